import { z } from 'zod';
import { HEIGHT_SOURCES } from '../../hydraulics/index';
import { nameText, safeText, uuid } from './common';
import {
  between,
  chainage,
  elevation,
  finite,
  MAX_LENGTH_M,
  metres,
  nonNegative,
  positive,
  whole,
  wholeInQuery,
} from './numbers';

export const RouteParams = z.strictObject({ routeId: uuid('Route id') });

/** Largest route a points save may send (a 100 000-point walk fits with room to spare). */
export const MAX_ROUTE_POINTS = 200_000;
/** Largest JSON body of a points save, bytes: about 150 bytes a point. */
export const MAX_POINTS_JSON_BYTES = 40 * 1024 * 1024;

export const heightSource = z.enum(HEIGHT_SOURCES, {
  error: `Height source must be one of ${HEIGHT_SOURCES.join(', ')}`,
});

export const CreateRouteSchema = z.strictObject({
  name: nameText('Route name'),
  notes: safeText('Notes', 5000).default(''),
});
export type CreateRouteInput = z.input<typeof CreateRouteSchema>;

export const UpdateRouteSchema = z
  .strictObject({ name: nameText('Route name'), notes: safeText('Notes', 5000) })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Send at least one field to change');
export type UpdateRouteInput = z.infer<typeof UpdateRouteSchema>;

/** One point of a whole-route save. `sourceSeq` ties an existing point to its raw survey values. */
export const RoutePointInputSchema = z.strictObject({
  sourceSeq: whole('Source row', 0).nullable(),
  latitude: between('Latitude', -90, 90, 'degrees').nullable(),
  longitude: between('Longitude', -180, 180, 'degrees').nullable(),
  chainageM: chainage('Chainage').nullable(),
  elevationM: elevation('Elevation'),
  label: safeText('Label', 200).nullable(),
  heightSource,
  confidenceM: nonNegative('Confidence', undefined, 'm').nullable(),
  excluded: z.boolean({ error: 'Excluded must be true or false' }),
});
export type RoutePointInput = z.infer<typeof RoutePointInputSchema>;

export const SavePointsSchema = z.strictObject({
  points: z.array(RoutePointInputSchema).max(MAX_ROUTE_POINTS, `A route can hold at most ${MAX_ROUTE_POINTS} points`),
  /** The route's updatedAt the edit started from; a newer one on the server means someone else saved (409). */
  baseUpdatedAt: z.iso.datetime({ error: 'baseUpdatedAt must be an ISO date-time' }).optional(),
  /**
   * The stored points `points` replace, by seq: from `fromSeq` up to (not including) `toSeq`; the
   * rest of the route stays as stored. Absent: `points` is the whole route. The route page saves
   * the page of rows it edited this way.
   */
  window: z
    .strictObject({ fromSeq: whole('fromSeq', 0, MAX_ROUTE_POINTS), toSeq: whole('toSeq', 0, MAX_ROUTE_POINTS) })
    .refine((w) => w.toSeq >= w.fromSeq, { error: 'toSeq must not be below fromSeq', path: ['toSeq'] })
    .optional(),
});
export type SavePointsInput = z.infer<typeof SavePointsSchema>;

const WindowStart = z.object({ window: z.object({ fromSeq: z.number().int().min(0).max(MAX_ROUTE_POINTS) }) });
/**
 * The route page's number of a save's first point: a page of rows (`window`) starts at its first seq + 1, so a refusal
 * names the row as the table does.
 */
export function firstPointNumberOf(data: unknown): number {
  const sent = WindowStart.safeParse(data);
  return sent.success ? sent.data.window.fromSeq + 1 : 1;
}

const CLEANUP_KINDS = [
  'grade-spike',
  'median-outlier',
  'duplicate',
  'chainage-backwards',
  'time-backwards',
  'smoothing',
  'benchmark-offset',
] as const;
const kind = z.enum(CLEANUP_KINDS, { error: `Kind must be one of ${CLEANUP_KINDS.join(', ')}` });
const pointIndex = whole('Index', 0);

export const ProposedChangeSchema = z.discriminatedUnion('field', [
  z.strictObject({
    kind,
    index: pointIndex,
    field: z.literal('elevationM'),
    from: finite('From'),
    to: finite('To'),
    reason: safeText('Reason', 500).default(''),
  }),
  z.strictObject({
    kind,
    index: pointIndex,
    field: z.literal('deleted'),
    from: z.literal(false),
    to: z.literal(true),
    reason: safeText('Reason', 500).default(''),
  }),
]);

