import { HydraulicsInputError } from '../errors';

export type Hemisphere = 'north' | 'south';
export type Season = 'spring' | 'summer' | 'autumn' | 'winter';

const MONTH_DAY = /^(\d{2})-(\d{2})$/;
const DAYS_IN_MONTH_LEAP = [31, 29, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

/** Parses `MM-DD` (a date that recurs every year); 02-29 is allowed and falls on 02-28 in other years. */
export function parseMonthDay(value: unknown, field: string): { month: number; day: number } {
  const match = typeof value === 'string' ? MONTH_DAY.exec(value) : null;
  if (!match) throw new HydraulicsInputError(field, `must be a month and day written MM-DD, got ${String(value)}`);
  const month = Number(match[1]);
  const day = Number(match[2]);
  if (month < 1 || month > 12 || day < 1 || day > DAYS_IN_MONTH_LEAP[month - 1]) {
    throw new HydraulicsInputError(field, `${value} is not a day of the year`);
  }
  return { month, day };
}

function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

/** The UTC date of a month-day in a year. */
export function dateInYear(year: number, { month, day }: { month: number; day: number }): Date {
  const clampedDay = month === 2 && day === 29 && !isLeapYear(year) ? 28 : day;
  return new Date(Date.UTC(year, month - 1, clampedDay));
}

/** First month (1-12) of each meteorological season. */
const SEASON_START_MONTH: Record<Hemisphere, Record<Season, number>> = {
  north: { spring: 3, summer: 6, autumn: 9, winter: 12 },
  south: { spring: 9, summer: 12, autumn: 3, winter: 6 },
};

/** First day of a meteorological season in a year. */
export function seasonStart(year: number, hemisphere: Hemisphere, season: Season): Date {
  return new Date(Date.UTC(year, SEASON_START_MONTH[hemisphere][season] - 1, 1));
}

/** Months in which a first frost is usual for the hemisphere (autumn and early winter, with a margin). */
export function isUsualFirstFrostMonth(hemisphere: Hemisphere, month: number): boolean {
  return hemisphere === 'north' ? month >= 8 || month === 1 : month >= 2 && month <= 7;
}
