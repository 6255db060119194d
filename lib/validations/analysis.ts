import { z } from 'zod';
import {
  lineDesignParts,
  LineSettingsSchema,
  StandaloneLineFlowSchema,
  StandaloneLineStartSchema,
} from './line-design';
import { elevation, metres, nonNegative } from './numbers';
import { unitSystem } from './projects';

// A line given whole to the stateless analysis: the saved line's design schema (lib/validations/line-design.ts)
// with the stations a saved line reads from its route, and without the project's parts (ram sites).

export const MAX_ANALYSIS_STATIONS = 200_000;
/** The stateless analysis endpoint takes smaller lines than a saved line may have (it is open to every account). */
export const MAX_STATELESS_ANALYSIS_STATIONS = 20_000;
/** Its largest body, bytes: 20 000 stations at about 100 bytes each, with room for stretches and devices. */
export const MAX_STATELESS_ANALYSIS_BYTES = 4_000_000;
/** Stateless analyses per user per minute (common practice, no source: well above what an editor sends). */
export const ANALYSIS_LIMIT = { name: 'analysis-user', points: 30, durationSeconds: 60 };

/**
 * `?profilePoints=N`: thin the returned profile to about N points (it keeps every high and low).
 * `?units=us|metric`: the unit system a refusal states its bounds in (the body and the answer stay SI);
 * metric by default, so a refusal reads as a metric project's saved line would.
 */
export const AnalysisQuerySchema = z.strictObject({
  units: unitSystem.default('metric'),
  profilePoints: z.coerce
    .number({ error: 'profilePoints must be a whole number' })
    .int('profilePoints must be a whole number')
    .min(50, 'profilePoints must be at least 50')
    .max(20_000, 'profilePoints must be at most 20000')
    .optional(),
});

/** One station as a route gives it to a saved line (the same height range as a route point). */
const StationSchema = z.strictObject({
  chainageM: metres('Chainage'),
  groundElevationM: elevation('Ground elevation'),
  coverM: nonNegative('Cover', 10, 'm').optional(),
});

export const LineInputSchema = z.strictObject({
  stations: z
    .array(StationSchema, { error: 'Stations must be a list' })
    .min(2, 'A line needs at least two stations')
    .max(MAX_ANALYSIS_STATIONS, `At most ${MAX_ANALYSIS_STATIONS} stations`),
  start: StandaloneLineStartSchema,
  flow: StandaloneLineFlowSchema,
  ...lineDesignParts,
  // A saved line takes its height datum from its route's height sources; a line given whole says it here.
  settings: LineSettingsSchema.safeExtend({
    heightDatum: z.enum(['geodetic', 'assumed'], { error: 'Height datum must be geodetic or assumed' }).optional(),
  }).default({}),
});
export type LineInputBody = z.infer<typeof LineInputSchema>;
