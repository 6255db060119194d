import type { PointRecord } from '../routes/edit-ops';
import { surveyPointRecord } from '../routes/new-point';
import { utcInstantMs } from '../survey/local-time';
import type { SurveyPoint } from '../survey/parsed-survey';

/**
 * Route points in PostgreSQL's binary COPY format (PostgreSQL 15 manual, COPY, "Binary Format";
 * each value in its type's send/receive form). Numbers go as their eight IEEE 754 bytes, so nothing
 * is printed as text and read back (exact by construction, and the costly part of a text COPY on
 * both sides). Pure, with no database or `server-only` import: the worker that parses an upload
 * writes the rows it read straight into this form, and the request thread only streams them.
 */

export const ROUTE_POINTS_COPY_SQL = `COPY route_points (route_id, seq, latitude, longitude, chainage_m, slope_chainage_m, elevation_m,
  raw_elevation_m, label, height_source, confidence_m, recorded_at, excluded, dismissed_checks) FROM STDIN (FORMAT binary)`;

const FIELDS = 14;
/** Signature, flags and header extension length. */
const HEADER = [0x50, 0x47, 0x43, 0x4f, 0x50, 0x59, 0x0a, 0xff, 0x0d, 0x0a, 0x00, 0, 0, 0, 0, 0, 0, 0, 0];
/** PostgreSQL's type id of varchar, the element type of dismissed_checks (pg_type.dat). */
const VARCHAR_OID = 1043;
/** timestamptz counts microseconds from 2000-01-01 00:00 UTC. */
const PG_EPOCH_MS = Date.UTC(2000, 0, 1);
const TWO_32 = 2 ** 32;

const utf8 = new TextEncoder();

/**
 * Bytes of a row whose texts are empty and whose checks list is empty: field count, then per field its length word
 * and value (uuid 16, seq 4, seven float8s and the time 8 each, excluded 1, an empty varchar[] 12; two texts 0).
 */
const ROW_BYTES_WITHOUT_TEXT = 2 + FIELDS * 4 + 16 + 4 + 7 * 8 + 8 + 1 + 12;

/** A growing buffer the rows are written into. */
class RowWriter {
  bytes: Uint8Array;
  view: DataView;
  at = 0;

  constructor(capacity: number) {
    this.bytes = new Uint8Array(capacity);
    this.view = new DataView(this.bytes.buffer);
  }

  room(n: number): void {
    if (this.at + n <= this.bytes.length) return;
    let size = this.bytes.length * 2;
    while (size < this.at + n) size *= 2;
    const next = new Uint8Array(size);
    next.set(this.bytes.subarray(0, this.at));
    this.bytes = next;
    this.view = new DataView(next.buffer);
  }

  int16(v: number): void {
    this.room(2);
    this.view.setInt16(this.at, v);
    this.at += 2;
  }

  int32(v: number): void {
    this.room(4);
    this.view.setInt32(this.at, v);
    this.at += 4;
  }

  raw(b: Uint8Array): void {
    this.room(b.length);
    this.bytes.set(b, this.at);
    this.at += b.length;
  }

  float8OrNull(v: number | null): void {
    this.room(12);
    if (v === null) {
      this.view.setInt32(this.at, -1);
      this.at += 4;
      return;
    }
    this.view.setInt32(this.at, 8);
    this.view.setFloat64(this.at + 4, v);
    this.at += 12;
  }

  /** A text value (varchar) as its UTF-8 bytes, or NULL. */
  textOrNull(v: string | null): void {
    if (v === null) return this.int32(-1);
    this.room(4 + 3 * v.length);
    const { written } = utf8.encodeInto(v, this.bytes.subarray(this.at + 4));
    this.view.setInt32(this.at, written);
    this.at += 4 + written;
  }

