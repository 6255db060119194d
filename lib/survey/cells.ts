import { SurveyImportError } from './errors';
import { isCanonicalUtcInstant, readWrittenDate, writtenDateToUtcMs, type DateOrder } from './local-time';

/** International foot, exactly 0.3048 m (international yard and pound agreement, 1959). */
export const METRES_PER_FOOT = 0.3048;

export type LengthUnit = 'm' | 'ft';

export function toMetres(value: number, unit: LengthUnit): number {
  return unit === 'ft' ? value * METRES_PER_FOOT : value;
}

export interface CellPlace {
  line?: number;
  column: string;
  field: string;
}

/**
 * Longest cell read as a number. No survey reading needs more digits; a longer cell is refused
 * before any pattern runs, so a hostile file cannot make the check slow.
 */
export const MAX_NUMBER_CELL_CHARS = 64;

// Each pattern has one way to match any text (no nested or adjacent repeats over the same
// characters), so a failing cell is rejected in one pass instead of backtracking.
export const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(?:\d+(?:,\d*)?|,\d+)$/;

/** A cell as quoted back in a message: long cells are cut so an error never echoes a whole file. */
export function quoteCell(cell: string): string {
  return cell.length > 40 ? `${cell.slice(0, 40)}…` : cell;
}

/**
 * Reads a number from a cell. Accepts a decimal comma when the file uses one; rejects text,
 * NaN, Infinity and thousands separators rather than guessing, naming the line and column.
 */
export function readNumberCell(raw: string | undefined, decimalComma: boolean, place: CellPlace): number {
  const cell = (raw ?? '').trim();
  if (cell === '') {
    throw new SurveyImportError('missing-value', `no ${place.field} given`, place);
  }
  if (cell.length > MAX_NUMBER_CELL_CHARS) {
    throw new SurveyImportError(
      'not-a-number',
      `“${quoteCell(cell)}” is ${cell.length} characters long, too long to be a number (expected the ${place.field})`,
      place,
    );
  }
  const normalised = decimalComma && COMMA_NUMBER.test(cell) ? cell.replace(',', '.') : cell;
  if (!NUMBER.test(normalised)) {
    throw new SurveyImportError(
      'not-a-number',
      `“${quoteCell(cell)}” is not a number (expected the ${place.field})`,
      place,
    );
  }
  return Number(normalised);
}

/** Same as readNumberCell but an empty cell gives undefined. */
export function readOptionalNumberCell(
  raw: string | undefined,
  decimalComma: boolean,
  place: CellPlace,
): number | undefined {
  return (raw ?? '').trim() === '' ? undefined : readNumberCell(raw, decimalComma, place);
}

/** How to read a time written without an offset, and a date whose day and month could swap. */
export interface TimeReading {
  /** IANA zone of times written without an offset (the project's). @default 'UTC' */
  timeZone?: string;
  /** Order of a date such as 01.05.2024; asked for when the file does not decide it. */
  dateOrder?: DateOrder;
}

/**
 * Reads a time: ISO 8601 text (with or without an offset), a day-month or month-day date with an
 * optional time, or a Unix epoch in seconds or milliseconds (phones log both). A time without an
 * offset is read in `reading.timeZone`, never in the machine's own zone, so the browser's preview
 * and the server's import agree. Returns ISO 8601 in UTC.
 */
export function readTimeCell(raw: string | undefined, place: CellPlace, reading: TimeReading = {}): string | undefined {
  const cell = (raw ?? '').trim();
  if (cell === '') return undefined;
  if (cell.length > MAX_NUMBER_CELL_CHARS) {
    throw new SurveyImportError('bad-time', `“${quoteCell(cell)}” is too long to be a date and time`, place);
  }
  // Phones mostly write UTC in the very form returned below: such a cell is its own answer, once it is known to
  // name a real instant (read back, it prints the same). Saves reading the date piece by piece 100,000 times.
  if (isCanonicalUtcInstant(cell)) return cell;
  let ms: number;
  if (/^\d+(?:\.\d+)?$/.test(cell)) {
    const n = Number(cell);
    ms = n > 1e11 ? n : n * 1000;
  } else {
    const written = readWrittenDate(cell, reading.dateOrder);
    if (!written.ok && written.reason === 'ambiguous-order') {
      throw new SurveyImportError(
        'ambiguous-date-order',
        `“${quoteCell(cell)}” could be day first or month first; choose the date order of the file (day first, as 31.12.2024, or month first, as 12/31/2024)`,
        place,
      );
    }
    ms = written.ok ? writtenDateToUtcMs(written.date, reading.timeZone ?? 'UTC') : Number.NaN;
  }
  if (!Number.isFinite(ms)) {
    throw new SurveyImportError(
      'bad-time',
      `“${quoteCell(cell)}” is not a date and time this importer can read (use ISO 8601, e.g. 2024-05-01T07:30:00Z)`,
      place,
    );
  }
  return new Date(ms).toISOString();
}
