import { HydraulicsInputError } from '../errors';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';

/**
 * Guards the demand, ram, storage, yield and seasons modules need beyond the core's shared
 * input-guards.ts: whole numbers and arrays. Each throws a HydraulicsInputError naming field and index.
 */
export { assertFiniteNumber, assertNonNegative, assertPositive };

export function assertNonNegativeInteger(value: unknown, field: string, index?: number): asserts value is number {
  assertNonNegative(value, field, index);
  if (!Number.isInteger(value)) throw new HydraulicsInputError(field, `must be a whole number, got ${value}`, index);
}

export function assertPositiveInteger(value: unknown, field: string, index?: number): asserts value is number {
  assertPositive(value, field, index);
  if (!Number.isInteger(value)) throw new HydraulicsInputError(field, `must be a whole number, got ${value}`, index);
}

/** A fraction such as an efficiency: greater than 0 and at most 1. */
export function assertFraction(value: unknown, field: string, index?: number): asserts value is number {
  assertPositive(value, field, index);
  if (value > 1) throw new HydraulicsInputError(field, `must be a fraction no greater than 1, got ${value}`, index);
}

export function assertArray(value: unknown, field: string): asserts value is readonly unknown[] {
  if (!Array.isArray(value)) throw new HydraulicsInputError(field, 'must be an array');
}
