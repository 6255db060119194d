import 'server-only';
import { createHash, createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import { env } from '../env';
import { consume, forget, refund, type LimitSpec } from '../rate-limits';

/**
 * Sign-in attempts are counted in PostgreSQL (lib/rate-limits.ts) BEFORE the password is checked,
 * one atomic count per attempt, per account and per client address, so a parallel burst cannot
 * pass and guessing costs the server no hashing once the limit is reached. A success clears the
 * account's count. A stranger can only lock an account for the window (a short cool-down), and a
 * device that has signed in to the account before is counted on its own, so the owner still gets in.
 */
export const DEVICE_COOKIE = 'runnel-known-device';

function limits(): { account: LimitSpec; address: LimitSpec; device: LimitSpec } {
  const e = env();
  const durationSeconds = e.RUNNEL_SIGNIN_WINDOW_SECONDS;
  return {
    account: { name: 'signin-account', points: e.RUNNEL_SIGNIN_MAX_FAILURES_PER_EMAIL, durationSeconds },
    address: { name: 'signin-address', points: e.RUNNEL_SIGNIN_MAX_FAILURES_PER_IP, durationSeconds },
    device: { name: 'signin-device', points: e.RUNNEL_SIGNIN_MAX_ATTEMPTS_PER_KNOWN_DEVICE, durationSeconds },
  };
}

/** The account key: a hash of the trimmed, lower-cased e-mail (no addresses stored in the counters). */
export function accountKey(email: string): string {
  return createHash('sha256').update(email.trim().toLowerCase()).digest('hex').slice(0, 40);
}

function sign(value: string): string {
  return createHmac('sha256', env().NEXTAUTH_SECRET).update(`known-device:${value}`).digest('base64url');
}

/** Cookie value marking this browser as one that signed in to the account: `<device>.<account>.<signature>`. */
export function knownDeviceCookie(email: string): string {
  const value = `${randomBytes(12).toString('base64url')}.${accountKey(email)}`;
  return `${value}.${sign(value)}`;
}

/** The device id when the cookie is genuine and names this account. */
export function knownDeviceOf(cookie: string | undefined, email: string): string | null {
  const parts = (cookie ?? '').split('.');
  if (parts.length !== 3) return null;
  const [device, account, signature] = parts as [string, string, string];
  const expected = Buffer.from(sign(`${device}.${account}`));
  const given = Buffer.from(signature);
  if (given.length !== expected.length || !timingSafeEqual(given, expected)) return null;
  return account === accountKey(email) ? device : null;
}

export interface SignInAttempt {
  email: string;
  address: string;
  /** From knownDeviceOf: this browser signed in to the account before. */
  knownDevice: string | null;
}

export type Admission = { allowed: true } | { allowed: false; retryAfterSeconds: number };

/** Counts the attempt; refuses it when the address, or the account (or the known device), is over its limit. */
export async function admitSignIn(attempt: SignInAttempt): Promise<Admission> {
  const l = limits();
  const account = accountKey(attempt.email);
  const byAddress = await consume(l.address, attempt.address);
  const byAccount = attempt.knownDevice
    ? await consume(l.device, `${account}:${attempt.knownDevice}`)
    : await consume(l.account, account);
  const refused = [byAddress, byAccount].filter((o) => !o.allowed);
  if (refused.length === 0) return { allowed: true };
  return { allowed: false, retryAfterSeconds: Math.max(...refused.map((o) => o.retryAfterSeconds)) };
}

/** A correct password: the account's failures (and this device's) are forgotten; the address gets its attempt back. */
export async function signInSucceeded(attempt: SignInAttempt): Promise<void> {
  const l = limits();
  const account = accountKey(attempt.email);
  await forget(l.account, account);
  await refund(l.address, attempt.address);
  if (attempt.knownDevice) await forget(l.device, `${account}:${attempt.knownDevice}`);
}
