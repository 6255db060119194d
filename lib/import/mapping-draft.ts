import type { HeightSource } from '../../hydraulics/index';
import { fromDisplay } from '../units/index';
import type { FieldErrors } from '../errors';
import type { UnitSystem } from '../units';
import type { LengthUnit } from '../survey/cells';
import type { GpsColumnMapping, StationColumnMapping } from '../survey/column-mapping';
import type { CsvDelimiter } from '../survey/csv-dialect';
import type { SurveyInspection } from '../survey/inspect';
import type { SurveyFormat } from '../survey/parsed-survey';
import { surveyImportWords } from '../validations/field-word-tables';
import { fieldErrorsIn } from '../validations/field-words';
import { SurveyImportOptionsSchema, type SurveyImportOptions } from '../validations/survey-import';
import { typedNumber } from '../units/decimal-mark-store';
import { readWrittenDate } from '../survey/local-time';

/** Everything the mapping screen lets the user set; turned into import options on submit. */
export interface MappingDraft {
  format: SurveyFormat;
  name: string;
  dialect: { delimiter: CsvDelimiter; decimalComma: boolean; hasHeader: boolean };
  gps: {
    mapping: GpsColumnMapping;
    elevationUnit: LengthUnit;
    accuracyIsVertical: boolean;
    heightSource: HeightSource;
  };
  /**
   * How times are read: the project's zone for times without an offset, and the order of an ambiguous date ('ask' until
   * chosen).
   */
  times: { timeZone: string; dateOrder: 'ask' | 'day-first' | 'month-first' };
  station: {
    mapping: StationColumnMapping;
    chainageUnit: LengthUnit;
    elevationUnit: LengthUnit;
    heightSource: HeightSource;
  };
  gpx: { useWaypointsAsRoute: boolean; heightSource: HeightSource };
  /** Field-book heights are typed in the project's units, as text until submitted. */
  fieldBook: {
    startElevation: string;
    startLabel: string;
    angleUnit: 'auto' | 'degrees' | 'percent';
    distanceUnit: LengthUnit;
    closingElevation: string;
    method: 'rise-and-fall' | 'height-of-collimation';
    hoseLevel: boolean;
  };
}

/** A route name from a file name: “upper-spring_walk.gpx” → “upper spring walk”. */
export function routeNameFromFile(fileName: string): string {
  const base = fileName
    .replace(/\.[^.]+$/, '')
    .replace(/[_-]+/g, ' ')
    .trim();
  return (base || 'Imported route').slice(0, 120);
}

export function initialMappingDraft(
  inspection: SurveyInspection,
  fileName: string,
  projectTimeZone: string | null = null,
): MappingDraft {
  const csv = inspection.kind === 'csv' ? inspection : null;
  return {
    times: { timeZone: projectTimeZone ?? 'UTC', dateOrder: 'ask' },
    format: inspection.suggestedFormat,
    name: routeNameFromFile(fileName),
    dialect: csv
      ? { delimiter: csv.dialect.delimiter, decimalComma: csv.dialect.decimalComma, hasHeader: csv.dialect.hasHeader }
      : { delimiter: ',', decimalComma: false, hasHeader: true },
    gps: csv
      ? {
          mapping: csv.gps.mapping,
          elevationUnit: csv.gps.elevationUnit,
          accuracyIsVertical: csv.gps.accuracyIsVertical,
          heightSource: 'gps',
        }
      : {
          mapping: { latitude: null, longitude: null, elevation: null, time: null, name: null, accuracy: null },
          elevationUnit: 'm',
          accuracyIsVertical: false,
          heightSource: 'gps',
        },
    station: csv
      ? {
          mapping: csv.station.mapping,
          chainageUnit: csv.station.chainageUnit,
          elevationUnit: csv.station.elevationUnit,
          heightSource: 'typed',
        }
      : {
          mapping: { chainage: null, elevation: null, name: null },
          chainageUnit: 'm',
          elevationUnit: 'm',
          heightSource: 'typed',
        },
    gpx: { useWaypointsAsRoute: false, heightSource: 'gps' },
    fieldBook: {
      startElevation: '',
      startLabel: '',
      angleUnit: 'auto',
      distanceUnit: 'm',
      closingElevation: '',
      method: 'rise-and-fall',
      hoseLevel: false,
    },
  };
}

