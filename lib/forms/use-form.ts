'use client';

import { useState } from 'react';
import type { z } from 'zod';
import type { FieldErrors } from '../errors';
import { CHECK_FIELDS_NOTE, checkInput, refusalOf, type FormNote, type FormWords } from './form-state';

export type { FormNote, FormWords };

/** A save the form is bound to: `submit(raw)` checks with `schema`, saves, and says `savedText`. */
export interface FormSave<S extends z.ZodType, R> {
  schema: S;
  save: (input: z.output<S>) => Promise<R>;
  savedText?: string | ((saved: R) => string);
}

/**
 * The one form hook. Every form checks its input with the same zod schema as the API first (errors
 * beside the fields at once), and a refusal from the API lands beside the fields it names, with its
 * message under the form. Bound to a save (`useForm({ schema, save, savedText })`), `submit(raw)`
 * does all of it and says it is saved; unbound, a form runs `check` and `fail` around its own call.
 */
export function useForm<S extends z.ZodType = z.ZodType, R = unknown>(bound?: FormSave<S, R>, words?: FormWords) {
  const [fields, setFields] = useState<FieldErrors>({});
  const [note, setNote] = useState<FormNote | null>(null);

  function check<T extends z.ZodType>(schema: T, data: unknown): z.output<T> | null {
    const checked = checkInput(schema, data, words);
    setNote(null);
    setFields(checked.fields);
    return checked.value;
  }

  function fail(error: unknown, fallback = 'Not saved. Try again.') {
    const refusal = refusalOf(error, fallback);
    setFields(refusal.fields);
    setNote(refusal.note);
  }

  async function submit(raw: unknown): Promise<boolean> {
    if (!bound) throw new Error('useForm: submit needs a bound save');
    const input = check(bound.schema, raw);
    if (input === null) {
      setNote(CHECK_FIELDS_NOTE);
      return false;
    }
    try {
      const saved = await bound.save(input);
      const text = bound.savedText ?? 'Saved.';
      setNote({ text: typeof text === 'function' ? text(saved) : text, tone: 'ok' });
      return true;
    } catch (error) {
      fail(error, error instanceof Error ? error.message : 'Not saved.');
      return false;
    }
  }

  return {
    fields,
    note,
    /** The note's words alone, for forms that show one line of text. */
    message: note?.text ?? null,
    check,
    fail,
    submit,
    /** Marks fields by a rule of the form's own (a name already taken), beside the fields like the schema's. */
    mark: (marked: FieldErrors) => setFields(marked),
    setMessage: (text: string | null) => setNote(text === null ? null : { text, tone: 'error' }),
    clearNote: () => setNote(null),
  };
}
