import { ACTORS, type Actor } from '../support/api';
import {
  createInvitationToken,
  createResetToken,
  createSignUpToken,
  giveKnownPassword,
  KNOWN_PASSWORD,
} from '../support/account-fixtures';
import { models } from '@/models';
import type { EndpointCase } from './endpoints';

type Expect = Record<Actor, number>;
const everyone = (ok: number): Expect => ({
  anonymous: ok,
  outsider: ok,
  viewer: ok,
  reviewer: ok,
  surveyor: ok,
  designer: ok,
  owner: ok,
});
const signedIn = (ok: number): Expect => ({ ...everyone(ok), anonymous: 401 });
const onlyOwner = (ok: number): Expect => ({
  anonymous: 401,
  outsider: 404,
  viewer: 403,
  reviewer: 403,
  surveyor: 403,
  designer: 403,
  owner: ok,
});

// Link tokens are made in `params` (async) and read back by `body` for the same fixture.
const tokens = new Map<string, string | string[]>();

/** Sign-up, reset, password, notification and invitation endpoints, with the status each caller must get. */
export const ACCOUNT_MAIL_ENDPOINTS: EndpointCase[] = [
  {
    file: 'accounts/confirm/route.ts',
    method: 'POST',
    expect: everyone(200),
    params: async (f) => {
      tokens.set(f.teamId, (await createSignUpToken()).token);
      return {};
    },
    body: (f) => ({ token: tokens.get(f.teamId) }),
  },
  {
    file: 'accounts/password-reset/route.ts',
    method: 'POST',
    params: () => ({}),
    body: (f) => ({ email: f.users.extra.email }),
    expect: everyone(202),
  },
  {
    file: 'accounts/password-reset/confirm/route.ts',
    method: 'POST',
    expect: everyone(200),
    params: async (f) => {
      tokens.set(f.teamId, await createResetToken(f.users.extra.id));
      return {};
    },
    body: (f) => ({ token: tokens.get(f.teamId), password: 'a brand new passphrase' }),
  },
  {
    file: 'accounts/password/route.ts',
    method: 'PUT',
    expect: signedIn(200),
    params: async (f) => {
      await giveKnownPassword(Object.values(f.users).map((u) => u.id));
      return {};
    },
    body: () => ({ currentPassword: KNOWN_PASSWORD, newPassword: 'another long passphrase' }),
  },
  { file: 'accounts/notifications/route.ts', method: 'GET', params: () => ({}), expect: signedIn(200) },
  {
    file: 'accounts/notifications/route.ts',
    method: 'PUT',
    params: () => ({}),
    body: () => ({ 'comment-mention': false }),
    expect: signedIn(200),
  },
  {
    file: 'teams/[teamId]/invitations/route.ts',
    method: 'GET',
    params: (f) => ({ teamId: f.teamId }),
    expect: onlyOwner(200),
  },
  {
    file: 'teams/[teamId]/invitations/route.ts',
    method: 'POST',
    params: (f) => ({ teamId: f.teamId }),
    body: (_f, n) => ({ email: `invitee-${Date.now()}-${n}@fixture.test`, role: 'surveyor' }),
    expect: onlyOwner(201),
  },
  {
    file: 'teams/[teamId]/invitations/[invitationId]/route.ts',
    method: 'DELETE',
    expect: onlyOwner(204),
    params: async (f) => ({
      teamId: f.teamId,
      invitationId: (
        await createInvitationToken(f.teamId, `withdrawn-${Date.now()}@fixture.test`, 'viewer', f.users.owner.id)
      ).id,
    }),
  },
  {
    // Each caller accepts an invitation to their own address (a new team none of them is on);
    // the anonymous caller accepts one for a fresh address as a new account.
    file: 'invitations/accept/route.ts',
    method: 'POST',
    expect: everyone(200),
    params: async (f) => {
      const team = await models().Team.create({ name: 'Inviting team' });
      const list: string[] = [];
      for (const actor of ACTORS) {
        const email = actor === 'anonymous' ? `accepting-${Date.now()}@fixture.test` : f.users[actor].email;
        list.push((await createInvitationToken(team.id, email, 'viewer', f.users.owner.id)).token);
      }
      tokens.set(f.teamId, list);
      return {};
    },
    body: (f, n) => ({
      token: (tokens.get(f.teamId) as string[])[n],
      ...(ACTORS[n] === 'anonymous' ? { name: 'New Invitee', password: 'a long enough passphrase' } : {}),
    }),
  },
];
