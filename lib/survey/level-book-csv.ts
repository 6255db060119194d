import {
  HydraulicsInputError,
  type LevelBookMethod,
  type LevelBookReading,
  reduceLevelBook,
} from '../../hydraulics/index';
import { buildParsedSurvey, type DraftPoint } from './build-survey';
import { readNumberCell, readOptionalNumberCell, toMetres, type LengthUnit } from './cells';
import { normaliseHeader } from './column-mapping';
import { detectCsvDialect } from './csv-dialect';
import { openCsvTable } from './csv-rows';
import { SurveyImportError } from './errors';
import type { ParsedSurvey, SurveyImportWarning } from './parsed-survey';

export interface LevelBookCsvOptions {
  /** Reduced level of the first station, metres. */
  startElevationM: number;
  /** @default 'rise-and-fall' */
  method?: LevelBookMethod;
  /** Known level of the last station when the run closes on a benchmark, metres. */
  closingElevationM?: number;
  /** Heights recorded with a hose level instead of an instrument. @default false */
  hoseLevel?: boolean;
  /** Unit of chainage and staff readings. @default 'm' */
  unit?: LengthUnit;
  onProgress?: (fraction: number) => void;
}

const COLUMNS = {
  backsight: ['bs', 'backsight', 'back', 'backsightm'],
  intermediate: ['is', 'intermediate', 'intermediatesight', 'int'],
  foresight: ['fs', 'foresight', 'fore', 'foresightm'],
  chainage: ['chainage', 'ch', 'distance', 'dist', 'sta'],
  label: ['station', 'point', 'name', 'label', 'remarks', 'remark', 'note'],
};

/**
 * Parses a level book (station, chainage, BS, IS, FS) and reduces it by rise-and-fall or height
 * of collimation. The closure error is reported when the run closes on a known level.
 */
export function parseLevelBookCsv(text: string, options: LevelBookCsvOptions): ParsedSurvey {
  if (!Number.isFinite(options.startElevationM)) {
    throw new SurveyImportError('missing-value', 'give the reduced level of the first station (start elevation)', {
      field: 'startElevationM',
    });
  }
  const unit = options.unit ?? 'm';
  const dialect = detectCsvDialect(text);
  const table = openCsvTable(text, dialect);
  const names = table.headers.map(normaliseHeader);
  const col = (key: keyof typeof COLUMNS) => {
    const i = names.findIndex((n) => COLUMNS[key].includes(n));
    return i < 0 ? null : i;
  };
  const bs = col('backsight');
  const is = col('intermediate');
  const fs = col('foresight');
  const ch = col('chainage');
  const lb = col('label');
  for (const [key, i] of [
    ['backsight (BS)', bs],
    ['foresight (FS)', fs],
    ['chainage', ch],
  ] as const) {
    if (i === null)
      throw new SurveyImportError(
        'missing-column',
        `no ${key} column found among ${table.headers.map((h) => `“${h}”`).join(', ')}`,
        { field: key },
      );
  }
  const readings: LevelBookReading[] = [];
  const rows: { line: number; chainageM: number; label?: string }[] = [];
  table.forEachRow(
    (cells, line) => {
      const read = (i: number | null, field: string) =>
        i === null
          ? undefined
          : readOptionalNumberCell(cells[i], dialect.decimalComma, { line, column: table.headers[i], field });
      const chainageM = toMetres(
        readNumberCell(cells[ch as number], dialect.decimalComma, {
          line,
          column: table.headers[ch as number],
          field: 'chainage',
        }),
        unit,
      );
      if (chainageM < 0)
        throw new SurveyImportError('negative-chainage', `chainage ${chainageM} m is negative`, {
          line,
          column: table.headers[ch as number],
          field: 'chainage',
        });
      const backsight = read(bs, 'backsight');
      const intermediate = read(is, 'intermediate sight');
      const foresight = read(fs, 'foresight');
      readings.push({
        label: lb === null ? undefined : (cells[lb] ?? '').trim() || undefined,
        backsightM: backsight === undefined ? undefined : toMetres(backsight, unit),
        intermediateM: intermediate === undefined ? undefined : toMetres(intermediate, unit),
        foresightM: foresight === undefined ? undefined : toMetres(foresight, unit),
      });
      rows.push({ line, chainageM, label: readings[readings.length - 1].label });
    },
    { onProgress: options.onProgress },
  );
  if (rows.length === 0)
    throw new SurveyImportError('no-data-rows', 'the level book has a header row but no readings', { line: 2 });
  if (rows.length === 1)
    throw new SurveyImportError('too-few-points', 'a level book needs at least two lines', { line: rows[0].line });
  let result;
  try {
    result = reduceLevelBook({
      readings,
      startElevationM: options.startElevationM,
      method: options.method ?? 'rise-and-fall',
      closingElevationM: options.closingElevationM,
    });
  } catch (e) {
    if (!(e instanceof HydraulicsInputError)) throw e;
    const row = e.index === undefined ? undefined : rows[e.index];
    const missingFs = /missing foresight/.test(e.message);
    const msg = e.message.replace(/^[^:]*: /, '');
    const column = e.field.endsWith('foresightM')
      ? fs
      : e.field.endsWith('backsightM')
        ? bs
        : e.field.endsWith('intermediateM')
          ? is
          : null;
    throw new SurveyImportError(missingFs ? 'level-book-missing-foresight' : 'level-book-order', msg, {
      line: row?.line,
      column: column === null ? undefined : table.headers[column],
      field: e.field,
    });
  }
  const warnings: SurveyImportWarning[] = [];
  if (result.closureErrorM !== undefined) {
    warnings.push({
      code: 'level-closure',
      message: `the run closes ${Math.abs(result.closureErrorM * 1000).toFixed(0)} mm ${result.closureErrorM >= 0 ? 'above' : 'below'} the known closing level`,
    });
  }
  const drafts: DraftPoint[] = rows.map((r, i) => ({
    line: r.line,
    chainageM: r.chainageM,
    elevationM: result.stations[i].reducedLevelM,
    label: r.label,
  }));
  for (let i = 1; i < drafts.length; i += 1) {
    if ((drafts[i].chainageM as number) < (drafts[i - 1].chainageM as number)) {
      throw new SurveyImportError(
        'chainage-not-increasing',
        `chainage ${drafts[i].chainageM} m is less than ${drafts[i - 1].chainageM} m on the line before`,
        {
          line: drafts[i].line,
          column: table.headers[ch as number],
          field: 'chainage',
        },
      );
    }
  }
  return buildParsedSurvey({
    format: 'level-book-csv',
    drafts,
    heightSource: options.hoseLevel ? 'hose-level' : 'level',
    rowsRead: rows.length,
    warnings,
    closureErrorM: result.closureErrorM,
  });
}
