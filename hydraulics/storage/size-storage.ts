import { SECONDS_PER_DAY } from '../constants';
import { assertNonNegative, assertPositive } from '../input-guards';
import { assertHourlyPattern } from '../demand/hourly-pattern';
import type { PlanCheck } from '../ram/plan-check';
import { massCurveStorage, type MassCurveResult } from './mass-curve';
import { supplyHourlyVolumeM3, type SupplyProfileOptions } from './supply-profile';
import { tankFillTimeS } from './tank-fill';

/** Daily demand as a volume with its hourly pattern, or directly as hourly volumes. */
export type StorageDemand =
  { dailyVolumeM3: number; hourlyFractions: readonly number[] } | { hourlyVolumeM3: readonly number[] };

export interface StorageSizingOptions {
  supply: SupplyProfileOptions;
  demand: StorageDemand;
  /** Whole days of average demand kept in reserve on top of the daily cycle. @default 0 */
  reserveDays?: number;
}

export interface StorageSizingResult {
  massCurve: MassCurveResult;
  /** Storage that carries the daily cycle without running dry, m³. */
  cycleStorageM3: number;
  reserveStorageM3: number;
  totalStorageM3: number;
  /** Time to fill the whole tank from empty with the outlets shut, s. */
  fillTimeFromEmptyS: number;
  /** The same while the outlets draw the average daily flow, s (null when the draw is not less than the supply). */
  fillTimeWithAverageDrawS: number | null;
  /** Flow the overflow must carry away when the tank is full and nothing is drawn, m³/s. */
  overflowFlowM3s: number;
  /** Water that spills each day once the tank is full, m³. */
  dailyOverflowM3: number;
  checks: PlanCheck[];
}

function demandHourlyM3(demand: StorageDemand): readonly number[] {
  if ('hourlyVolumeM3' in demand) return demand.hourlyVolumeM3;
  assertNonNegative(demand.dailyVolumeM3, 'demand.dailyVolumeM3');
  assertHourlyPattern(demand.hourlyFractions, 'demand.hourlyFractions');
  return demand.hourlyFractions.map((fraction) => fraction * demand.dailyVolumeM3);
}

/** Tank size, fill time and overflow for a daily supply against a daily demand pattern. */
export function sizeStorage({ supply, demand, reserveDays = 0 }: StorageSizingOptions): StorageSizingResult {
  assertPositive(supply.flowM3s, 'supply.flowM3s');
  assertNonNegative(reserveDays, 'reserveDays');
  const massCurve = massCurveStorage({
    supplyHourlyM3: supplyHourlyVolumeM3(supply),
    demandHourlyM3: demandHourlyM3(demand),
  });
  const reserveStorageM3 = reserveDays * massCurve.dailyDemandM3;
  const totalStorageM3 = massCurve.cycleStorageM3 + reserveStorageM3;
  const averageDrawM3s = massCurve.dailyDemandM3 / SECONDS_PER_DAY;
  const checks: PlanCheck[] = [];
  if (massCurve.dailyBalanceM3 < -1e-9) {
    checks.push({
      code: 'supply-below-demand',
      severity: 'error',
      values: {
        supplyVolumeM3: massCurve.dailySupplyM3,
        demandVolumeM3: massCurve.dailyDemandM3,
        volumeM3: -massCurve.dailyBalanceM3,
      },
      message: `The supply gives ${massCurve.dailySupplyM3.toFixed(2)} m³ a day but the uses take ${massCurve.dailyDemandM3.toFixed(2)} m³: the tank loses ${(-massCurve.dailyBalanceM3).toFixed(2)} m³ every day and no size of tank keeps up.`,
      fix: 'Increase the supply (longer hours, more drive flow, another source) or reduce the demand.',
      source: 'mass balance of the daily cycle',
    });
  }
  if (reserveDays === 0) {
    checks.push({
      code: 'no-reserve',
      severity: 'info',
      values: {},
      message:
        'No reserve days are held: the tank only carries the daily cycle, so any stop in supply leaves the outlets dry within hours.',
      fix: 'Hold a reserve equal to the interval between checks of the system (3-4 days if checked every 3-4 days).',
      source: 'Alberta Agriculture (McNaughton) in Western Producer 2002',
    });
  }
  return {
    massCurve,
    cycleStorageM3: massCurve.cycleStorageM3,
    reserveStorageM3,
    totalStorageM3,
    fillTimeFromEmptyS: tankFillTimeS({ volumeM3: totalStorageM3, inflowM3s: supply.flowM3s }),
    fillTimeWithAverageDrawS:
      supply.flowM3s > averageDrawM3s
        ? tankFillTimeS({ volumeM3: totalStorageM3, inflowM3s: supply.flowM3s, outflowM3s: averageDrawM3s })
        : null,
    overflowFlowM3s: supply.flowM3s,
    dailyOverflowM3: Math.max(0, massCurve.dailyBalanceM3),
    checks,
  };
}
