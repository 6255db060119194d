import { assertNonNegative, assertPositive } from '../input-guards';
import { HydraulicsInputError } from '../errors';

export interface TankFillOptions {
  volumeM3: number;
  inflowM3s: number;
  /** Draw while filling, m³/s. @default 0 (outlets shut) */
  outflowM3s?: number;
}

/** Time to fill a volume from empty, s: volume / net inflow. Throws when the tank would never fill. */
export function tankFillTimeS({ volumeM3, inflowM3s, outflowM3s = 0 }: TankFillOptions): number {
  assertNonNegative(volumeM3, 'volumeM3');
  assertPositive(inflowM3s, 'inflowM3s');
  assertNonNegative(outflowM3s, 'outflowM3s');
  const netInflowM3s = inflowM3s - outflowM3s;
  if (netInflowM3s <= 0) {
    throw new HydraulicsInputError(
      'outflowM3s',
      `the draw (${outflowM3s} m³/s) is not less than the inflow, so the tank never fills`,
    );
  }
  return volumeM3 / netInflowM3s;
}
