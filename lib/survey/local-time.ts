/**
 * Wall-clock times in a time zone, and dates in either order. A time written without an offset
 * means nothing until its zone is known: the browser's preview and the server's import must read
 * it in the same zone (the project's), never in the machine's own.
 */

/** Minutes the zone is ahead of UTC at an instant. */
function zoneOffsetMinutes(timeZone: string, utcMs: number): number {
  const parts = new Intl.DateTimeFormat('en-US', {
    timeZone,
    hourCycle: 'h23',
    year: 'numeric',
    month: '2-digit',
    day: '2-digit',
    hour: '2-digit',
    minute: '2-digit',
    second: '2-digit',
  }).formatToParts(new Date(utcMs));
  const get = (type: string) => Number(parts.find((p) => p.type === type)?.value);
  const asUtc = Date.UTC(get('year'), get('month') - 1, get('day'), get('hour'), get('minute'), get('second'));
  return Math.round((asUtc - Math.floor(utcMs / 1000) * 1000) / 60_000);
}

/** The UTC instant (ms) of a wall-clock time in `timeZone` (two passes settle a daylight-saving change). */
export function zonedTimeToUtcMs(
  fields: { year: number; month: number; day: number; hour: number; minute: number; second: number },
  timeZone: string,
): number {
  const wall =
    Date.UTC(fields.year, fields.month - 1, fields.day, fields.hour, fields.minute, 0) + fields.second * 1000;
  let utc = wall - zoneOffsetMinutes(timeZone, wall) * 60_000;
  utc = wall - zoneOffsetMinutes(timeZone, utc) * 60_000;
  return utc;
}

export type DateOrder = 'day-first' | 'month-first';

export interface WrittenDate {
  year: number;
  month: number;
  day: number;
  hour: number;
  minute: number;
  second: number;
  /** Offset written in the text, minutes ahead of UTC; undefined when none was written. */
  offsetMinutes?: number;
}

export type DateReading = { ok: true; date: WrittenDate } | { ok: false; reason: 'ambiguous-order' | 'unreadable' };

const TIME = String.raw`(?:[T ](\d{1,2}):(\d{2})(?::(\d{2})(?:[.,](\d+))?)?)?`;
const OFFSET = String.raw`\s*(Z|[+-]\d{2}:?\d{2})?`;
const ISO = new RegExp(String.raw`^(\d{4})-(\d{1,2})-(\d{1,2})${TIME}${OFFSET}$`, 'i');
const NUMERIC = new RegExp(String.raw`^(\d{1,2})([./-])(\d{1,2})\2(\d{4})${TIME}${OFFSET}$`, 'i');

function offsetOf(text: string | undefined): number | undefined {
  if (text === undefined) return undefined;
  if (text.toUpperCase() === 'Z') return 0;
  const sign = text.startsWith('-') ? -1 : 1;
  const digits = text.slice(1).replace(':', '');
  return sign * (Number(digits.slice(0, 2)) * 60 + Number(digits.slice(2, 4)));
}

// Built as one literal (no spread) and checked without a Date: this runs once per fix of a 100,000-point walk.
function withTime(year: number, month: number, day: number, m: RegExpExecArray, at: number): WrittenDate {
  const fraction = m[at + 3] ? Number(`0.${m[at + 3]}`) : 0;
  return {
    year,
    month,
    day,
    hour: Number(m[at] ?? 0),
    minute: Number(m[at + 1] ?? 0),
    second: Number(m[at + 2] ?? 0) + fraction,
    offsetMinutes: offsetOf(m[at + 4]),
  };
}

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** Days in a month of the (proleptic) Gregorian calendar. */
function gregorianDaysInMonth(year: number, month: number): number {
  const leap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  return month === 2 && leap ? 29 : DAYS_IN_MONTH[month - 1];
}

/** Days in a month as Date.UTC counts them (years 0-99 taken as 1900-1999, as Date.UTC takes them). */
function daysInMonth(written: number, month: number): number {
  return gregorianDaysInMonth(written >= 0 && written <= 99 ? 1900 + written : written, month);
}

/** `YYYY-MM-DDTHH:MM:SS.sssZ`: where its separators stand, and their character codes (- - T : : . Z). */
const ISO_INSTANT_MARK_AT = Int32Array.of(4, 7, 10, 13, 16, 19, 23);
const ISO_INSTANT_MARK_CODE = Int32Array.of(45, 45, 84, 58, 58, 46, 90);

/** Digits of `text` from `from` to `to` (exclusive) as a number, or -1 when any is not a digit. */
function digitsAt(text: string, from: number, to: number): number {
  let value = 0;
  for (let i = from; i < to; i++) {
    const digit = text.charCodeAt(i) - 48;
    if (digit < 0 || digit > 9) return -1;
    value = value * 10 + digit;
  }
  return value;
}

