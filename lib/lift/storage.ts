import {
  type PlanCheck,
  requiredTankElevation,
  simulateTank,
  sizeStorage,
  type StorageSizingResult,
  supplyHourlyVolumeM3,
  type TankElevationResult,
  tankFillTimeS,
} from '../../hydraulics/index';
import { outcomeOf } from './outcome';
import type { Outcome, TankRecord } from './records';

/** Where a tank's supply figure came from. */
export interface TankSupply {
  flowM3s: number | null;
  basis: 'ram-sites' | 'source' | 'entered';
  /** Why there is no figure, or what it is made of. */
  note: string;
}

export interface TankSizingView {
  sizing: StorageSizingResult;
  /** Cumulative supply and demand at each hour boundary over the day, m³ (25 values each): the mass curve. */
  cumulativeSupplyM3: number[];
  cumulativeDemandM3: number[];
  /** Volume in this tank at each hour boundary over three repeating days, starting full, m³. */
  levelOverThreeDaysM3: number[];
  /** Whether this tank holds the daily cycle plus the reserve wanted. */
  holdsCycleAndReserve: boolean;
  /** Days of average demand this tank holds beyond the daily cycle. */
  reserveDaysHeld: number | null;
  /** Running time to fill this tank from empty with the outlets shut, s. */
  fillTimeS: number;
  elevation: {
    required: TankElevationResult | null;
    /** Lowest working water level of this tank, m (null without a floor elevation). */
    lowestWaterLevelM: number | null;
    /** How far the lowest working level is below what the outlets need, m (0 when high enough). */
    shortfallM: number | null;
  };
  checks: PlanCheck[];
}

const cumulative = (hourly: readonly number[]): number[] =>
  hourly.reduce((sums, volume) => [...sums, sums[sums.length - 1] + volume], [0]);

function elevationOf(tank: TankRecord): TankSizingView['elevation'] {
  const required = tank.outlets.length > 0 ? requiredTankElevation({ outlets: tank.outlets }) : null;
  const lowestWaterLevelM = tank.baseElevationM === null ? null : tank.baseElevationM + tank.lowLevelM;
  const shortfallM =
    required && lowestWaterLevelM !== null ? Math.max(0, required.minimumWaterLevelM - lowestWaterLevelM) : null;
  return { required, lowestWaterLevelM, shortfallM };
}

function tankChecks(tank: TankRecord, view: Omit<TankSizingView, 'checks'>): PlanCheck[] {
  const checks: PlanCheck[] = [];
  if (!view.holdsCycleAndReserve) {
    checks.push({
      code: 'tank-smaller-than-needed',
      severity: 'warning',
      values: { volumeM3: view.sizing.totalStorageM3 },
      message: `The tank holds less than the daily cycle plus the reserve wanted (${view.sizing.totalStorageM3.toFixed(2)} m³).`,
      fix: 'Fit a larger tank, add a second one, or hold fewer reserve days.',
      source: 'mass curve of the daily cycle',
    });
  }
  if (view.elevation.shortfallM !== null && view.elevation.shortfallM > 0) {
    checks.push({
      code: 'tank-too-low',
      severity: 'warning',
      values: { headM: view.elevation.shortfallM },
      message: `At its lowest working level the tank is ${view.elevation.shortfallM.toFixed(1)} m too low to give every outlet its residual head.`,
      fix: 'Set the tank higher, lower the residual head wanted, or use larger pipe to cut friction.',
      source: 'energy balance: outlet elevation + residual head + friction loss',
    });
  }
  return checks;
}

/** Storage sizing of a tank against the project's daily demand. */
export function tankSizingView(
  tank: TankRecord,
  supply: TankSupply,
  demandHourlyM3: readonly number[],
): Outcome<TankSizingView> {
  const flowM3s = supply.flowM3s;
  if (flowM3s === null || flowM3s <= 0) return { ok: false, error: supply.note, field: 'supplyKind' };
  return outcomeOf(() => {
    const supplyOptions = { flowM3s, hoursPerDay: tank.supplyHoursPerDay, startHour: tank.supplyStartHour };
    const sizing = sizeStorage({
      supply: supplyOptions,
      demand: { hourlyVolumeM3: demandHourlyM3 },
      reserveDays: tank.reserveDays,
    });
    const dailyDemandM3 = sizing.massCurve.dailyDemandM3;
    const supplyHourlyM3 = supplyHourlyVolumeM3(supplyOptions);
    const view = {
      sizing,
      cumulativeSupplyM3: cumulative(supplyHourlyM3),
      cumulativeDemandM3: cumulative(demandHourlyM3),
      levelOverThreeDaysM3: simulateTank({ capacityM3: tank.volumeM3, supplyHourlyM3, demandHourlyM3 }).volumeAtHourM3,
      holdsCycleAndReserve: tank.volumeM3 >= sizing.totalStorageM3 - 1e-9,
      reserveDaysHeld: dailyDemandM3 > 0 ? Math.max(0, tank.volumeM3 - sizing.cycleStorageM3) / dailyDemandM3 : null,
      fillTimeS: tankFillTimeS({ volumeM3: tank.volumeM3, inflowM3s: flowM3s }),
      elevation: elevationOf(tank),
    };
    return { ...view, checks: [...sizing.checks, ...tankChecks(tank, view)] };
  });
}
