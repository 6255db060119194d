import type { z } from 'zod';
import type { FieldErrors } from '../errors';
import { ApiError } from '../queries/fetch-json';
import { fieldErrorsOf } from '../validations/common';

/** The line under a form: what was saved, or why not. */
export interface FormNote {
  text: string;
  tone: 'ok' | 'error';
}

/** What the form's own check (the API's zod schema) makes of the input: the value, or errors beside the fields. */
export function checkInput<S extends z.ZodType>(schema: S, data: unknown): { value: z.output<S> | null; fields: FieldErrors } {
  const parsed = schema.safeParse(data);
  return parsed.success ? { value: parsed.data, fields: {} } : { value: null, fields: fieldErrorsOf(parsed.error) };
}

/** A refused save: the API's field errors beside the fields and its message under the form, else `fallback`. */
export function refusalOf(error: unknown, fallback: string): { fields: FieldErrors; note: FormNote } {
  if (error instanceof ApiError) return { fields: error.fields ?? {}, note: { text: error.message, tone: 'error' } };
  return { fields: {}, note: { text: fallback, tone: 'error' } };
}

/** Said under a form whose own check found fields to mend. */
export const CHECK_FIELDS_NOTE: FormNote = { text: 'Check the fields marked.', tone: 'error' };
