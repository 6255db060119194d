import autocannon from 'autocannon';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import pg from 'pg';
import { startAppInstance, type AppInstance } from '../tests/load/app-instance';
import { closedLoop, usersPerSecond, type LoadResult } from '../tests/load/drive';
import { createLoadFixture, type LoadFixture } from '../tests/load/fixture';
import type { Benchmark } from './harness';

const DURATION_S = 30;
const USERS = 50;

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** One built instance (`.next`, from `npm test` or `next build`) on a free loopback port, and a fixture team. */
async function serve(
  label: string,
): Promise<{ url: string; fixture: LoadFixture; pid: number; databaseUrl: string; stop: () => Promise<void> }> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error(`${label} needs DATABASE_URL (a migrated Runnel database, e.g. the test cluster)`);
  if (!fs.existsSync('.next/BUILD_ID'))
    throw new Error(`${label} needs a build: run \`npm test\` or \`next build\` first`);
  const secretFile = path.join('.secrets', 'session-secret');
  const secret =
    process.env.NEXTAUTH_SECRET ?? (fs.existsSync(secretFile) ? fs.readFileSync(secretFile, 'utf8').trim() : '');
  if (!secret) throw new Error(`${label} needs NEXTAUTH_SECRET or .secrets/session-secret`);
  const port = await freePort();
  fs.mkdirSync('.runtime', { recursive: true });
  const instance: AppInstance = await startAppInstance(
    port,
    { ...process.env, NEXTAUTH_SECRET: secret, NEXTAUTH_URL: `http://127.0.0.1:${port}`, RUNNEL_ENV: 'test' },
    `.runtime/${label}.log`,
  );
  const fixture = await createLoadFixture(databaseUrl, secret, label);
  return {
    url: `http://127.0.0.1:${port}`,
    fixture,
    pid: instance.pid,
    databaseUrl,
    stop: async () => {
      await instance.drainAndStop();
      await fixture.remove();
    },
  };
}

function figures(result: LoadResult): Record<string, number> {
  const non2xx = Object.values(result.non2xx).reduce((n, c) => n + c, 0);
  return {
    median_ms: result.p50,
    rps: result.requestsPerSecond,
    p95_ms: result.p95,
    p99_ms: result.p99,
    errors: result.errors + result.timeouts + non2xx,
    requests: result.requests,
  };
}

/** 50 closed-loop connections for 30 s reading a team's project list (database-backed), through one instance. */
export const apiCapacity50: Benchmark = {
  name: 'api-capacity-50',
  run: () => undefined,
  measure: async () => {
    const server = await serve('api-capacity-50');
    try {
      // A short warm-up so the figures are not the first compilation of each route.
      await closedLoop(server.url, server.fixture, { connections: 10, durationS: 3, writeEvery: 0 });
      return figures(
        await closedLoop(server.url, server.fixture, { connections: USERS, durationS: DURATION_S, writeEvery: 0 }),
      );
    } finally {
      await server.stop();
    }
  },
};

/** 50 users each reading the project list once a second, their requests spread over the second, for 30 s. */
export const apiLatency50u: Benchmark = {
  name: 'api-latency-50u',
  run: () => undefined,
  measure: async () => {
    const server = await serve('api-latency-50u');
    try {
      await closedLoop(server.url, server.fixture, { connections: 10, durationS: 3, writeEvery: 0 });
      return figures(await usersPerSecond(server.url, server.fixture, { users: USERS, durationS: DURATION_S }));
    } finally {
      await server.stop();
    }
  },
};

/** User plus system CPU time of every process in a process group, ms (Linux /proc; clock ticks of 10 ms). */
function groupCpuMs(pgid: number): number {
  let ticks = 0;
  for (const entry of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    let stat: string;
    try {
      stat = fs.readFileSync(`/proc/${entry}/stat`, 'utf8');
    } catch {
      continue; // ended meanwhile
    }
    const fields = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
    if (Number(fields[2]) === pgid) ticks += Number(fields[11]) + Number(fields[12]);
  }
  return ticks * 10;
}

/** Transactions committed or rolled back in the database so far: one per statement outside a transaction. */
async function transactions(databaseUrl: string): Promise<number> {
  const client = new pg.Client({ connectionString: databaseUrl });
  await client.connect();
  try {
    const { rows } = await client.query(
      'SELECT xact_commit + xact_rollback AS n FROM pg_stat_database WHERE datname = current_database()',
    );
    return Number(rows[0].n);
  } finally {
    await client.end();
  }
}

/** The server's CPU time and database statements per request over a closed-loop run of `path`. */
async function costOf(
  server: Awaited<ReturnType<typeof serve>>,
  route: string,
  seconds: number,
): Promise<{ cpuMs: number; statements: number }> {
  const cpu0 = groupCpuMs(server.pid);
  const tx0 = await transactions(server.databaseUrl);
  const result = await autocannon({
    url: `${server.url}${route}`,
    connections: 20,
    duration: seconds,
    headers: { cookie: server.fixture.cookie },
  });
  const cpu1 = groupCpuMs(server.pid);
  // Less the one reading `transactions` itself makes.
  const tx1 = (await transactions(server.databaseUrl)) - 1;
  if (result.non2xx || result.errors)
    throw new Error(`${route}: ${result.non2xx} answers outside 2xx and ${result.errors} errors under load`);
  const requests = result.requests.total;
  return { cpuMs: (cpu1 - cpu0) / requests, statements: (tx1 - tx0) / requests };
}

/**
 * What one project-list request costs the server, as far as the machine's load allows: its CPU time
 * per request (`median_ms`), the same for `/api/health` (the framework's own share, no database),
 * their ratio, and database statements per request. Steadier than requests/s on a shared machine,
 * though CPU per request still grows when the machine is busy (fewer requests share each wake-up).
 */
export const apiListCost: Benchmark = {
  name: 'api-list-cost',
  run: () => undefined,
  measure: async () => {
    const server = await serve('api-list-cost');
    try {
      await closedLoop(server.url, server.fixture, { connections: 10, durationS: 3, writeEvery: 0 });
      const list = await costOf(server, `/api/teams/${server.fixture.teamId}/projects`, 10);
      const health = await costOf(server, '/api/health', 10);
      return {
        median_ms: list.cpuMs,
        ratio: list.cpuMs / health.cpuMs,
        health_ms: health.cpuMs,
        statements: list.statements,
      };
    } finally {
      await server.stop();
    }
  },
};
