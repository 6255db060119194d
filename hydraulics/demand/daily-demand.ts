import { DEFAULT_DEMAND_FIGURES } from './default-figures';
import type { DemandFigures } from './figures';
import { peakOfSummedFlows, useFlowIntervals } from './flow-timeline';
import { assertArray } from '../input-guards';
import { HOURS_PER_DAY } from './hourly-pattern';
import { useDemand } from './use-demand';
import type { UseDemandResult, WaterUse } from './use-types';

export interface DailyDemandOptions {
  uses: readonly WaterUse[];
  /** Editable figures; named defaults are looked up here. @default DEFAULT_DEMAND_FIGURES */
  figures?: DemandFigures;
}

export interface DailyDemandResult {
  uses: UseDemandResult[];
  dailyVolumeM3: number;
  /** Total volume per hour of the day, m³. */
  hourlyVolumeM3: number[];
  /** Peak flow of all uses together, m³/s. */
  peakFlowM3s: number;
  /**
   * `coincident-hourly` when every use has a time of day (peak of the summed flow rates, never
   * below any single use's peak);
   * `sum-of-peaks` when any use has only a peak factor, so peaks are assumed to coincide (safe side).
   */
  peakMethod: 'coincident-hourly' | 'sum-of-peaks';
}

/** Daily volume and peak flow per use and in total. */
export function dailyDemand({ uses, figures = DEFAULT_DEMAND_FIGURES }: DailyDemandOptions): DailyDemandResult {
  assertArray(uses, 'uses');
  const results = uses.map((use, index) => useDemand({ use, figures, index }));
  const hourlyVolumeM3 = new Array<number>(HOURS_PER_DAY).fill(0);
  for (const result of results) {
    result.hourlyVolumeM3.forEach((volume, hour) => {
      hourlyVolumeM3[hour] += volume;
    });
  }
  const anyNominal = results.some((result) => result.hourlyShapeNominal);
  // Peaks from the summed rates, not the hourly volumes: a 30-minute window's rate is twice its hour's mean.
  const largestSingle = Math.max(0, ...results.map((result) => result.peakFlowM3s));
  const peakFlowM3s = anyNominal
    ? results.reduce((sum, result) => sum + result.peakFlowM3s, 0)
    : Math.max(
        largestSingle,
        peakOfSummedFlows(uses.flatMap((use, i) => useFlowIntervals(use.delivery, results[i].dailyVolumeM3))),
      );
  return {
    uses: results,
    dailyVolumeM3: results.reduce((sum, result) => sum + result.dailyVolumeM3, 0),
    hourlyVolumeM3,
    peakFlowM3s,
    peakMethod: anyNominal ? 'sum-of-peaks' : 'coincident-hourly',
  };
}
