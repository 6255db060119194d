import { assertNonNegative, assertPositiveInteger } from '../input-guards';
import { HydraulicsInputError } from '../errors';

export interface SimulateTankOptions {
  capacityM3: number;
  /** Level at the start, m³. @default capacityM3 (full) */
  startVolumeM3?: number;
  supplyHourlyM3: readonly number[];
  demandHourlyM3: readonly number[];
  /** Days to run the repeating day. @default 3 */
  days?: number;
  /** Sub-steps per hour; inflow and draw are spread evenly within the hour. @default 12 */
  stepsPerHour?: number;
}

export interface SimulateTankResult {
  /** Lowest volume reached, m³ (negative means the draw was not met). */
  lowestVolumeM3: number;
  /** Volume at each hour boundary, m³ (days × 24 + 1 values), floored at zero (see unmetDemandM3). */
  volumeAtHourM3: number[];
  spilledM3: number;
  /** Draw not met because the tank was empty, m³. */
  unmetDemandM3: number;
}

/** Steps a tank with overflow through repeating days: inflow fills it to capacity, the rest spills. */
export function simulateTank({
  capacityM3,
  startVolumeM3 = capacityM3,
  supplyHourlyM3,
  demandHourlyM3,
  days = 3,
  stepsPerHour = 12,
}: SimulateTankOptions): SimulateTankResult {
  assertNonNegative(capacityM3, 'capacityM3');
  assertNonNegative(startVolumeM3, 'startVolumeM3');
  if (startVolumeM3 > capacityM3) throw new HydraulicsInputError('startVolumeM3', 'must not exceed the capacity');
  assertPositiveInteger(days, 'days');
  assertPositiveInteger(stepsPerHour, 'stepsPerHour');
  let volume = startVolumeM3;
  let lowestVolumeM3 = volume;
  let spilledM3 = 0;
  let unmetDemandM3 = 0;
  const volumeAtHourM3 = [volume];
  for (let day = 0; day < days; day += 1) {
    for (let hour = 0; hour < supplyHourlyM3.length; hour += 1) {
      const net = (supplyHourlyM3[hour] - demandHourlyM3[hour]) / stepsPerHour;
      for (let step = 0; step < stepsPerHour; step += 1) {
        volume += net;
        if (volume > capacityM3) {
          spilledM3 += volume - capacityM3;
          volume = capacityM3;
        }
        lowestVolumeM3 = Math.min(lowestVolumeM3, volume);
        if (volume < 0) {
          unmetDemandM3 += -volume;
          volume = 0;
        }
      }
      volumeAtHourM3.push(volume);
    }
  }
  return { lowestVolumeM3, volumeAtHourM3, spilledM3, unmetDemandM3 };
}
