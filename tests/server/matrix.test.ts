import { randomUUID } from 'node:crypto';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { db } from '@/lib/db';
import { ENDPOINTS, EXEMPT, type EndpointCase } from '../api/endpoints';
import { ACTORS, type Actor } from '../support/api';
import {
  apiPath,
  createCast,
  freshFixture,
  markTeam,
  renewSession,
  request,
  type Cast,
  type Fixture,
  type SignedInActor,
} from './cast';
import { discoverRouteHandlers, discoverServerActions } from './discover';
import { changedTables, fingerprint, settle, startWriteLog, stopWriteLog, writesSince } from './fingerprint';
import { callServerAction } from './server-action';
import type { LiveAnswer } from './live';

/**
 * The authorisation matrix against the running app: every route handler method and every server
 * action, as each of seven actors signed in through the real sign-in flow, with the exact status;
 * refused calls write nothing (each call checked on its own against the write log, the whole run
 * against the database fingerprint); every id in the address or in the body swapped for team B's
 * or for one that does not exist answers the same 404; no answer carries anything of team B.
 */

// Cases that end the caller's sessions on purpose: the actor signs in again afterwards.
const SESSION_SPENDING = new Set(['accounts/password/route.ts PUT', 'accounts/sign-out-everywhere/route.ts POST']);
const OWNER = ACTORS.indexOf('owner');

