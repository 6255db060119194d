import { NextRequest } from 'next/server';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { readJsonBody } from '@/lib/api/body';
import { AppError } from '@/lib/errors';

const CHUNK = 64 * 1024;

/** A body of `totalBytes` sent in chunks with no Content-Length; counts how much the server pulled. */
function streamedRequest(totalBytes: number, contentType = 'application/json') {
  let pulled = 0;
  const chunk = new TextEncoder().encode(' '.repeat(CHUNK));
  const body = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (pulled >= totalBytes) return controller.close();
      pulled += chunk.byteLength;
      controller.enqueue(chunk);
    },
  });
  const req = new NextRequest('http://127.0.0.1/api/x', {
    method: 'POST',
    headers: { 'content-type': contentType },
    body,
    duplex: 'half',
  } as never);
  return { req, pulled: () => pulled };
}

const Schema = z.strictObject({ a: z.number() });

async function refusal(work: Promise<unknown>): Promise<AppError> {
  const error = await work.catch((e: unknown) => e);
  expect(error).toBeInstanceOf(AppError);
  return error as AppError;
}

describe('JSON bodies are capped while they stream', () => {
  it('refuses a 30 MB body sent without Content-Length after reading just past a 1 MB cap', async () => {
    const { req, pulled } = streamedRequest(30 * 1024 * 1024);
    const error = await refusal(readJsonBody(req, Schema, 1_000_000));
    expect(error.status).toBe(413);
    expect(pulled()).toBeLessThanOrEqual(1_000_000 + 2 * CHUNK);
  });

  it('refuses a declared length above the cap before reading anything', async () => {
    const req = new NextRequest('http://127.0.0.1/api/x', {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'content-length': '5000000' },
      body: '{"a":1}',
    });
    expect((await refusal(readJsonBody(req, Schema, 1_000_000))).status).toBe(413);
  });

  it('reads a body under the cap that was sent without Content-Length', async () => {
    const body = new ReadableStream<Uint8Array>({
      start(c) {
        c.enqueue(new TextEncoder().encode('{"a":'));
        c.enqueue(new TextEncoder().encode('12}'));
        c.close();
      },
    });
    const req = new NextRequest('http://127.0.0.1/api/x', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body,
      duplex: 'half',
    } as never);
    expect(await readJsonBody(req, Schema, 1000)).toEqual({ a: 12 });
  });

  it('refuses a body that is not JSON by type (415) or not UTF-8 (400)', async () => {
    const asForm = new NextRequest('http://127.0.0.1/api/x', {
      method: 'POST',
      headers: { 'content-type': 'application/x-www-form-urlencoded' },
      body: '{"a":1}',
    });
    expect((await refusal(readJsonBody(asForm, Schema))).status).toBe(415);
    const badBytes = new NextRequest('http://127.0.0.1/api/x', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: new Uint8Array([0x7b, 0xff, 0xfe, 0x7d]),
    });
    expect((await refusal(readJsonBody(badBytes, Schema))).status).toBe(400);
  });
});
