import 'server-only';
import { Op } from 'sequelize';
import { models } from '../../models';
import { hashPassword } from '../auth/password';
import { LINK_LIFETIME_MS, newLinkToken } from '../auth/tokens';
import { passwordResetMail } from '../mail/messages';
import { queueMail } from '../mail/outbox';
import { claimAccountToken } from './link-tokens';

/** Mails a reset link when the address has an account; the caller answers the same either way. */
export async function requestPasswordReset(email: string): Promise<void> {
  const { User, AccountToken, sequelize } = models();
  await sequelize.transaction(async (transaction) => {
    const user = await User.findOne({ where: { email }, transaction });
    if (!user) return;
    const { token, hash } = newLinkToken();
    await AccountToken.create(
      {
        purpose: 'password-reset',
        email,
        userId: user.id,
        name: null,
        passwordHash: null,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + LINK_LIFETIME_MS['password-reset']),
      },
      { transaction },
    );
    await queueMail(transaction, passwordResetMail(email, token));
  });
}

/**
 * Sets the new password through a reset link, once: every other reset link of the account stops
 * working and every session is signed out (the session version moves on).
 */
export async function resetPassword(token: string, newPassword: string): Promise<{ email: string }> {
  const { User, AccountToken, sequelize } = models();
  const passwordHash = await hashPassword(newPassword);
  return sequelize.transaction(async (transaction) => {
    const row = await claimAccountToken(transaction, 'password-reset', token);
    const user = await User.findByPk(row.userId!, { transaction, lock: transaction.LOCK.UPDATE });
    const now = new Date();
    await AccountToken.update(
      { usedAt: now },
      { where: { purpose: 'password-reset', userId: row.userId, usedAt: { [Op.is]: null } }, transaction },
    );
    if (!user) return { email: row.email };
    user.passwordHash = passwordHash;
    user.sessionVersion += 1;
    // The link reached the mailbox: the address is proven.
    user.emailVerifiedAt ??= now;
    await user.save({ transaction });
    return { email: user.email };
  });
}
