import { HydraulicsInputError } from './errors';

/**
 * The core's one set of input guards. Each throws a HydraulicsInputError naming the field (and the
 * row, `index`) in one wording: "must be a finite number", "must be greater than 0", "must not be
 * negative", "must be between <min> and <max> <unit>", "must be a whole number".
 */

/** Throws unless `value` is a finite number (rejects NaN, ±Infinity and non-numbers). */
export function assertFiniteNumber(value: unknown, field: string, index?: number): asserts value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new HydraulicsInputError(field, `must be a finite number, got ${describe(value)}`, index);
  }
}

/** Throws unless `value` is a finite number strictly greater than zero. */
export function assertPositive(value: unknown, field: string, index?: number): asserts value is number {
  assertFiniteNumber(value, field, index);
  if (value <= 0) throw new HydraulicsInputError(field, `must be greater than 0, got ${value}`, index);
}

/** Throws unless `value` is a finite number greater than or equal to zero. */
export function assertNonNegative(value: unknown, field: string, index?: number): asserts value is number {
  assertFiniteNumber(value, field, index);
  if (value < 0) throw new HydraulicsInputError(field, `must not be negative, got ${value}`, index);
}

/** Throws unless `value` is a finite number within [min, max]. */
export function assertInRange(
  value: unknown,
  field: string,
  min: number,
  max: number,
  unit: string,
  index?: number,
): asserts value is number {
  assertFiniteNumber(value, field, index);
  if (value < min || value > max) {
    throw new HydraulicsInputError(field, `must be between ${min} and ${max} ${unit}, got ${value}`, index);
  }
}

/** Throws unless `value` is a whole number, zero or more. */
export function assertNonNegativeInteger(value: unknown, field: string, index?: number): asserts value is number {
  assertNonNegative(value, field, index);
  if (!Number.isInteger(value)) throw new HydraulicsInputError(field, `must be a whole number, got ${value}`, index);
}

/** Throws unless `value` is a whole number, one or more. */
export function assertPositiveInteger(value: unknown, field: string, index?: number): asserts value is number {
  assertPositive(value, field, index);
  if (!Number.isInteger(value)) throw new HydraulicsInputError(field, `must be a whole number, got ${value}`, index);
}

/** A fraction such as an efficiency: greater than 0 and at most 1. */
export function assertFraction(value: unknown, field: string, index?: number): asserts value is number {
  assertPositive(value, field, index);
  if (value > 1) throw new HydraulicsInputError(field, `must be a fraction no greater than 1, got ${value}`, index);
}

/** Latitude in degrees, −90 … 90 inclusive. */
export function assertLatitude(value: unknown, field: string, index?: number): asserts value is number {
  assertInRange(value, field, -90, 90, 'degrees', index);
}

/** Longitude in degrees, −180 … 180 inclusive. */
export function assertLongitude(value: unknown, field: string, index?: number): asserts value is number {
  assertInRange(value, field, -180, 180, 'degrees', index);
}

/** Moving windows need a centre sample, so the width must be an odd integer ≥ 3. */
export function assertOddWindow(value: unknown, field: string): asserts value is number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 3 || value % 2 === 0) {
    throw new HydraulicsInputError(field, `must be an odd whole number of points, 3 or more, got ${describe(value)}`);
  }
}

export function assertArray(value: unknown, field: string): asserts value is readonly unknown[] {
  if (!Array.isArray(value)) throw new HydraulicsInputError(field, 'must be an array');
}

function describe(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (value === null) return 'null';
  return typeof value;
}
