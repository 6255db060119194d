import { HydraulicsInputError } from '../../hydraulics/index';
import type { Outcome } from './records';

/** Runs a computation; a HydraulicsInputError becomes a failed outcome naming the field, anything else is rethrown. */
export function outcomeOf<T>(compute: () => T): Outcome<T> {
  try {
    return { ok: true, value: compute() };
  } catch (error) {
    if (error instanceof HydraulicsInputError) return { ok: false, error: error.message, field: error.field };
    throw error;
  }
}
