import { HydraulicsInputError } from '../errors';

/** Throws unless `value` is a finite number (rejects NaN, ±Infinity and non-numbers). */
export function assertFiniteNumber(value: unknown, field: string, index?: number): asserts value is number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new HydraulicsInputError(field, `must be a finite number, got ${String(value)}`, index);
  }
}

/** Latitude in degrees, −90 … 90 inclusive. */
export function assertLatitude(value: unknown, field: string, index?: number): asserts value is number {
  assertFiniteNumber(value, field, index);
  if (value < -90 || value > 90) {
    throw new HydraulicsInputError(field, `latitude must be between -90 and 90 degrees, got ${value}`, index);
  }
}

/** Longitude in degrees, −180 … 180 inclusive. */
export function assertLongitude(value: unknown, field: string, index?: number): asserts value is number {
  assertFiniteNumber(value, field, index);
  if (value < -180 || value > 180) {
    throw new HydraulicsInputError(field, `longitude must be between -180 and 180 degrees, got ${value}`, index);
  }
}

export function assertNonNegative(value: unknown, field: string, index?: number): asserts value is number {
  assertFiniteNumber(value, field, index);
  if (value < 0) throw new HydraulicsInputError(field, `must not be negative, got ${value}`, index);
}

export function assertPositive(value: unknown, field: string, index?: number): asserts value is number {
  assertFiniteNumber(value, field, index);
  if (value <= 0) throw new HydraulicsInputError(field, `must be greater than zero, got ${value}`, index);
}

/** Moving windows need a centre sample, so the width must be an odd integer ≥ 3. */
export function assertOddWindow(value: unknown, field: string): asserts value is number {
  if (typeof value !== 'number' || !Number.isInteger(value) || value < 3 || value % 2 === 0) {
    throw new HydraulicsInputError(field, `must be an odd whole number of points, 3 or more, got ${String(value)}`);
  }
}
