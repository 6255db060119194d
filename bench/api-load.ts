import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
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
async function serve(label: string): Promise<{ url: string; fixture: LoadFixture; stop: () => Promise<void> }> {
  const databaseUrl = process.env.DATABASE_URL;
  if (!databaseUrl) throw new Error(`${label} needs DATABASE_URL (a migrated Runnel database, e.g. the test cluster)`);
  if (!fs.existsSync('.next/BUILD_ID')) throw new Error(`${label} needs a build: run \`npm test\` or \`next build\` first`);
  const secretFile = path.join('.secrets', 'session-secret');
  const secret = process.env.NEXTAUTH_SECRET ?? (fs.existsSync(secretFile) ? fs.readFileSync(secretFile, 'utf8').trim() : '');
  if (!secret) throw new Error(`${label} needs NEXTAUTH_SECRET or .secrets/session-secret`);
  const port = await freePort();
  fs.mkdirSync('.runtime', { recursive: true });
  const instance: AppInstance = await startAppInstance(port, { ...process.env, NEXTAUTH_SECRET: secret, NEXTAUTH_URL: `http://127.0.0.1:${port}`, RUNNEL_ENV: 'test' }, `.runtime/${label}.log`);
  const fixture = await createLoadFixture(databaseUrl, secret, label);
  return {
    url: `http://127.0.0.1:${port}`,
    fixture,
    stop: async () => {
      await instance.drainAndStop();
      await fixture.remove();
    },
  };
}

function figures(result: LoadResult): Record<string, number> {
  const non2xx = Object.values(result.non2xx).reduce((n, c) => n + c, 0);
  return { median_ms: result.p50, rps: result.requestsPerSecond, p95_ms: result.p95, p99_ms: result.p99, errors: result.errors + result.timeouts + non2xx, requests: result.requests };
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
      return figures(await closedLoop(server.url, server.fixture, { connections: USERS, durationS: DURATION_S, writeEvery: 0 }));
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
