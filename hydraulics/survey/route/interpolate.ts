import { geodesicInterpolate } from '../geodesic';
import type { RouteStation } from '../types';

/**
 * The station at `chainageM` on the straight grade between `a` and `b`: height linear in
 * chainage, position along the geodesic between them when both positions are known.
 */
export function interpolateStation(a: RouteStation, b: RouteStation, chainageM: number): RouteStation {
  const run = b.chainageM - a.chainageM;
  const t = run === 0 ? 0 : (chainageM - a.chainageM) / run;
  const station: RouteStation = { chainageM, elevationM: a.elevationM + t * (b.elevationM - a.elevationM) };
  if (
    a.latitudeDeg !== undefined &&
    a.longitudeDeg !== undefined &&
    b.latitudeDeg !== undefined &&
    b.longitudeDeg !== undefined
  ) {
    const p = geodesicInterpolate({
      latitude1Deg: a.latitudeDeg,
      longitude1Deg: a.longitudeDeg,
      latitude2Deg: b.latitudeDeg,
      longitude2Deg: b.longitudeDeg,
      fraction: t,
    });
    station.latitudeDeg = p.latitudeDeg;
    station.longitudeDeg = p.longitudeDeg;
  }
  if (a.timeS !== undefined && b.timeS !== undefined) station.timeS = a.timeS + t * (b.timeS - a.timeS);
  return station;
}

/** Height of the profile at a chainage inside it (linear between stations), metres. */
export function elevationAtChainage(points: readonly RouteStation[], chainageM: number): number {
  for (let i = 1; i < points.length; i += 1) {
    if (chainageM <= points[i].chainageM) return interpolateStation(points[i - 1], points[i], chainageM).elevationM;
  }
  return points[points.length - 1].elevationM;
}
