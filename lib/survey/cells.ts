import { SurveyImportError } from './errors';

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

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const COMMA_NUMBER = /^[+-]?(\d+,?\d*|,\d+)$/;

/**
 * Reads a number from a cell. Accepts a decimal comma when the file uses one; rejects text,
 * NaN, Infinity and thousands separators rather than guessing, naming the line and column.
 */
export function readNumberCell(raw: string | undefined, decimalComma: boolean, place: CellPlace): number {
  const cell = (raw ?? '').trim();
  if (cell === '') {
    throw new SurveyImportError('missing-value', `no ${place.field} given`, place);
  }
  const normalised = decimalComma && COMMA_NUMBER.test(cell) ? cell.replace(',', '.') : cell;
  if (!NUMBER.test(normalised)) {
    throw new SurveyImportError('not-a-number', `“${cell}” is not a number (expected the ${place.field})`, place);
  }
  return Number(normalised);
}

/** Same as readNumberCell but an empty cell gives undefined. */
export function readOptionalNumberCell(raw: string | undefined, decimalComma: boolean, place: CellPlace): number | undefined {
  return (raw ?? '').trim() === '' ? undefined : readNumberCell(raw, decimalComma, place);
}

/**
 * Reads a time: ISO 8601 text, or a Unix epoch in seconds or milliseconds (phones log both).
 * Returns ISO 8601 in UTC.
 */
export function readTimeCell(raw: string | undefined, place: CellPlace): string | undefined {
  const cell = (raw ?? '').trim();
  if (cell === '') return undefined;
  let ms: number;
  if (/^\d+(\.\d+)?$/.test(cell)) {
    const n = Number(cell);
    ms = n > 1e11 ? n : n * 1000;
  } else {
    ms = Date.parse(cell);
  }
  if (!Number.isFinite(ms)) {
    throw new SurveyImportError('bad-time', `“${cell}” is not a date and time this importer can read (use ISO 8601, e.g. 2024-05-01T07:30:00Z)`, place);
  }
  return new Date(ms).toISOString();
}
