import 'server-only';
import { QueryTypes, type Transaction } from 'sequelize';
import { models } from '../../models';
import { AppError } from '../errors';
import type { PointRecord } from '../routes/edit-ops';
import { MAX_ROUTE_POINTS } from '../validations/routes';
import type { RoutePointView } from '../routes/types';

/** Rows per INSERT: large enough that a 100 000-point walk is four statements. */
const CHUNK = 25_000;

const INSERT_SQL = `
INSERT INTO route_points (route_id, seq, latitude, longitude, chainage_m, slope_chainage_m, elevation_m, raw_elevation_m,
                          label, height_source, confidence_m, recorded_at, excluded, dismissed_checks)
SELECT $1::uuid, t.seq, t.lat, t.lon, t.ch, t.sch, t.el, t.raw, t.label, t.hs, t.conf, t.rec, t.ex, t.dis::varchar(24)[]
FROM unnest($2::int[], $3::float8[], $4::float8[], $5::float8[], $6::float8[], $7::float8[], $8::float8[],
            $9::text[], $10::text[], $11::float8[], $12::timestamptz[], $13::bool[], $14::text[])
     AS t(seq, lat, lon, ch, sch, el, raw, label, hs, conf, rec, ex, dis)`;

/** A text[] literal for one point's dismissed checks (kinds are plain words with hyphens). */
const arrayLiteral = (values: readonly string[]) => `{${values.join(',')}}`;

/**
 * PostgreSQL array literals built by hand: for 100 000 values this is several times faster than
 * the driver's generic per-element conversion. Numbers print exactly (shortest round-trip form).
 */
function numberArray(values: readonly (number | null)[]): string {
  return `{${values.map((v) => (v === null ? 'NULL' : String(v))).join(',')}}`;
}

function textArray(values: readonly (string | null)[]): string {
  return `{${values.map((v) => (v === null ? 'NULL' : `"${v.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`)).join(',')}}`;
}

const boolArray = (values: readonly boolean[]) => `{${values.map((v) => (v ? 't' : 'f')).join(',')}}`;

/**
 * Bulk insert of a route's points, seq = position in `records`: one statement per chunk with
 * column arrays unnested server-side, far cheaper than a row of bound values per point.
 */
export async function insertRoutePoints(routeId: string, records: readonly PointRecord[], transaction: Transaction): Promise<void> {
  // Every way a route gets points (import, save, join, split, clean-up) ends here, so the cap holds for all of them.
  if (records.length > MAX_ROUTE_POINTS) {
    const message = `A route can hold at most ${MAX_ROUTE_POINTS.toLocaleString('en-US')} points; this one would have ${records.length.toLocaleString('en-US')}`;
    throw new AppError('bad_request', message, { points: [message] });
  }
  const { sequelize } = models();
  for (let start = 0; start < records.length; start += CHUNK) {
    const part = records.slice(start, start + CHUNK);
    await sequelize.query(INSERT_SQL, {
      transaction,
      type: QueryTypes.INSERT,
      bind: [
        routeId,
        numberArray(part.map((_, i) => start + i)),
        numberArray(part.map((p) => p.latitude)),
        numberArray(part.map((p) => p.longitude)),
        numberArray(part.map((p) => p.chainageM)),
        numberArray(part.map((p) => p.slopeChainageM)),
        numberArray(part.map((p) => p.elevationM)),
        numberArray(part.map((p) => p.rawElevationM)),
        textArray(part.map((p) => p.label)),
        textArray(part.map((p) => p.heightSource)),
        numberArray(part.map((p) => p.confidenceM)),
        textArray(part.map((p) => p.recordedAt)),
        boolArray(part.map((p) => p.excluded)),
        textArray(part.map((p) => arrayLiteral(p.dismissedChecks))),
      ],
    });
  }
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

/** A route's points in order, as plain objects. */
export async function loadRoutePoints(routeId: string, transaction?: Transaction): Promise<RoutePointView[]> {
  const rows = await models().sequelize.query<PointRow>(
    `SELECT seq, latitude, longitude, chainage_m, slope_chainage_m, elevation_m, raw_elevation_m, label, height_source,
            confidence_m, recorded_at, excluded, dismissed_checks
       FROM route_points WHERE route_id = $1 ORDER BY seq`,
    { bind: [routeId], type: QueryTypes.SELECT, transaction },
  );
  return rows.map((r) => ({
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
  }));
}

/** Replaces every point of a route (the route is saved whole, inside the caller's transaction). */
export async function replaceRoutePoints(routeId: string, records: readonly PointRecord[], transaction: Transaction): Promise<void> {
  await models().RoutePoint.destroy({ where: { routeId }, transaction });
  await insertRoutePoints(routeId, records, transaction);
}
