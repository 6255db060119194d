import { HydraulicsInputError } from '../../errors';
import { assertFiniteNumber } from '../../input-guards';
import type { RouteStation } from '../types';

/** A route edit needs at least two stations with chainage that never goes backwards. */
export function assertOrderedStations(points: readonly RouteStation[], field = 'points'): void {
  if (points.length < 2)
    throw new HydraulicsInputError(field, `a route needs at least two stations, got ${points.length}`);
  points.forEach((p, i) => {
    assertFiniteNumber(p.chainageM, `${field}.chainageM`, i);
    assertFiniteNumber(p.elevationM, `${field}.elevationM`, i);
    if (i > 0 && p.chainageM < points[i - 1].chainageM) {
      throw new HydraulicsInputError(
        `${field}.chainageM`,
        `chainage goes backwards (${p.chainageM} after ${points[i - 1].chainageM})`,
        i,
      );
    }
  });
}
