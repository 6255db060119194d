import { randomUUID } from 'node:crypto';
import fs from 'node:fs';
import { QueryTypes } from 'sequelize';
import { beforeAll, describe, expect, it } from 'vitest';
import { newLinkToken } from '@/lib/auth/tokens';
import { projectStoragePrefix } from '@/lib/data/project-files';
import { db } from '@/lib/db';
import { listKeys } from '@/lib/storage';
import { models } from '@/models';
import { ENDPOINTS, type EndpointCase } from '../api/endpoints';
import { createInvitationToken } from '../support/account-fixtures';
import { ACTORS, type Actor } from '../support/api';
import { createPhotoFixture, photoUpload, PLAIN_PNG } from '../support/photo-fixtures';
import { apiPath, createCast, freshFixture, request, type Cast, type Fixture } from './cast';
import { changedTables, fingerprint, settle } from './fingerprint';
import { STORAGE_FAULTS_FILE } from './global-setup';
import { live, type LiveAnswer } from './live';

/**
 * Faults and races against the running app. A fault is a trigger that fails the statement one
 * step of a write makes (every table the write touches, so its first, middle and last steps), or a
 * backend killed while the write's transaction is open: the database and the object store must
 * look exactly as before. Races: one stale version among 20 updates, two owners demoting each
 * other, one address signing up twice at once.
 */

let cast: Cast;

function endpoint(file: string, method: EndpointCase['method']): EndpointCase {
  const e = ENDPOINTS.find((c) => c.file === file && c.method === method);
  if (!e) throw new Error(`no table row for ${method} ${file}`);
  return e;
}

/** Makes what the call needs (its params may create rows), and returns the call to make later. */
async function prepareCall(e: EndpointCase, f: Fixture, actor: Actor): Promise<() => Promise<LiveAnswer>> {
  const params = await e.params(f);
  const input = {
    method: e.method,
    path: apiPath(e.file, params),
    body: e.body?.(f, ACTORS.indexOf(actor)),
    upload: e.upload?.(f),
  };
  return () => request(cast, actor, input);
}

async function callCase(e: EndpointCase, f: Fixture, actor: Actor): Promise<LiveAnswer> {
  return (await prepareCall(e, f, actor))();
}

const storedKeys = async (f: Fixture) => (await listKeys(projectStoragePrefix(f.projectId))).sort();

const FAULT_FUNCTION = `CREATE OR REPLACE FUNCTION runnel_test_fault() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN RAISE EXCEPTION 'injected fault on %', TG_TABLE_NAME; END $$`;
const SLOW_FUNCTION = `CREATE OR REPLACE FUNCTION runnel_test_stall() RETURNS trigger LANGUAGE plpgsql AS $$
  BEGIN PERFORM pg_sleep(20); RETURN NULL; END $$`;

async function withTrigger<T>(
  table: string,
  fn: 'runnel_test_fault' | 'runnel_test_stall',
  run: () => Promise<T>,
): Promise<T> {
  const quoted = table.includes('.') ? table : `"${table}"`;
  await db().query(
    `CREATE TRIGGER runnel_test_trigger BEFORE INSERT OR UPDATE OR DELETE ON ${quoted} FOR EACH STATEMENT EXECUTE FUNCTION ${fn}()`,
  );
  try {
    return await run();
  } finally {
    await db().query(`DROP TRIGGER IF EXISTS runnel_test_trigger ON ${quoted}`);
  }
}

interface MultiStepWrite {
  name: string;
  e: EndpointCase;
  actor: Actor;
  /** Tables a write touches outside the public schema (the job queue). */
  alsoTouches?: string[];
  /**
   * The steps to fail when the write touches many tables (a project delete cascades through all
   * of them): the first statement, one cascade in the middle, the job queued last.
   */
  steps?: string[];
}

