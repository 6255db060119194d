import { HydraulicsInputError } from '../../errors';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../../input-guards';

export { assertNonNegative, assertPositive };

/** Throws unless `value` is a finite number (no NaN, no infinity). */
export const assertFinite: (value: unknown, field: string, index?: number) => asserts value is number =
  assertFiniteNumber;

/** Throws unless `value` is undefined or a finite number >= 0. */
export function assertOptionalNonNegative(value: unknown, field: string, index?: number): void {
  if (value !== undefined) assertNonNegative(value, field, index);
}

/** Throws unless `value` is a plain object (not null, not an array). */
export function assertRecord(value: unknown, field: string, index?: number): asserts value is Record<string, unknown> {
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    throw new HydraulicsInputError(field, 'must be an object', index);
  }
}

/** Throws unless `value` is an array. */
export function assertArray(value: unknown, field: string): asserts value is readonly unknown[] {
  if (!Array.isArray(value)) throw new HydraulicsInputError(field, 'must be an array');
}

/** Throws unless `value` is one of `allowed`. */
export function assertOneOf<T extends string>(
  value: unknown,
  allowed: readonly T[],
  field: string,
  index?: number,
): asserts value is T {
  if (typeof value !== 'string' || !(allowed as readonly string[]).includes(value)) {
    throw new HydraulicsInputError(field, `must be one of ${allowed.join(', ')}, got ${String(value)}`, index);
  }
}
