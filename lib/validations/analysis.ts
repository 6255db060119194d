import { z } from 'zod';
import { safeText } from './common';

// Shapes of hydraulics/profile/types.ts (LineInput), checked at the API boundary. zod refuses NaN
// and infinities; the engineering core then checks order, coverage and pipe ids and names the row.
const finite = (label: string) => z.number({ error: `${label} must be a finite number` });
const positive = (label: string) => finite(label).positive(`${label} must be greater than zero`);
const nonNegative = (label: string) => finite(label).nonnegative(`${label} must not be negative`);

export const MAX_ANALYSIS_STATIONS = 200_000;
/** The stateless analysis endpoint takes smaller lines than a saved line may have (it is open to every account). */
export const MAX_STATELESS_ANALYSIS_STATIONS = 20_000;
/** Its largest body, bytes: 20 000 stations at about 100 bytes each, with room for stretches and devices. */
export const MAX_STATELESS_ANALYSIS_BYTES = 4_000_000;
/** Stateless analyses per user per minute (common practice, no source: well above what an editor sends). */
export const ANALYSIS_LIMIT = { name: 'analysis-user', points: 30, durationSeconds: 60 };

/** `?profilePoints=N`: thin the returned profile to about N points (it keeps every high and low). */
export const AnalysisQuerySchema = z.strictObject({
  profilePoints: z.coerce.number({ error: 'profilePoints must be a whole number' }).int('profilePoints must be a whole number').min(50, 'profilePoints must be at least 50').max(20_000, 'profilePoints must be at most 20000').optional(),
});

export const PipeSpecSchema = z.strictObject({
  id: safeText('Pipe id', 120).pipe(z.string().min(1, 'Pipe id is required')),
  label: safeText('Pipe label', 200),
  material: z.enum(['pvc', 'pe', 'steel', 'custom']),
  nominalSize: safeText('Nominal size', 40),
  outsideDiameterM: positive('Outside diameter'),
  insideDiameterM: positive('Inside diameter'),
  wallM: positive('Wall thickness'),
  pressureRatingPa: positive('Pressure rating'),
  hazenWilliamsC: positive('Hazen-Williams C'),
  roughnessM: nonNegative('Roughness'),
  waveSpeedMs: positive('Wave speed'),
  source: safeText('Source', 500),
  sdr: positive('SDR').optional(),
  sidr: positive('SIDR').optional(),
});

const StationSchema = z.strictObject({
  chainageM: finite('Chainage'),
  groundElevationM: finite('Ground elevation'),
  coverM: nonNegative('Cover').optional(),
});

const StretchSchema = z.strictObject({
  fromM: finite('Stretch start'),
  toM: finite('Stretch end'),
  pipe: z.union([safeText('Pipe id', 120), PipeSpecSchema]),
});

const FittingSchema = z.strictObject({
  chainageM: finite('Fitting chainage'),
  k: nonNegative('Loss coefficient K'),
  label: safeText('Fitting label', 120).optional(),
});

const DeviceSchema = z.strictObject({
  kind: z.enum(['break-pressure-tank', 'air-release-valve', 'washout', 'isolation-valve']),
  chainageM: finite('Device chainage'),
  waterLevelM: finite('Tank water level').optional(),
  label: safeText('Device label', 120).optional(),
});

const StartSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('water-level'), levelM: finite('Start water level') }),
  z.strictObject({ kind: z.literal('pump'), outletHeadM: finite('Pump outlet head'), shutoffHeadM: finite('Pump shut-off head').optional() }),
]);

const EndSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('outlet'), elevationM: finite('Outlet elevation'), residualHeadM: nonNegative('Residual head').optional() }),
  z.strictObject({ kind: z.literal('tank-inlet'), elevationM: finite('Tank inlet elevation') }),
  z.strictObject({ kind: z.literal('free-discharge') }),
]);

const FlowSchema = z.discriminatedUnion('kind', [
  z.strictObject({ kind: z.literal('design'), flowM3s: nonNegative('Design flow') }),
  z.strictObject({ kind: z.literal('find') }),
]);

export const LineSettingsSchema = z.strictObject({
  frictionMethod: z.enum(['hazen-williams', 'darcy-weisbach']).optional(),
  waterTemperatureC: finite('Water temperature').min(0, 'Water temperature must be 0 C or more').max(40, 'Water temperature must be 40 C or less').optional(),
  safetyFactor: finite('Safety factor').min(1, 'Safety factor must be at least 1').optional(),
  velocityMinMs: nonNegative('Minimum velocity').optional(),
  velocityMaxMs: positive('Maximum velocity').optional(),
  minResidualHeadM: nonNegative('Minimum residual head').optional(),
  airPointToleranceM: nonNegative('Air point tolerance').optional(),
  siteAltitudeM: finite('Site altitude').optional(),
  siphonLimitHeadM: positive('Siphon limit').optional(),
  defaultCoverM: nonNegative('Default cover').optional(),
  entranceLossK: nonNegative('Entrance loss coefficient').optional(),
  heightDatum: z.enum(['geodetic', 'assumed'], { error: 'Height datum must be geodetic or assumed' }).optional(),
  checkSurge: z.boolean().optional(),
});

export const LineInputSchema = z.strictObject({
  stations: z.array(StationSchema).min(2, 'A line needs at least two stations').max(MAX_ANALYSIS_STATIONS, `At most ${MAX_ANALYSIS_STATIONS} stations`),
  stretches: z.array(StretchSchema).min(1, 'A line needs at least one pipe stretch').max(5000, 'At most 5000 stretches'),
  fittings: z.array(FittingSchema).max(5000).optional(),
  devices: z.array(DeviceSchema).max(5000).optional(),
  pipes: z.array(PipeSpecSchema).max(200).optional(),
  start: StartSchema,
  end: EndSchema,
  flow: FlowSchema,
  settings: LineSettingsSchema.optional(),
});
export type LineInputBody = z.infer<typeof LineInputSchema>;
