import type { LengthUnit } from './cells';
import {
  guessGpsColumnMapping,
  guessStationColumnMapping,
  normaliseHeader,
  type GpsColumnMapping,
  type StationColumnMapping,
} from './column-mapping';
import { detectCsvDialect, normaliseLineEndings, splitRow, type CsvDialect } from './csv-dialect';
import { looksLikeGpx } from './detect-format';
import { openCsvTable } from './csv-rows';
import type { SurveyFormat } from './parsed-survey';

/** How many data rows the mapping screen shows under the headers. */
export const SAMPLE_ROWS = 8;

export type SurveyInspection =
  | { kind: 'gpx'; suggestedFormat: 'gpx' }
  | {
      kind: 'csv';
      dialect: CsvDialect;
      headers: string[];
      sampleRows: string[][];
      suggestedFormat: Exclude<SurveyFormat, 'gpx'>;
      gps: { mapping: GpsColumnMapping; elevationUnit: LengthUnit; accuracyIsVertical: boolean };
      station: { mapping: StationColumnMapping; elevationUnit: LengthUnit; chainageUnit: LengthUnit };
    };

const has = (names: string[], ...wanted: string[]) => wanted.some((w) => names.includes(w));

/** Which kind of CSV the header names suggest; a GPS track when nothing else fits. */
function suggestCsvFormat(headers: readonly string[]): Exclude<SurveyFormat, 'gpx'> {
  const names = headers.map(normaliseHeader);
  if (has(names, 'bs', 'backsight') && has(names, 'fs', 'foresight')) return 'level-book-csv';
  if (has(names, 'slopedistance', 'sd', 'tape') && has(names, 'verticalangle', 'va', 'angle', 'grade', 'inclination'))
    return 'inclinometer-csv';
  const gps = guessGpsColumnMapping(headers).mapping;
  if (gps.latitude !== null && gps.longitude !== null) return 'gps-csv';
  const station = guessStationColumnMapping(headers).mapping;
  if (station.chainage !== null && station.elevation !== null) return 'station-csv';
  return 'gps-csv';
}

/**
 * A first look at a survey file for the mapping screen: GPX or CSV, the CSV's dialect, headers,
 * first rows and the guessed column mappings (a delimiter or header choice from the screen
 * overrides what was detected). Throws SurveyImportError when nothing is readable.
 */
export function inspectSurveyText(text: string, override: Partial<CsvDialect> = {}): SurveyInspection {
  if (looksLikeGpx(text)) return { kind: 'gpx', suggestedFormat: 'gpx' };
  const dialect = { ...detectCsvDialect(text), ...override };
  const table = openCsvTable(text, dialect);
  const lines = normaliseLineEndings(text.slice(0, 65_536)).split('\n', SAMPLE_ROWS * 4 + 1);
  const sampleRows = lines
    .slice(dialect.hasHeader ? 1 : 0)
    .filter((l) => l.trim() !== '')
    .slice(0, SAMPLE_ROWS)
    .map((l) => splitRow(l, dialect.delimiter));
  const gps = guessGpsColumnMapping(table.headers);
  const station = guessStationColumnMapping(table.headers);
  return {
    kind: 'csv',
    dialect,
    headers: table.headers,
    sampleRows,
    suggestedFormat: suggestCsvFormat(table.headers),
    gps: { mapping: gps.mapping, elevationUnit: gps.elevationUnit, accuracyIsVertical: gps.accuracyIsVertical },
    station: { mapping: station.mapping, elevationUnit: station.elevationUnit, chainageUnit: station.chainageUnit },
  };
}
