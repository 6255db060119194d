import { randomUUID } from 'node:crypto';
import { encode } from 'next-auth/jwt';
import { beforeAll, describe, expect, it } from 'vitest';
import { env } from '@/lib/env';
import { models } from '@/models';
import { giveKnownPassword, KNOWN_PASSWORD } from '../support/account-fixtures';
import { createTeamFixture } from '../support/api';
import { signInCookie, type Fixture } from './cast';
import { live, type LiveAnswer } from './live';

/**
 * Sessions against the running app: a forged or damaged session cookie is an anonymous caller
 * (401, never a server error), and demotion, removal, a password change and sign-out take effect
 * on the very next request made with the cookie issued before.
 */

const COOKIE = 'next-auth.session-token';
let team: Fixture;

const asCookie = (cookie: string) => ({ headers: { cookie } });
const teams = (cookie: string) => live('/api/teams', asCookie(cookie));

function flip(s: string, at: number): string {
  const i = ((at % s.length) + s.length) % s.length;
  return s.slice(0, i) + (s[i] === 'A' ? 'B' : 'A') + s.slice(i + 1);
}

async function tokenFor(
  claims: Record<string, unknown>,
  secret = env().NEXTAUTH_SECRET,
  maxAge?: number,
): Promise<string> {
  return encode({ token: claims, secret, ...(maxAge !== undefined ? { maxAge } : {}) });
}

async function signOut(sessionCookie: string): Promise<LiveAnswer> {
  const csrf = await live('/api/auth/csrf', asCookie(sessionCookie));
  const cookie = [sessionCookie, ...csrf.cookies].join('; ');
  return live('/api/auth/signout', {
    method: 'POST',
    headers: { cookie, 'content-type': 'application/x-www-form-urlencoded' },
    body: new URLSearchParams({ csrfToken: csrf.json.csrfToken, json: 'true' }).toString(),
  });
}

describe('sessions against the running app', () => {
  beforeAll(async () => {
    team = await createTeamFixture();
    await giveKnownPassword(Object.values(team.users).map((u) => u.id));
  });

  it('20 tampered or forged session cookies are each refused with 401 (never a server error)', async () => {
    const good = await signInCookie(team.users.designer.email);
    expect((await teams(good)).status).toBe(200);
    const jwe = good.slice(`${COOKIE}=`.length);
    const parts = jwe.split('.');
    const u = team.users.designer;
    const user = await models().User.findByPk(u.id);
    const claims = { sub: u.id, email: u.email, name: 'x', sv: user!.sessionVersion };
    const tampered: Record<string, string> = {
      'header flipped': flip(jwe, 3),
      'ciphertext flipped': [parts[0], parts[1], parts[2], flip(parts[3]!, 5), parts[4]].join('.'),
      'tag flipped': [...parts.slice(0, 4), flip(parts[4]!, 2)].join('.'),
      'iv flipped': [parts[0], parts[1], flip(parts[2]!, 1), ...parts.slice(3)].join('.'),
      'last character dropped': jwe.slice(0, -1),
      'first half only': jwe.slice(0, Math.floor(jwe.length / 2)),
      'one part missing': parts.slice(0, 4).join('.'),
      'extra part': `${jwe}.AAAA`,
      empty: '',
      'plain text': 'not-a-token',
      'unsigned JWT (alg none)': `${Buffer.from('{"alg":"none","typ":"JWT"}').toString('base64url')}.${Buffer.from(JSON.stringify(claims)).toString('base64url')}.`,
      'non-ASCII bytes': 'cl\u00e9.\u00ff\u00fe.\u00e9',
      'NUL bytes': 'a%00b.%00',
      '8 kB of letters': 'A'.repeat(8000),
      'signed with another secret': await tokenFor(claims, 'another secret that is long enough to be one'),
      expired: await tokenFor(claims, undefined, -60),
      'user that does not exist': await tokenFor({ ...claims, sub: randomUUID() }),
      'subject not an id': await tokenFor({ ...claims, sub: "1' OR '1'='1" }),
      'older session version': await tokenFor({ ...claims, sv: user!.sessionVersion - 1 }),
      'no session version': await tokenFor({ sub: u.id, email: u.email }),
    };
    expect(Object.keys(tampered)).toHaveLength(20);
    const statuses: Record<string, number> = {};
    for (const [name, value] of Object.entries(tampered)) {
      const res = await teams(`${COOKIE}=${value}`);
      statuses[name] = res.status;
      if (res.status === 401) expect(res.json.error.code).toBe('unauthenticated');
    }
    expect(statuses).toEqual(Object.fromEntries(Object.keys(tampered).map((k) => [k, 401])));
    // A page asked for with a forged cookie goes to sign-in; it never fails.
    const page = await live('/projects', asCookie(`${COOKIE}=${tampered['ciphertext flipped']}`));
    expect(page.status).toBeGreaterThanOrEqual(300);
    expect(page.status).toBeLessThan(400);
    expect(page.headers.get('location')).toMatch(/\/sign-in/);
    // The genuine cookie still works: nothing above ended it.
    expect((await teams(good)).status).toBe(200);
  });

  it('a demotion and a removal take effect on the next request made with the old cookie', async () => {
    const owner = await signInCookie(team.users.owner.email);
    const designer = await signInCookie(team.users.designer.email);
    const edit = () =>
      live(`/api/projects/${team.projectId}`, {
        method: 'PATCH',
        headers: { cookie: designer, 'content-type': 'application/json' },
        body: JSON.stringify({ siteNotes: 'Walked the line.' }),
      });
    expect((await edit()).status).toBe(200);
    const demote = await live(`/api/teams/${team.teamId}/members/${team.users.designer.id}`, {
      method: 'PATCH',
      headers: { cookie: owner, 'content-type': 'application/json' },
      body: JSON.stringify({ role: 'viewer' }),
    });
    expect(demote.status).toBe(200);
    expect((await edit()).status).toBe(403);
    expect((await live(`/api/projects/${team.projectId}`, asCookie(designer))).status).toBe(200);
    const remove = await live(`/api/teams/${team.teamId}/members/${team.users.designer.id}`, {
      method: 'DELETE',
      headers: { cookie: owner },
    });
    expect(remove.status).toBe(204);
    expect((await live(`/api/projects/${team.projectId}`, asCookie(designer))).status).toBe(404);
    expect((await edit()).status).toBe(404);
  });

  it('a password change ends the sessions signed in before it', async () => {
    const otherDevice = await signInCookie(team.users.surveyor.email);
    const thisDevice = await signInCookie(team.users.surveyor.email);
    expect((await teams(otherDevice)).status).toBe(200);
    const change = await live('/api/accounts/password', {
      method: 'PUT',
      headers: { cookie: thisDevice, 'content-type': 'application/json' },
      body: JSON.stringify({ currentPassword: KNOWN_PASSWORD, newPassword: 'a changed passphrase by the spring' }),
    });
    expect(change.status).toBe(200);
    expect((await teams(otherDevice)).status).toBe(401);
    expect((await teams(thisDevice)).status).toBe(401);
  });

  it('sign-out ends the session: the old cookie is refused on the next request', async () => {
    const other = await signInCookie(team.users.reviewer.email);
    const cookie = await signInCookie(team.users.reviewer.email);
    expect((await teams(cookie)).status).toBe(200);
    const out = await signOut(cookie);
    expect(out.status).toBe(200);
    expect((await teams(cookie)).status).toBe(401);
    // Sign-out ends every session of the account (one session version per account).
    expect((await teams(other)).status).toBe(401);
  });
});
