import { z } from 'zod';
import { nameText, safeText, timeZone } from './common';
import { elevation, whole } from './numbers';
import { heightSource } from './routes';

/**
 * What the user chose on the import screens. The browser parses with these options to preview;
 * the server parses the uploaded file again with the same options (it never trusts the preview).
 */
const lengthUnit = z.enum(['m', 'ft'], { error: 'Units must be "m" or "ft"' });
const column = whole('Column', 0, 999).nullable();
const dialect = z
  .strictObject({
    delimiter: z.enum([',', ';', '\t', '|'], { error: 'Delimiter must be a comma, semicolon, tab or bar' }),
    decimalComma: z.boolean(),
    hasHeader: z.boolean(),
  })
  .partial()
  .optional();

const routeName = nameText('Route name');

export const GpsCsvImportSchema = z.strictObject({
  format: z.literal('gps-csv'),
  name: routeName,
  mapping: z.strictObject({
    latitude: column,
    longitude: column,
    elevation: column,
    time: column,
    name: column,
    accuracy: column,
  }),
  elevationUnit: lengthUnit,
  accuracyIsVertical: z.boolean().optional(),
  heightSource: heightSource.default('gps'),
  dialect,
  /** Zone of times written without an offset: the project's, the same in preview and import. */
  timeZone: timeZone.optional(),
  dateOrder: z.enum(['day-first', 'month-first'], { error: 'Date order must be day-first or month-first' }).optional(),
});

export const StationCsvImportSchema = z.strictObject({
  format: z.literal('station-csv'),
  name: routeName,
  mapping: z.strictObject({ chainage: column, elevation: column, name: column }),
  chainageUnit: lengthUnit,
  elevationUnit: lengthUnit,
  heightSource: heightSource.default('typed'),
  dialect,
});

export const GpxImportSchema = z.strictObject({
  format: z.literal('gpx'),
  name: routeName,
  useWaypointsAsRoute: z.boolean().default(false),
  heightSource: heightSource.default('gps'),
});

export const InclinometerImportSchema = z.strictObject({
  format: z.literal('inclinometer-csv'),
  name: routeName,
  startElevationM: elevation('Height of the first mark'),
  startLabel: safeText('First mark', 200).optional(),
  angleUnit: z.enum(['degrees', 'percent']).optional(),
  distanceUnit: lengthUnit.default('m'),
});

export const LevelBookImportSchema = z.strictObject({
  format: z.literal('level-book-csv'),
  name: routeName,
  startElevationM: elevation('Reduced level of the first station'),
  method: z.enum(['rise-and-fall', 'height-of-collimation']).default('rise-and-fall'),
  closingElevationM: elevation('Known closing level').optional(),
  hoseLevel: z.boolean().default(false),
  unit: lengthUnit.default('m'),
});

export const SurveyImportOptionsSchema = z.discriminatedUnion('format', [
  GpsCsvImportSchema,
  StationCsvImportSchema,
  GpxImportSchema,
  InclinometerImportSchema,
  LevelBookImportSchema,
]);
export type SurveyImportOptions = z.infer<typeof SurveyImportOptionsSchema>;
export type SurveyImportOptionsInput = z.input<typeof SurveyImportOptionsSchema>;