export const CleanupDecisionSchema = z
  .strictObject({
    accept: z.array(ProposedChangeSchema).max(MAX_ROUTE_POINTS).default([]),
    reject: z.array(ProposedChangeSchema).max(MAX_ROUTE_POINTS).default([]),
  })
  .refine((v) => v.accept.length + v.reject.length > 0, 'Accept or reject at least one proposal');
export type CleanupDecisionInput = z.input<typeof CleanupDecisionSchema>;
export type CleanupDecision = z.infer<typeof CleanupDecisionSchema>;

export const SplitRouteSchema = z.strictObject({
  chainageM: positive('Split chainage', MAX_LENGTH_M, 'm'),
  secondName: nameText('Name of the second part').optional(),
});
export type SplitRouteInput = z.input<typeof SplitRouteSchema>;

export const TrimRouteSchema = z
  .strictObject({ fromChainageM: chainage('Keep from'), toChainageM: metres('Keep to') })
  .refine((v) => v.toChainageM > v.fromChainageM, {
    message: 'Keep to must be beyond keep from',
    path: ['toChainageM'],
  });
export type TrimRouteInput = z.input<typeof TrimRouteSchema>;

export const JoinRoutesSchema = z.strictObject({
  otherRouteId: uuid('Route to join'),
  gapM: nonNegative('Gap', MAX_LENGTH_M, 'm').optional(),
  name: nameText('Name of the joined route').optional(),
});
export type JoinRoutesInput = z.input<typeof JoinRoutesSchema>;

/** Rows a page of the route table may ask for at once. */
const MAX_POINTS_PAGE = 500;
/** Rows the route table shows and edits at once (one request each); the default page. */
export const ROUTE_PAGE_SIZE = 50;

/** `GET /api/routes/:id/points?offset=&limit=`: a page of rows by seq. */
export const RoutePointsQuerySchema = z.strictObject({
  offset: wholeInQuery('offset', 0, MAX_ROUTE_POINTS).default(0),
  limit: wholeInQuery('limit', 1, MAX_POINTS_PAGE).default(ROUTE_PAGE_SIZE),
});

/** `GET /api/routes/:id/view?profilePoints=N`: the profile thinned to about N points (highs and lows on top). */
export const RouteViewQuerySchema = z.strictObject({
  profilePoints: wholeInQuery('profilePoints', 50, 20_000).optional(),
});

/**
 * `GET /api/routes/:id/proposals`: a moving-median smoothing (`smoothingWindow`, by default the
 * import's 5 points, `IMPORT_SMOOTHING_WINDOW`) or a benchmark offset (`benchmarkPoint` with
 * `benchmarkElevationM`), never both.
 */
export const RouteProposalsQuerySchema = z
  .strictObject({
    smoothingWindow: wholeInQuery('smoothingWindow', 3, 101).optional(),
    benchmarkPoint: wholeInQuery('benchmarkPoint', 1, MAX_ROUTE_POINTS).optional(),
    benchmarkElevationM: z
      .string()
      .regex(/^-?\d{1,5}(\.\d{1,6})?$/, 'benchmarkElevationM must be a number of metres')
      .transform(Number)
      .pipe(elevation('benchmarkElevationM'))
      .optional(),
  })
  .transform((q, ctx): { smoothingWindow: number } | { benchmarkPoint: number; benchmarkElevationM: number } => {
    const benchmark = q.benchmarkPoint !== undefined || q.benchmarkElevationM !== undefined;
    if (!benchmark) return { smoothingWindow: q.smoothingWindow ?? 5 };
    if (q.smoothingWindow !== undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['smoothingWindow'],
        message: 'Ask for smoothing or for a benchmark offset, not both',
      });
    if (q.benchmarkPoint === undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['benchmarkPoint'],
        message: 'Give benchmarkPoint with benchmarkElevationM',
      });
    if (q.benchmarkElevationM === undefined)
      ctx.addIssue({
        code: 'custom',
        path: ['benchmarkElevationM'],
        message: 'Give benchmarkElevationM with benchmarkPoint',
      });
    return { benchmarkPoint: q.benchmarkPoint ?? 0, benchmarkElevationM: q.benchmarkElevationM ?? 0 };
  });
export type RouteProposalsQuery = z.infer<typeof RouteProposalsQuerySchema>;
