import { geodesicDistanceM } from './geodesic';
import { assertFiniteNumber, assertLatitude, assertLongitude } from '../input-guards';
import type { GeoPosition } from './types';
import { HydraulicsInputError } from '../errors';

export interface TrackChainage {
  /** Cumulative horizontal (ellipsoidal) distance at each point, metres; first is 0. */
  horizontalChainageM: number[];
  /** Cumulative 3-D length at each point, metres: what a pipe laid on the ground needs. */
  slopeChainageM: number[];
  /** Horizontal length of each leg (point i-1 → i), metres; one fewer than points. */
  legHorizontalM: number[];
  legSlopeM: number[];
  totalHorizontalM: number;
  totalSlopeM: number;
}

/**
 * Chainage along a walked track. Horizontal legs are WGS84 geodesics (not a spherical
 * approximation, whose error on long routes reaches ~0.3 %); slope legs add the height change
 * as √(horizontal² + Δz²), treating each leg as a straight grade.
 */
export function chainageAlongTrack(points: readonly GeoPosition[]): TrackChainage {
  if (points.length === 0) throw new HydraulicsInputError('points', 'needs at least one point');
  points.forEach((p, i) => {
    assertLatitude(p.latitudeDeg, 'points.latitudeDeg', i);
    assertLongitude(p.longitudeDeg, 'points.longitudeDeg', i);
    assertFiniteNumber(p.elevationM, 'points.elevationM', i);
  });
  const horizontalChainageM = [0];
  const slopeChainageM = [0];
  const legHorizontalM: number[] = [];
  const legSlopeM: number[] = [];
  for (let i = 1; i < points.length; i += 1) {
    const a = points[i - 1];
    const b = points[i];
    // Every point was checked above.
    const horizontal = geodesicDistanceM(a.latitudeDeg, a.longitudeDeg, b.latitudeDeg, b.longitudeDeg);
    const slope = Math.hypot(horizontal, b.elevationM - a.elevationM);
    legHorizontalM.push(horizontal);
    legSlopeM.push(slope);
    horizontalChainageM.push(horizontalChainageM[i - 1] + horizontal);
    slopeChainageM.push(slopeChainageM[i - 1] + slope);
  }
  return {
    horizontalChainageM,
    slopeChainageM,
    legHorizontalM,
    legSlopeM,
    totalHorizontalM: horizontalChainageM[horizontalChainageM.length - 1],
    totalSlopeM: slopeChainageM[slopeChainageM.length - 1],
  };
}

/** 3-D length of a station/elevation profile (horizontal chainage already known), metres. */
export function slopeLengthOfProfile(stations: readonly { chainageM: number; elevationM: number }[]): number {
  let total = 0;
  for (let i = 1; i < stations.length; i += 1) {
    total += Math.hypot(
      stations[i].chainageM - stations[i - 1].chainageM,
      stations[i].elevationM - stations[i - 1].elevationM,
    );
  }
  return total;
}
