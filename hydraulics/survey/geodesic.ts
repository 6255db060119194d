import { Geodesic } from 'geographiclib-geodesic';
import { assertFiniteNumber, assertLatitude, assertLongitude } from '../input-guards';

/** WGS84 ellipsoid; every route distance in Runnel is measured on it. */
const WGS84 = Geodesic.WGS84;

export interface GeodesicInverseResult {
  /** Ellipsoidal (geodesic) distance, metres. */
  distanceM: number;
  /** Forward azimuth at the first point, degrees clockwise from north. */
  azimuth1Deg: number;
  /** Forward azimuth at the second point, degrees clockwise from north. */
  azimuth2Deg: number;
  /** Arc length on the auxiliary sphere, degrees. */
  arcDeg: number;
}

export interface GeodesicInverseInput {
  latitude1Deg: number;
  longitude1Deg: number;
  latitude2Deg: number;
  longitude2Deg: number;
}

/** Distance and azimuths between two points on the WGS84 ellipsoid (Karney's inverse problem). */
export function geodesicInverse(input: GeodesicInverseInput): GeodesicInverseResult {
  assertLatitude(input.latitude1Deg, 'latitude1Deg');
  assertLongitude(input.longitude1Deg, 'longitude1Deg');
  assertLatitude(input.latitude2Deg, 'latitude2Deg');
  assertLongitude(input.longitude2Deg, 'longitude2Deg');
  const r = WGS84.Inverse(
    input.latitude1Deg,
    input.longitude1Deg,
    input.latitude2Deg,
    input.longitude2Deg,
    Geodesic.DISTANCE | Geodesic.AZIMUTH,
  );
  return { distanceM: r.s12 ?? 0, azimuth1Deg: r.azi1 ?? 0, azimuth2Deg: r.azi2 ?? 0, arcDeg: r.a12 };
}

/**
 * Only the distance between two points on the WGS84 ellipsoid, metres: the same inverse problem as
 * `geodesicInverse`, asking the library for the distance alone (no azimuths) and building no objects
 * of its own, for loops over whole tracks. Inputs are assumed checked by the caller.
 */
export function geodesicDistanceM(
  latitude1Deg: number,
  longitude1Deg: number,
  latitude2Deg: number,
  longitude2Deg: number,
): number {
  return WGS84.Inverse(latitude1Deg, longitude1Deg, latitude2Deg, longitude2Deg, Geodesic.DISTANCE).s12 ?? 0;
}

export interface GeodesicDirectInput {
  latitudeDeg: number;
  longitudeDeg: number;
  azimuthDeg: number;
  distanceM: number;
}

export interface GeodesicDirectResult {
  latitudeDeg: number;
  longitudeDeg: number;
  /** Forward azimuth at the end point, degrees. */
  azimuthDeg: number;
  arcDeg: number;
}

/** The point reached by going `distanceM` along azimuth `azimuthDeg` (Karney's direct problem). */
export function geodesicDirect(input: GeodesicDirectInput): GeodesicDirectResult {
  assertLatitude(input.latitudeDeg, 'latitudeDeg');
  assertLongitude(input.longitudeDeg, 'longitudeDeg');
  assertFiniteNumber(input.azimuthDeg, 'azimuthDeg');
  assertFiniteNumber(input.distanceM, 'distanceM');
  const r = WGS84.Direct(input.latitudeDeg, input.longitudeDeg, input.azimuthDeg, input.distanceM);
  return { latitudeDeg: r.lat2 ?? NaN, longitudeDeg: r.lon2 ?? NaN, azimuthDeg: r.azi2 ?? NaN, arcDeg: r.a12 };
}

export interface GeodesicInterpolateInput extends GeodesicInverseInput {
  /** 0 at the first point, 1 at the second. */
  fraction: number;
}

/** The point a given fraction of the way along the geodesic between two points. */
export function geodesicInterpolate(input: GeodesicInterpolateInput): { latitudeDeg: number; longitudeDeg: number } {
  assertFiniteNumber(input.fraction, 'fraction');
  const line = WGS84.InverseLine(input.latitude1Deg, input.longitude1Deg, input.latitude2Deg, input.longitude2Deg);
  const p = line.Position(line.s13 * input.fraction, Geodesic.LATITUDE | Geodesic.LONGITUDE);
  return { latitudeDeg: p.lat2 ?? NaN, longitudeDeg: p.lon2 ?? NaN };
}
