import { z } from 'zod';
import { HEIGHT_SOURCES } from '../../hydraulics/index';
import { SurveyImportError } from './errors';

export const HeightSourceSchema = z.enum(HEIGHT_SOURCES);

export const SurveyPointSchema = z.object({
  /** 0-based position along the route. */
  order: z.number().int().nonnegative(),
  lat: z.number().min(-90).max(90).optional(),
  lon: z.number().min(-180).max(180).optional(),
  /** Horizontal distance from the start of the route, metres. */
  chainageM: z.number().nonnegative().finite(),
  elevationM: z.number().finite(),
  label: z.string().optional(),
  heightSource: HeightSourceSchema,
  /** Vertical uncertainty, metres. */
  confidence: z.number().nonnegative().finite().optional(),
  /** ISO 8601 time of the fix. */
  time: z.iso.datetime({ offset: true }).optional(),
});

export const SurveyImportWarningSchema = z.object({
  code: z.string(),
  message: z.string(),
  line: z.number().int().positive().optional(),
  /** Index into `points` the warning is about. */
  index: z.number().int().nonnegative().optional(),
});

/** A named place along the route (a GPX waypoint) snapped to the nearest chainage. */
export const SurveyFeatureSchema = z.object({
  label: z.string(),
  chainageM: z.number().nonnegative().finite(),
  /** How far the feature lay from the route line, metres. */
  offsetM: z.number().nonnegative().finite(),
  lat: z.number().min(-90).max(90).optional(),
  lon: z.number().min(-180).max(180).optional(),
  elevationM: z.number().finite().optional(),
  line: z.number().int().positive().optional(),
});

export const SurveyFormatSchema = z.enum(['gps-csv', 'station-csv', 'gpx', 'inclinometer-csv', 'level-book-csv']);

export const ParsedSurveySchema = z.object({
  points: z.array(SurveyPointSchema).min(2),
  warnings: z.array(SurveyImportWarningSchema),
  /** Labelled features along the route; only GPX waypoints produce them so far. */
  features: z.array(SurveyFeatureSchema).optional(),
  stats: z.object({
    format: SurveyFormatSchema,
    pointCount: z.number().int().nonnegative(),
    rowsRead: z.number().int().nonnegative(),
    totalHorizontalLengthM: z.number().nonnegative(),
    /** 3-D length (what pipe on the ground needs), metres. */
    totalSlopeLengthM: z.number().nonnegative(),
    minElevationM: z.number(),
    maxElevationM: z.number(),
    duplicateCount: z.number().int().nonnegative(),
    /** Computed minus known closing level, metres (level books that close on a benchmark). */
    closureErrorM: z.number().optional(),
  }),
});

export type HeightSourceName = z.infer<typeof HeightSourceSchema>;
export type SurveyPoint = z.infer<typeof SurveyPointSchema>;
export type SurveyImportWarning = z.infer<typeof SurveyImportWarningSchema>;
export type SurveyFeature = z.infer<typeof SurveyFeatureSchema>;
export type SurveyFormat = z.infer<typeof SurveyFormatSchema>;
export type ParsedSurvey = z.infer<typeof ParsedSurveySchema>;

/** The pattern `SurveyPointSchema.time` checks (zod's own ISO 8601 date-time with an offset). */
const ISO_TIME = z.regexes.datetime({ offset: true, local: false, precision: null });
const HEIGHT_SOURCE_NAMES: ReadonlySet<unknown> = new Set(HEIGHT_SOURCES);

const isNumberIn = (v: unknown, min: number, max: number) => typeof v === 'number' && v >= min && v <= max;
const isOptionalNumberIn = (v: unknown, min: number, max: number) => v === undefined || isNumberIn(v, min, max);

/**
 * The first rule of SurveyPointSchema that point `p` breaks, or null. The same rules as the schema, checked field
 * by field: the points are the parser's own objects (the file was read and checked cell by cell before), and zod
 * building and copying 100,000 of them was a tenth of a large import's time.
 */
function pointFault(p: unknown): { field: string; message: string } | null {
  if (typeof p !== 'object' || p === null) return { field: '', message: 'not an object' };
  const q = p as Record<string, unknown>;
  if (!Number.isInteger(q.order) || (q.order as number) < 0)
    return { field: 'order', message: 'expected a whole number ≥ 0' };
  if (!isOptionalNumberIn(q.lat, -90, 90)) return { field: 'lat', message: 'expected a number from -90 to 90' };
  if (!isOptionalNumberIn(q.lon, -180, 180)) return { field: 'lon', message: 'expected a number from -180 to 180' };
  if (!isNumberIn(q.chainageM, 0, Number.MAX_VALUE))
    return { field: 'chainageM', message: 'expected a finite number ≥ 0' };
  if (!isNumberIn(q.elevationM, -Number.MAX_VALUE, Number.MAX_VALUE))
    return { field: 'elevationM', message: 'expected a finite number' };
  if (q.label !== undefined && typeof q.label !== 'string') return { field: 'label', message: 'expected text' };
  if (!HEIGHT_SOURCE_NAMES.has(q.heightSource))
    return { field: 'heightSource', message: `expected one of ${HEIGHT_SOURCES.join(', ')}` };
  if (!isOptionalNumberIn(q.confidence, 0, Number.MAX_VALUE))
    return { field: 'confidence', message: 'expected a finite number ≥ 0' };
  if (q.time !== undefined && !(typeof q.time === 'string' && ISO_TIME.test(q.time)))
    return { field: 'time', message: 'expected an ISO 8601 date-time with an offset' };
  return null;
}

const OutlineSchema = ParsedSurveySchema.omit({ points: true });

/** Last gate before a result leaves the parser: a shape error here is a bug, reported plainly. */
export function validateParsedSurvey(value: unknown): ParsedSurvey {
  const invalid = (path: string, message: string) =>
    new SurveyImportError('invalid-result', `the import produced an invalid survey at ${path}: ${message}`);
  if (typeof value !== 'object' || value === null) throw invalid('', 'not an object');
  const { points, ...outline } = value as { points?: unknown };
  if (!Array.isArray(points) || points.length < 2) throw invalid('points', 'expected at least two points');
  for (let i = 0; i < points.length; i++) {
    const fault = pointFault(points[i]);
    if (fault) throw invalid(`points.${i}${fault.field ? `.${fault.field}` : ''}`, fault.message);
  }
  const r = OutlineSchema.safeParse(outline);
  if (!r.success) {
    const issue = r.error.issues[0];
    throw invalid(issue.path.join('.'), issue.message);
  }
  return { ...r.data, points: points as SurveyPoint[] };
}
