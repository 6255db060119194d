import { HydraulicsInputError } from '../../errors';
import { assertFiniteNumber, assertNonNegative } from '../../input-guards';

export type VerticalAngleUnit = 'degrees' | 'percent';

export interface InclinometerLegInput {
  /** Distance measured along the ground/tape between the two stations, metres. */
  slopeDistanceM: number;
  /** Vertical angle from the horizontal, positive uphill; degrees or percent grade. */
  verticalAngle: number;
  angleUnit: VerticalAngleUnit;
}

export interface InclinometerLegResult {
  horizontalDistanceM: number;
  /** Height of the far station minus the near one, metres (positive uphill). */
  heightDifferenceM: number;
  verticalAngleDeg: number;
}

/** Vertical angle in degrees from a reading in degrees or percent grade (100·tan θ). */
export function verticalAngleToDegrees(verticalAngle: number, angleUnit: VerticalAngleUnit): number {
  return angleUnit === 'degrees' ? verticalAngle : (Math.atan(verticalAngle / 100) * 180) / Math.PI;
}

/**
 * Reduces one Abney/clinometer leg: horizontal = L·cos θ, height difference = L·sin θ.
 * A vertical angle must lie strictly inside ±90° (a reading of 90° or more is a booking error).
 */
export function reduceInclinometerLeg(input: InclinometerLegInput, index?: number): InclinometerLegResult {
  assertNonNegative(input.slopeDistanceM, 'slopeDistanceM', index);
  assertFiniteNumber(input.verticalAngle, 'verticalAngle', index);
  if (input.angleUnit !== 'degrees' && input.angleUnit !== 'percent') {
    throw new HydraulicsInputError(
      'angleUnit',
      `must be "degrees" or "percent", got ${String(input.angleUnit)}`,
      index,
    );
  }
  if (input.angleUnit === 'degrees' && Math.abs(input.verticalAngle) >= 90) {
    throw new HydraulicsInputError(
      'verticalAngle',
      `a vertical angle must be between -90 and 90 degrees, got ${input.verticalAngle}`,
      index,
    );
  }
  const verticalAngleDeg = verticalAngleToDegrees(input.verticalAngle, input.angleUnit);
  const theta = (verticalAngleDeg * Math.PI) / 180;
  return {
    horizontalDistanceM: input.slopeDistanceM * Math.cos(theta),
    heightDifferenceM: input.slopeDistanceM * Math.sin(theta),
    verticalAngleDeg,
  };
}

export interface InclinometerTraverseInput {
  startElevationM: number;
  /** @default 0 */
  startChainageM?: number;
  legs: readonly InclinometerLegInput[];
}

export interface ReducedStation {
  chainageM: number;
  elevationM: number;
  /** Cumulative slope (tape) length to this station, metres. */
  slopeChainageM: number;
}

/** Chains legs into stations; the first station is the start mark. */
export function reduceInclinometerTraverse(input: InclinometerTraverseInput): ReducedStation[] {
  assertFiniteNumber(input.startElevationM, 'startElevationM');
  const startChainageM = input.startChainageM ?? 0;
  assertFiniteNumber(startChainageM, 'startChainageM');
  const stations: ReducedStation[] = [
    { chainageM: startChainageM, elevationM: input.startElevationM, slopeChainageM: 0 },
  ];
  input.legs.forEach((leg, i) => {
    const r = reduceInclinometerLeg(leg, i);
    const prev = stations[stations.length - 1];
    stations.push({
      chainageM: prev.chainageM + r.horizontalDistanceM,
      elevationM: prev.elevationM + r.heightDifferenceM,
      slopeChainageM: prev.slopeChainageM + leg.slopeDistanceM,
    });
  });
  return stations;
}
