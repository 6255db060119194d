import 'server-only';
import { Readable } from 'node:stream';
import { pipeline } from 'node:stream/promises';
import type pg from 'pg';
import { from as copyFrom } from 'pg-copy-streams';
import { QueryTypes, type Transaction } from 'sequelize';
import { models } from '../../models';
import { AppError } from '../errors';
import type { PointRecord } from '../routes/edit-ops';
import { MAX_ROUTE_POINTS } from '../validations/routes';
import type { HeightSource } from '../../hydraulics/index';
import type { CheckedPoint, RoutePointView } from '../routes/types';
import { pointRows, ROUTE_POINTS_COPY_SQL, type CopyRows } from './route-points-copy';

/** Pieces of a buffer, as views (no copy), for the COPY stream. */
function* slices(bytes: Uint8Array, size: number): Generator<Uint8Array> {
  for (let at = 0; at < bytes.byteLength; at += size) yield bytes.subarray(at, Math.min(at + size, bytes.byteLength));
}

/**
 * Bulk insert of rows already in COPY's binary form (`pointRows`, or `surveyRows` written by the
 * worker that parsed an upload) with PostgreSQL's COPY on the transaction's own connection: one
 * stream, no statement, parameters or text per row.
 */
export async function insertRouteRows(rows: CopyRows, transaction: Transaction): Promise<void> {
  // Every way a route gets points (import, save, join, split, clean-up) ends here, so the cap holds for all of them.
  if (rows.count > MAX_ROUTE_POINTS) {
    const message = `A route can hold at most ${MAX_ROUTE_POINTS.toLocaleString('en-US')} points; this one would have ${rows.count.toLocaleString('en-US')}`;
    throw new AppError('bad_request', message, { points: [message] });
  }
  if (rows.count === 0) return;
  // Sequelize keeps the transaction's pg client here (not in its typings).
  const client = (transaction as unknown as { connection: pg.ClientBase }).connection;
  await pipeline(Readable.from(slices(rows.bytes, 256 * 1024)), client.query(copyFrom(ROUTE_POINTS_COPY_SQL)));
}

/** Bulk insert of a route's points (seq = position in the list); see insertRouteRows. */
export async function insertRoutePoints(
  routeId: string,
  records: readonly PointRecord[],
  transaction: Transaction,
): Promise<void> {
  await insertRouteRows(pointRows(routeId, records), transaction);
}

interface PointRow {
  seq: number;
  latitude: number | null;
  longitude: number | null;
  chainage_m: number;
  slope_chainage_m: number | null;
  elevation_m: number;
  raw_elevation_m: number;
  label: string | null;
  height_source: RoutePointView['heightSource'];
  confidence_m: number | null;
  recorded_at: Date | null;
  excluded: boolean;
  dismissed_checks: string[];
}

const POINT_COLUMNS = `seq, latitude, longitude, chainage_m, slope_chainage_m, elevation_m, raw_elevation_m, label, height_source,
            confidence_m, recorded_at, excluded, dismissed_checks`;

function pointViewOf(r: PointRow): RoutePointView {
  return {
    seq: r.seq,
    latitude: r.latitude,
    longitude: r.longitude,
    chainageM: r.chainage_m,
    slopeChainageM: r.slope_chainage_m,
    elevationM: r.elevation_m,
    rawElevationM: r.raw_elevation_m,
    label: r.label,
    heightSource: r.height_source,
    confidenceM: r.confidence_m,
    recordedAt: r.recorded_at === null ? null : new Date(r.recorded_at).toISOString(),
    excluded: r.excluded,
    dismissedChecks: r.dismissed_checks ?? [],
  };
}

