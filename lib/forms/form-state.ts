import type { z } from 'zod';
import type { UnitSystem } from '../units/index';
import { fieldErrorsIn, type FieldWordTable } from '../validations/field-words';
import type { FieldErrors } from '../errors';
import { ApiError } from '../queries/fetch-json';
import { fieldErrorsOf } from '../validations/common';

/** The line under a form: what was saved, or why not. */
export interface FormNote {
  text: string;
  tone: 'ok' | 'error';
}

/**
 * The screen's names of a form's fields and the project's units, so a bound reads "at most 29,528 ft", not the schema's
 * metres.
 */
export interface FormWords {
  table: FieldWordTable;
  units: UnitSystem;
}

/**
 * What the form's own check (the API's zod schema) makes of the input: the value, or errors beside the fields, worded
 * with `words` when given.
 */
export function checkInput<S extends z.ZodType>(
  schema: S,
  data: unknown,
  words?: FormWords,
): { value: z.output<S> | null; fields: FieldErrors } {
  const parsed = schema.safeParse(data);
  if (parsed.success) return { value: parsed.data, fields: {} };
  return {
    value: null,
    fields: words ? fieldErrorsIn(parsed.error, words.units, words.table) : fieldErrorsOf(parsed.error),
  };
}

/** A refused save: the API's field errors beside the fields and its message under the form, else `fallback`. */
export function refusalOf(error: unknown, fallback: string): { fields: FieldErrors; note: FormNote } {
  if (error instanceof ApiError) return { fields: error.fields ?? {}, note: { text: error.message, tone: 'error' } };
  return { fields: {}, note: { text: fallback, tone: 'error' } };
}

/** Said under a form whose own check found fields to mend. */
export const CHECK_FIELDS_NOTE: FormNote = { text: 'Check the fields marked.', tone: 'error' };
