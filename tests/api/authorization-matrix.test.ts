import fs from 'node:fs';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { ACTORS, call, createTeamFixture } from '../support/api';
import { ENDPOINTS, EXEMPT } from './endpoints';

const API_DIR = path.resolve(__dirname, '../../app/api');
const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;

function routeFiles(dir = API_DIR): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return routeFiles(full);
    return entry.name === 'route.ts' ? [path.relative(API_DIR, full).split(path.sep).join('/')] : [];
  });
}

async function load(file: string): Promise<Record<string, unknown>> {
  return import(/* @vite-ignore */ path.join(API_DIR, file));
}

describe('authorisation matrix', () => {
  const exported: string[] = [];

  beforeAll(async () => {
    for (const file of routeFiles()) {
      const mod = await load(file);
      for (const method of METHODS) if (typeof mod[method] === 'function') exported.push(`${file} ${method}`);
    }
  });

  it('covers every exported handler of every route file', () => {
    const covered = new Set([...ENDPOINTS.map((e) => `${e.file} ${e.method}`), ...Object.keys(EXEMPT)]);
    expect(exported.length).toBeGreaterThan(10);
    expect(exported.filter((key) => !covered.has(key))).toEqual([]);
  });

  it('lists no endpoint that does not exist', () => {
    const missing = ENDPOINTS.map((e) => `${e.file} ${e.method}`).filter((key) => !exported.includes(key));
    expect(missing).toEqual([]);
  });

  describe.each(ENDPOINTS)('$method $file', (endpoint) => {
    it.each(ACTORS)('as %s', async (actor) => {
      // A fresh team per call, so a delete or a role change by one caller cannot colour the next.
      const fixture = await createTeamFixture();
      const mod = await load(endpoint.file);
      const handler = mod[endpoint.method] as Parameters<typeof call>[0];
      const userId = actor === 'anonymous' ? undefined : fixture.users[actor].id;
      const upload = endpoint.upload?.(fixture);
      const res = await call(handler, {
        method: endpoint.method,
        path: `/api/${endpoint.file}`,
        params: await endpoint.params(fixture),
        body: endpoint.body?.(fixture, ACTORS.indexOf(actor)),
        rawBody: upload?.body,
        headers: upload ? { 'content-type': upload.contentType } : undefined,
        userId,
      });
      expect({ actor, status: res.status, body: res.status >= 400 ? res.json : undefined }).toMatchObject({
        actor,
        status: endpoint.expect[actor],
      });
      if (res.status >= 400)
        expect(res.json.error).toMatchObject({ code: expect.any(String), message: expect.any(String) });
    });
  });
});
