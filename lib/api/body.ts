import type { NextRequest } from 'next/server';
import type { z } from 'zod';
import { env } from '../env';
import { AppError, type FieldErrors } from '../errors';
import { fieldErrorsOf } from '../validations/common';

/**
 * Reads a request body as a stream and stops as soon as it passes `limit` bytes, so a body sent
 * without (or with a false) Content-Length is never buffered whole. A declared length above the
 * limit is refused before reading.
 */
export async function readBodyCapped(req: Request, limit: number, tooLarge: () => AppError): Promise<Uint8Array> {
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > limit) throw tooLarge();
  if (!req.body) return new Uint8Array(0);
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge();
    }
    chunks.push(value);
  }
  const out = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    out.set(c, at);
    at += c.byteLength;
  }
  return out;
}

// A form post from another site cannot send this type without the browser asking first.
function isJsonContentType(type: string | null): boolean {
  const mediaType = (type ?? '').split(';')[0]!.trim().toLowerCase();
  return mediaType === 'application/json' || /^application\/[a-z0-9.+-]{1,60}\+json$/.test(mediaType);
}

/**
 * How a refused body's issues become field errors (`data` is the body as sent): the default names paths and keeps the
 * schema's (SI) messages.
 */
export type FieldsOf = (error: z.ZodError, data: unknown) => FieldErrors;

/** Reads a JSON body with a size cap (413, checked while streaming) and validates it (400 with field errors). */
export async function readJsonBody<S extends z.ZodType>(
  req: NextRequest,
  schema: S,
  maxBytes?: number,
  fieldsOf?: FieldsOf,
): Promise<z.output<S>> {
  const max = maxBytes ?? env().RUNNEL_MAX_JSON_BYTES;
  const bytes = await readBodyCapped(
    req,
    max,
    () => new AppError('payload_too_large', `Request body is larger than ${max} bytes`),
  );
  let raw: string;
  try {
    raw = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new AppError('bad_request', 'Request body is not valid UTF-8 text', { _: ['Send a JSON object in UTF-8'] });
  }

  if (raw.trim() !== '' && !isJsonContentType(req.headers.get('content-type'))) {
    throw new AppError('unsupported_media_type', 'Send the body as JSON with Content-Type: application/json', {
      _: ['Send a JSON object'],
    });
  }
  let data: unknown;
  try {
    data = raw.trim() === '' ? undefined : JSON.parse(raw);
  } catch {
    throw new AppError('bad_request', 'Request body is not valid JSON', { _: ['Send a JSON object'] });
  }
  return parseOrThrow(schema, data, 'Some fields are not valid', fieldsOf);
}

/**
 * A request's query string checked by `schema`: the one way a handler reads its address options (a refusal is a 400
 * naming each bad option, as a body's are).
 */
export function parseQuery<S extends z.ZodType>(
  req: NextRequest,
  schema: S,
  message = 'The address has options that are not valid',
): z.output<S> {
  return parseOrThrow(schema, Object.fromEntries(req.nextUrl.searchParams), message);
}

export function parseOrThrow<S extends z.ZodType>(
  schema: S,
  data: unknown,
  message: string,
  fieldsOf: FieldsOf = fieldErrorsOf,
): z.output<S> {
  const result = schema.safeParse(data);
  if (!result.success) {
    const fields = fieldsOf(result.error, data);
    // With screen words, the message names the first problem too, so a client that shows only the message says what and
    // where.
    const first = fieldsOf === fieldErrorsOf ? undefined : Object.values(fields)[0]?.[0];
    throw new AppError('bad_request', first ? `${message}: ${first}` : message, fields);
  }
  return result.data;
}
