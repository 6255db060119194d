import { beforeEach, describe, expect, it } from 'vitest';
import { POST as confirmSignUp } from '@/app/api/accounts/confirm/route';
import { PUT as changePassword } from '@/app/api/accounts/password/route';
import { POST as confirmReset } from '@/app/api/accounts/password-reset/confirm/route';
import { POST as requestReset } from '@/app/api/accounts/password-reset/route';
import { POST as signUp } from '@/app/api/accounts/route';
import { PUT as setNotifications } from '@/app/api/accounts/notifications/route';
import { POST as acceptInvitation } from '@/app/api/invitations/accept/route';
import { DELETE as revokeInvitation } from '@/app/api/teams/[teamId]/invitations/[invitationId]/route';
import { POST as invite } from '@/app/api/teams/[teamId]/invitations/route';
import { GET as listTeams } from '@/app/api/teams/route';
import { verifyPassword } from '@/lib/auth/password';
import { hashLinkToken } from '@/lib/auth/tokens';
import { models } from '@/models';
import {
  createInvitationToken,
  createResetToken,
  createSignUpToken,
  giveKnownPassword,
  KNOWN_PASSWORD,
} from '../support/account-fixtures';
import { call, createTeamFixture, sessionCookie } from '../support/api';

type Fixture = Awaited<ReturnType<typeof createTeamFixture>>;
const fresh = (label: string) => `${label}-${Date.now()}-${Math.round(Math.random() * 1e6)}@fixture.test`;
const outbox = (to: string) => models().MailOutbox.findAll({ where: { toAddress: to }, order: [['createdAt', 'ASC']] });
/** The token a mail carries, read back from its text (as the person would click it). */
const tokenIn = (text: string) => /token=([A-Za-z0-9_-]+)/.exec(text)?.[1] ?? null;

describe('answers do not reveal whether an address has an account', () => {
  let f: Fixture;
  beforeEach(async () => {
    f = await createTeamFixture();
  });

  it('sign-up: the same status and body for a known and an unknown address; only the mail differs', async () => {
    const unknown = fresh('newcomer');
    const body = (email: string) => ({ name: 'Wren Alder', email, password: 'a long enough passphrase' });
    const a = await call(signUp, { method: 'POST', path: '/api/accounts', body: body(unknown) });
    const b = await call(signUp, { method: 'POST', path: '/api/accounts', body: body(f.users.designer.email) });
    expect([a.status, b.status]).toEqual([202, 202]);
    expect(a.json).toEqual({ status: 'check-your-mail', email: unknown });
    expect(b.json).toEqual({ status: 'check-your-mail', email: f.users.designer.email });
    expect(Object.keys(a.json)).toEqual(Object.keys(b.json));
    // No account before the address is confirmed; the known one is untouched.
    expect(await models().User.count({ where: { email: unknown } })).toBe(0);
    expect((await outbox(unknown)).map((m) => m.kind)).toEqual(['sign-up']);
    expect((await outbox(f.users.designer.email)).map((m) => m.kind)).toEqual(['sign-up-existing']);
  });

  it('password reset: the same answer for a known and an unknown address; a link only goes to the account', async () => {
    const unknown = fresh('nobody');
    const a = await call(requestReset, { method: 'POST', path: '/x', body: { email: unknown } });
    const b = await call(requestReset, { method: 'POST', path: '/x', body: { email: f.users.viewer.email } });
    expect([a.status, b.status]).toEqual([202, 202]);
    expect({ ...a.json, email: '' }).toEqual({ ...b.json, email: '' });
    expect(await outbox(unknown)).toHaveLength(0);
    expect((await outbox(f.users.viewer.email)).map((m) => m.kind)).toEqual(['password-reset']);
  });

  it('invitation: the same answer for an address with an account and one without', async () => {
    const send = (email: string) =>
      call(invite, {
        method: 'POST',
        path: '/x',
        params: { teamId: f.teamId },
        body: { email, role: 'surveyor' },
        userId: f.users.owner.id,
      });
    const a = await send(fresh('stranger'));
    const b = await send(f.users.outsider.email);
    expect([a.status, b.status]).toEqual([201, 201]);
    const shape = (j: { invitation: Record<string, unknown> }) => ({
      ...j.invitation,
      id: 'x',
      email: 'x',
      expiresAt: 'x',
    });
    expect(shape(a.json)).toEqual(shape(b.json));
  });
});

