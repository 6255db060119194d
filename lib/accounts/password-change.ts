import 'server-only';
import { models } from '../../models';
import { hashPassword, verifyPassword } from '../auth/password';
import { AppError } from '../errors';

/**
 * Changes the password of a signed-in person who knows the current one. Every session ends
 * (the caller signs in again with the new password), so a stolen session does not outlive it.
 */
export async function changePassword(userId: string, currentPassword: string, newPassword: string): Promise<void> {
  const { User } = models();
  const user = await User.findByPk(userId);
  if (!user || !(await verifyPassword(user.passwordHash, currentPassword))) {
    throw new AppError('bad_request', 'The current password is not right', {
      currentPassword: ['The current password is not right'],
    });
  }
  user.passwordHash = await hashPassword(newPassword);
  user.sessionVersion += 1;
  await user.save();
}
