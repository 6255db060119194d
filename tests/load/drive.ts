import autocannon from 'autocannon';
import type { LoadFixture } from './fixture';

/** What one load run saw. Latencies in milliseconds; `errors` counts refused, reset and timed-out requests. */
export interface LoadResult {
  requests: number;
  durationS: number;
  requestsPerSecond: number;
  errors: number;
  timeouts: number;
  /** Answers outside 2xx, by status. */
  non2xx: Record<number, number>;
  p50: number;
  p95: number;
  p99: number;
  /** Notes of the yield readings the server answered 201 for. */
  ackedWrites: string[];
}

/** Percentile by the nearest-rank method (common practice, no source). */
export function percentile(sorted: number[], p: number): number {
  if (sorted.length === 0) return Number.NaN;
  return sorted[Math.min(sorted.length - 1, Math.max(0, Math.ceil((p / 100) * sorted.length) - 1))];
}

type Context = { n?: number; note?: string };

/**
 * The mix a team produces: reading the project list (a database-backed list) and logging yield
 * readings (a write). Every write carries a unique note so lost writes can be counted afterwards.
 */
function mixedRequests(fixture: LoadFixture, writeEvery: number, ackedWrites: string[]): autocannon.Request[] {
  const read: autocannon.Request = { method: 'GET', path: `/api/teams/${fixture.teamId}/projects` };
  if (writeEvery <= 0) return [read];
  let serial = 0;
  const write: autocannon.Request = {
    method: 'POST',
    path: `/api/projects/${fixture.projectId}/sources/${fixture.sourceId}/yield-readings`,
    setupRequest: (request, context) => {
      const ctx = context as Context;
      ctx.note = `${fixture.notePrefix} write ${++serial}`;
      const body = {
        measuredOn: '2026-08-14',
        season: 'dry',
        bucketVolumeM3: 0.02,
        bucketSeconds: 31.5,
        note: ctx.note,
      };
      return { ...request, body: JSON.stringify(body) };
    },
    onResponse: (status, _body, context) => {
      const ctx = context as Context;
      if (status === 201 && ctx.note) ackedWrites.push(ctx.note);
    },
  };
  return [...Array.from({ length: writeEvery - 1 }, () => read), write];
}

interface Collected {
  latencies: number[];
  non2xx: Record<number, number>;
  errors: number;
  timeouts: number;
}

/** Runs autocannon, recording every answer's status and latency into `into`. */
function run(options: autocannon.Options, into: Collected): Promise<autocannon.Result> {
  return new Promise((resolve, reject) => {
    const instance = autocannon(options, (error, result) => (error ? reject(error) : resolve(result)));
    collect(instance, into);
  });
}

function collect(instance: autocannon.Instance, into: Collected): void {
  instance.on('response', (_client, statusCode, _bytes, responseTime) => {
    into.latencies.push(responseTime);
    if (statusCode < 200 || statusCode >= 300) into.non2xx[statusCode] = (into.non2xx[statusCode] ?? 0) + 1;
  });
  instance.on('reqError', () => {
    into.errors++;
  });
}

function summarise(
  collected: Collected,
  results: autocannon.Result[],
  durationS: number,
  ackedWrites: string[],
): LoadResult {
  const sorted = collected.latencies.sort((a, b) => a - b);
  const timeouts = results.reduce((n, r) => n + r.timeouts, 0);
  const errors = Math.max(
    collected.errors,
    results.reduce((n, r) => n + r.errors, 0),
  );
  return {
    requests: sorted.length,
    durationS,
    requestsPerSecond: sorted.length / durationS,
    errors,
    timeouts,
    non2xx: collected.non2xx,
    p50: percentile(sorted, 50),
    p95: percentile(sorted, 95),
    p99: percentile(sorted, 99),
    ackedWrites,
  };
}

const headers = (fixture: LoadFixture) => ({
  cookie: fixture.cookie,
  'content-type': 'application/json',
  accept: 'application/json',
});

/**
 * `connections` closed-loop connections (each sends its next request when the last is answered) for
 * `durationS`; every `writeEvery`-th request is a write (0: reads only). @default writeEvery 4
 */
export async function closedLoop(
  baseUrl: string,
  fixture: LoadFixture,
  options: { connections: number; durationS: number; writeEvery?: number },
): Promise<LoadResult> {
  const ackedWrites: string[] = [];
  const collected: Collected = { latencies: [], non2xx: {}, errors: 0, timeouts: 0 };
  const started = performance.now();
  const result = await run(
    {
      url: baseUrl,
      connections: options.connections,
      duration: options.durationS,
      timeout: 20,
      headers: headers(fixture),
      requests: mixedRequests(fixture, options.writeEvery ?? 4, ackedWrites),
    },
    collected,
  );
  return summarise(collected, [result], (performance.now() - started) / 1000, ackedWrites);
}

/**
 * `users` users, each making one read per second for `durationS`, their starts spread evenly over
 * the first second (one autocannon instance of one connection per user), so the load is open-loop.
 */
export async function usersPerSecond(
  baseUrl: string,
  fixture: LoadFixture,
  options: { users: number; durationS: number },
): Promise<LoadResult> {
  const collected: Collected = { latencies: [], non2xx: {}, errors: 0, timeouts: 0 };
  const started = performance.now();
  const runs = Array.from({ length: options.users }, async (_, i) => {
    await new Promise((resolve) => setTimeout(resolve, (i * 1000) / options.users));
    return run(
      {
        url: `${baseUrl}/api/teams/${fixture.teamId}/projects`,
        connections: 1,
        connectionRate: 1,
        duration: options.durationS,
        timeout: 20,
        headers: headers(fixture),
      },
      collected,
    );
  });
  const results = await Promise.all(runs);
  return summarise(collected, results, (performance.now() - started) / 1000, []);
}
