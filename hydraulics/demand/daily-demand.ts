import { DEFAULT_DEMAND_FIGURES } from './default-figures';
import type { DemandFigures } from './figures';
import { assertArray } from './guards';
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
   * `coincident-hourly` when every use has an hourly shape (peak of the summed profile);
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
  const peakFlowM3s = anyNominal
    ? results.reduce((sum, result) => sum + result.peakFlowM3s, 0)
    : Math.max(0, ...hourlyVolumeM3) / 3600;
  return {
    uses: results,
    dailyVolumeM3: results.reduce((sum, result) => sum + result.dailyVolumeM3, 0),
    hourlyVolumeM3,
    peakFlowM3s,
    peakMethod: anyNominal ? 'sum-of-peaks' : 'coincident-hourly',
  };
}