  /** timestamptz from ISO 8601 text (the stored form has milliseconds), or NULL. */
  timeOrNull(iso: string | null): void {
    if (iso === null) return this.int32(-1);
    const ms = utcInstantMs(iso);
    if (!Number.isFinite(ms)) throw new Error(`not a time: ${iso}`);
    // Microseconds stay below 2^53, so the split into two 32-bit halves is exact.
    const us = (ms - PG_EPOCH_MS) * 1000;
    const high = Math.floor(us / TWO_32);
    this.room(12);
    this.view.setInt32(this.at, 8);
    this.view.setInt32(this.at + 4, high);
    this.view.setUint32(this.at + 8, us - high * TWO_32);
    this.at += 12;
  }

  /** varchar[] with one dimension (none when empty), no NULL elements. */
  textArray(values: readonly string[]): void {
    const lengthAt = this.at;
    this.int32(0);
    this.int32(values.length === 0 ? 0 : 1);
    this.int32(0);
    this.int32(VARCHAR_OID);
    if (values.length > 0) {
      this.int32(values.length);
      this.int32(1);
      for (const v of values) this.textOrNull(v);
    }
    this.view.setInt32(lengthAt, this.at - lengthAt - 4);
  }
}

/** The 16 bytes of a UUID written as 36 characters of hex and hyphens. */
function uuidBytes(uuid: string): Uint8Array {
  const hex = uuid.replace(/-/g, '');
  if (!/^[0-9a-f]{32}$/i.test(hex)) throw new Error(`not a UUID: ${uuid}`);
  return Uint8Array.from({ length: 16 }, (_, i) => parseInt(hex.slice(2 * i, 2 * i + 2), 16));
}

/** One stored point as a row. */
function writeRow(w: RowWriter, route: Uint8Array, seq: number, p: PointRecord): void {
  w.int16(FIELDS);
  w.int32(16);
  w.raw(route);
  w.int32(4);
  w.int32(seq);
  w.float8OrNull(p.latitude);
  w.float8OrNull(p.longitude);
  w.float8OrNull(p.chainageM);
  w.float8OrNull(p.slopeChainageM);
  w.float8OrNull(p.elevationM);
  w.float8OrNull(p.rawElevationM);
  w.textOrNull(p.label);
  w.textOrNull(p.heightSource);
  w.float8OrNull(p.confidenceM);
  w.timeOrNull(p.recordedAt);
  w.int32(1);
  w.room(1);
  w.bytes[w.at++] = p.excluded ? 1 : 0;
  w.textArray(p.dismissedChecks);
}

/** Rows ready for COPY: the whole binary stream (header, rows, trailer) and how many rows it holds. */
export interface CopyRows {
  bytes: Uint8Array;
  count: number;
}

function rowsOf(routeId: string, count: number, write: (w: RowWriter, route: Uint8Array, i: number) => void): CopyRows {
  const route = uuidBytes(routeId);
  // Sized for rows without labels up front: grown by doubling from 64 kB, a 100,000-row buffer was copied 8 times.
  const w = new RowWriter(HEADER.length + 2 + count * ROW_BYTES_WITHOUT_TEXT);
  w.raw(Uint8Array.from(HEADER));
  for (let i = 0; i < count; i++) write(w, route, i);
  w.int16(-1);
  return { bytes: w.bytes.subarray(0, w.at), count };
}

/** Stored points as COPY rows of route `routeId`; seq = position in the list. */
export function pointRows(routeId: string, records: readonly PointRecord[]): CopyRows {
  return rowsOf(routeId, records.length, (w, route, i) => writeRow(w, route, i, records[i]));
}

/** A parsed survey's points as the rows of a new route, with the route's slope length. */
export interface SurveyRows extends CopyRows {
  /** Slope chainage of the last point, m. */
  slopeLengthM: number;
}

/**
 * A parsed survey's points as new points of route `routeId` (`surveyPointRecord`), slope chainage summed leg by leg.
 */
export function surveyRows(routeId: string, points: readonly SurveyPoint[]): SurveyRows {
  let slopeM = 0;
  const rows = rowsOf(routeId, points.length, (w, route, i) => {
    const p = points[i];
    if (i > 0) slopeM += Math.hypot(p.chainageM - points[i - 1].chainageM, p.elevationM - points[i - 1].elevationM);
    const record = surveyPointRecord(p, slopeM);
    writeRow(w, route, i, record);
  });
  return { ...rows, slopeLengthM: slopeM };
}
