import { buildParsedSurvey, type DraftPoint } from './build-survey';
import { readNumberCell, readOptionalNumberCell, readTimeCell, toMetres, type LengthUnit } from './cells';
import { assertMappingInRange, guessGpsColumnMapping, type GpsColumnMapping } from './column-mapping';
import { detectCsvDialect, type CsvDialect } from './csv-dialect';
import { openCsvTable } from './csv-rows';
import { SurveyImportError } from './errors';
import type { HeightSourceName, ParsedSurvey } from './parsed-survey';
import type { DateOrder } from './local-time';

export interface GpsCsvOptions {
  /** Column mapping confirmed on the mapping screen; guessed from headers when omitted. */
  mapping?: GpsColumnMapping;
  /** @default guessed from the elevation header, else 'm' */
  elevationUnit?: LengthUnit;
  /** @default 'gps' */
  heightSource?: HeightSourceName;
  /** Accuracy column holds vertical uncertainty (else horizontal, scaled ×1.5). @default guessed from header */
  accuracyIsVertical?: boolean;
  /** Overrides the detected dialect (e.g. the user picked a delimiter). */
  dialect?: Partial<CsvDialect>;
  /** Time zone of times without an offset (the project's) and the date order when the file does not decide it. */
  timeZone?: string;
  dateOrder?: DateOrder;
  onProgress?: (fraction: number) => void;
}

/**
 * Consumer receivers' vertical error is about 1.5× their horizontal figure (blackboxcamera
 * “GPS limits” note, core.md §6.4 [R28], low authority): used only when a file gives a
 * horizontal accuracy and no vertical one.
 */
const VERTICAL_PER_HORIZONTAL = 1.5;

const DELIMITER_NAMES: Record<string, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab', '|': 'bar' };

/** Works out the dialect, headers and guessed mapping, for the mapping screen. */
export function previewGpsCsv(text: string): {
  dialect: CsvDialect;
  headers: string[];
  guess: ReturnType<typeof guessGpsColumnMapping>;
} {
  const dialect = detectCsvDialect(text);
  const headers = openCsvTable(text, dialect).headers;
  return { dialect, headers, guess: guessGpsColumnMapping(headers) };
}

function resolveDialect(text: string, override: Partial<CsvDialect> | undefined): CsvDialect {
  let detected: CsvDialect | undefined;
  try {
    detected = detectCsvDialect(text);
  } catch (e) {
    if (!(override?.delimiter && e instanceof SurveyImportError && e.code === 'no-delimiter')) throw e;
  }
  const dialect: CsvDialect = {
    delimiter: ',',
    decimalComma: false,
    hasHeader: true,
    lineEnding: 'lf',
    ...detected,
    ...override,
  };
  const table = openCsvTable(text, dialect);
  if (override?.delimiter && table.headers.length < 2) {
    const hint =
      detected && detected.delimiter !== override.delimiter
        ? `; the file looks ${DELIMITER_NAMES[detected.delimiter]}-separated`
        : '';
    throw new SurveyImportError(
      'wrong-delimiter',
      `splitting on ${DELIMITER_NAMES[override.delimiter]}s gives only one column${hint}`,
      { line: 1 },
    );
  }
  return dialect;
}

/** Parses a phone or handheld-receiver CSV of fixes into a route. */
export function parseGpsCsv(text: string, options: GpsCsvOptions = {}): ParsedSurvey {
  const dialect = resolveDialect(text, options.dialect);
  const table = openCsvTable(text, dialect);
  const guess = guessGpsColumnMapping(table.headers);
  const mapping = options.mapping ?? guess.mapping;
  const elevationUnit = options.elevationUnit ?? guess.elevationUnit;
  const accuracyIsVertical = options.accuracyIsVertical ?? guess.accuracyIsVertical;
  if (options.mapping) assertMappingInRange({ ...options.mapping }, table.headers);
  for (const key of ['latitude', 'longitude', 'elevation'] as const) {
    const index = mapping[key];
    if (index === null || index >= table.headers.length || index < 0) {
      throw new SurveyImportError(
        'missing-column',
        `no ${key} column found among ${table.headers.map((h) => `“${h}”`).join(', ')}; choose it on the mapping screen`,
        { field: key, line: dialect.hasHeader ? 1 : undefined },
      );
    }
  }
  const col = (i: number | null) => (i === null ? '' : table.headers[i]);
  // One place per field, its line set per row: no objects per cell on a 100,000-row file (an error copies what it
  // needs).
  const place = (field: string, i: number | null) => ({ line: 0, column: col(i), field });
  const at = {
    latitude: place('latitude', mapping.latitude),
    longitude: place('longitude', mapping.longitude),
    elevation: place('elevation', mapping.elevation),
    accuracy: place('accuracy', mapping.accuracy),
    time: place('time', mapping.time),
  };
  const timeReading = { timeZone: options.timeZone, dateOrder: options.dateOrder };
  const drafts: DraftPoint[] = [];
  const rowsRead = table.forEachRow(
    (cells, line) => {
      at.latitude.line = at.longitude.line = at.elevation.line = at.accuracy.line = at.time.line = line;
      const lat = readNumberCell(cells[mapping.latitude as number], dialect.decimalComma, at.latitude);
      if (lat < -90 || lat > 90) {
        throw new SurveyImportError(
          'latitude-out-of-range',
          `latitude ${lat} is outside −90 to 90 degrees`,
          at.latitude,
        );
      }
      const lon = readNumberCell(cells[mapping.longitude as number], dialect.decimalComma, at.longitude);
      if (lon < -180 || lon > 180) {
        throw new SurveyImportError(
          'longitude-out-of-range',
          `longitude ${lon} is outside −180 to 180 degrees`,
          at.longitude,
        );
      }
      const elevation = readNumberCell(cells[mapping.elevation as number], dialect.decimalComma, at.elevation);
      const accuracy =
        mapping.accuracy === null
          ? undefined
          : readOptionalNumberCell(cells[mapping.accuracy], dialect.decimalComma, at.accuracy);
      if (accuracy !== undefined && accuracy < 0) {
        throw new SurveyImportError('not-a-number', `accuracy cannot be negative (${accuracy})`, at.accuracy);
      }
      drafts.push({
        line,
        lat,
        lon,
        elevationM: toMetres(elevation, elevationUnit),
        label: mapping.name === null ? undefined : (cells[mapping.name] ?? '').trim() || undefined,
        time: mapping.time === null ? undefined : readTimeCell(cells[mapping.time], at.time, timeReading),
        confidence:
          accuracy === undefined
            ? undefined
            : accuracyIsVertical
              ? toMetres(accuracy, elevationUnit)
              : accuracy * VERTICAL_PER_HORIZONTAL,
      });
    },
    { onProgress: options.onProgress },
  );
  if (rowsRead === 0) {
    throw new SurveyImportError('no-data-rows', 'the file has a header row but no data rows', { line: 2 });
  }
  return buildParsedSurvey({ format: 'gps-csv', drafts, heightSource: options.heightSource ?? 'gps', rowsRead });
}
