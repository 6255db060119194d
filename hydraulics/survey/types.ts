/**
 * A station along a route: where it is along the line (chainage, horizontal metres from the
 * start), the ground elevation there (metres) and, when known, where it is on the map.
 */
export interface RouteStation {
  chainageM: number;
  elevationM: number;
  latitudeDeg?: number;
  longitudeDeg?: number;
  label?: string;
  /** GPS fix time, seconds since the Unix epoch, when the source recorded one. */
  timeS?: number;
}

/** A surveyed position before chainage is known (a GPS fix, a GPX track point). */
export interface GeoPosition {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
}
