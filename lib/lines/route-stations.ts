import { trimRoute, type HeightSource, type LineStation, type RouteStation } from '../../hydraulics/index';

/** A route's stations as columns (compact JSON for long routes). Coordinates are null where not surveyed. */
export interface RouteColumns {
  chainageM: number[];
  elevationM: number[];
  latitude: (number | null)[];
  longitude: (number | null)[];
  /** Where each height came from and its stated vertical uncertainty, m (absent on old callers). */
  heightSource?: HeightSource[];
  confidenceM?: (number | null)[];
}

/** The part of a route a line follows; null ends mean the route's own ends. */
export interface ChainageWindow {
  fromChainageM: number | null;
  toChainageM: number | null;
}

/** One station of a line with its map position when known (for the plan view). */
export interface LineRouteStation extends LineStation {
  latitudeDeg?: number;
  longitudeDeg?: number;
  /** The height's source and stated vertical uncertainty, m (from the nearest surveyed point). */
  heightSource?: HeightSource;
  confidenceM?: number | null;
}

/** Index of the surveyed point nearest `chainageM` (columns in chainage order). */
function nearestIndex(chainageM: readonly number[], c: number): number {
  let lo = 0;
  let hi = chainageM.length - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (chainageM[mid] <= c) lo = mid;
    else hi = mid;
  }
  return Math.abs(chainageM[hi] - c) < Math.abs(chainageM[lo] - c) ? hi : lo;
}

function routeStationsOf(columns: RouteColumns): RouteStation[] {
  return columns.chainageM.map((chainageM, i) => {
    const station: RouteStation = { chainageM, elevationM: columns.elevationM[i] };
    const lat = columns.latitude[i];
    const lon = columns.longitude[i];
    if (lat != null && lon != null) {
      station.latitudeDeg = lat;
      station.longitudeDeg = lon;
    }
    return station;
  });
}

/**
 * The stations of a line along `columns`, cut to the window (interpolated end stations, route
 * chainage kept so stretches and devices read the same chainage as the survey pegs). A station
 * repeating the previous chainage is dropped: the analysis needs chainage to increase.
 */
export function lineStationsOf(columns: RouteColumns, window: ChainageWindow): LineRouteStation[] {
  let route = routeStationsOf(columns);
  if (route.length >= 2 && (window.fromChainageM != null || window.toChainageM != null)) {
    route = trimRoute(route, {
      fromChainageM: window.fromChainageM ?? route[0].chainageM,
      toChainageM: window.toChainageM ?? route[route.length - 1].chainageM,
      rebase: false,
    });
  }
  const stations: LineRouteStation[] = [];
  for (const p of route) {
    if (stations.length > 0 && p.chainageM <= stations[stations.length - 1].chainageM) continue;
    const station: LineRouteStation = { chainageM: p.chainageM, groundElevationM: p.elevationM };
    if (p.latitudeDeg !== undefined && p.longitudeDeg !== undefined) {
      station.latitudeDeg = p.latitudeDeg;
      station.longitudeDeg = p.longitudeDeg;
    }
    if (columns.heightSource && columns.chainageM.length > 0) {
      const k = nearestIndex(columns.chainageM, p.chainageM);
      station.heightSource = columns.heightSource[k];
      station.confidenceM = columns.confidenceM?.[k] ?? null;
    }
    stations.push(station);
  }
  return stations;
}
