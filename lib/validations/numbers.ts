import { z } from 'zod';

/**
 * Every number the API takes, in one wording: "<Label> must be a number", "must be at least <min>
 * <unit>", "must be at most <max> <unit>", "must be more than 0 <unit>", "must be a whole number".
 * zod's number refuses NaN and ±Infinity, so each of these is finite. Figures are SI (m, m³, m³/s,
 * Pa, m of head); forms convert from the project's units before they send, so "not a number" names
 * no unit (the form's field may be in feet).
 */

/** Longest length or chainage taken, m (1000 km: beyond any line, and keeps sums finite). */
export const MAX_LENGTH_M = 1e6;
/**
 * Lowest and highest ground a survey point or node may stand on, m above sea level (the Dead Sea shore is about -430 m,
 * the highest summit 8,849 m; from memory).
 */
export const MIN_ELEVATION_M = -500;
export const MAX_ELEVATION_M = 9000;

const amount = (value: number, unit: string) => (unit ? `${value} ${unit}` : `${value}`);

/** Any finite number. */
export function finite(label: string) {
  return z.number({ error: `${label} must be a number` });
}

/** A number from `min` to `max` (both included); leave `max` out for no upper bound. */
export function between(label: string, min: number, max?: number, unit = '') {
  const atLeast = finite(label).min(min, `${label} must be at least ${amount(min, unit)}`);
  return max === undefined ? atLeast : atLeast.max(max, `${label} must be at most ${amount(max, unit)}`);
}

/** Zero or more, up to `max` when given. */
export function nonNegative(label: string, max?: number, unit = '') {
  return between(label, 0, max, unit);
}

/** More than zero, up to `max` when given. */
export function positive(label: string, max?: number, unit = '') {
  const above = finite(label).positive(`${label} must be more than ${amount(0, unit)}`);
  return max === undefined ? above : above.max(max, `${label} must be at most ${amount(max, unit)}`);
}

/** A whole number from `min` to `max` (both included); leave `max` out for no upper bound. */
export function whole(label: string, min: number, max?: number, unit = '') {
  return between(label, min, max, unit).int(`${label} must be a whole number`);
}

/** A whole number written in an address's query (`?offset=200`): digits only, then `whole`'s range and words. */
export function wholeInQuery(label: string, min: number, max?: number) {
  return z
    .string()
    .regex(/^\d{1,9}$/, `${label} must be a whole number`)
    .transform(Number)
    .pipe(whole(label, min, max));
}

/** More than zero, at most one (an efficiency, a share). */
export const fraction = (label: string) => positive(label, 1);
/** An hour of the day, 0 to 23. */
export const hourOfDay = (label: string) => whole(label, 0, 23);
/** A level, head or chainage of a line, m, either side of the datum. */
export const metres = (label: string) => between(label, -MAX_LENGTH_M, MAX_LENGTH_M, 'm');
/** A chainage along a route or line, m from its start. */
export const chainage = (label: string) => between(label, 0, MAX_LENGTH_M, 'm');
/** A height of ground above sea level, m. */
export const elevation = (label: string) => between(label, MIN_ELEVATION_M, MAX_ELEVATION_M, 'm');
