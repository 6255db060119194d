import type { NextRequest } from 'next/server';
import type { z } from 'zod';
import { env } from '../env';
import { AppError } from '../errors';
import { fieldErrorsOf } from '../validations/common';

/** Reads a JSON body with a size cap (413) and validates it (400 with field errors). */
export async function readJsonBody<S extends z.ZodType>(req: NextRequest, schema: S, maxBytes?: number): Promise<z.output<S>> {
  const max = maxBytes ?? env().RUNNEL_MAX_JSON_BYTES;
  const declared = Number(req.headers.get('content-length') ?? '0');
  if (declared > max) throw new AppError('payload_too_large', `Request body is larger than ${max} bytes`);

  const raw = await req.text();
  if (Buffer.byteLength(raw, 'utf8') > max) throw new AppError('payload_too_large', `Request body is larger than ${max} bytes`);

  let data: unknown;
  try {
    data = raw.trim() === '' ? undefined : JSON.parse(raw);
  } catch {
    throw new AppError('bad_request', 'Request body is not valid JSON', { _: ['Send a JSON object'] });
  }
  return parseOrThrow(schema, data, 'Some fields are not valid');
}

export function parseOrThrow<S extends z.ZodType>(schema: S, data: unknown, message: string): z.output<S> {
  const result = schema.safeParse(data);
  if (!result.success) throw new AppError('bad_request', message, fieldErrorsOf(result.error));
  return result.data;
}
