import { HydraulicsInputError } from '../errors';
import { assertArray, assertNonNegative } from '../input-guards';
import { HOURS_PER_DAY } from '../demand/hourly-pattern';

export interface MassCurveOptions {
  /** Inflow in each hour of the day, m³ (24 values). */
  supplyHourlyM3: readonly number[];
  /** Draw in each hour of the day, m³ (24 values). */
  demandHourlyM3: readonly number[];
}

export interface MassCurveResult {
  /** Cumulative inflow minus draw at each hour boundary, m³ (25 values, starting at 0). */
  cumulativeSurplusM3: number[];
  dailySupplyM3: number;
  dailyDemandM3: number;
  /** Supply minus demand over the day, m³ (negative: the tank loses this much every day). */
  dailyBalanceM3: number;
  /**
   * Smallest tank that never runs dry over a repeating day, m³: the largest fall of the cumulative
   * surplus curve within any 24 h (wrapping past midnight). With supply equal to demand this is the
   * classic mass-curve answer, max cumulative surplus minus min.
   */
  cycleStorageM3: number;
  /** Hour boundary (0-23, 0 = midnight) at which the tank is lowest in that worst stretch. */
  lowestAtHour: number;
}

function assertHourly(value: unknown, field: string): asserts value is readonly number[] {
  assertArray(value, field);
  if (value.length !== HOURS_PER_DAY)
    throw new HydraulicsInputError(field, `needs 24 hourly volumes, got ${value.length}`);
  value.forEach((volume, hour) => assertNonNegative(volume, field, hour));
}

/** Storage a repeating day needs, from the mass curve of supply against demand. */
export function massCurveStorage({ supplyHourlyM3, demandHourlyM3 }: MassCurveOptions): MassCurveResult {
  assertHourly(supplyHourlyM3, 'supplyHourlyM3');
  assertHourly(demandHourlyM3, 'demandHourlyM3');
  const cumulativeSurplusM3 = [0];
  for (let hour = 0; hour < HOURS_PER_DAY; hour += 1) {
    cumulativeSurplusM3.push(cumulativeSurplusM3[hour] + supplyHourlyM3[hour] - demandHourlyM3[hour]);
  }
  const dailyBalanceM3 = cumulativeSurplusM3[HOURS_PER_DAY];
  // Every stretch of up to 24 h, wrapping past midnight: the tank must cover the largest fall of
  // the curve over any of them. Longer stretches only add whole days, which add nothing when the
  // day is in surplus or balance.
  const curveAt = (step: number): number =>
    cumulativeSurplusM3[step % HOURS_PER_DAY] + Math.floor(step / HOURS_PER_DAY) * dailyBalanceM3;
  let cycleStorageM3 = 0;
  let lowestAtHour = 0;
  for (let start = 0; start < HOURS_PER_DAY; start += 1) {
    for (let length = 1; length <= HOURS_PER_DAY; length += 1) {
      const drawdown = curveAt(start) - curveAt(start + length);
      if (drawdown > cycleStorageM3 + 1e-12) {
        cycleStorageM3 = drawdown;
        lowestAtHour = (start + length) % HOURS_PER_DAY;
      }
    }
  }
  const dailySupplyM3 = supplyHourlyM3.reduce((sum, volume) => sum + volume, 0);
  const dailyDemandM3 = demandHourlyM3.reduce((sum, volume) => sum + volume, 0);
  return { cumulativeSurplusM3, dailySupplyM3, dailyDemandM3, dailyBalanceM3, cycleStorageM3, lowestAtHour };
}
