import { assertArray, assertPositive, assertPositiveInteger } from '../input-guards';
import { HydraulicsInputError } from '../errors';
import type { PlanCheck } from '../ram/plan-check';
import { measuredFlowM3s } from './bucket-flow';
import { MS_PER_DAY, parseIsoDate } from './iso-date';
import type { YieldReading } from './yield-reading';

/** How the design yield is chosen: the lowest recent dry-season figure unless the user says otherwise. */
export type DesignYieldChoice =
  { kind: 'lowest-recent-dry' } | { kind: 'reading'; index: number } | { kind: 'entered'; flowM3s: number };

export interface DesignYieldOptions {
  readings: readonly YieldReading[];
  /** Date "recent" is counted back from, `YYYY-MM-DD`. @default the latest reading's date */
  asOfDate?: string;
  /**
   * How many days back count as recent (Runnel's default: three years, so a dry year is not forgotten at once).
   * @default 1096
   */
  recentDays?: number;
  /** @default { kind: 'lowest-recent-dry' } */
  choice?: DesignYieldChoice;
}

export interface DesignYieldResult {
  designYieldM3s: number;
  basis: 'lowest-recent-dry' | 'lowest-recent-any-season' | 'chosen-reading' | 'entered';
  /** Reading the figure came from (null when entered). */
  readingIndex: number | null;
  /** Flow of every reading, m³/s, in the caller's order. */
  readingFlowsM3s: number[];
  /** Lowest recent dry-season figure, m³/s (null when there is none), for comparison with a choice. */
  lowestRecentDryM3s: number | null;
  checks: PlanCheck[];
}

const SAFE_YIELD_SOURCE =
  'T.D. Jordan Jr., A Handbook of Gravity-Flow Water Systems for Small Communities (ITACA summary): never draw more than the minimum source flow';

function lowestIndex(indices: readonly number[], flows: readonly number[]): number | null {
  return indices.reduce<number | null>(
    (best, index) => (best === null || flows[index] < flows[best] ? index : best),
    null,
  );
}

/** The design yield of a source from its dated readings. */
export function designYield({
  readings,
  asOfDate,
  recentDays = 1096,
  choice = { kind: 'lowest-recent-dry' },
}: DesignYieldOptions): DesignYieldResult {
  assertArray(readings, 'readings');
  assertPositiveInteger(recentDays, 'recentDays');
  if (readings.length === 0 && choice.kind !== 'entered')
    throw new HydraulicsInputError('readings', 'needs at least one reading');
  const dates = readings.map((reading, index) => parseIsoDate(reading.date, 'readings.date', index));
  const readingFlowsM3s = readings.map((reading, index) =>
    measuredFlowM3s(reading.measurement, 'readings.measurement', index),
  );
  readings.forEach((reading, index) => {
    if (!['dry', 'wet', 'unspecified'].includes(reading.season)) {
      throw new HydraulicsInputError(
        'readings.season',
        `must be dry, wet or unspecified, got ${String(reading.season)}`,
        index,
      );
    }
  });
  const asOf =
    asOfDate === undefined
      ? Math.max(...dates.map((date) => date.getTime()))
      : parseIsoDate(asOfDate, 'asOfDate').getTime();
  const recent = readings
    .map((_, index) => index)
    .filter((index) => {
      const age = asOf - dates[index].getTime();
      return age >= 0 && age <= recentDays * MS_PER_DAY;
    });
  const lowestDry = lowestIndex(
    recent.filter((index) => readings[index].season === 'dry'),
    readingFlowsM3s,
  );
  const lowestRecentDryM3s = lowestDry === null ? null : readingFlowsM3s[lowestDry];
  const checks: PlanCheck[] = [];
  const base = { readingFlowsM3s, lowestRecentDryM3s, checks };

  if (choice.kind === 'entered' || choice.kind === 'reading') {
    let designYieldM3s: number;
    let readingIndex: number | null = null;
    if (choice.kind === 'entered') {
      assertPositive(choice.flowM3s, 'choice.flowM3s');
      designYieldM3s = choice.flowM3s;
    } else {
      if (!Number.isInteger(choice.index) || choice.index < 0 || choice.index >= readings.length) {
        throw new HydraulicsInputError(
          'choice.index',
          `no reading ${String(choice.index)}; there are ${readings.length}`,
        );
      }
      readingIndex = choice.index;
      designYieldM3s = readingFlowsM3s[choice.index];
    }
    if (lowestRecentDryM3s !== null && designYieldM3s > lowestRecentDryM3s) {
      checks.push({
        code: 'design-yield-above-dry-season',
        severity: 'warning',
        values: { flowM3s: designYieldM3s, limitFlowM3s: lowestRecentDryM3s },
        message: `The chosen design yield is above the lowest recent dry-season reading (${(lowestRecentDryM3s * 60_000).toFixed(1)} L/min).`,
        fix: 'Design on the dry-season figure unless storage carries the system through the dry season.',
        source: SAFE_YIELD_SOURCE,
      });
    }
    return { ...base, designYieldM3s, basis: choice.kind === 'entered' ? 'entered' : 'chosen-reading', readingIndex };
  }

  if (lowestDry !== null)
    return { ...base, designYieldM3s: readingFlowsM3s[lowestDry], basis: 'lowest-recent-dry', readingIndex: lowestDry };
  const lowestAny = lowestIndex(recent, readingFlowsM3s);
  if (lowestAny === null) {
    throw new HydraulicsInputError(
      'readings',
      `no reading in the ${recentDays} days before the reference date; measure the source again`,
    );
  }
  checks.push({
    code: 'no-dry-season-reading',
    severity: 'warning',
    values: {},
    message:
      'No recent dry-season reading: the lowest recent reading of any season is used, and the dry-season flow may be lower.',
    fix: 'Measure the source in the driest weeks of the year.',
    source: SAFE_YIELD_SOURCE,
  });
  return {
    ...base,
    designYieldM3s: readingFlowsM3s[lowestAny],
    basis: 'lowest-recent-any-season',
    readingIndex: lowestAny,
  };
}

/** Warns when the design draw on a source exceeds its design yield. */
export function yieldDrawChecks({
  designYieldM3s,
  designDrawM3s,
}: {
  designYieldM3s: number;
  designDrawM3s: number;
}): PlanCheck[] {
  assertPositive(designYieldM3s, 'designYieldM3s');
  assertPositive(designDrawM3s, 'designDrawM3s');
  if (designDrawM3s <= designYieldM3s) return [];
  return [
    {
      code: 'draw-exceeds-yield',
      severity: 'warning',
      values: { flowM3s: designDrawM3s, limitFlowM3s: designYieldM3s },
      message: `The design draw (${(designDrawM3s * 60_000).toFixed(1)} L/min) exceeds the design yield (${(designYieldM3s * 60_000).toFixed(1)} L/min): the intake will run dry and draw air.`,
      fix: 'Draw less (smaller ram, fewer pumps, shorter delivery hours) or add storage and another source.',
      source: SAFE_YIELD_SOURCE,
    },
  ];
}
