import { assertLatitude, assertLongitude } from '../input-guards';
import { HydraulicsInputError } from '../errors';

/** Mean Earth radius R₁ (IUGG), metres; used only for the drawing projection, never for lengths. */
export const MEAN_EARTH_RADIUS_M = 6_371_008.8;

export interface PlanPoint {
  /** East of the route centre, metres. */
  eastM: number;
  /** North of the route centre, metres. */
  northM: number;
}

export interface LocalPlan {
  originLatitudeDeg: number;
  originLongitudeDeg: number;
  points: PlanPoint[];
}

/**
 * Flat x/y for drawing a plan view: an equirectangular projection about the centre of the
 * route's bounding box (x = R·Δλ·cos φ₀, y = R·Δφ). Good to a fraction of a percent over a few
 * kilometres, which is plenty for a sketch; lengths and chainage always come from the
 * ellipsoidal geodesic instead.
 */
export function projectToLocalPlan(points: readonly { latitudeDeg: number; longitudeDeg: number }[]): LocalPlan {
  if (points.length === 0) throw new HydraulicsInputError('points', 'needs at least one point');
  points.forEach((p, i) => {
    assertLatitude(p.latitudeDeg, 'points.latitudeDeg', i);
    assertLongitude(p.longitudeDeg, 'points.longitudeDeg', i);
  });
  // A loop, not Math.min(...array): spreading 100 000 points overflows the call stack.
  let minLat = Infinity;
  let maxLat = -Infinity;
  let minLon = Infinity;
  let maxLon = -Infinity;
  for (const p of points) {
    minLat = Math.min(minLat, p.latitudeDeg);
    maxLat = Math.max(maxLat, p.latitudeDeg);
    minLon = Math.min(minLon, p.longitudeDeg);
    maxLon = Math.max(maxLon, p.longitudeDeg);
  }
  const originLatitudeDeg = (minLat + maxLat) / 2;
  const originLongitudeDeg = (minLon + maxLon) / 2;
  const cosLat = Math.cos((originLatitudeDeg * Math.PI) / 180);
  const toRad = Math.PI / 180;
  return {
    originLatitudeDeg,
    originLongitudeDeg,
    points: points.map((p) => ({
      eastM: MEAN_EARTH_RADIUS_M * (p.longitudeDeg - originLongitudeDeg) * toRad * cosLat,
      northM: MEAN_EARTH_RADIUS_M * (p.latitudeDeg - originLatitudeDeg) * toRad,
    })),
  };
}
