import { userRoute } from '@/lib/api/route';
import { changePassword } from '@/lib/accounts/password-change';
import { PasswordChangeSchema } from '@/lib/validations/auth';

/** Changes the caller's password; every session ends, the page signs in again with the new one. */
export const PUT = userRoute({ body: PasswordChangeSchema }, async ({ user, body }) => {
  await changePassword(user.id, body.currentPassword, body.newPassword);
  return { changed: true };
});
