import { HydraulicsInputError } from '../errors';

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;
export const MS_PER_DAY = 86_400_000;

/** Parses a calendar date `YYYY-MM-DD` as UTC midnight; throws on a malformed or impossible date. */
export function parseIsoDate(value: unknown, field: string, index?: number): Date {
  const match = typeof value === 'string' ? ISO_DATE.exec(value) : null;
  if (!match) throw new HydraulicsInputError(field, `must be a date written YYYY-MM-DD, got ${String(value)}`, index);
  const [year, month, day] = [Number(match[1]), Number(match[2]), Number(match[3])];
  const date = new Date(Date.UTC(year, month - 1, day));
  if (date.getUTCFullYear() !== year || date.getUTCMonth() !== month - 1 || date.getUTCDate() !== day) {
    throw new HydraulicsInputError(field, `${String(value)} is not a calendar date`, index);
  }
  return date;
}

/** Formats a UTC date as `YYYY-MM-DD`. */
export function formatIsoDate(date: Date): string {
  return date.toISOString().slice(0, 10);
}

/** Adds whole days to a UTC date. */
export function addDays(date: Date, days: number): Date {
  return new Date(date.getTime() + days * MS_PER_DAY);
}
