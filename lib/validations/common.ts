import { z } from 'zod';
import type { FieldErrors } from '../errors';

/** Text the database can store as given: no NUL bytes (PostgreSQL rejects them with a 500). */
export function safeText(label: string, max: number) {
  return z
    .string({ error: `${label} must be text` })
    .max(max, `${label} must be at most ${max} characters`)
    .refine((s) => !s.includes('\u0000'), `${label} must not contain NUL characters`);
}

/** A required one-line name: trimmed, 1..max characters. */
export function nameText(label: string, max = 120) {
  return safeText(label, max)
    .transform((s) => s.trim())
    .pipe(z.string().min(1, `${label} is required`));
}

export const uuid = (label: string) => z.uuid({ error: `${label} is not a valid id` });

export const email = z
  .string({ error: 'E-mail must be text' })
  .trim()
  .toLowerCase()
  .max(254, 'E-mail must be at most 254 characters')
  .pipe(z.email({ error: 'Enter a valid e-mail address' }));

/** zod issues -> `{ "field.path": [messages] }` for the API error shape and for forms. */
export function fieldErrorsOf(error: z.ZodError): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of error.issues) {
    const key = issue.path.length > 0 ? issue.path.map(String).join('.') : '_';
    if (issue.code === 'unrecognized_keys') {
      for (const k of issue.keys) (fields[key === '_' ? k : `${key}.${k}`] ??= []).push(`Unknown field "${k}"`);
      continue;
    }
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

/** An IANA time zone name the platform knows, e.g. "America/Denver" or "UTC". */
export const timeZone = z
  .string({ error: 'Time zone must be text' })
  .trim()
  .max(64, 'Time zone must be at most 64 characters')
  .refine((name) => {
    try {
      new Intl.DateTimeFormat('en', { timeZone: name });
      return true;
    } catch {
      return false;
    }
  }, 'Time zone must be a zone name such as America/Denver, Europe/Vienna or UTC');
