import 'server-only';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import type { AccountToken, AccountTokenPurpose } from '../../models/account-token';
import { hashLinkToken } from '../auth/tokens';
import { AppError } from '../errors';

const REFUSAL: Record<AccountTokenPurpose, string> = {
  'sign-up':
    'This confirmation link cannot be used: it was already used, replaced by a newer one or has expired. Sign up again to get a new link.',
  'password-reset':
    'This reset link cannot be used: it was already used, replaced by a newer one or has expired. Ask for a new one.',
};

/** The unused, unexpired token row for a link, locked for the caller's transaction; refused otherwise. */
export async function claimAccountToken(
  transaction: Transaction,
  purpose: AccountTokenPurpose,
  token: string,
): Promise<AccountToken> {
  const row = await models().AccountToken.findOne({
    where: { tokenHash: hashLinkToken(token), purpose },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!row || row.usedAt || row.expiresAt.getTime() <= Date.now()) {
    throw new AppError('bad_request', REFUSAL[purpose], { token: [REFUSAL[purpose]] });
  }
  return row;
}
