import { assertArray, assertFiniteNumber, assertNonNegative } from '../input-guards';
import { findTurningPoints } from '../checks/air-points';
import { HydraulicsInputError } from '../errors';
import { DEFAULT_LINE_SETTINGS } from '../profile/settings';

export interface PipeProfile {
  /** Distance along the pipe, m, strictly increasing. */
  chainageM: readonly number[];
  /** Pipe elevation at each chainage, m. */
  elevationM: readonly number[];
}

export interface LowPointOptions extends PipeProfile {
  /**
   * A sag must stand out by more than this on both sides to count (filters survey noise), m.
   * @default DEFAULT_LINE_SETTINGS.airPointToleranceM (1 m): the same rule as the washout check, so
   * a winter drain point and a washout are found at the same sags
   */
  prominenceM?: number;
}

export interface LowPoint {
  index: number;
  chainageM: number;
  elevationM: number;
}

export function assertPipeProfile({ chainageM, elevationM }: PipeProfile): void {
  assertArray(chainageM, 'chainageM');
  assertArray(elevationM, 'elevationM');
  if (chainageM.length !== elevationM.length) {
    throw new HydraulicsInputError(
      'elevationM',
      `has ${elevationM.length} values but chainageM has ${chainageM.length}`,
    );
  }
  if (chainageM.length < 2) throw new HydraulicsInputError('chainageM', 'needs at least two points');
  chainageM.forEach((chainage, index) => {
    assertFiniteNumber(chainage, 'chainageM', index);
    assertFiniteNumber(elevationM[index], 'elevationM', index);
    if (index > 0 && chainage <= chainageM[index - 1]) {
      throw new HydraulicsInputError(
        'chainageM',
        `must increase along the pipe (${chainage} after ${chainageM[index - 1]})`,
        index,
      );
    }
  });
}

/**
 * Low points of a pipe profile, where a drain or washout goes: the sags the line checks find
 * (`findTurningPoints`, which needs a sag to stand out by more than the prominence on both sides and
 * never reports the ends, which are the source and the outlet).
 */
export function findLowPoints({
  chainageM,
  elevationM,
  prominenceM = DEFAULT_LINE_SETTINGS.airPointToleranceM,
}: LowPointOptions): LowPoint[] {
  assertPipeProfile({ chainageM, elevationM });
  assertNonNegative(prominenceM, 'prominenceM');
  return findTurningPoints(elevationM, prominenceM).lows.map((index) => ({
    index,
    chainageM: chainageM[index],
    elevationM: elevationM[index],
  }));
}
