import Papa from 'papaparse';
import { MAX_NUMBER_CELL_CHARS, NUMBER } from './cells';
import { SurveyImportError } from './errors';

export type CsvDelimiter = ',' | ';' | '\t' | '|';
export type LineEnding = 'lf' | 'crlf' | 'cr' | 'mixed' | 'none';

export interface CsvDialect {
  delimiter: CsvDelimiter;
  decimalComma: boolean;
  hasHeader: boolean;
  lineEnding: LineEnding;
}

/** Ties go to the delimiter listed first: a comma is the likeliest to be a decimal mark too. */
const CANDIDATES: CsvDelimiter[] = ['\t', ';', '|', ','];
const PREVIEW_LINES = 50;

export function detectLineEnding(text: string): LineEnding {
  // Most files have no carriage return at all: two searches answer, without walking a 100,000-line file.
  if (text.indexOf('\r') < 0) return text.indexOf('\n') < 0 ? 'none' : 'lf';
  // Counted in one pass: regex match arrays would hold one string per line of a 100 000-line file.
  let crlf = 0;
  let cr = 0;
  let lf = 0;
  for (let i = 0; i < text.length; i += 1) {
    const c = text.charCodeAt(i);
    if (c === 13) {
      if (text.charCodeAt(i + 1) === 10) {
        crlf += 1;
        i += 1;
      } else cr += 1;
    } else if (c === 10) lf += 1;
  }
  const kinds = [crlf > 0, cr > 0, lf > 0].filter(Boolean).length;
  if (kinds === 0) return 'none';
  if (kinds > 1) return 'mixed';
  return crlf > 0 ? 'crlf' : cr > 0 ? 'cr' : 'lf';
}

/** One line ending throughout, so mixed files from edited exports parse like any other. */
export function normaliseLineEndings(text: string): string {
  return text.indexOf('\r') < 0 ? text : text.replace(/\r\n?/g, '\n');
}

function previewLines(text: string): string[] {
  const lines: string[] = [];
  let start = 0;
  while (lines.length < PREVIEW_LINES && start < text.length) {
    let end = text.indexOf('\n', start);
    if (end < 0) end = text.length;
    const line = text.slice(start, end);
    if (line.trim() !== '') lines.push(line);
    start = end + 1;
  }
  return lines;
}

export function splitRow(line: string, delimiter: CsvDelimiter): string[] {
  return Papa.parse<string[]>(line, { delimiter }).data[0] ?? [];
}

function scoreDelimiter(lines: string[], delimiter: CsvDelimiter): { columns: number; agreement: number } {
  const counts = lines.map((l) => splitRow(l, delimiter).length);
  const tally = new Map<number, number>();
  counts.forEach((c) => tally.set(c, (tally.get(c) ?? 0) + 1));
  let columns = 1;
  let best = 0;
  tally.forEach((n, c) => {
    if (n > best || (n === best && c > columns)) {
      best = n;
      columns = c;
    }
  });
  return { columns, agreement: best / lines.length };
}

// Linear patterns (one way to match any text) on trimmed cells no longer than a number can be:
// see lib/survey/cells.ts.
const COMMA_DECIMAL = /^[+-]?\d+,\d+$/;

function numericCandidate(cell: string): string | undefined {
  const trimmed = cell.trim();
  return trimmed.length > 0 && trimmed.length <= MAX_NUMBER_CELL_CHARS ? trimmed : undefined;
}

function isCommaDecimal(cell: string): boolean {
  const c = numericCandidate(cell);
  return c !== undefined && COMMA_DECIMAL.test(c);
}

function looksNumeric(cell: string, decimalComma: boolean): boolean {
  const c = numericCandidate(cell);
  return c !== undefined && (NUMBER.test(c) || (decimalComma && COMMA_DECIMAL.test(c)));
}

/**
 * Guesses delimiter, decimal mark and header row from the first lines. The delimiter is the one
 * that splits most lines into the same number (≥ 2) of columns; a decimal comma is assumed only
 * when the delimiter is not a comma and cells look like “512,4”; the first row is a header when
 * it holds text where the rows below hold numbers.
 */
export function detectCsvDialect(rawText: string): CsvDialect {
  const lineEnding = detectLineEnding(rawText);
  const lines = previewLines(normaliseLineEndings(rawText));
  if (lines.length === 0) throw new SurveyImportError('empty-file', 'the file has no rows');
  let chosen: { delimiter: CsvDelimiter; columns: number; agreement: number } | undefined;
  for (const delimiter of CANDIDATES) {
    const s = scoreDelimiter(lines, delimiter);
    if (s.columns < 2) continue;
    if (!chosen || s.agreement > chosen.agreement + 1e-9) chosen = { delimiter, ...s };
  }
  if (!chosen) {
    throw new SurveyImportError(
      'no-delimiter',
      'every row is a single column: the columns must be separated by commas, semicolons, tabs or bars',
      { line: 1 },
    );
  }
  const rows = lines.map((l) => splitRow(l, chosen.delimiter));
  const dataCells = rows.slice(1).flat();
  const decimalComma = chosen.delimiter !== ',' && dataCells.some(isCommaDecimal);
  const first = rows[0];
  const second = rows[1];
  const hasHeader =
    first.some(
      (cell, i) =>
        cell.trim() !== '' &&
        !looksNumeric(cell, decimalComma) &&
        (second === undefined || looksNumeric(second[i] ?? '', decimalComma)),
    ) ||
    (second === undefined && first.some((c) => c.trim() !== '' && !looksNumeric(c, decimalComma)));
  return { delimiter: chosen.delimiter, decimalComma, hasHeader, lineEnding };
}
