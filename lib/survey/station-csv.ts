import { buildParsedSurvey, type DraftPoint } from './build-survey';
import { readNumberCell, toMetres, type LengthUnit } from './cells';
import { assertMappingInRange, guessStationColumnMapping, type StationColumnMapping } from './column-mapping';
import { detectCsvDialect, type CsvDialect } from './csv-dialect';
import { openCsvTable } from './csv-rows';
import { SurveyImportError } from './errors';
import type { HeightSourceName, ParsedSurvey, SurveyImportWarning } from './parsed-survey';

export interface StationCsvOptions {
  mapping?: StationColumnMapping;
  /** @default guessed from the header, else 'm' */
  chainageUnit?: LengthUnit;
  /** @default guessed from the header, else 'm' */
  elevationUnit?: LengthUnit;
  /** Where the heights came from. @default 'typed' */
  heightSource?: HeightSourceName;
  dialect?: Partial<CsvDialect>;
  onProgress?: (fraction: number) => void;
}

/**
 * Parses a station/elevation table (chainage, elevation, optional label). Chainage must start
 * at or above zero and rise row by row; an exact repeat of a row is kept and flagged, but two
 * different heights at one chainage, or chainage going back, stop the import with the line.
 */
export function parseStationCsv(text: string, options: StationCsvOptions = {}): ParsedSurvey {
  const dialect: CsvDialect = { ...detectCsvDialect(text), ...options.dialect };
  const table = openCsvTable(text, dialect);
  const guess = guessStationColumnMapping(table.headers);
  const mapping = options.mapping ?? guess.mapping;
  const chainageUnit = options.chainageUnit ?? guess.chainageUnit;
  const elevationUnit = options.elevationUnit ?? guess.elevationUnit;
  if (options.mapping) assertMappingInRange({ ...options.mapping }, table.headers);
  for (const key of ['chainage', 'elevation'] as const) {
    if (mapping[key] === null) {
      throw new SurveyImportError(
        'missing-column',
        `no ${key} column found among ${table.headers.map((h) => `“${h}”`).join(', ')}`,
        { field: key },
      );
    }
  }
  const chainageCol = table.headers[mapping.chainage as number];
  const elevationCol = table.headers[mapping.elevation as number];
  const drafts: DraftPoint[] = [];
  const warnings: SurveyImportWarning[] = [];
  const rowsRead = table.forEachRow(
    (cells, line) => {
      const chainageM = toMetres(
        readNumberCell(cells[mapping.chainage as number], dialect.decimalComma, {
          line,
          column: chainageCol,
          field: 'chainage',
        }),
        chainageUnit,
      );
      const elevationM = toMetres(
        readNumberCell(cells[mapping.elevation as number], dialect.decimalComma, {
          line,
          column: elevationCol,
          field: 'elevation',
        }),
        elevationUnit,
      );
      const place = { line, column: chainageCol, field: 'chainage' };
      if (chainageM < 0)
        throw new SurveyImportError(
          'negative-chainage',
          `chainage ${chainageM} m is negative; a route starts at 0`,
          place,
        );
      const prev = drafts[drafts.length - 1];
      if (prev && chainageM <= (prev.chainageM as number)) {
        const repeat = chainageM === prev.chainageM && elevationM === prev.elevationM;
        if (!repeat) {
          throw new SurveyImportError(
            'chainage-not-increasing',
            `chainage ${chainageM} m is not greater than ${prev.chainageM} m on line ${prev.line}; rows must be in order along the route`,
            place,
          );
        }
      }
      drafts.push({
        line,
        chainageM,
        elevationM,
        label: mapping.name === null ? undefined : (cells[mapping.name] ?? '').trim() || undefined,
      });
    },
    { onProgress: options.onProgress },
  );
  if (rowsRead === 0)
    throw new SurveyImportError('no-data-rows', 'the file has a header row but no data rows', { line: 2 });
  return buildParsedSurvey({
    format: 'station-csv',
    drafts,
    heightSource: options.heightSource ?? 'typed',
    rowsRead,
    warnings,
  });
}
