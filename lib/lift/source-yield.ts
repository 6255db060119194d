import {
  designYield,
  type DesignYieldChoice,
  type DesignYieldResult,
  measuredFlowM3s,
  type PlanCheck,
  yieldDrawChecks,
  type YieldReading,
} from '../../hydraulics/index';
import { outcomeOf } from './outcome';
import type { Outcome, WaterSourceRecord, YieldReadingRecord } from './records';

export interface SourceYieldView {
  source: WaterSourceRecord;
  /** Readings newest first, each with its flow, m³/s. */
  readings: (YieldReadingRecord & { flowM3sMeasured: number })[];
  design: Outcome<DesignYieldResult & { readingId: string | null }>;
  /** What the design draws from the source: drive flow of its ram sites plus other draw, m³/s. */
  drawM3s: number;
  drawChecks: PlanCheck[];
}

function toYieldReading(reading: YieldReadingRecord): YieldReading {
  const measurement =
    reading.flowM3s !== null
      ? { flowM3s: reading.flowM3s }
      : { bucket: { volumeM3: reading.bucketVolumeM3 ?? Number.NaN, seconds: reading.bucketSeconds ?? Number.NaN } };
  return { date: reading.measuredOn, season: reading.season, measurement, note: reading.note };
}

function choiceOf(source: WaterSourceRecord, readings: readonly YieldReadingRecord[]): DesignYieldChoice {
  if (source.designYieldChoice === 'entered' && source.enteredYieldM3s !== null)
    return { kind: 'entered', flowM3s: source.enteredYieldM3s };
  const index = readings.findIndex((reading) => reading.id === source.designReadingId);
  if (source.designYieldChoice === 'reading' && index >= 0) return { kind: 'reading', index };
  return { kind: 'lowest-recent-dry' };
}

/** Design yield of a source from its readings, and the warning when the design draws more. */
export function sourceYieldView(
  source: WaterSourceRecord,
  allReadings: readonly YieldReadingRecord[],
  drawM3s: number,
): SourceYieldView {
  const readings = allReadings
    .filter((reading) => reading.sourceId === source.id)
    .sort((a, b) => b.measuredOn.localeCompare(a.measuredOn));
  const asYield = readings.map(toYieldReading);
  const design = outcomeOf(() => {
    const result = designYield({ readings: asYield, choice: choiceOf(source, readings) });
    return { ...result, readingId: result.readingIndex === null ? null : readings[result.readingIndex].id };
  });
  const drawChecks =
    design.ok && drawM3s > 0
      ? yieldDrawChecks({ designYieldM3s: design.value.designYieldM3s, designDrawM3s: drawM3s })
      : [];
  return {
    source,
    readings: readings.map((reading, index) => ({
      ...reading,
      flowM3sMeasured: measuredFlowM3s(asYield[index].measurement),
    })),
    design,
    drawM3s,
    drawChecks,
  };
}
