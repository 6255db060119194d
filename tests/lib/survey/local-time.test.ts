import { describe, expect, it } from 'vitest';
import { readTimeCell } from '../../../lib/survey/cells';
import {
  isCanonicalUtcInstant,
  readWrittenDate,
  utcInstantMs,
  writtenDateToUtcMs,
  zonedTimeToUtcMs,
} from '../../../lib/survey/local-time';
import { parseSurveyText } from '../../../lib/survey/run-import';
import { SurveyImportError } from '../../../lib/survey/errors';
import { sampleDatesAmbiguous } from '../../../lib/import/mapping-draft';
import { SurveyImportOptionsSchema } from '../../../lib/validations/survey-import';

const iso = (ms: number) => new Date(ms).toISOString();

describe('dates in either order are asked, never guessed', () => {
  it('01.05.2024 could be either: reported as ambiguous until an order is chosen', () => {
    expect(readWrittenDate('01.05.2024 07:30')).toEqual({ ok: false, reason: 'ambiguous-order' });
    const dayFirst = readWrittenDate('01.05.2024 07:30', 'day-first');
    const monthFirst = readWrittenDate('01.05.2024 07:30', 'month-first');
    expect(dayFirst.ok && [dayFirst.date.day, dayFirst.date.month]).toEqual([1, 5]);
    expect(monthFirst.ok && [monthFirst.date.day, monthFirst.date.month]).toEqual([5, 1]);
  });

  it('a number above 12 decides by itself; ISO dates are never ambiguous; nonsense is unreadable', () => {
    const a = readWrittenDate('31.12.2024');
    const b = readWrittenDate('12/31/2024 18:05:09');
    expect(a.ok && [a.date.day, a.date.month]).toEqual([31, 12]);
    expect(b.ok && [b.date.day, b.date.month, b.date.second]).toEqual([31, 12, 9]);
    expect(readWrittenDate('2024-05-01T07:30:00').ok).toBe(true);
    expect(readWrittenDate('31.02.2024')).toEqual({ ok: false, reason: 'unreadable' });
    expect(readWrittenDate('next Tuesday')).toEqual({ ok: false, reason: 'unreadable' });
  });

  it('a day is valid exactly when the calendar has it: leap years by the Gregorian rule, every month of 1896-2104', () => {
    for (let year = 1896; year <= 2104; year++) {
      for (let month = 1; month <= 12; month++) {
        for (let day = 27; day <= 32; day++) {
          const text = `${year}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
          const calendarHasIt = new Date(Date.UTC(year, month - 1, day)).getUTCDate() === day;
          expect(readWrittenDate(text).ok, text).toBe(calendarHasIt);
        }
      }
    }
    expect(readWrittenDate('29.02.1900').ok).toBe(false);
    expect(readWrittenDate('29.02.2000').ok).toBe(true);
  });

  it('the mapping screen sees the ambiguity in the first rows of the time column', () => {
    expect(sampleDatesAmbiguous([['46.1', '7.2', '01.05.2024 07:30']], 2)).toBe(true);
    expect(sampleDatesAmbiguous([['46.1', '7.2', '13.05.2024 07:30']], 2)).toBe(false);
    expect(sampleDatesAmbiguous([['46.1', '7.2', '01.05.2024 07:30']], null)).toBe(false);
  });
});

describe("times without an offset are read in the project's zone, the same everywhere", () => {
  it('wall-clock time in a zone, across a daylight-saving change (IANA tz rules via Intl)', () => {
    // Denver: MST (UTC−7) in January, MDT (UTC−6) in July.
    expect(
      iso(zonedTimeToUtcMs({ year: 2024, month: 1, day: 15, hour: 7, minute: 30, second: 0 }, 'America/Denver')),
    ).toBe('2024-01-15T14:30:00.000Z');
    expect(
      iso(zonedTimeToUtcMs({ year: 2024, month: 7, day: 15, hour: 7, minute: 30, second: 0 }, 'America/Denver')),
    ).toBe('2024-07-15T13:30:00.000Z');
    expect(iso(zonedTimeToUtcMs({ year: 2024, month: 7, day: 15, hour: 7, minute: 30, second: 0 }, 'UTC'))).toBe(
      '2024-07-15T07:30:00.000Z',
    );
  });

  it('a time with its own offset keeps it, whatever zone is chosen', () => {
    const written = readWrittenDate('2024-05-01T07:30:00+02:00');
    expect(written.ok && iso(writtenDateToUtcMs(written.date, 'America/Denver'))).toBe('2024-05-01T05:30:00.000Z');
  });

  const csv = 'lat,lon,ele,time\n46.10000,7.20000,812.4,01.05.2024 07:30\n46.10010,7.20010,811.9,01.05.2024 07:31\n';

  it('a phone CSV with an ambiguous date stops with a clear question naming the line and column', () => {
    const options = SurveyImportOptionsSchema.parse({
      format: 'gps-csv',
      name: 'walk',
      mapping: { latitude: 0, longitude: 1, elevation: 2, time: 3, name: null, accuracy: null },
      elevationUnit: 'm',
    });
    try {
      parseSurveyText(csv, options);
      throw new Error('expected an ambiguous-date error');
    } catch (error) {
      expect(error).toBeInstanceOf(SurveyImportError);
      expect((error as SurveyImportError).code).toBe('ambiguous-date-order');
      expect((error as SurveyImportError).message).toMatch(/day first or month first/);
      expect((error as SurveyImportError).line).toBe(2);
      expect((error as SurveyImportError).column).toBe('time');
    }
  });

  it('with the order and the project zone chosen, the same file gives the same UTC times wherever it is read', () => {
    const options = SurveyImportOptionsSchema.parse({
      format: 'gps-csv',
      name: 'walk',
      mapping: { latitude: 0, longitude: 1, elevation: 2, time: 3, name: null, accuracy: null },
      elevationUnit: 'm',
      timeZone: 'Europe/Vienna',
      dateOrder: 'day-first',
    });
    const survey = parseSurveyText(csv, options);
    // 1 May 2024 07:30 in Vienna (CEST, UTC+2) is 05:30 UTC.
    expect(survey.points.map((p) => p.time)).toEqual(['2024-05-01T05:30:00.000Z', '2024-05-01T05:31:00.000Z']);
  });

  it('refuses a time zone the platform does not know, naming the field', () => {
    const result = SurveyImportOptionsSchema.safeParse({
      format: 'gps-csv',
      name: 'walk',
      mapping: { latitude: 0, longitude: 1, elevation: 2, time: 3, name: null, accuracy: null },
      elevationUnit: 'm',
      timeZone: 'Mars/Olympus',
    });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(['timeZone']);
  });
});

describe('UTC times already in the stored form are kept as written, and only real instants are', () => {
  const place = { column: 'time', field: 'time' };
  it.each([
    ['2026-04-18T06:00:03.000Z', '2026-04-18T06:00:03.000Z'],
    ['2024-02-29T23:59:59.999Z', '2024-02-29T23:59:59.999Z'],
    ['2026-04-18T06:00:03.000+00:00', '2026-04-18T06:00:03.000Z'],
    ['2026-04-18T06:00:03Z', '2026-04-18T06:00:03.000Z'],
  ])('%s reads as %s', (cell, expected) => {
    expect(readTimeCell(cell, place)).toBe(expected);
    const written = readWrittenDate(cell);
    expect(written.ok && new Date(writtenDateToUtcMs(written.date, 'UTC')).toISOString()).toBe(expected);
  });
  it.each(['2026-02-30T06:00:00.000Z', '2026-13-01T06:00:00.000Z', '2026-04-18T25:00:00.000Z'])(
    '%s, a date that does not exist, is refused as before',
    (cell) => {
      expect(() => readTimeCell(cell, place)).toThrow(SurveyImportError);
    },
  );

  it('a cell is taken as its own stored form exactly when the engine reads it back to the same text, at the same instant', () => {
    // The oracle: Date.parse, then toISOString, as the fast path did before it read character codes.
    const roundTrips = (cell: string) => {
      const ms = Date.parse(cell);
      return Number.isFinite(ms) && new Date(ms).toISOString() === cell;
    };
    let state = 20261203;
    const random = (n: number) => {
      state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
      return state % n;
    };
    const two = (n: number) => String(n).padStart(2, '0');
    const cells = ['2024-02-29T00:00:00.000Z', '2023-02-29T00:00:00.000Z', '2000-02-29T12:00:00.000Z'];
    cells.push('1900-02-29T12:00:00.000Z', '0000-01-01T00:00:00.000Z', '0050-06-01T00:00:00.000Z');
    cells.push('2026-04-18T24:00:00.000Z');
    cells.push('2026-04-18T06:60:00.000Z', '2026-04-18T06:00:60.000Z', '2026-04-18 06:00:00.000Z');
    cells.push('2026-04-18T06:00:00,000Z', '+026-04-18T06:00:00.000Z', '2026-04-18T06:00:00.00AZ');
    for (let i = 0; i < 20_000; i++) {
      // Any year of four digits too, so the day count is checked across the 400-year cycles and before year 100.
      const year = String([1999, 2000, 2024, 2026, 2100, 1600, random(10_000)][random(7)]).padStart(4, '0');
      const cell = `${year}-${two(random(14))}-${two(random(33))}T${two(random(26))}:${two(random(62))}:${two(random(62))}.${String(random(1000)).padStart(3, '0')}Z`;
      cells.push(cell);
    }
    let canonical = 0;
    for (const cell of cells) {
      expect(isCanonicalUtcInstant(cell), cell).toBe(roundTrips(cell));
      // Read from its digits, the instant is the engine's own reading of the text.
      if (roundTrips(cell)) expect(utcInstantMs(cell), cell).toBe(Date.parse(cell));
      if (roundTrips(cell)) canonical++;
    }
    // Both kinds are well represented, so agreement is not agreement on "no" alone.
    expect(canonical).toBeGreaterThan(2_000);
    expect(cells.length - canonical).toBeGreaterThan(2_000);
  });

  it('a time in any other form is read by the engine: offsets, no milliseconds', () => {
    for (const cell of ['2026-04-18T06:00:03+02:00', '2026-04-18T06:00:03Z', '2026-04-18T06:00:03.5Z'])
      expect(utcInstantMs(cell)).toBe(Date.parse(cell));
  });
});
