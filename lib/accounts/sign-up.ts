import 'server-only';
import { Op } from 'sequelize';
import { models } from '../../models';
import { hashPassword } from '../auth/password';
import { LINK_LIFETIME_MS, newLinkToken } from '../auth/tokens';
import { alreadyRegisteredMail, signUpMail } from '../mail/messages';
import { queueMail } from '../mail/outbox';
import type { SignUpInput } from '../validations/auth';
import { claimAccountToken } from './link-tokens';

/**
 * Starts a sign-up: the account exists only once the address is confirmed through the mailed
 * link. A known address gets a "you already have an account" mail instead; the caller's answer is
 * the same either way, and the password is hashed on both paths so the timing is too.
 */
export async function requestSignUp(input: SignUpInput): Promise<void> {
  const { User, AccountToken, sequelize } = models();
  const passwordHash = await hashPassword(input.password);
  await sequelize.transaction(async (transaction) => {
    const existing = await User.findOne({ where: { email: input.email }, transaction });
    if (existing) {
      await queueMail(transaction, alreadyRegisteredMail(input.email));
      return;
    }
    const { token, hash } = newLinkToken();
    await AccountToken.create(
      {
        purpose: 'sign-up',
        email: input.email,
        userId: null,
        name: input.name,
        passwordHash,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + LINK_LIFETIME_MS['sign-up']),
      },
      { transaction },
    );
    await queueMail(transaction, signUpMail(input.email, input.name, token));
  });
}

/** Confirms a sign-up: makes the (verified) account and its own team, once. */
export async function confirmSignUp(token: string): Promise<{ email: string }> {
  const { User, Team, Membership, AccountToken, sequelize } = models();
  return sequelize.transaction(async (transaction) => {
    const row = await claimAccountToken(transaction, 'sign-up', token);
    const now = new Date();
    // Every pending sign-up of the address ends here: only the confirmed one becomes the account.
    await AccountToken.update(
      { usedAt: now },
      { where: { purpose: 'sign-up', email: row.email, usedAt: { [Op.is]: null } }, transaction },
    );
    const existing = await User.findOne({ where: { email: row.email }, transaction });
    if (existing) return { email: row.email };
    const user = await User.create(
      { email: row.email, name: row.name!, passwordHash: row.passwordHash!, emailVerifiedAt: now },
      { transaction },
    );
    const team = await Team.create({ name: `${user.name}'s team` }, { transaction });
    await Membership.create({ teamId: team.id, userId: user.id, role: 'owner' }, { transaction });
    return { email: user.email };
  });
}