/** A route's points in order, as plain objects. */
export async function loadRoutePoints(routeId: string, transaction?: Transaction): Promise<RoutePointView[]> {
  const rows = await models().sequelize.query<PointRow>(
    `SELECT ${POINT_COLUMNS} FROM route_points WHERE route_id = $1 ORDER BY seq`,
    {
      bind: [routeId],
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  return rows.map(pointViewOf);
}

/** The points with seq from `offset` to `offset + limit - 1` (seq is the position along the route, 0..n-1). */
export async function loadRoutePointsPage(
  routeId: string,
  offset: number,
  limit: number,
  transaction?: Transaction,
): Promise<RoutePointView[]> {
  const rows = await models().sequelize.query<PointRow>(
    `SELECT ${POINT_COLUMNS} FROM route_points WHERE route_id = $1 AND seq >= $2 AND seq < $3 ORDER BY seq`,
    { bind: [routeId, offset, offset + limit], type: QueryTypes.SELECT, transaction },
  );
  return rows.map(pointViewOf);
}

/** Doubles per point in `loadCheckedPoints`' packed column, in this order. */
const PACKED = [
  'chainage_m',
  'elevation_m',
  'raw_elevation_m',
  'confidence_m',
  'latitude',
  'longitude',
  "date_part('epoch', recorded_at)",
];

/**
 * A route's points as the checks and the route view read them, fast enough for a 100,000-point
 * route on every page view: the numbers come out of PostgreSQL as one binary string (each point's
 * doubles, `float8send`, big-endian, NaN for a null), not as 100,000 row objects; labels and slope
 * chainage are not read, recording times come as seconds. Exact: the doubles are the stored bits.
 */
export async function loadCheckedPoints(routeId: string, transaction?: Transaction): Promise<CheckedPoint[]> {
  const packed = PACKED.map((c) => `float8send(coalesce(${c}, 'NaN'))`).join(' || ');
  const [row] = await models().sequelize.query<{
    n: number;
    numbers: Buffer | null;
    excluded: string | null;
    sources: string | null;
    dismissed: Record<string, string[]> | null;
  }>(
    `SELECT count(*)::int AS n, string_agg(${packed}, ''::bytea) AS numbers,
            string_agg(CASE WHEN excluded THEN 't' ELSE 'f' END, '') AS excluded, string_agg(height_source, ',') AS sources,
            jsonb_object_agg(seq, dismissed_checks) FILTER (WHERE cardinality(dismissed_checks) > 0) AS dismissed
       FROM (SELECT * FROM route_points WHERE route_id = $1 ORDER BY seq) ordered`,
    { bind: [routeId], type: QueryTypes.SELECT, transaction },
  );
  const n = row?.n ?? 0;
  if (n === 0 || !row.numbers) return [];
  const data = new DataView(row.numbers.buffer, row.numbers.byteOffset, row.numbers.byteLength);
  const width = PACKED.length * 8;
  const at = (i: number, k: number) => data.getFloat64(i * width + k * 8, false);
  const orNull = (v: number) => (Number.isNaN(v) ? null : v);
  const sources = (row.sources ?? '').split(',') as HeightSource[];
  const excluded = row.excluded ?? '';
  const dismissed = row.dismissed ?? {};
  const points: CheckedPoint[] = new Array(n);
  for (let i = 0; i < n; i++) {
    points[i] = {
      seq: i,
      chainageM: at(i, 0),
      elevationM: at(i, 1),
      rawElevationM: at(i, 2),
      confidenceM: orNull(at(i, 3)),
      latitude: orNull(at(i, 4)),
      longitude: orNull(at(i, 5)),
      timeS: orNull(at(i, 6)),
      heightSource: sources[i],
      excluded: excluded.charCodeAt(i) === 116, // 't'
      dismissedChecks: dismissed[i] ?? [],
    };
  }
  return points;
}

/** Replaces every point of a route (the route is saved whole, inside the caller's transaction). */
export async function replaceRoutePoints(
  routeId: string,
  records: readonly PointRecord[],
  transaction: Transaction,
): Promise<void> {
  await models().RoutePoint.destroy({ where: { routeId }, transaction });
  await insertRoutePoints(routeId, records, transaction);
}
