import { geodesicInterpolate, geodesicInverse } from './geodesic';
import { assertFiniteNumber, assertLatitude, assertLongitude } from '../input-guards';
import { HydraulicsInputError } from '../errors';

/** WGS84 semi-major axis (m) and flattening: NGA TR8350.2, table 3.1. */
const WGS84_A_M = 6_378_137;
const WGS84_F = 1 / 298.257223563;
const WGS84_E2 = WGS84_F * (2 - WGS84_F);

export interface LocatableStation {
  chainageM: number;
  latitudeDeg?: number | null;
  longitudeDeg?: number | null;
}

export interface RouteLocation {
  /** Chainage of the nearest point of the route, interpolated between the stations' own chainages, metres. */
  chainageM: number;
  /** Ellipsoidal distance from the position to that nearest point, metres (how far off the line). */
  offsetM: number;
  /** Index of the station that starts the nearest stretch (the nearest station when only one has a position). */
  stationIndex: number;
}

/**
 * The nearest point of a surveyed route to a position (a photo, a find in the field): each
 * stretch between two stations with positions is laid on a local plane about its first station
 * (east = N·cos φ·Δλ, north = M·Δφ, with the WGS84 radii of curvature M and N), the position is
 * dropped perpendicular onto it (clamped to its ends), and the closest stretch wins. The chainage
 * follows the route's own chainage between the two stations; the distance off the line is the
 * WGS84 geodesic from the position to the foot. Null when no station has a position.
 */
export function locateOnRoute(
  stations: readonly LocatableStation[],
  position: { latitudeDeg: number; longitudeDeg: number },
): RouteLocation | null {
  assertLatitude(position.latitudeDeg, 'position.latitudeDeg');
  assertLongitude(position.longitudeDeg, 'position.longitudeDeg');
  stations.forEach((s, i) => assertFiniteNumber(s.chainageM, 'stations.chainageM', i));
  const located = stations
    .map((s, index) => ({ s, index }))
    .filter(
      ({ s }) =>
        s.latitudeDeg != null &&
        s.longitudeDeg != null &&
        Number.isFinite(s.latitudeDeg) &&
        Number.isFinite(s.longitudeDeg),
    );
  if (located.length === 0) return null;
  const toRad = Math.PI / 180;

  let best: { planarM: number; index: number; t: number; nextIndex: number } | null = null;
  for (let k = 0; k < located.length; k += 1) {
    const a = located[k];
    const b = located[k + 1];
    const latA = a.s.latitudeDeg! * toRad;
    const w = Math.sqrt(1 - WGS84_E2 * Math.sin(latA) ** 2);
    const northPerRad = (WGS84_A_M * (1 - WGS84_E2)) / w ** 3;
    const eastPerRad = (WGS84_A_M / w) * Math.cos(latA);
    const plane = (lat: number, lon: number) => ({
      x: eastPerRad * (lon - a.s.longitudeDeg!) * toRad,
      y: northPerRad * (lat - a.s.latitudeDeg!) * toRad,
    });
    const p = plane(position.latitudeDeg, position.longitudeDeg);
    // The last station alone, or a stretch to the next station that has a position.
    const end = b ? plane(b.s.latitudeDeg!, b.s.longitudeDeg!) : { x: 0, y: 0 };
    const lengthSq = end.x ** 2 + end.y ** 2;
    const t = lengthSq === 0 ? 0 : Math.min(1, Math.max(0, (p.x * end.x + p.y * end.y) / lengthSq));
    const planarM = Math.hypot(p.x - t * end.x, p.y - t * end.y);
    if (!best || planarM < best.planarM) best = { planarM, index: a.index, t, nextIndex: b ? b.index : a.index };
    if (!b) break;
  }
  if (!best) throw new HydraulicsInputError('stations', 'no stretch could be measured');
  const a = stations[best.index];
  const b = stations[best.nextIndex];
  const foot =
    best.nextIndex === best.index || best.t === 0
      ? { latitudeDeg: a.latitudeDeg!, longitudeDeg: a.longitudeDeg! }
      : geodesicInterpolate({
          latitude1Deg: a.latitudeDeg!,
          longitude1Deg: a.longitudeDeg!,
          latitude2Deg: b.latitudeDeg!,
          longitude2Deg: b.longitudeDeg!,
          fraction: best.t,
        });
  const offsetM = geodesicInverse({
    latitude1Deg: position.latitudeDeg,
    longitude1Deg: position.longitudeDeg,
    latitude2Deg: foot.latitudeDeg,
    longitude2Deg: foot.longitudeDeg,
  }).distanceM;
  return { chainageM: a.chainageM + best.t * (b.chainageM - a.chainageM), offsetM, stationIndex: best.index };
}