const WRITES: MultiStepWrite[] = [
  { name: 'survey import', e: endpoint('projects/[projectId]/routes/import/route.ts', 'POST'), actor: 'surveyor' },
  { name: 'route clean-up', e: endpoint('routes/[routeId]/cleanup/route.ts', 'POST'), actor: 'surveyor' },
  { name: 'revision', e: endpoint('projects/[projectId]/revisions/route.ts', 'POST'), actor: 'designer' },
  {
    name: 'member change (invitation accepted as a new account)',
    e: endpoint('invitations/accept/route.ts', 'POST'),
    actor: 'anonymous',
  },
  {
    name: 'project delete',
    e: endpoint('projects/[projectId]/route.ts', 'DELETE'),
    actor: 'owner',
    alsoTouches: ['graphile_worker._private_jobs'],
    steps: ['projects', 'route_points', 'attachments', 'graphile_worker._private_jobs'],
  },
];

describe('faults and races against the running app', () => {
  beforeAll(async () => {
    cast = await createCast();
    await db().query(FAULT_FUNCTION);
    await db().query(SLOW_FUNCTION);
  }, 120_000);

  describe.each(WRITES)('$name: a fault at every step leaves no partial rows and no orphan files', (w) => {
    it('every table it writes, failed in turn', async () => {
      // Which tables the write touches, from one successful run.
      const probe = await prepareCall(w.e, await freshFixture(cast), w.actor);
      await settle();
      const p0 = await fingerprint();
      const ok = await probe();
      expect(ok.status, ok.text.slice(0, 200)).toBeLessThan(300);
      const all = [...changedTables(p0, await fingerprint()), ...(w.alsoTouches ?? [])];
      expect(all.length).toBeGreaterThan(1);
      for (const step of w.steps ?? []) expect(all).toContain(step);
      const touched = w.steps ?? all;

      const outcomes: Record<string, string> = {};
      for (const table of touched) {
        const f = await freshFixture(cast);
        if (w.name === 'project delete') await createPhotoFixture(f.projectId, f.users.surveyor.id);
        const call = await prepareCall(w.e, f, w.actor);
        await settle();
        const before = await fingerprint();
        const keysBefore = await storedKeys(f);
        const res = await withTrigger(table, 'runnel_test_fault', call);
        await settle();
        const changed = changedTables(before, await fingerprint());
        const keysAfter = await storedKeys(f);
        outcomes[table] =
          `${res.status >= 400 ? 'refused' : `answered ${res.status}`}, changed: [${changed.join(', ')}], files ${keysAfter.length === keysBefore.length && keysAfter.every((k, i) => k === keysBefore[i]) ? 'unchanged' : 'CHANGED'}`;
        if (res.status >= 400) expect(res.json?.error?.code).toEqual(expect.any(String));
      }
      expect(outcomes).toEqual(Object.fromEntries(touched.map((t) => [t, 'refused, changed: [], files unchanged'])));
    }, 300_000);
  });

  it('a database backend killed in the middle of an import: no rows, no file', async () => {
    const f = await freshFixture(cast);
    await settle();
    const before = await fingerprint();
    const keysBefore = await storedKeys(f);
    const res = await withTrigger('route_points', 'runnel_test_stall', async () => {
      const pending = callCase(endpoint('projects/[projectId]/routes/import/route.ts', 'POST'), f, 'surveyor');
      let killed = 0;
      for (let i = 0; i < 200 && killed === 0; i++) {
        await new Promise((r) => setTimeout(r, 100));
        const rows = await db().query<{ killed: boolean }>(
          `SELECT pg_terminate_backend(pid) AS killed FROM pg_stat_activity WHERE pid <> pg_backend_pid() AND wait_event = 'PgSleep' AND query ILIKE '%route_points%'`,
          { type: QueryTypes.SELECT },
        );
        killed = rows.filter((r) => r.killed).length;
      }
      expect(killed).toBe(1);
      return pending;
    });
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).not.toBe(500);
    await settle();
    expect(changedTables(before, await fingerprint())).toEqual([]);
    expect(await storedKeys(f)).toEqual(keysBefore);
    // The app carries on: the next import of the same file succeeds.
    expect(
      (await callCase(endpoint('projects/[projectId]/routes/import/route.ts', 'POST'), f, 'surveyor')).status,
    ).toBe(201);
  }, 120_000);

  it('20 parallel saves of a line from one version: 1 succeeds, 19 answer 409', async () => {
    const f = await freshFixture(cast);
    const line = await models().Line.findByPk(f.lineId);
    const base = line!.revision;
    const saves = await Promise.all(
      Array.from({ length: 20 }, (_, i) =>
        request(cast, 'designer', {
          method: 'PATCH',
          path: `/api/lines/${f.lineId}`,
          body: { notes: `Save ${i}`, baseRevision: base },
        }),
      ),
    );
    const statuses = saves.map((s) => s.status).sort();
    expect(statuses).toEqual([200, ...Array(19).fill(409)]);
    for (const s of saves.filter((r) => r.status === 409)) expect(s.json.error.code).toBe('conflict');
    expect((await models().Line.findByPk(f.lineId))!.revision).toBe(base + 1);
  });

  it('two owners demoting each other at once: one 200, the other refused (409, or 403 once demoted), and the team keeps an owner', async () => {
    const f = await freshFixture(cast);
    const { Membership, Team } = models();
    const team = await Team.create({ name: 'Two owners' });
    const [a, b] = [f.users.owner, f.users.designer];
    await Membership.bulkCreate([
      { teamId: team.id, userId: a.id, role: 'owner' },
      { teamId: team.id, userId: b.id, role: 'owner' },
    ]);
    for (let round = 0; round < 3; round++) {
      await Membership.update({ role: 'owner' }, { where: { teamId: team.id } });
      const demote = (by: 'owner' | 'designer', target: string) =>
        request(cast, by, {
          method: 'PATCH',
          path: `/api/teams/${team.id}/members/${target}`,
          body: { role: 'designer' },
        });
      const answers = await Promise.all([demote('owner', b.id), demote('designer', a.id)]);
      // The loser is refused either way: 409 when both passed the role check and met at the lock,
      // 403 when the winner had already demoted it by the time its own role was read.
      const [first, second] = answers.map((r) => r.status).sort();
      expect(first).toBe(200);
      expect([403, 409]).toContain(second);
      expect(await Membership.count({ where: { teamId: team.id, role: 'owner' } })).toBe(1);
    }
  });

  it('one address signing up many times at once: every answer 202, never a server error', async () => {
    const email = `race-${randomUUID().slice(0, 8)}@fixture.test`;
    const answers = await Promise.all(
      Array.from({ length: 8 }, () =>
        live('/api/accounts', {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ name: 'Race', email, password: 'a long enough passphrase' }),
        }),
      ),
    );
    expect(answers.map((r) => r.status)).toEqual(Array(8).fill(202));
  });

  it('two pending sign-ups of one address confirmed at once: one account, the other link refused (no 500)', async () => {
    const email = `race-${randomUUID().slice(0, 8)}@fixture.test`;
    const tokens: string[] = [];
    for (let i = 0; i < 4; i++) {
      const { token, hash } = newLinkToken();
      await models().AccountToken.create({
        purpose: 'sign-up',
        email,
        userId: null,
        name: 'Race',
        passwordHash: 'x',
        tokenHash: hash,
        expiresAt: new Date(Date.now() + 3_600_000),
      });
      tokens.push(token);
    }
    const answers = await Promise.all(
      tokens.map((token) =>
        live('/api/accounts/confirm', {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ token }),
        }),
      ),
    );
    const statuses = answers.map((r) => r.status).sort();
    expect(statuses.filter((s) => s === 200)).toHaveLength(1);
    expect(statuses.filter((s) => s >= 500)).toEqual([]);
    expect(await models().User.count({ where: { email } })).toBe(1);
  });

  it('invitations to one new address accepted at once as new accounts: one account, the others 409', async () => {
    const email = `race-${randomUUID().slice(0, 8)}@fixture.test`;
    const tokens: string[] = [];
    for (let i = 0; i < 4; i++) {
      const team = await models().Team.create({ name: `Inviting ${i}` });
      tokens.push((await createInvitationToken(team.id, email, 'viewer', null)).token);
    }
    const answers = await Promise.all(
      tokens.map((token) =>
        live('/api/invitations/accept', {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: JSON.stringify({ token, name: 'Race', password: 'a long enough passphrase' }),
        }),
      ),
    );
    expect(answers.map((r) => r.status).sort()).toEqual([200, 409, 409, 409]);
    expect(await models().User.count({ where: { email } })).toBe(1);
  });

  it('deleting a project removes its stored files (survey files and photos)', async () => {
    const f = await freshFixture(cast);
    await createPhotoFixture(f.projectId, f.users.surveyor.id);
    expect((await storedKeys(f)).length).toBeGreaterThanOrEqual(4);
    const res = await request(cast, 'owner', { method: 'DELETE', path: `/api/projects/${f.projectId}` });
    expect(res.status).toBe(204);
    const deadline = Date.now() + 30_000;
    let left = await storedKeys(f);
    while (left.length > 0 && Date.now() < deadline) {
      await new Promise((r) => setTimeout(r, 250));
      left = await storedKeys(f);
    }
    expect(left).toEqual([]);
    expect(await models().Attachment.count({ where: { projectId: f.projectId } })).toBe(0);
  });

  describe('object storage failing at the first, middle and last step of each write that stores or removes files', () => {
    /**
     * Fails the nth storage call of kind `op` on a key containing `match` (lib/storage-faults.ts), while `run` runs.
     */
    async function withStorageFault<T>(
      plan: { match: string; op: 'put' | 'delete' | 'list'; nth: number },
      run: () => Promise<T>,
    ): Promise<T> {
      fs.writeFileSync(STORAGE_FAULTS_FILE, JSON.stringify(plan));
      try {
        return await run();
      } finally {
        fs.rmSync(STORAGE_FAULTS_FILE, { force: true });
      }
    }

    /** Waits (the job queue retries with back-off) until the keys under `prefix` are exactly `want`. */
    async function keysBecome(prefix: string, want: string[], ms = 40_000): Promise<string[]> {
      const deadline = Date.now() + ms;
      let keys = (await listKeys(prefix)).sort();
      while (JSON.stringify(keys) !== JSON.stringify(want) && Date.now() < deadline) {
        await new Promise((r) => setTimeout(r, 250));
        keys = (await listKeys(prefix)).sort();
      }
      return keys;
    }

    const photoPost = (f: Fixture) =>
      request(cast, 'surveyor', {
        method: 'POST',
        path: `/api/projects/${f.projectId}/photos`,
        upload: photoUpload(PLAIN_PNG, 'gate.png', { caption: 'Gate' }, 'image/png'),
      });

    // A photo upload stores the image, then the thumbnail, then writes its row.
    it.each([
      ['first (the image)', { op: 'put' as const, nth: 1 }],
      ['middle (the thumbnail)', { op: 'put' as const, nth: 2 }],
    ])('photo upload, store failing at the %s step: 503 with Retry-After, no row, no file', async (_step, fault) => {
      const f = await freshFixture(cast);
      await settle();
      const before = await fingerprint();
      const keysBefore = await storedKeys(f);
      const res = await withStorageFault({ match: `projects/${f.projectId}/photos/`, ...fault }, () => photoPost(f));
      expect([res.status, res.json?.error?.code, res.headers.get('retry-after')]).toEqual([
        503,
        'service_unavailable',
        '5',
      ]);
      await settle();
      expect(changedTables(before, await fingerprint())).toEqual([]);
      expect(await storedKeys(f)).toEqual(keysBefore);
      // The store answers again: the same upload goes through.
      expect((await photoPost(f)).status).toBe(201);
    });

    it('photo upload, its row failing last (after both files are stored): no row, no file', async () => {
      const f = await freshFixture(cast);
      await settle();
      const before = await fingerprint();
      const keysBefore = await storedKeys(f);
      const res = await withTrigger('site_photos', 'runnel_test_fault', () => photoPost(f));
      expect(res.status).toBeGreaterThanOrEqual(400);
      await settle();
      expect(changedTables(before, await fingerprint())).toEqual([]);
      expect(await keysBecome(projectStoragePrefix(f.projectId), keysBefore)).toEqual(keysBefore);
    });

    it('survey import, store failing at its one storage step (before any row): 503, no row, no file', async () => {
      const f = await freshFixture(cast);
      await settle();
      const before = await fingerprint();
      const keysBefore = await storedKeys(f);
      const res = await withStorageFault({ match: `projects/${f.projectId}/survey-files/`, op: 'put', nth: 1 }, () =>
        callCase(endpoint('projects/[projectId]/routes/import/route.ts', 'POST'), f, 'surveyor'),
      );
      expect(res.status).toBe(503);
      await settle();
      expect(changedTables(before, await fingerprint())).toEqual([]);
      expect(await storedKeys(f)).toEqual(keysBefore);
    });

    // A project delete removes its rows at once and its files through the job queue: listing them,
    // then removing each. A failed step fails the job, which is retried until every file is gone.
    it.each([
      ['first (listing the files)', { op: 'list' as const, nth: 1 }],
      ['first file', { op: 'delete' as const, nth: 1 }],
      ['middle file', { op: 'delete' as const, nth: 2 }],
      ['last file', { op: 'delete' as const, nth: 4 }],
    ])(
      'project delete, store failing at the %s: the rows go, and every file after a retry',
      async (_step, fault) => {
        const f = await freshFixture(cast);
        await createPhotoFixture(f.projectId, f.users.surveyor.id);
        const prefix = projectStoragePrefix(f.projectId);
        expect((await storedKeys(f)).length).toBe(4);
        await withStorageFault({ match: prefix, ...fault }, async () => {
          const res = await request(cast, 'owner', { method: 'DELETE', path: `/api/projects/${f.projectId}` });
          expect(res.status).toBe(204);
          expect(await keysBecome(prefix, [])).toEqual([]);
        });
        expect(await models().Project.count({ where: { id: f.projectId } })).toBe(0);
        expect(await models().Attachment.count({ where: { projectId: f.projectId } })).toBe(0);
        expect(await models().SitePhoto.count({ where: { projectId: f.projectId } })).toBe(0);
      },
      90_000,
    );

    it.each([
      ['first (the image)', 1],
      ['last (the thumbnail)', 2],
    ])(
      'photo delete, store failing at the %s: the row goes, and both files after a retry',
      async (_step, nth) => {
        const f = await freshFixture(cast);
        const photoId = await createPhotoFixture(f.projectId, f.users.surveyor.id);
        const folder = (await models().SitePhoto.findByPk(photoId))!.imageKey.replace(/[^/]+$/, '');
        expect((await listKeys(folder)).length).toBe(2);
        await withStorageFault({ match: folder, op: 'delete', nth }, async () => {
          expect((await request(cast, 'surveyor', { method: 'DELETE', path: `/api/photos/${photoId}` })).status).toBe(
            204,
          );
          expect(await keysBecome(folder, [])).toEqual([]);
        });
        expect(await models().SitePhoto.count({ where: { id: photoId } })).toBe(0);
      },
      90_000,
    );

    it('route delete, store failing to remove its survey file: the rows go, and the file after a retry', async () => {
      const f = await freshFixture(cast);
      const route = await models().Route.findByPk(f.routeId);
      const file = await models().Attachment.findByPk(route!.sourceAttachmentId!);
      expect(await listKeys(file!.storageKey)).toEqual([file!.storageKey]);
      await withStorageFault({ match: file!.storageKey, op: 'delete', nth: 1 }, async () => {
        expect((await request(cast, 'surveyor', { method: 'DELETE', path: `/api/routes/${f.routeId}` })).status).toBe(
          204,
        );
        expect(await keysBecome(file!.storageKey, [])).toEqual([]);
      });
      expect(await models().Attachment.count({ where: { id: file!.id } })).toBe(0);
    }, 90_000);
  });
});
