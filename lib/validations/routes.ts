import { z } from 'zod';
import { HEIGHT_SOURCES } from '../../hydraulics/index';
import { nameText, safeText, uuid } from './common';

export const RouteParams = z.strictObject({ routeId: uuid('Route id') });

/** Largest route a points save may send (a 100 000-point walk fits with room to spare). */
export const MAX_ROUTE_POINTS = 200_000;
/** Largest JSON body of a points save, bytes: about 150 bytes a point. */
export const MAX_POINTS_JSON_BYTES = 40 * 1024 * 1024;

export const heightSource = z.enum(HEIGHT_SOURCES, { error: `Height source must be one of ${HEIGHT_SOURCES.join(', ')}` });

const finite = (label: string) => z.number({ error: `${label} must be a number` }).finite(`${label} must be a finite number`);

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
  sourceSeq: z.number().int().min(0).nullable(),
  latitude: finite('Latitude').min(-90, 'Latitude must be between -90 and 90 degrees').max(90, 'Latitude must be between -90 and 90 degrees').nullable(),
  longitude: finite('Longitude').min(-180, 'Longitude must be between -180 and 180 degrees').max(180, 'Longitude must be between -180 and 180 degrees').nullable(),
  chainageM: finite('Chainage').min(0, 'Chainage must not be negative').nullable(),
  elevationM: finite('Elevation').min(-500, 'Elevation must be above -500 m').max(9000, 'Elevation must be below 9000 m'),
  label: safeText('Label', 200).nullable(),
  heightSource,
  confidenceM: finite('Confidence').min(0, 'Confidence must not be negative').nullable(),
  excluded: z.boolean({ error: 'Excluded must be true or false' }),
});
export type RoutePointInput = z.infer<typeof RoutePointInputSchema>;

export const SavePointsSchema = z.strictObject({
  points: z.array(RoutePointInputSchema).max(MAX_ROUTE_POINTS, `A route can hold at most ${MAX_ROUTE_POINTS} points`),
  /** The route's updatedAt the edit started from; a newer one on the server means someone else saved (409). */
  baseUpdatedAt: z.iso.datetime({ error: 'baseUpdatedAt must be an ISO date-time' }).optional(),
});
export type SavePointsInput = z.infer<typeof SavePointsSchema>;

const CLEANUP_KINDS = ['grade-spike', 'median-outlier', 'duplicate', 'chainage-backwards', 'time-backwards', 'smoothing', 'benchmark-offset'] as const;
const kind = z.enum(CLEANUP_KINDS, { error: `Kind must be one of ${CLEANUP_KINDS.join(', ')}` });
const pointIndex = z.number({ error: 'Index must be a point number' }).int('Index must be a whole number').min(0, 'Index must not be negative');

export const ProposedChangeSchema = z.discriminatedUnion('field', [
  z.strictObject({ kind, index: pointIndex, field: z.literal('elevationM'), from: finite('From'), to: finite('To'), reason: safeText('Reason', 500).default('') }),
  z.strictObject({ kind, index: pointIndex, field: z.literal('deleted'), from: z.literal(false), to: z.literal(true), reason: safeText('Reason', 500).default('') }),
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
  chainageM: finite('Split chainage').positive('Split chainage must be greater than zero'),
  secondName: nameText('Name of the second part').optional(),
});
export type SplitRouteInput = z.input<typeof SplitRouteSchema>;

export const TrimRouteSchema = z
  .strictObject({ fromChainageM: finite('Keep from').min(0, 'Keep from must not be negative'), toChainageM: finite('Keep to') })
  .refine((v) => v.toChainageM > v.fromChainageM, { message: 'Keep to must be beyond keep from', path: ['toChainageM'] });
export type TrimRouteInput = z.input<typeof TrimRouteSchema>;

export const JoinRoutesSchema = z.strictObject({
  otherRouteId: uuid('Route to join'),
  gapM: finite('Gap').min(0, 'Gap must not be negative').optional(),
  name: nameText('Name of the joined route').optional(),
});
export type JoinRoutesInput = z.input<typeof JoinRoutesSchema>;
