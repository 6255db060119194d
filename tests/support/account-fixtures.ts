import './env';
import { randomUUID } from 'node:crypto';
import { hashPassword } from '@/lib/auth/password';
import { LINK_LIFETIME_MS, newLinkToken } from '@/lib/auth/tokens';
import type { Role } from '@/lib/roles';
import { models } from '@/models';

/** The password every fixture user gets when a test needs to know it. */
export const KNOWN_PASSWORD = 'fixture passphrase at the spring';
let knownHash: Promise<string> | undefined;

export async function giveKnownPassword(userIds: string[]): Promise<void> {
  knownHash ??= hashPassword(KNOWN_PASSWORD);
  await models().User.update({ passwordHash: await knownHash }, { where: { id: userIds } });
}

/** A pending sign-up for a fresh address; returns the link token (as the mail would carry it). */
export async function createSignUpToken(
  expiresInMs = LINK_LIFETIME_MS['sign-up'],
): Promise<{ token: string; email: string }> {
  knownHash ??= hashPassword(KNOWN_PASSWORD);
  const email = `signup-${randomUUID().slice(0, 8)}@fixture.test`;
  const { token, hash } = newLinkToken();
  await models().AccountToken.create({
    purpose: 'sign-up',
    email,
    userId: null,
    name: 'Fixture newcomer',
    passwordHash: await knownHash,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + expiresInMs),
  });
  return { token, email };
}

export async function createResetToken(
  userId: string,
  expiresInMs = LINK_LIFETIME_MS['password-reset'],
): Promise<string> {
  const user = await models().User.findByPk(userId);
  const { token, hash } = newLinkToken();
  await models().AccountToken.create({
    purpose: 'password-reset',
    email: user!.email,
    userId,
    name: null,
    passwordHash: null,
    tokenHash: hash,
    expiresAt: new Date(Date.now() + expiresInMs),
  });
  return token;
}

/** An invitation of `email` to `teamId` made straight in the database; returns the link token. */
export async function createInvitationToken(
  teamId: string,
  email: string,
  role: Role,
  invitedBy: string | null,
  expiresInMs = LINK_LIFETIME_MS.invitation,
): Promise<{ token: string; id: string }> {
  const { token, hash } = newLinkToken();
  const row = await models().Invitation.create({
    teamId,
    email,
    role,
    tokenHash: hash,
    invitedBy,
    expiresAt: new Date(Date.now() + expiresInMs),
  });
  return { token, id: row.id };
}
