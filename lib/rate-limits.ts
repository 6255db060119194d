import 'server-only';
import { RateLimiterPostgres, RateLimiterRes } from 'rate-limiter-flexible';
import { db } from './db';
import { AppError } from './errors';

/**
 * Request limits held in PostgreSQL (table rate_limits, rate-limiter-flexible's store), so they
 * hold across app instances. Each `consume` is one atomic upsert: a parallel burst cannot slip
 * past a limit between the check and the count.
 */
export interface LimitSpec {
  /** Key prefix, one per kind of limit. */
  name: string;
  points: number;
  durationSeconds: number;
}

const holder = globalThis as unknown as { runnelLimiters?: Map<string, RateLimiterPostgres> };

function limiter(spec: LimitSpec): RateLimiterPostgres {
  holder.runnelLimiters ??= new Map();
  const id = `${spec.name}:${spec.points}:${spec.durationSeconds}`;
  let found = holder.runnelLimiters.get(id);
  if (!found) {
    found = new RateLimiterPostgres({
      storeClient: db(),
      storeType: 'sequelize',
      tableName: 'rate_limits',
      tableCreated: true,
      // Expired rows are deleted in bulk by the store's own timer; keep it off so tests and
      // short-lived processes exit cleanly. Expired keys are overwritten on their next use anyway.
      clearExpiredByTimeout: false,
      keyPrefix: spec.name,
      points: spec.points,
      duration: spec.durationSeconds,
    });
    holder.runnelLimiters.set(id, found);
  }
  return found;
}

export interface LimitOutcome {
  allowed: boolean;
  /** Seconds until the next attempt can pass (when refused). */
  retryAfterSeconds: number;
}

/** Counts one use of `key`; says whether it was within the limit. Database errors propagate (503 upstream). */
export async function consume(spec: LimitSpec, key: string, points = 1): Promise<LimitOutcome> {
  try {
    await limiter(spec).consume(key, points);
    return { allowed: true, retryAfterSeconds: 0 };
  } catch (error) {
    if (error instanceof RateLimiterRes)
      return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil(error.msBeforeNext / 1000)) };
    throw error;
  }
}

/** Whether `key` still has room, without counting a use. */
export async function hasRoom(spec: LimitSpec, key: string): Promise<LimitOutcome> {
  const res = await limiter(spec).get(key);
  if (!res || res.consumedPoints < spec.points) return { allowed: true, retryAfterSeconds: 0 };
  return { allowed: false, retryAfterSeconds: Math.max(1, Math.ceil(res.msBeforeNext / 1000)) };
}

/** Forgets the uses of `key` (a successful sign-in clears its account's failures). */
export async function forget(spec: LimitSpec, key: string): Promise<void> {
  await limiter(spec).delete(key);
}

/** Gives back uses of `key` (a successful sign-in is not held against its client address). */
export async function refund(spec: LimitSpec, key: string, points = 1): Promise<void> {
  await limiter(spec).reward(key, points);
}

/** Throws 429 with Retry-After when `key` is over its limit. */
export async function enforce(spec: LimitSpec, key: string, message: string): Promise<void> {
  const outcome = await consume(spec, key);
  if (!outcome.allowed)
    throw new AppError('rate_limited', message, undefined, { retryAfterSeconds: outcome.retryAfterSeconds });
}
