// `npm run test:scale` (scripts/scale.sh sets up the database and the build first): two stateless
// instances behind nginx share PostgreSQL; 50 connections of mixed reads and writes for 30 s; one
// instance is drained and stopped at 10 s (SIGTERM: it stops listening, so nginx sends new
// requests to the other, and answers the ones in flight; see nginx.ts) and started again at 20 s. Passes with 0 errors
// (no
// refused, reset or timed-out request, no answer outside 2xx) and 0 lost writes (every write
// answered 201 is in the database).
import os from 'node:os';
import path from 'node:path';
import pg from 'pg';
import { startAppInstance, type AppInstance } from './app-instance';
import { closedLoop } from './drive';
import { createLoadFixture } from './fixture';
import { startNginx } from './nginx';

const DURATION_S = Number(process.env.RUNNEL_SCALE_SECONDS ?? 30);
const CONNECTIONS = 50;
const [portA, portB] = (process.env.RUNNEL_SCALE_APP_PORTS ?? '3110 3111').split(/\s+/).map(Number);
const portLb = Number(process.env.RUNNEL_SCALE_LB_PORT ?? 3112);
const runtime = process.env.RUNNEL_RUNTIME_DIR ?? '.runtime/scale';
const databaseUrl = process.env.DATABASE_URL!;
const secret = process.env.NEXTAUTH_SECRET!;

const say = (message: string) => console.log(`[scale] ${new Date().toISOString().slice(11, 19)} ${message}`);
const sleepUntil = (t0: number, seconds: number) =>
  new Promise((resolve) => setTimeout(resolve, Math.max(0, t0 + seconds * 1000 - performance.now())));

async function storedNotes(prefix: string): Promise<Set<string>> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const { rows } = await client.query<{ note: string }>('SELECT note FROM yield_readings WHERE note LIKE $1', [
      `${prefix}%`,
    ]);
    return new Set(rows.map((r) => r.note));
  } finally {
    await client.end();
  }
}

async function main(): Promise<number> {
  if (!databaseUrl || !secret)
    throw new Error('DATABASE_URL and NEXTAUTH_SECRET must be set (run through `npm run test:scale`)');
  const fixture = await createLoadFixture(databaseUrl, secret, 'scale');
  const log = (name: string) => path.join(runtime, `${name}.log`);
  let a: AppInstance | undefined;
  let b: AppInstance | undefined;
  let lb: Awaited<ReturnType<typeof startNginx>> | undefined;
  try {
    [a, b] = await Promise.all([
      startAppInstance(portA, process.env, log('instance-a')),
      startAppInstance(portB, process.env, log('instance-b')),
    ]);
    lb = await startNginx(path.join(os.tmpdir(), `runnel-nginx-${portLb}`), portLb, [portA, portB]);
    say(`instances on ${portA} and ${portB} behind nginx on ${portLb}; ${CONNECTIONS} connections for ${DURATION_S} s`);

    const t0 = performance.now();
    const load = closedLoop(lb.url, fixture, { connections: CONNECTIONS, durationS: DURATION_S });
    const events = (async () => {
      await sleepUntil(t0, DURATION_S / 3);
      say(`t=${((performance.now() - t0) / 1000).toFixed(1)} s: draining and stopping instance A (SIGTERM)`);
      await a!.drainAndStop();
      say(`t=${((performance.now() - t0) / 1000).toFixed(1)} s: instance A stopped`);
      await sleepUntil(t0, (2 * DURATION_S) / 3);
      say(`t=${((performance.now() - t0) / 1000).toFixed(1)} s: starting instance A again`);
      a = await startAppInstance(portA, process.env, log('instance-a'));
      say(`t=${((performance.now() - t0) / 1000).toFixed(1)} s: instance A ready`);
    })();
    const [result] = await Promise.all([load, events]);

    const stored = await storedNotes(fixture.notePrefix);
    const lost = result.ackedWrites.filter((note) => !stored.has(note));
    const non2xx = Object.values(result.non2xx).reduce((n, c) => n + c, 0);
    say(
      `${result.requests} requests in ${result.durationS.toFixed(1)} s (${result.requestsPerSecond.toFixed(0)}/s), ` +
        `p50 ${result.p50} ms, p95 ${result.p95} ms, p99 ${result.p99} ms; errors ${result.errors}, timeouts ${result.timeouts}, ` +
        `non-2xx ${non2xx} ${JSON.stringify(result.non2xx)}; writes answered 201: ${result.ackedWrites.length}, stored: ${stored.size}, lost: ${lost.length}`,
    );
    const failures = [
      result.errors > 0 && `${result.errors} request errors`,
      result.timeouts > 0 && `${result.timeouts} timeouts`,
      non2xx > 0 && `${non2xx} answers outside 2xx`,
      lost.length > 0 && `${lost.length} lost writes (e.g. "${lost[0]}")`,
      result.ackedWrites.length === 0 && 'no write was answered',
    ].filter(Boolean);
    if (failures.length > 0) {
      say(`FAILED: ${failures.join(', ')}`);
      return 1;
    }
    say('passed: 0 errors, 0 lost writes');
    return 0;
  } finally {
    await lb?.stop();
    await Promise.all([a?.drainAndStop(), b?.drainAndStop()]);
    await fixture.remove();
  }
}

main().then(
  (code) => process.exit(code),
  (error) => {
    console.error(`[scale] ${(error as Error).stack ?? error}`);
    process.exit(1);
  },
);
