import { randomUUID } from 'node:crypto';
import { beforeAll, describe, expect, it } from 'vitest';
import { ENDPOINTS, EXEMPT, type EndpointCase } from '../api/endpoints';
import { ACTORS, type Actor } from '../support/api';
import { apiPath, createCast, freshFixture, markTeam, renewSession, request, type Cast, type Fixture, type SignedInActor } from './cast';
import { discoverRouteHandlers, discoverServerActions } from './discover';
import { changedTables, fingerprint, settle } from './fingerprint';
import { callServerAction } from './server-action';
import type { LiveAnswer } from './live';

/**
 * The authorisation matrix against the running app: every route handler method and every server
 * action, as each of seven actors signed in through the real sign-in flow, with the exact status;
 * refused calls write nothing (database fingerprint); every id in the address swapped for team B's
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
  swapKeys: string[];
}

/** Plans a case's refused calls (as refused actors, and as the owner with each id swapped) on the shared project. */
async function planRefused(e: EndpointCase, shared: Fixture): Promise<Omit<CasePlan, 'name' | 'answers'>> {
  const refused: Planned[] = [];
  for (const actor of ACTORS.filter((a) => e.expect[a] >= 400)) refused.push(await plan(e, { ...shared }, actor, actor, e.expect[actor]));
  const fa = { ...shared };
  const paramsA = await e.params(fa);
  const swapKeys = Object.keys(paramsA);
  if (swapKeys.length > 0) {
    const bodyA = e.body?.(fa, OWNER);
    const uploadA = e.upload?.(fa);
    const paramsB = await e.params({ ...cast.b });
    for (const key of swapKeys) {
      const variants = [
        { kind: 'team B' as const, value: paramsB[key] },
        { kind: 'missing' as const, value: randomUUID() },
      ];
      for (const v of variants) {
        if (!v.value || v.value === paramsA[key]) throw new Error(`${e.method} ${e.file}: no distinct ${v.kind} value for [${key}]`);
        refused.push({
          label: `owner with ${key} of ${v.kind}`, actor: 'owner', method: e.method, path: apiPath(e.file, { ...paramsA, [key]: v.value }),
          body: bodyA, upload: uploadA, expect: 404, swap: { key, kind: v.kind },
        });
      }
    }
  }
  return { e, refused, swapKeys };
}

// A call that deletes or reshapes its object (a route split, a year's tasks made) needs its own;
// other writes can share one fresh project per case.
const needsOwnFixture = (e: EndpointCase) => e.method === 'DELETE' || /\/(split|trim|reverse|join|cleanup|points|generate)\/route\.ts$/.test(e.file);
describe('authorisation matrix against the running app', () => {
  const plans: CasePlan[] = [];
  let before: Record<string, string> = {};
  let after: Record<string, string> = {};

  // Every refused call of every case runs in one stretch between two fingerprints of the whole
  // database (cheaper than two per case); the allowed calls come after, each case on its own project.
  beforeAll(async () => {
    cast = await createCast();
    const shared = await freshFixture(cast);
    for (const [n, e] of ENDPOINTS.entries()) plans.push({ ...(await planRefused(e, shared)), name: `${e.method} ${e.file} (#${n})`, answers: [] });
    await markTeam(cast.b.teamId);
    await settle();
    before = await fingerprint();
    for (const p of plans) for (const call of p.refused) p.answers.push(await send(call));
    after = await fingerprint();
  }, 600_000);

  it('its table names every route handler method the router serves, and nothing that does not exist', () => {
    const served = discoverRouteHandlers();
    const tabled = new Set([...ENDPOINTS.map((e) => `${e.file} ${e.method}`), ...Object.keys(EXEMPT)]);
    expect(served.length).toBeGreaterThan(60);
    expect(served.filter((key) => !tabled.has(key)), 'endpoints missing from the table').toEqual([]);
    expect([...tabled].filter((key) => !served.includes(key)), 'table rows with no endpoint').toEqual([]);
  });

  it('the refused calls (every refused actor, every swapped and missing id) wrote nothing', () => {
    expect(plans.reduce((n, p) => n + p.refused.length, 0)).toBeGreaterThan(300);
    expect(Object.keys(before).length).toBeGreaterThan(20);
    expect(changedTables(before, after)).toEqual([]);
  });

  it.each(ENDPOINTS.map((_e, n) => n))('refused: case #%i answers each refused caller and every swapped id exactly', (n) => {
    const p = plans[n]!;
    expect(p.answers.map((r, i) => `${p.refused[i]!.label}: ${r.status}`), p.name).toEqual(p.refused.map((c) => `${c.label}: ${c.expect}`));
    expect(p.answers.filter((r) => !errorShapeOk(r)).map((r) => r.text.slice(0, 200)), 'every refusal has the one error shape').toEqual([]);
    expect(p.answers.flatMap(leaksOfB), 'no answer carries team B').toEqual([]);
    // A team B id and an id that does not exist answer alike: nothing tells the caller which.
    for (const key of p.swapKeys) {
      const pair = p.refused.map((c, i) => ({ c, a: p.answers[i]! })).filter(({ c }) => c.swap?.key === key);
      expect(pair).toHaveLength(2);
      expect(pair[0]!.a.json, `${p.name} [${key}] of team B vs missing`).toEqual(pair[1]!.a.json);
    }
  });

  it.each(ENDPOINTS.map((_e, n) => n))('allowed: case #%i answers each allowed caller with its status', async (n) => {
    const e = ENDPOINTS[n]!;
    let fixture: Fixture | undefined;
    for (const actor of ACTORS.filter((a) => e.expect[a] < 400)) {
      if (!fixture || needsOwnFixture(e)) fixture = await freshFixture(cast);
      const p = await plan(e, { ...fixture }, actor, actor, e.expect[actor]);
      const res = await send(p);
      expect(`${actor}: ${res.status}${res.status >= 400 ? ` ${res.text.slice(0, 300)}` : ''}`, plans[n]!.name).toBe(`${actor}: ${p.expect}`);
      expect(leaksOfB(res), 'no answer carries team B').toEqual([]);
      if (SESSION_SPENDING.has(`${e.file} ${e.method}`) && actor !== 'anonymous') await renewSession(cast, actor as SignedInActor);
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
    for (const actor of ACTORS) outcome[actor] = (await callServerAction(cast, actor, 'app/actions/select-team.ts', 'selectTeam', { teamId: cast.a.teamId })).result;
    const toB = await callServerAction(cast, 'owner', 'app/actions/select-team.ts', 'selectTeam', { teamId: cast.b.teamId });
    const missing = await callServerAction(cast, 'owner', 'app/actions/select-team.ts', 'selectTeam', { teamId: randomUUID() });
    const malformed = await callServerAction(cast, 'owner', 'app/actions/select-team.ts', 'selectTeam', { teamId: 'x', more: 1 });
    expect(await fingerprint()).toEqual(before);
    expect(outcome).toEqual({ anonymous: 'unauthenticated', outsider: 'not_found', viewer: 'ok', reviewer: 'ok', surveyor: 'ok', designer: 'ok', owner: 'ok' });
    expect([toB.status, toB.result, missing.status, missing.result]).toEqual([200, 'not_found', 200, 'not_found']);
    expect(toB.payload).toEqual(missing.payload);
    expect(malformed.result).toBe('bad_request');
    expect(cast.secretsOfB.filter((s) => toB.text.includes(s))).toEqual([]);
  });

});
