'use client';

import { useState } from 'react';
import type { z } from 'zod';
import type { FieldErrors } from '@/lib/errors';
import { ApiError } from '@/lib/queries/fetch-json';
import { fieldErrorsOf } from '@/lib/validations/common';

export interface FormNote { text: string; tone: 'ok' | 'error' }

/**
 * One submit path for the lift forms: the same zod schema as the API first (errors beside the
 * fields), then the save; an API refusal's field errors land on the same fields.
 */
export function useLiftForm<S extends z.ZodType>(schema: S, save: (input: z.output<S>) => Promise<unknown>, savedText = 'Saved.') {
  const [fields, setFields] = useState<FieldErrors>({});
  const [note, setNote] = useState<FormNote | null>(null);

  async function submit(raw: unknown): Promise<boolean> {
    const parsed = schema.safeParse(raw);
    if (!parsed.success) {
      setFields(fieldErrorsOf(parsed.error));
      setNote({ text: 'Check the fields marked.', tone: 'error' });
      return false;
    }
    setFields({});
    try {
      await save(parsed.data);
      setNote({ text: savedText, tone: 'ok' });
      return true;
    } catch (error) {
      if (error instanceof ApiError) setFields(error.fields ?? {});
      setNote({ text: error instanceof Error ? error.message : 'Not saved.', tone: 'error' });
      return false;
    }
  }

  return { fields, note, submit, clearNote: () => setNote(null) };
}

/** Text typed in a number box -> a number; blank or not a number -> NaN (the schema then names the field). */
export function numberFrom(text: string): number {
  const trimmed = text.trim().replace(/,/g, '');
  return trimmed === '' ? Number.NaN : Number(trimmed);
}

/** Like numberFrom, but a blank box means "not given". */
export function numberOrNull(text: string): number | null {
  return text.trim() === '' ? null : numberFrom(text);
}
