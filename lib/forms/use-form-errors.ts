'use client';

import { useState } from 'react';
import type { z } from 'zod';
import type { FieldErrors } from '../errors';
import { ApiError } from '../queries/fetch-json';
import type { UnitSystem } from '../units/index';
import { fieldErrorsOf } from '../validations/common';
import { fieldErrorsIn, type FieldWordTable } from '../validations/field-words';

/**
 * Errors of one form: `check` validates with the same zod schema the handler uses and shows the
 * field errors at once; `fail` shows a refusal from the API beside the fields it names.
 */
export function useFormErrors(
  /** The screen's names of the fields and the project's units, so a bound reads in feet in a US project. */
  words?: { table: FieldWordTable; units: UnitSystem },
) {
  const [fields, setFields] = useState<FieldErrors>({});
  const [message, setMessage] = useState<string | null>(null);

  function check<S extends z.ZodType>(schema: S, data: unknown): z.output<S> | null {
    const parsed = schema.safeParse(data);
    setMessage(null);
    if (!parsed.success) {
      setFields(words ? fieldErrorsIn(parsed.error, words.units, words.table) : fieldErrorsOf(parsed.error));
      return null;
    }
    setFields({});
    return parsed.data;
  }

  function fail(error: unknown, fallback = 'Not saved. Try again.') {
    if (error instanceof ApiError) {
      setFields(error.fields ?? {});
      setMessage(error.message);
    } else {
      setMessage(fallback);
    }
  }

  return { fields, message, check, fail, setMessage };
}