/** After a new look at the file (delimiter or header changed), take its fresh guesses for the columns. */
export function withInspection(draft: MappingDraft, inspection: SurveyInspection): MappingDraft {
  if (inspection.kind !== 'csv') return draft;
  return {
    ...draft,
    dialect: {
      delimiter: inspection.dialect.delimiter,
      decimalComma: inspection.dialect.decimalComma,
      hasHeader: inspection.dialect.hasHeader,
    },
    gps: {
      ...draft.gps,
      mapping: inspection.gps.mapping,
      elevationUnit: inspection.gps.elevationUnit,
      accuracyIsVertical: inspection.gps.accuracyIsVertical,
    },
    station: {
      ...draft.station,
      mapping: inspection.station.mapping,
      chainageUnit: inspection.station.chainageUnit,
      elevationUnit: inspection.station.elevationUnit,
    },
  };
}

/** A typed height in project units: metres, NaN when blank or not a number (zod then names the field). */
function typedHeightM(text: string, units: UnitSystem): number {
  const value = typedNumber(text);
  return Number.isFinite(value) ? fromDisplay('length', value, units) : NaN;
}

/** The draft as import options, checked by the same zod schema the server uses. */
export function mappingToOptions(
  draft: MappingDraft,
  units: UnitSystem,
): { options: SurveyImportOptions } | { errors: FieldErrors } {
  const fb = draft.fieldBook;
  const raw = (() => {
    switch (draft.format) {
      case 'gps-csv':
        return {
          format: draft.format,
          name: draft.name,
          ...draft.gps,
          dialect: draft.dialect,
          timeZone: draft.times.timeZone,
          ...(draft.times.dateOrder === 'ask' ? {} : { dateOrder: draft.times.dateOrder }),
        };
      case 'station-csv':
        return { format: draft.format, name: draft.name, ...draft.station, dialect: draft.dialect };
      case 'gpx':
        return { format: draft.format, name: draft.name, ...draft.gpx };
      case 'inclinometer-csv':
        return {
          format: draft.format,
          name: draft.name,
          startElevationM: typedHeightM(fb.startElevation, units),
          ...(fb.startLabel.trim() ? { startLabel: fb.startLabel.trim() } : {}),
          ...(fb.angleUnit === 'auto' ? {} : { angleUnit: fb.angleUnit }),
          distanceUnit: fb.distanceUnit,
        };
      case 'level-book-csv':
        return {
          format: draft.format,
          name: draft.name,
          startElevationM: typedHeightM(fb.startElevation, units),
          ...(fb.closingElevation.trim() ? { closingElevationM: typedHeightM(fb.closingElevation, units) } : {}),
          method: fb.method,
          hoseLevel: fb.hoseLevel,
          unit: fb.distanceUnit,
        };
    }
  })();
  const parsed = SurveyImportOptionsSchema.safeParse(raw);
  return parsed.success
    ? { options: parsed.data }
    : { errors: fieldErrorsIn(parsed.error, units, surveyImportWords(raw)) };
}

/**
 * Whether the time column's first rows hold a date that could be day first or month first
 * (01.05.2024): the mapping screen then asks, before anything is read.
 */
export function sampleDatesAmbiguous(rows: readonly (readonly string[])[], timeColumn: number | null): boolean {
  if (timeColumn === null) return false;
  return rows.some((row) => {
    const reading = readWrittenDate((row[timeColumn] ?? '').trim());
    return !reading.ok && reading.reason === 'ambiguous-order';
  });
}