/**
 * Days from 1970-01-01 to a day of the proleptic Gregorian calendar, in whole numbers: whole 400-year cycles of
 * 146,097 days, then years of the cycle counted from 1 March so the leap day falls last. Any year, no Date; the tests
 * hold it to the engine's own reading of 20,000 generated times.
 */
function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yearOfEra = y - era * 400;
  const dayOfYear = Math.floor((153 * (month > 2 ? month - 3 : month + 9) + 2) / 5) + day - 1;
  const dayOfEra = yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  // 719,468 days run from 0000-03-01, where the cycles are counted from, to 1970-01-01.
  return era * 146097 + dayOfEra - 719468;
}

/**
 * Milliseconds since the Unix epoch of an instant written exactly as `Date.prototype.toISOString` writes it
 * (`2024-05-01T07:30:00.000Z`, a real day of a real month, hours 00-23), or NaN for any other text. Read once, with
 * character codes and whole numbers, not `Date`: the engine's reader accepts 30 February and 24:00, and each fix's
 * time is checked or read four times on its way from the file to the database.
 */
export function canonicalInstantMs(text: string): number {
  if (text.length !== 24) return Number.NaN;
  for (let i = 0; i < ISO_INSTANT_MARK_AT.length; i++) {
    if (text.charCodeAt(ISO_INSTANT_MARK_AT[i]) !== ISO_INSTANT_MARK_CODE[i]) return Number.NaN;
  }
  const year = digitsAt(text, 0, 4);
  const month = digitsAt(text, 5, 7);
  const day = digitsAt(text, 8, 10);
  const hour = digitsAt(text, 11, 13);
  const minute = digitsAt(text, 14, 16);
  const second = digitsAt(text, 17, 19);
  const millisecond = digitsAt(text, 20, 23);
  const inRange =
    year >= 0 &&
    millisecond >= 0 &&
    month >= 1 &&
    month <= 12 &&
    day >= 1 &&
    day <= gregorianDaysInMonth(year, month) &&
    hour >= 0 &&
    hour <= 23 &&
    minute >= 0 &&
    minute <= 59 &&
    second >= 0 &&
    second <= 59;
  if (!inRange) return Number.NaN;
  return ((daysFromCivil(year, month, day) * 24 + hour) * 60 + minute) * 60_000 + second * 1000 + millisecond;
}

/** True when `text` is an instant in the stored form (see `canonicalInstantMs`): such a cell is its own stored form. */
export function isCanonicalUtcInstant(text: string): boolean {
  return !Number.isNaN(canonicalInstantMs(text));
}

/**
 * Milliseconds since the Unix epoch of an instant in the stored form, read from its digits; any other text goes to
 * `Date.parse`.
 */
export function utcInstantMs(text: string): number {
  const ms = canonicalInstantMs(text);
  return Number.isNaN(ms) ? Date.parse(text) : ms;
}

function valid(d: WrittenDate): boolean {
  return (
    d.month >= 1 &&
    d.month <= 12 &&
    d.day >= 1 &&
    d.day <= daysInMonth(d.year, d.month) &&
    d.hour <= 23 &&
    d.minute <= 59 &&
    d.second < 61
  );
}

/**
 * Reads `2024-05-01 07:30`, `2024-05-01T07:30:00+02:00`, `01.05.2024 07:30` or `05/01/2024`. A date
 * whose first two numbers could each be the month (both 12 or less) needs `order`, or it is
 * reported as ambiguous so the import can ask; one that cannot be a month decides by itself.
 */
export function readWrittenDate(text: string, order?: DateOrder): DateReading {
  const iso = ISO.exec(text);
  if (iso) {
    const d = withTime(Number(iso[1]), Number(iso[2]), Number(iso[3]), iso, 4);
    return valid(d) ? { ok: true, date: d } : { ok: false, reason: 'unreadable' };
  }
  const num = NUMERIC.exec(text);
  if (!num) return { ok: false, reason: 'unreadable' };
  const a = Number(num[1]);
  const b = Number(num[3]);
  const decided: DateOrder | undefined = a > 12 ? 'day-first' : b > 12 ? 'month-first' : a === b ? 'day-first' : order;
  if (!decided) return { ok: false, reason: 'ambiguous-order' };
  const [day, month] = decided === 'day-first' ? [a, b] : [b, a];
  const d = withTime(Number(num[4]), month, day, num, 5);
  return valid(d) ? { ok: true, date: d } : { ok: false, reason: 'unreadable' };
}

/** The UTC instant of a written date: its own offset if it has one, else the given zone's wall clock. */
export function writtenDateToUtcMs(date: WrittenDate, timeZone: string): number {
  if (date.offsetMinutes !== undefined) {
    return (
      Date.UTC(date.year, date.month - 1, date.day, date.hour, date.minute, 0) +
      date.second * 1000 -
      date.offsetMinutes * 60_000
    );
  }
  return zonedTimeToUtcMs(date, timeZone);
}
