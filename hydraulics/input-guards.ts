import { HydraulicsInputError } from './errors';

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

function describe(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (value === null) return 'null';
  return typeof value;
}
