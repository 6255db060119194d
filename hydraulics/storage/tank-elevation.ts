import { assertArray, assertFiniteNumber, assertNonNegative } from '../input-guards';
import { HydraulicsInputError } from '../errors';

/** One outlet fed from the tank. */
export interface OutletHeadNeed {
  label?: string;
  elevationM: number;
  /** Pressure head wanted at the outlet while it runs, m. */
  residualHeadM: number;
  /** Friction (and fitting) loss from the tank to this outlet at design flow, m. */
  frictionLossM: number;
}

export interface TankElevationResult {
  /** Lowest water level in the tank that still gives every outlet its residual, m. */
  minimumWaterLevelM: number;
  /** Index of the outlet that sets it. */
  governingOutletIndex: number;
  /** Level each outlet would need on its own, m. */
  levelPerOutletM: number[];
}

/**
 * Water level the tank must hold (at its lowest working level) so every outlet below gets its
 * residual head: outlet elevation + residual head + friction loss, the largest over the outlets.
 */
export function requiredTankElevation({ outlets }: { outlets: readonly OutletHeadNeed[] }): TankElevationResult {
  assertArray(outlets, 'outlets');
  if (outlets.length === 0) throw new HydraulicsInputError('outlets', 'needs at least one outlet');
  const levelPerOutletM = outlets.map((outlet, index) => {
    assertFiniteNumber(outlet.elevationM, 'outlets.elevationM', index);
    assertNonNegative(outlet.residualHeadM, 'outlets.residualHeadM', index);
    assertNonNegative(outlet.frictionLossM, 'outlets.frictionLossM', index);
    return outlet.elevationM + outlet.residualHeadM + outlet.frictionLossM;
  });
  const minimumWaterLevelM = Math.max(...levelPerOutletM);
  return { minimumWaterLevelM, governingOutletIndex: levelPerOutletM.indexOf(minimumWaterLevelM), levelPerOutletM };
}