describe('sign-up confirmation', () => {
  it('makes a verified account with a team of its own, once; a reused or expired link is refused', async () => {
    const { token, email } = await createSignUpToken();
    const res = await call(confirmSignUp, { method: 'POST', path: '/x', body: { token } });
    expect(res.status).toBe(200);
    const user = await models().User.findOne({ where: { email } });
    expect(user!.emailVerifiedAt).not.toBeNull();
    const teams = await call(listTeams, { method: 'GET', path: '/x', userId: user!.id });
    expect(teams.json.teams).toEqual([expect.objectContaining({ role: 'owner', name: "Fixture newcomer's team" })]);

    const again = await call(confirmSignUp, { method: 'POST', path: '/x', body: { token } });
    expect(again.status).toBe(400);
    expect(again.json.error.fields.token[0]).toMatch(/already used/);
    const expired = await createSignUpToken(-1000);
    expect((await call(confirmSignUp, { method: 'POST', path: '/x', body: { token: expired.token } })).status).toBe(
      400,
    );
    expect(await models().User.count({ where: { email: expired.email } })).toBe(0);
  });

  it('the link in the mail is the one that works, and only its hash is stored', async () => {
    const email = fresh('mailed');
    await call(signUp, {
      method: 'POST',
      path: '/api/accounts',
      body: { name: 'Ines Tarn', email, password: 'a long enough passphrase' },
    });
    const [mail] = await outbox(email);
    const token = tokenIn(mail.textBody)!;
    const stored = await models().AccountToken.findOne({ where: { email } });
    expect(stored!.tokenHash).toBe(hashLinkToken(token));
    expect(JSON.stringify(stored!.toJSON())).not.toContain(token);
    expect((await call(confirmSignUp, { method: 'POST', path: '/x', body: { token } })).status).toBe(200);
    expect(await models().User.count({ where: { email } })).toBe(1);
  });
});

describe('password reset and change', () => {
  let f: Fixture;
  beforeEach(async () => {
    f = await createTeamFixture();
  });

  it('a reset sets the password, signs every session out and works once', async () => {
    const oldCookie = await sessionCookie(f.users.designer.id);
    const token = await createResetToken(f.users.designer.id);
    const res = await call(confirmReset, {
      method: 'POST',
      path: '/x',
      body: { token, password: 'the new passphrase for the tank' },
    });
    expect(res.status).toBe(200);
    const user = await models().User.findByPk(f.users.designer.id);
    expect(await verifyPassword(user!.passwordHash, 'the new passphrase for the tank')).toBe(true);
    expect((await call(listTeams, { method: 'GET', path: '/x', cookie: oldCookie })).status).toBe(401);
    const reused = await call(confirmReset, {
      method: 'POST',
      path: '/x',
      body: { token, password: 'yet another passphrase' },
    });
    expect(reused.status).toBe(400);
  });

  it('an expired reset link is refused and the password stays', async () => {
    const before = (await models().User.findByPk(f.users.viewer.id))!.passwordHash;
    const token = await createResetToken(f.users.viewer.id, -1);
    expect(
      (await call(confirmReset, { method: 'POST', path: '/x', body: { token, password: 'a long enough passphrase' } }))
        .status,
    ).toBe(400);
    expect((await models().User.findByPk(f.users.viewer.id))!.passwordHash).toBe(before);
  });

  it('a change needs the current password and ends the other sessions', async () => {
    await giveKnownPassword([f.users.surveyor.id]);
    const cookie = await sessionCookie(f.users.surveyor.id);
    const wrong = await call(changePassword, {
      method: 'PUT',
      path: '/x',
      body: { currentPassword: 'not it at all', newPassword: 'a long enough passphrase' },
      cookie,
    });
    expect(wrong.status).toBe(400);
    expect(Object.keys(wrong.json.error.fields)).toEqual(['currentPassword']);
    const ok = await call(changePassword, {
      method: 'PUT',
      path: '/x',
      body: { currentPassword: KNOWN_PASSWORD, newPassword: 'a long enough passphrase' },
      cookie,
    });
    expect(ok.status).toBe(200);
    expect((await call(listTeams, { method: 'GET', path: '/x', cookie })).status).toBe(401);
  });
});

