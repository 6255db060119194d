import { spawn } from 'node:child_process';
import path from 'node:path';
import { beforeAll, describe, expect, it } from 'vitest';
import { models } from '@/models';
import { createCast, freshFixture, request, type Cast, type Fixture } from './cast';
import { signIn, type LiveAnswer } from './live';

/**
 * The database stopped for 5 s while the running app is under load: requests wait and succeed or
 * answer 503 with Retry-After; none answers 500 or shows a driver's message; no acknowledged write
 * is lost.
 */

const ROOT = path.resolve(import.meta.dirname, '../..');
let cast: Cast;
let f: Fixture;

function outage(seconds: number): Promise<string> {
  return new Promise((resolve, reject) => {
    const child = spawn('bash', [path.join(ROOT, 'scripts/pg-outage.sh'), String(seconds)], {
      cwd: ROOT,
      env: process.env,
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let out = '';
    child.stdout.on('data', (d) => (out += d));
    child.stderr.on('data', (d) => (out += d));
    child.on('exit', (code) =>
      code === 0 ? resolve(out) : reject(new Error(`pg-outage.sh failed (${code}): ${out}`)),
    );
  });
}

// The driver's words, or the database's address (the app's own address may appear in a redirect).
const dbPort = new URL(process.env.DATABASE_URL ?? 'postgres://x@127.0.0.1:5432/x').port || '5432';
const DRIVER_WORDS = new RegExp(
  `ECONNREFUSED|:${dbPort}\\b|Sequelize|postgres|connect ECONN|terminating connection`,
  'i',
);

describe('database outage under load', () => {
  beforeAll(async () => {
    cast = await createCast();
    f = await freshFixture(cast);
  }, 120_000);

  it('stopped for 5 s: every answer is 2xx or 503 with Retry-After, never 500; no acknowledged write is lost', async () => {
    const answers: { status: number; retryAfter: string | null; text: string; sentAt: number }[] = [];
    const created: string[] = [];
    const failures: string[] = [];
    let running = true;
    const worker = async (w: number) => {
      for (let n = 0; running; n++) {
        const write = n % 4 === 0;
        const name = `Outage ${w}-${n}`;
        const sentAt = Date.now();
        try {
          const r: LiveAnswer = write
            ? await request(cast, 'designer', {
                method: 'POST',
                path: `/api/teams/${f.teamId}/projects`,
                body: { name },
              })
            : await request(cast, 'viewer', { method: 'GET', path: `/api/teams/${f.teamId}/projects` });
          answers.push({ status: r.status, retryAfter: r.headers.get('retry-after'), text: r.text, sentAt });
          if (write && r.status === 201) created.push(r.json.project.id);
        } catch (error) {
          failures.push(String(error));
        }
        if (!running) break;
      }
    };
    const workers = Array.from({ length: 12 }, (_, w) => worker(w));
    await new Promise((r) => setTimeout(r, 1500));
    const down = outage(5);
    await new Promise((r) => setTimeout(r, 2500));
    // Requests sent while the database is surely down, besides the workers' (which may all be waiting).
    const probes = Array.from({ length: 6 }, async (_, i) => {
      const sentAt = Date.now();
      const r =
        i % 3 === 0
          ? await request(cast, 'designer', {
              method: 'POST',
              path: `/api/teams/${f.teamId}/projects`,
              body: { name: `Outage probe ${i}` },
            })
          : await request(cast, 'viewer', { method: 'GET', path: `/api/teams/${f.teamId}/projects` });
      answers.push({ status: r.status, retryAfter: r.headers.get('retry-after'), text: r.text, sentAt });
      if (i % 3 === 0 && r.status === 201) created.push(r.json.project.id);
    });
    // A sign-in while the database is down: refused without the driver's words.
    const signInDuring = await signIn(cast.a.users.viewer.email, 'whatever it is');
    const log = await down;
    await Promise.all(probes);
    await new Promise((r) => setTimeout(r, 2500));
    running = false;
    await Promise.all(workers);

    const stoppedAt = Number(/stopped (\d+)/.exec(log)![1]);
    const startedAt = Number(/started (\d+)/.exec(log)![1]);
    expect(startedAt - stoppedAt).toBeGreaterThanOrEqual(5000);
    expect(failures).toEqual([]);
    expect(answers.length).toBeGreaterThan(50);
    const byStatus: Record<number, number> = {};
    for (const a of answers) byStatus[a.status] = (byStatus[a.status] ?? 0) + 1;
    expect(
      Object.keys(byStatus)
        .map(Number)
        .filter((s) => ![200, 201, 503].includes(s)),
      JSON.stringify(byStatus),
    ).toEqual([]);
    for (const a of answers.filter((x) => x.status === 503)) {
      expect(Number(a.retryAfter)).toBeGreaterThan(0);
      expect(a.text).not.toMatch(DRIVER_WORDS);
    }
    // Requests were sent while the database was down; each waited and succeeded, or answered 503.
    expect(answers.filter((a) => a.sentAt > stoppedAt && a.sentAt < startedAt).length).toBeGreaterThan(0);
    expect(signInDuring.status).not.toBe(500);
    expect(signInDuring.text).not.toMatch(DRIVER_WORDS);
    expect(signInDuring.headers.get('location') ?? '').not.toMatch(DRIVER_WORDS);
    // Every write the app acknowledged is there.
    expect(await models().Project.count({ where: { id: created } })).toBe(created.length);
  }, 120_000);
});