interface Planned {
  label: string;
  actor: Actor;
  method: string;
  path: string;
  body?: unknown;
  upload?: { body: Uint8Array; contentType: string };
  expect: number;
  /** Swapped id key: the B answer and the missing answer must be the same. */
  swap?: { key: string; kind: 'team B' | 'missing' };
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;
type Upload = { body: Uint8Array; contentType: string };

/** Dot paths of every id in a JSON body (`anchor.lineId`, `mentions.0`). */
function idPathsOf(value: unknown, at = ''): string[] {
  if (typeof value === 'string') return UUID.test(value) ? [at] : [];
  if (value === null || typeof value !== 'object') return [];
  return Object.entries(value).flatMap(([k, v]) => idPathsOf(v, at ? `${at}.${k}` : k));
}

const latin1 = (u: Upload) => Buffer.from(u.body).toString('latin1');
/** Field name -> value of every id an upload's form fields carry; ids anywhere else in it under '?'. */
function uploadIdsOf(u: Upload): Record<string, string> {
  const text = latin1(u);
  const found: Record<string, string> = {};
  for (const m of text.matchAll(/name="([^"]+)"\r\n\r\n([0-9a-f-]{36})\r\n/gi))
    if (UUID.test(m[2]!)) found[m[1]!] = m[2]!;
  const all = text.match(/[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi) ?? [];
  if (all.some((id) => !Object.values(found).includes(id))) found['?'] = 'an id outside a form field';
  return found;
}

function idAt(body: unknown, upload: Upload | undefined, path: string): string | undefined {
  if (upload) return uploadIdsOf(upload)[path];
  const value = path
    .split('.')
    .reduce<unknown>((v, k) => (v && typeof v === 'object' ? (v as Record<string, unknown>)[k] : undefined), body);
  return typeof value === 'string' ? value : undefined;
}

/** The body (or upload) with the id at `path` replaced. */
function withIdAt(
  body: unknown,
  upload: Upload | undefined,
  path: string,
  id: string,
): { body?: unknown; upload?: Upload } {
  if (upload) {
    const old = uploadIdsOf(upload)[path]!;
    const text = latin1(upload).replace(`name="${path}"\r\n\r\n${old}\r\n`, `name="${path}"\r\n\r\n${id}\r\n`);
    return { upload: { body: new Uint8Array(Buffer.from(text, 'latin1')), contentType: upload.contentType } };
  }
  const copy = structuredClone(body) as Record<string, unknown>;
  const keys = path.split('.');
  const parent = keys.slice(0, -1).reduce<Record<string, unknown>>((v, k) => v[k] as Record<string, unknown>, copy);
  parent[keys[keys.length - 1]!] = id;
  return { body: copy };
}

let cast: Cast;

function leaksOfB(res: LiveAnswer): string[] {
  return cast.secretsOfB.filter((s) => res.text.includes(s));
}

async function plan(e: EndpointCase, f: Fixture, actor: Actor, label: string, expectStatus: number): Promise<Planned> {
  const params = await e.params(f);
  const body = e.body?.(f, ACTORS.indexOf(actor));
  const upload = e.upload?.(f);
  return { label, actor, method: e.method, path: apiPath(e.file, params), body, upload, expect: expectStatus };
}

async function send(p: Planned): Promise<LiveAnswer> {
  return request(cast, p.actor, { method: p.method, path: p.path, body: p.body, upload: p.upload });
}

function errorShapeOk(res: LiveAnswer): boolean {
  return typeof res.json?.error?.code === 'string' && typeof res.json?.error?.message === 'string';
}

interface CasePlan {
  e: EndpointCase;
  name: string;
  refused: Planned[];
  answers: LiveAnswer[];
  /** What each refused call wrote (the write log after it): must be nothing. */
  writes: string[][];
  swapKeys: string[];
  /** Where the body made for team A carries ids. */
  bodyIdPaths: string[];
}

/** Plans a case's refused calls (as refused actors, and as the owner with each id swapped) on the shared project. */
async function planRefused(e: EndpointCase, shared: Fixture): Promise<Omit<CasePlan, 'name' | 'answers' | 'writes'>> {
  const refused: Planned[] = [];
  for (const actor of ACTORS.filter((a) => e.expect[a] >= 400))
    refused.push(await plan(e, { ...shared }, actor, actor, e.expect[actor]));
  const fa = { ...shared };
  const paramsA = await e.params(fa);
  const bodyA = e.body?.(fa, OWNER);
  const uploadA = e.upload?.(fa);
  const bodyIdPaths = uploadA ? Object.keys(uploadIdsOf(uploadA)) : idPathsOf(bodyA);
  const pathKeys = Object.keys(paramsA);
  const bodyKeys = e.bodyIds ?? [];
  if (pathKeys.length + bodyKeys.length === 0) return { e, refused, swapKeys: [], bodyIdPaths };
  // Team B's own records of the same kinds (params run first: they may make the records the body names).
  const fb = { ...cast.b };
  const paramsB = await e.params(fb);
  const bodyB = e.body?.(fb, OWNER);
  const uploadB = e.upload?.(fb);
  const variants = (a: string | undefined, b: string | undefined, what: string) => {
    if (!b || b === a) throw new Error(`${e.method} ${e.file}: no distinct team B value for ${what}`);
    return [
      { kind: 'team B' as const, value: b },
      { kind: 'missing' as const, value: randomUUID() },
    ];
  };
  for (const key of pathKeys) {
    for (const v of variants(paramsA[key], paramsB[key], `[${key}]`)) {
      refused.push({
        label: `owner with ${key} of ${v.kind}`,
        actor: 'owner',
        method: e.method,
        path: apiPath(e.file, { ...paramsA, [key]: v.value }),
        body: bodyA,
        upload: uploadA,
        expect: 404,
        swap: { key, kind: v.kind },
      });
    }
  }
  // An id in the body: a parent of team A (the address) with a child of team B, or one that does not exist.
  for (const path of bodyKeys) {
    const key = `body ${path}`;
    for (const v of variants(idAt(bodyA, uploadA, path), idAt(bodyB, uploadB, path), key)) {
      refused.push({
        label: `owner with ${key} of ${v.kind}`,
        actor: 'owner',
        method: e.method,
        path: apiPath(e.file, paramsA),
        ...withIdAt(bodyA, uploadA, path, v.value),
        expect: 404,
        swap: { key, kind: v.kind },
      });
    }
  }
  return { e, refused, swapKeys: [...pathKeys, ...bodyKeys.map((p) => `body ${p}`)], bodyIdPaths };
}

// A call that deletes or reshapes its object (a route split, a year's tasks made) needs its own;
// other writes can share one fresh project per case.
const needsOwnFixture = (e: EndpointCase) =>
  e.method === 'DELETE' || /\/(split|trim|reverse|join|cleanup|points|generate)\/route\.ts$/.test(e.file);
describe('authorisation matrix against the running app', () => {
  const plans: CasePlan[] = [];
  let before: Record<string, string> = {};
  let after: Record<string, string> = {};
  let probeWrites: string[] = [];

  // Every refused call of every case runs in one stretch: each call is checked on its own against
  // the write log (one indexed query), the stretch as a whole against two fingerprints of the whole
  // database. The allowed calls come after, each case on its own project.
  beforeAll(async () => {
    cast = await createCast();
    const shared = await freshFixture(cast);
    for (const [n, e] of ENDPOINTS.entries())
      plans.push({ ...(await planRefused(e, shared)), name: `${e.method} ${e.file} (#${n})`, answers: [], writes: [] });
    await markTeam(cast.b.teamId);
    await settle();
    let mark = await startWriteLog();
    // The log must see a write for its silence to mean anything: an update that changes nothing still counts.
    await db().query('UPDATE teams SET name = name WHERE id = :id', { replacements: { id: cast.b.teamId } });
    const probe = await writesSince(mark);
    probeWrites = probe.writes;
    mark = probe.mark;
    before = await fingerprint();
    for (const p of plans) {
      for (const call of p.refused) {
        p.answers.push(await send(call));
        const since = await writesSince(mark);
        p.writes.push(since.writes);
        mark = since.mark;
      }
    }
    after = await fingerprint();
    await stopWriteLog();
  }, 600_000);

  afterAll(async () => {
    await stopWriteLog();
  });

  it('its table names every route handler method the router serves, and nothing that does not exist', () => {
    const served = discoverRouteHandlers();
    const tabled = new Set([...ENDPOINTS.map((e) => `${e.file} ${e.method}`), ...Object.keys(EXEMPT)]);
    expect(served.length).toBeGreaterThan(60);
    expect(
      served.filter((key) => !tabled.has(key)),
      'endpoints missing from the table',
    ).toEqual([]);
    expect(
      [...tabled].filter((key) => !served.includes(key)),
      'table rows with no endpoint',
    ).toEqual([]);
  });

  it('the write log notes a write made while it runs', () => {
    expect(probeWrites).toEqual(['UPDATE teams ×1']);
  });

  it('the refused calls (every refused actor, every swapped and missing id) wrote nothing', () => {
    expect(plans.reduce((n, p) => n + p.refused.length, 0)).toBeGreaterThan(400);
    expect(Object.keys(before).length).toBeGreaterThan(20);
    expect(changedTables(before, after)).toEqual([]);
  });

  it('every id a body carries is swapped for one of team B and a missing one, and every listed one is there', () => {
    const listed = plans.filter((p) => (p.e.bodyIds ?? []).length > 0);
    expect(listed.length).toBeGreaterThan(20);
    expect(listed.reduce((n, p) => n + p.e.bodyIds!.length, 0)).toBeGreaterThan(30);
    for (const p of plans)
      expect([...p.bodyIdPaths].sort(), `${p.name}: ids in its body`).toEqual([...(p.e.bodyIds ?? [])].sort());
  });

  it.each(ENDPOINTS.map((_e, n) => n))(
    'refused: case #%i answers each refused caller and every swapped id exactly',
    (n) => {
      const p = plans[n]!;
      expect(
        p.answers.map((r, i) => `${p.refused[i]!.label}: ${r.status}`),
        p.name,
      ).toEqual(p.refused.map((c) => `${c.label}: ${c.expect}`));
      // Checked per call, so a write names the call that made it.
      expect(
        p.writes.flatMap((w, i) => (w.length ? [`${p.refused[i]!.label}: ${w.join(', ')}`] : [])),
        `${p.name} wrote`,
      ).toEqual([]);
      expect(
        p.answers.filter((r) => !errorShapeOk(r)).map((r) => r.text.slice(0, 200)),
        'every refusal has the one error shape',
      ).toEqual([]);
      expect(p.answers.flatMap(leaksOfB), 'no answer carries team B').toEqual([]);
      // A team B id and an id that does not exist answer alike: nothing tells the caller which.
      for (const key of p.swapKeys) {
        const pair = p.refused.map((c, i) => ({ c, a: p.answers[i]! })).filter(({ c }) => c.swap?.key === key);
        expect(pair).toHaveLength(2);
        expect(pair[0]!.a.json, `${p.name} [${key}] of team B vs missing`).toEqual(pair[1]!.a.json);
      }
    },
  );

  it.each(ENDPOINTS.map((_e, n) => n))('allowed: case #%i answers each allowed caller with its status', async (n) => {
    const e = ENDPOINTS[n]!;
    let fixture: Fixture | undefined;
    for (const actor of ACTORS.filter((a) => e.expect[a] < 400)) {
      if (!fixture || needsOwnFixture(e)) fixture = await freshFixture(cast);
      const p = await plan(e, { ...fixture }, actor, actor, e.expect[actor]);
      const res = await send(p);
      expect(`${actor}: ${res.status}${res.status >= 400 ? ` ${res.text.slice(0, 300)}` : ''}`, plans[n]!.name).toBe(
        `${actor}: ${p.expect}`,
      );
      expect(leaksOfB(res), 'no answer carries team B').toEqual([]);
      if (SESSION_SPENDING.has(`${e.file} ${e.method}`) && actor !== 'anonymous')
        await renewSession(cast, actor as SignedInActor);
    }
  });

  it('next-auth: each actor has its own session, the anonymous caller none', async () => {
    for (const actor of ACTORS) {
      const res = await request(cast, actor, { method: 'GET', path: '/api/auth/session' });
      expect(res.status).toBe(200);
      expect(res.json?.user?.email ?? null).toBe(actor === 'anonymous' ? null : cast.a.users[actor].email);
    }
  });

  it('server actions: every one is exercised here', () => {
    expect(discoverServerActions()).toEqual(['app/actions/select-team.ts selectTeam']);
  });

  it('selectTeam: members switch to their team; others, team B and a missing team are refused alike, nothing written', async () => {
    await settle();
    const before = await fingerprint();
    const outcome: Record<string, string> = {};
    for (const actor of ACTORS)
      outcome[actor] = (
        await callServerAction(cast, actor, 'app/actions/select-team.ts', 'selectTeam', { teamId: cast.a.teamId })
      ).result;
    const toB = await callServerAction(cast, 'owner', 'app/actions/select-team.ts', 'selectTeam', {
      teamId: cast.b.teamId,
    });
    const missing = await callServerAction(cast, 'owner', 'app/actions/select-team.ts', 'selectTeam', {
      teamId: randomUUID(),
    });
    const malformed = await callServerAction(cast, 'owner', 'app/actions/select-team.ts', 'selectTeam', {
      teamId: 'x',
      more: 1,
    });
    expect(await fingerprint()).toEqual(before);
    expect(outcome).toEqual({
      anonymous: 'unauthenticated',
      outsider: 'not_found',
      viewer: 'ok',
      reviewer: 'ok',
      surveyor: 'ok',
      designer: 'ok',
      owner: 'ok',
    });
    expect([toB.status, toB.result, missing.status, missing.result]).toEqual([200, 'not_found', 200, 'not_found']);
    expect(toB.payload).toEqual(missing.payload);
    expect(malformed.result).toBe('bad_request');
    expect(cast.secretsOfB.filter((s) => toB.text.includes(s))).toEqual([]);
  });
});
