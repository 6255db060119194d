import { geodesicInverse } from '../geodesic';
import { assertNonNegative } from '../../input-guards';
import type { RouteStation } from '../types';
import { assertOrderedStations } from './ordered-stations';

export interface JoinRouteResult<T extends RouteStation> {
  stations: T[];
  /** Index in `stations` of the first station that came from the second route. */
  junctionIndex: number;
  /** Horizontal gap bridged between the end of the first and the start of the second, metres. */
  gapM: number;
  /**
   * When the routes meet at one place, the second route's start height minus the first's end
   * height, metres. The first route's height is kept; a non-zero step is for the user to see.
   */
  heightStepM: number;
}

function sameSpot(a: RouteStation, b: RouteStation): boolean {
  return a.latitudeDeg === b.latitudeDeg && a.longitudeDeg === b.longitudeDeg;
}

/**
 * Joins `second` onto the end of `first` (intake → pump, then pump → tank). The gap between them
 * defaults to the geodesic distance between the two ends when both positions are known, else 0.
 * With no gap the two end stations are one place and are merged into one station.
 */
export function joinRoutes<T extends RouteStation>(
  first: readonly T[],
  second: readonly T[],
  options: { gapM?: number } = {},
): JoinRouteResult<T> {
  assertOrderedStations(first, 'first');
  assertOrderedStations(second, 'second');
  const end = first[first.length - 1];
  const start = second[0];
  const bothPlaced =
    end.latitudeDeg !== undefined &&
    end.longitudeDeg !== undefined &&
    start.latitudeDeg !== undefined &&
    start.longitudeDeg !== undefined;
  const gapM =
    options.gapM ??
    (bothPlaced
      ? geodesicInverse({
          latitude1Deg: end.latitudeDeg as number,
          longitude1Deg: end.longitudeDeg as number,
          latitude2Deg: start.latitudeDeg as number,
          longitude2Deg: start.longitudeDeg as number,
        }).distanceM
      : 0);
  assertNonNegative(gapM, 'gapM');
  const shiftM = end.chainageM + gapM - start.chainageM;
  const moved = second.map((p) => ({ ...p, chainageM: p.chainageM + shiftM }));
  const merge = gapM === 0 && sameSpot(end, start);
  const head = first.map((p) => ({ ...p }));
  if (merge) {
    const mergedEnd = head[head.length - 1];
    if (mergedEnd.label === undefined && start.label !== undefined) mergedEnd.label = start.label;
  }
  const tail = merge ? moved.slice(1) : moved;
  return {
    stations: [...head, ...tail],
    junctionIndex: merge ? head.length - 1 : head.length,
    gapM,
    heightStepM: merge ? start.elevationM - end.elevationM : 0,
  };
}
