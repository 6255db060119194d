import { describe, expect, it } from 'vitest';
import { MAX_NUMBER_CELL_CHARS, NUMBER, readNumberCell, readTimeCell } from '@/lib/survey/cells';
import { normaliseHeader } from '@/lib/survey/column-mapping';
import { detectCsvDialect } from '@/lib/survey/csv-dialect';
import { parseGpsCsv } from '@/lib/survey/gps-csv';
import { SurveyImportError } from '@/lib/survey/errors';

/** Milliseconds `work` takes (best of three, so a busy machine does not fail the test). */
function timeMs(work: () => unknown): number {
  let best = Infinity;
  for (let i = 0; i < 3; i += 1) {
    const start = performance.now();
    try {
      work();
    } catch {
      // refusals are what these inputs should get
    }
    best = Math.min(best, performance.now() - start);
  }
  return best;
}

// A cell of digits with a letter at the end: before the fix, 40 kB of it held the server for seconds
// (a pattern with two adjacent digit runs tried every split of the digits).
const hostileCell = (n: number) => `${'1'.repeat(n)}x`;
const place = { line: 2, column: 'ele', field: 'elevation' };

describe('number cells are read without backtracking', () => {
  it('refuses a 40 kB digit cell at once, naming line and column, quoting only its start', () => {
    let error: unknown;
    const ms = timeMs(() => {
      try {
        readNumberCell(hostileCell(40_000), true, place);
      } catch (e) {
        error = e;
        throw e;
      }
    });
    expect(ms).toBeLessThan(20);
    expect(error).toBeInstanceOf(SurveyImportError);
    expect((error as SurveyImportError).code).toBe('not-a-number');
    expect((error as SurveyImportError).message).toMatch(/^line 2, column “ele”/);
    expect((error as SurveyImportError).message.length).toBeLessThan(200);
  });

  it('checks in time linear in the cell length even without the length cap', () => {
    const small = timeMs(() => NUMBER.test(hostileCell(20_000)));
    const large = timeMs(() => NUMBER.test(hostileCell(200_000)));
    // ten times the text: a quadratic check would take about a hundred times as long
    expect(large).toBeLessThan(50);
    expect(large).toBeLessThan(Math.max(5, small * 30));
  });

  it('still reads every ordinary way of writing a number', () => {
    const cases: [string, boolean, number][] = [
      ['12', false, 12],
      ['-1.5e3', false, -1500],
      ['.5', false, 0.5],
      ['5.', false, 5],
      ['+7.25', false, 7.25],
      ['512,4', true, 512.4],
      [',5', true, 0.5],
      ['1E-2', false, 0.01],
    ];
    for (const [cell, comma, value] of cases) expect(readNumberCell(cell, comma, place)).toBeCloseTo(value, 12);
    for (const bad of ['1,234.5', 'NaN', 'Infinity', '1e', '--1', '1.2.3', '0x10', '١٢'])
      expect(() => readNumberCell(bad, false, place)).toThrow(SurveyImportError);
  });

  it(`refuses a cell longer than ${MAX_NUMBER_CELL_CHARS} characters even when it is all digits`, () => {
    expect(() => readNumberCell('9'.repeat(MAX_NUMBER_CELL_CHARS + 1), false, place)).toThrow(
      /too long to be a number/,
    );
    expect(readNumberCell('9'.repeat(MAX_NUMBER_CELL_CHARS), false, place)).toBeGreaterThan(1e63);
  });

  it('refuses a 40 kB time cell at once', () => {
    expect(timeMs(() => readTimeCell(hostileCell(40_000), place))).toBeLessThan(20);
    expect(() => readTimeCell(hostileCell(40_000), place)).toThrow(/too long/);
  });
});

describe('dialect and header guessing stay fast on hostile first lines', () => {
  it('guesses the dialect of a file whose cells are 40 kB digit runs in well under a second', () => {
    const text = `lat;lon;ele\n${hostileCell(40_000)};${hostileCell(40_000)};${hostileCell(40_000)}\n52,1;-1,2;100,5\n`;
    expect(timeMs(() => detectCsvDialect(text))).toBeLessThan(100);
    expect(detectCsvDialect('lat;lon;ele\n52,1;-1,2;100,5\n52,2;-1,3;101,5\n')).toMatchObject({
      delimiter: ';',
      decimalComma: true,
      hasHeader: true,
    });
  });

  it('normalises a 40 kB header of unclosed brackets and separators quickly', () => {
    expect(timeMs(() => normaliseHeader('('.repeat(40_000)))).toBeLessThan(20);
    expect(timeMs(() => normaliseHeader(`${' '.repeat(40_000)}x`))).toBeLessThan(20);
    expect(normaliseHeader('Altitude (ft)')).toBe('altitude');
  });

  it('refuses a whole 40 kB hostile survey file in well under a second', () => {
    const text = `lat,lon,ele\n52.1,-1.2,${hostileCell(40_000)}\n`;
    const mapping = { latitude: 0, longitude: 1, elevation: 2, time: null, name: null, accuracy: null };
    expect(timeMs(() => parseGpsCsv(text, { mapping, elevationUnit: 'm', heightSource: 'gps' } as never))).toBeLessThan(
      200,
    );
    expect(() => parseGpsCsv(text, { mapping, elevationUnit: 'm', heightSource: 'gps' } as never)).toThrow(
      SurveyImportError,
    );
  });
});

describe('imports have a point cap', () => {
  it('refuses a file with more points than a route can hold, saying how many', async () => {
    const { buildParsedSurvey } = await import('@/lib/survey/build-survey');
    const { MAX_ROUTE_POINTS } = await import('@/lib/validations/routes');
    const drafts = Array.from({ length: MAX_ROUTE_POINTS + 1 }, (_, i) => ({ chainageM: i, elevationM: 100 }));
    expect(() =>
      buildParsedSurvey({ format: 'station-csv', drafts, heightSource: 'typed', rowsRead: drafts.length }),
    ).toThrow(/200,001 points; a route can hold at most 200,000/);
  });
});
