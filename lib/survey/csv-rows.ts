import Papa from 'papaparse';
import type { CsvDialect } from './csv-dialect';
import { normaliseLineEndings, splitRow } from './csv-dialect';
import { SurveyImportError } from './errors';

export interface CsvTable {
  /** Column names from the header row, or “column 1”, “column 2”… when there is none. */
  headers: string[];
  /** Called once per data row with its cells and its 1-based line in the file. */
  forEachRow(
    onRow: (cells: string[], line: number) => void,
    options?: { onProgress?: (fraction: number) => void },
  ): number;
}

/**
 * Opens CSV text as a table without reading every row up front. Rows are streamed through
 * papaparse's step callback so a worker can report progress from the parser's cursor; blank
 * lines are skipped but still counted, so line numbers match what the user sees in an editor.
 */
export function openCsvTable(rawText: string, dialect: CsvDialect): CsvTable {
  const text = normaliseLineEndings(rawText);
  const firstBreak = text.indexOf('\n');
  const firstLine = firstBreak < 0 ? text : text.slice(0, firstBreak);
  const firstCells = splitRow(firstLine, dialect.delimiter);
  const headers = dialect.hasHeader
    ? firstCells.map((h, i) => (h.trim() === '' ? `column ${i + 1}` : h.trim()))
    : firstCells.map((_, i) => `column ${i + 1}`);
  const bodyStart = dialect.hasHeader ? (firstBreak < 0 ? text.length : firstBreak + 1) : 0;
  const startLine = dialect.hasHeader ? 2 : 1;

  return {
    headers,
    forEachRow(onRow, options = {}) {
      const body = text.slice(bodyStart);
      let rows = 0;
      let scanPos = 0;
      let scanLine = startLine;
      let rowStart = 0;
      let lastReported = -1;
      // Line breaks counted by searching from one to the next, not by reading every character.
      const lineAt = (pos: number): number => {
        for (;;) {
          const lineBreak = body.indexOf('\n', scanPos);
          if (lineBreak < 0 || lineBreak >= pos) return scanLine;
          scanLine += 1;
          scanPos = lineBreak + 1;
        }
      };
      Papa.parse<string[]>(body, {
        delimiter: dialect.delimiter,
        skipEmptyLines: 'greedy',
        step(result) {
          // Blank lines before this row were skipped; move to the first character of the row.
          while (
            rowStart < body.length &&
            (body[rowStart] === '\n' || body[rowStart] === ' ' || body[rowStart] === '\t')
          )
            rowStart += 1;
          const line = lineAt(rowStart);
          if (result.errors.length > 0) {
            const e = result.errors[0];
            throw new SurveyImportError('bad-reading', `the row could not be read as CSV: ${e.message}`, { line });
          }
          onRow(result.data, line);
          rows += 1;
          rowStart = result.meta.cursor;
          if (options.onProgress && body.length > 0) {
            const fraction = Math.floor((100 * result.meta.cursor) / body.length) / 100;
            if (fraction > lastReported) {
              lastReported = fraction;
              options.onProgress(Math.min(fraction, 1));
            }
          }
        },
      });
      if (options.onProgress && lastReported < 1) options.onProgress(1);
      return rows;
    },
  };
}
