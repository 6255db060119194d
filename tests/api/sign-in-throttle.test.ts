import { describe, expect, it } from 'vitest';
import {
  accountKey,
  admitSignIn,
  knownDeviceCookie,
  knownDeviceOf,
  signInSucceeded,
  type SignInAttempt,
} from '@/lib/auth/sign-in-throttle';
import { clientAddress } from '@/lib/http/client-address';
import { db } from '@/lib/db';

const unique = () => `${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
const email = () => `throttle-${unique()}@fixture.test`;
/** A fresh client address per attempt unless one is given, so only the account limit is in play. */
const attempt = (who: string, extra: Partial<SignInAttempt> = {}): SignInAttempt => ({
  email: who,
  address: `addr-${unique()}`,
  knownDevice: null,
  ...extra,
});

// The whole sign-in route (form, 429 answer, device cookie) runs against `next start` in tests/server.
describe('sign-in throttle (counted in PostgreSQL before the password check)', () => {
  it('lets exactly 5 of a parallel burst of 20 attempts on one account through, then refuses with a wait', async () => {
    const who = email();
    const verdicts = await Promise.all(Array.from({ length: 20 }, () => admitSignIn(attempt(who))));
    expect(verdicts.filter((v) => v.allowed)).toHaveLength(5);
    const refused = verdicts.find((v) => !v.allowed) as { allowed: false; retryAfterSeconds: number };
    expect(refused.retryAfterSeconds).toBeGreaterThan(0);
    expect(refused.retryAfterSeconds).toBeLessThanOrEqual(300);
  });

  it('keeps the counts in the database (shared by every instance), keyed by a hash, never the e-mail', async () => {
    const who = email();
    await admitSignIn(attempt(who));
    const [rows] = await db().query(`SELECT key, points FROM rate_limits WHERE key = :key`, {
      replacements: { key: `signin-account:${accountKey(who)}` },
    });
    expect(rows).toEqual([{ key: `signin-account:${accountKey(who)}`, points: 1 }]);
    const [leaks] = await db().query(`SELECT count(*)::int AS n FROM rate_limits WHERE key LIKE :pattern`, {
      replacements: { pattern: `%${who}%` },
    });
    expect(leaks).toEqual([{ n: 0 }]);
  });

  it('a success clears the account, so the owner is not locked by their own typos', async () => {
    const who = email();
    for (let i = 0; i < 4; i += 1) expect((await admitSignIn(attempt(who))).allowed).toBe(true);
    await signInSucceeded(attempt(who));
    for (let i = 0; i < 5; i += 1) expect((await admitSignIn(attempt(who))).allowed).toBe(true);
    expect((await admitSignIn(attempt(who))).allowed).toBe(false);
  });

  it('a device that signed in before is counted on its own while strangers have locked the account', async () => {
    const who = email();
    const device = knownDeviceOf(knownDeviceCookie(who), who);
    expect(device).not.toBeNull();
    for (let i = 0; i < 8; i += 1) await admitSignIn(attempt(who));
    expect((await admitSignIn(attempt(who))).allowed).toBe(false);
    expect((await admitSignIn(attempt(who, { knownDevice: device }))).allowed).toBe(true);
  });

  it('accepts a known-device cookie only for its own account and only with a valid signature', () => {
    const who = email();
    const cookie = knownDeviceCookie(who);
    expect(knownDeviceOf(cookie, who.toUpperCase())).not.toBeNull();
    expect(knownDeviceOf(cookie, email())).toBeNull();
    const [device, account] = cookie.split('.');
    expect(knownDeviceOf(`${device}.${account}.forged-signature`, who)).toBeNull();
    expect(knownDeviceOf('abc.def', who)).toBeNull();
    expect(knownDeviceOf(undefined, who)).toBeNull();
  });

  it('limits one client address across many accounts (30 attempts a window)', async () => {
    const from = `addr-${unique()}`;
    const verdicts = await Promise.all(
      Array.from({ length: 35 }, () => admitSignIn(attempt(email(), { address: from }))),
    );
    expect(verdicts.filter((v) => v.allowed)).toHaveLength(30);
  });
});

describe('the client address', () => {
  it('is read behind the configured number of trusted proxies; entries a client wrote are ignored', () => {
    expect(clientAddress('6.6.6.6, 203.0.113.9', 1)).toBe('203.0.113.9');
    expect(clientAddress('6.6.6.6, 203.0.113.9, 10.0.0.2', 2)).toBe('203.0.113.9');
    expect(clientAddress('203.0.113.9', 3)).toBe('203.0.113.9');
    expect(clientAddress(null, 1)).toBe('unknown');
    expect(clientAddress('127.0.0.1', 0)).toBe('127.0.0.1');
  });
});

describe('successful sign-ins from one address (an office behind one router)', () => {
  it('are not counted against the address', async () => {
    const from = `office-${unique()}`;
    for (let i = 0; i < 40; i += 1) {
      const a = attempt(email(), { address: from });
      expect((await admitSignIn(a)).allowed).toBe(true);
      await signInSucceeded(a);
    }
  });
});
