'use client';

import { useState } from 'react';
import type { z } from 'zod';
import type { FieldErrors } from '../errors';
import { ApiError } from '../queries/fetch-json';
import type { UnitSystem } from '../units/index';
import { fieldErrorsOf } from '../validations/common';
import { fieldErrorsIn, type FieldWordTable } from '../validations/field-words';

export interface FormNote { text: string; tone: 'ok' | 'error' }

/**
 * One submit path for a form that stays on the page after saving: the same zod schema as the API
 * first (errors beside the fields), then the save and a note that it is saved; an API refusal's
 * field errors land on the same fields.
 */
export function useSaveForm<S extends z.ZodType, R>(
  schema: S,
  save: (input: z.output<S>) => Promise<R>,
  savedText: string | ((saved: R) => string) = 'Saved.',
  /** The screen's names of the fields and the project's units, so a bound reads "at most 29,528 ft", not the schema's metres. */
  words?: { table: FieldWordTable; units: UnitSystem },
) {
  const [fields, setFields] = useState<FieldErrors>({});
  const [note, setNote] = useState<FormNote | null>(null);

  async function submit(raw: unknown): Promise<boolean> {
    const parsed = schema.safeParse(raw);
    if (!parsed.success) {
      setFields(words ? fieldErrorsIn(parsed.error, words.units, words.table) : fieldErrorsOf(parsed.error));
      setNote({ text: 'Check the fields marked.', tone: 'error' });
      return false;
    }
    setFields({});
    try {
      const saved = await save(parsed.data);
      setNote({ text: typeof savedText === 'function' ? savedText(saved) : savedText, tone: 'ok' });
      return true;
    } catch (error) {
      if (error instanceof ApiError) setFields(error.fields ?? {});
      setNote({ text: error instanceof Error ? error.message : 'Not saved.', tone: 'error' });
      return false;
    }
  }

  return { fields, note, submit, clearNote: () => setNote(null) };
}