describe('invitations', () => {
  let f: Fixture;
  beforeEach(async () => {
    f = await createTeamFixture();
  });
  const acceptNew = (token: string) =>
    call(acceptInvitation, {
      method: 'POST',
      path: '/x',
      body: { token, name: 'Sorrel Vane', password: 'a long enough passphrase' },
    });

  it('a new person accepts from the mailed link and joins with the invited role; the inviter is told', async () => {
    const email = fresh('surveyor');
    const sent = await call(invite, {
      method: 'POST',
      path: '/x',
      params: { teamId: f.teamId },
      body: { email, role: 'surveyor' },
      userId: f.users.owner.id,
    });
    expect(sent.status).toBe(201);
    const [mail] = await outbox(email);
    expect(mail.kind).toBe('invitation');
    const res = await acceptNew(tokenIn(mail.textBody)!);
    expect(res.status).toBe(200);
    const user = await models().User.findOne({ where: { email } });
    expect(user!.emailVerifiedAt).not.toBeNull();
    const membership = await models().Membership.findOne({ where: { teamId: f.teamId, userId: user!.id } });
    expect(membership!.role).toBe('surveyor');
    expect((await outbox(f.users.owner.email)).map((m) => m.kind)).toContain('invitation-accepted');
  });

  it('a used, withdrawn or expired link is refused and nobody joins', async () => {
    const used = await createInvitationToken(f.teamId, fresh('used'), 'viewer', f.users.owner.id);
    expect((await acceptNew(used.token)).status).toBe(200);
    const reused = await acceptNew(used.token);
    expect(reused.status).toBe(400);
    expect(reused.json.error.message).toMatch(/already been used/);

    const withdrawnEmail = fresh('withdrawn');
    const withdrawn = await createInvitationToken(f.teamId, withdrawnEmail, 'designer', f.users.owner.id);
    expect(
      (
        await call(revokeInvitation, {
          method: 'DELETE',
          path: '/x',
          params: { teamId: f.teamId, invitationId: withdrawn.id },
          userId: f.users.owner.id,
        })
      ).status,
    ).toBe(204);
    const afterRevoke = await acceptNew(withdrawn.token);
    expect(afterRevoke.status).toBe(400);
    expect(afterRevoke.json.error.message).toMatch(/withdrawn/);
    expect(await models().User.count({ where: { email: withdrawnEmail } })).toBe(0);

    const expiredEmail = fresh('late');
    const expired = await createInvitationToken(f.teamId, expiredEmail, 'viewer', f.users.owner.id, -1000);
    const late = await acceptNew(expired.token);
    expect(late.status).toBe(400);
    expect(late.json.error.message).toMatch(/expired/);
    expect(await models().User.count({ where: { email: expiredEmail } })).toBe(0);
  });

  it('a signed-in person can accept only an invitation sent to their own address', async () => {
    const forOutsider = await createInvitationToken(f.teamId, f.users.outsider.email, 'reviewer', f.users.owner.id);
    const wrongPerson = await call(acceptInvitation, {
      method: 'POST',
      path: '/x',
      body: { token: forOutsider.token },
      userId: f.users.viewer.id,
    });
    expect(wrongPerson.status).toBe(403);
    const right = await call(acceptInvitation, {
      method: 'POST',
      path: '/x',
      body: { token: forOutsider.token },
      userId: f.users.outsider.id,
    });
    expect(right.status).toBe(200);
    expect(
      (await models().Membership.findOne({ where: { teamId: f.teamId, userId: f.users.outsider.id } }))!.role,
    ).toBe('reviewer');
  });

  it('a second invitation of the same address withdraws the first', async () => {
    const email = fresh('twice');
    const send = () =>
      call(invite, {
        method: 'POST',
        path: '/x',
        params: { teamId: f.teamId },
        body: { email, role: 'viewer' },
        userId: f.users.owner.id,
      });
    await send();
    await send();
    const [first, second] = await outbox(email);
    expect((await acceptNew(tokenIn(first.textBody)!)).status).toBe(400);
    expect((await acceptNew(tokenIn(second.textBody)!)).status).toBe(200);
  });

  it('an inviter who turned "invitation accepted" off gets no mail for it', async () => {
    await call(setNotifications, {
      method: 'PUT',
      path: '/x',
      body: { 'invitation-accepted': false },
      userId: f.users.owner.id,
    });
    const before = (await outbox(f.users.owner.email)).length;
    const { token } = await createInvitationToken(f.teamId, fresh('quiet'), 'viewer', f.users.owner.id);
    expect((await acceptNew(token)).status).toBe(200);
    expect(await outbox(f.users.owner.email)).toHaveLength(before);
  });
});
