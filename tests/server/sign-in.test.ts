import { beforeAll, describe, expect, it } from 'vitest';
import { hashPassword } from '@/lib/auth/password';
import { DEVICE_COOKIE } from '@/lib/auth/sign-in-throttle';
import { models } from '@/models';
import { sessionStarted, signIn } from './live';

const PASSWORD = 'live-fixture-password-1';
const unique = () => `${Date.now()}-${Math.random().toString(36).slice(2, 8)}`;
let passwordHash = '';

async function account(): Promise<string> {
  const email = `live-${unique()}@fixture.test`;
  await models().User.create({ email, name: 'Live fixture', passwordHash, emailVerifiedAt: new Date() });
  return email;
}

describe('sign-in through the running app', () => {
  beforeAll(async () => {
    passwordHash = await hashPassword(PASSWORD);
  });

  it('signs in with the right password and remembers the device', async () => {
    const res = await signIn(await account(), PASSWORD);
    expect(res.status).toBe(200);
    expect(sessionStarted(res)).toBe(true);
    expect(res.cookies.some((c) => c.startsWith(`${DEVICE_COOKIE}=`))).toBe(true);
  });

  it('answers an unknown e-mail and a wrong password alike, in status, body and (roughly) time', async () => {
    const email = await account();
    const t0 = performance.now();
    const wrong = await signIn(email, 'not the password');
    const t1 = performance.now();
    const unknown = await signIn(`nobody-${unique()}@fixture.test`, 'not the password');
    const t2 = performance.now();
    expect(wrong.status).toBe(unknown.status);
    expect(wrong.json).toEqual(unknown.json);
    expect(sessionStarted(wrong) || sessionStarted(unknown)).toBe(false);
    // Both paths verify one argon2id hash (a decoy for the unknown e-mail): neither is several times faster.
    const [a, b] = [t1 - t0, t2 - t1];
    expect(Math.max(a, b) / Math.min(a, b)).toBeLessThan(4);
  });

  it('a parallel burst on one account: 5 reach the password check, the rest get 429 with Retry-After; a known device still signs in', async () => {
    const email = await account();
    const device = (await signIn(email, PASSWORD)).cookies.find((c) => c.startsWith(`${DEVICE_COOKIE}=`))!;
    const burst = await Promise.all(Array.from({ length: 12 }, (_, i) => signIn(email, `guess ${i}`)));
    const limited = burst.filter((a) => a.status === 429);
    expect(limited).toHaveLength(7);
    expect(Number(limited[0]!.headers.get('retry-after'))).toBeGreaterThan(0);
    expect(limited[0]!.json.error.code).toBe('rate_limited');
    expect(new URL(limited[0]!.json.url).searchParams.get('error')).toBe('rate_limited');
    expect((await signIn(email, PASSWORD)).status).toBe(429);
    const owner = await signIn(email, PASSWORD, { cookies: [device] });
    expect(owner.status).toBe(200);
    expect(sessionStarted(owner)).toBe(true);
  });
});
