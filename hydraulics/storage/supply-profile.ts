import { deliveryWindowPattern, HOURS_PER_DAY } from '../demand/hourly-pattern';
import { assertNonNegative } from '../input-guards';

export interface SupplyProfileOptions {
  /** Flow into the tank while the supply runs, m³/s (source yield or pump delivery). */
  flowM3s: number;
  /** Hours a day the supply runs. @default 24 */
  hoursPerDay?: number;
  /** Hour the supply starts when it runs part of the day. @default 0 */
  startHour?: number;
}

/** Volume delivered in each hour of the day, m³ (24 values). */
export function supplyHourlyVolumeM3({
  flowM3s,
  hoursPerDay = HOURS_PER_DAY,
  startHour = 0,
}: SupplyProfileOptions): number[] {
  assertNonNegative(flowM3s, 'supply.flowM3s');
  const dailyVolumeM3 = flowM3s * hoursPerDay * 3600;
  return deliveryWindowPattern({ hours: hoursPerDay, startHour }).map((fraction) => fraction * dailyVolumeM3);
}
