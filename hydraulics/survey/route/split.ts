import { HydraulicsInputError } from '../../errors';
import { assertFiniteNumber } from '../../input-guards';
import type { RouteStation } from '../types';
import { interpolateStation } from './interpolate';
import { assertOrderedStations } from './ordered-stations';

export interface SplitRouteResult<T extends RouteStation> {
  /** Stations up to and including the split station. */
  first: (T | RouteStation)[];
  /** The split station and everything after it, chainage restarting at 0. */
  second: (T | RouteStation)[];
  /** True when the split station was interpolated (no station stood at that chainage). */
  splitStationInterpolated: boolean;
  splitElevationM: number;
}

/**
 * Splits a route at a chainage strictly inside it (e.g. intake → pump | pump → tank). Both parts
 * share the split station; its height is interpolated on the grade between its neighbours when
 * no station stood there.
 */
export function splitRoute<T extends RouteStation>(
  points: readonly T[],
  options: { chainageM: number },
): SplitRouteResult<T> {
  assertOrderedStations(points);
  const c = options.chainageM;
  assertFiniteNumber(c, 'chainageM');
  const startM = points[0].chainageM;
  const endM = points[points.length - 1].chainageM;
  if (c <= startM || c >= endM) {
    throw new HydraulicsInputError(
      'chainageM',
      `the split must fall inside the route (${startM} m to ${endM} m), got ${c} m`,
    );
  }
  const exact = points.findIndex((p) => p.chainageM === c);
  const after = points.findIndex((p) => p.chainageM > c);
  const splitStation: T | RouteStation =
    exact >= 0 ? points[exact] : interpolateStation(points[after - 1], points[after], c);
  const before = points.filter((p) => p.chainageM < c);
  const rest = points.filter((p) => p.chainageM > c);
  return {
    first: [...before.map((p) => ({ ...p })), { ...splitStation }],
    second: [{ ...splitStation }, ...rest].map((p) => ({ ...p, chainageM: p.chainageM - c })),
    splitStationInterpolated: exact < 0,
    splitElevationM: splitStation.elevationM,
  };
}
