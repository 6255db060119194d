import { joinRoutes, reverseRoute, type RouteStation, splitRoute, trimRoute } from '../../hydraulics/index';
import { newPointRecord } from './new-point';
import type { RoutePointView } from './types';

/** A point as stored, without its place in the order (seq is given on write). */
export type PointRecord = Omit<RoutePointView, 'seq'>;

type Station = RouteStation & { record?: PointRecord };

function toStations(points: readonly RoutePointView[]): Station[] {
  return points
    .filter((p) => !p.excluded)
    .map(recordOf)
    .map((record) => ({
      chainageM: record.chainageM,
      elevationM: record.elevationM,
      latitudeDeg: record.latitude ?? undefined,
      longitudeDeg: record.longitude ?? undefined,
      record,
    }));
}

/**
 * Back to stored points. A station the core interpolated (a split or trim end) has no record of
 * its own: it takes its height as both raw and cleaned, and the height source and the larger
 * uncertainty of the nearest surveyed point before it.
 */
function toRecords(stations: readonly Station[]): PointRecord[] {
  let previous: PointRecord | undefined = stations.find((s) => s.record)?.record;
  return stations.map((s) => {
    if (s.record) {
      previous = s.record;
      return {
        ...s.record,
        chainageM: s.chainageM,
        latitude: s.latitudeDeg ?? null,
        longitude: s.longitudeDeg ?? null,
      };
    }
    return newPointRecord({
      latitude: s.latitudeDeg ?? null,
      longitude: s.longitudeDeg ?? null,
      chainageM: s.chainageM,
      slopeChainageM: null,
      elevationM: s.elevationM,
      label: null,
      heightSource: previous?.heightSource ?? 'typed',
      confidenceM: previous?.confidenceM ?? null,
      recordedAt: null,
    });
  });
}

/** The route walked the other way (kept points only; excluded ones are dropped). */
export function reversePoints(points: readonly RoutePointView[]): PointRecord[] {
  return toRecords(reverseRoute(toStations(points)));
}

export interface SplitPoints {
  first: PointRecord[];
  second: PointRecord[];
  splitStationInterpolated: boolean;
}

/** Splits at a chainage inside the route; both parts share the split station. */
export function splitPoints(points: readonly RoutePointView[], chainageM: number): SplitPoints {
  const r = splitRoute(toStations(points), { chainageM });
  return {
    first: toRecords(r.first),
    second: toRecords(r.second),
    splitStationInterpolated: r.splitStationInterpolated,
  };
}

/** Keeps the part between two chainages, chainage restarting at 0. */
export function trimPoints(
  points: readonly RoutePointView[],
  fromChainageM: number,
  toChainageM: number,
): PointRecord[] {
  return toRecords(trimRoute(toStations(points), { fromChainageM, toChainageM }));
}

export interface JoinedPoints {
  points: PointRecord[];
  gapM: number;
  heightStepM: number;
}

/** `second` joined onto the end of `first`; the gap defaults to the distance between the ends. */
export function joinPoints(
  first: readonly RoutePointView[],
  second: readonly RoutePointView[],
  gapM?: number,
): JoinedPoints {
  const r = joinRoutes(toStations(first), toStations(second), gapM === undefined ? {} : { gapM });
  return { points: toRecords(r.stations), gapM: r.gapM, heightStepM: r.heightStepM };
}

/** A point without its place in the order. */
export function recordOf(point: RoutePointView): PointRecord {
  const record: Partial<RoutePointView> = { ...point };
  delete record.seq;
  return record as PointRecord;
}
