import { publicRoute } from '@/lib/api/route';
import { resetPassword } from '@/lib/accounts/password-reset';
import { PasswordResetSchema } from '@/lib/validations/auth';

/** Sets a new password from a reset link; every session of the account is signed out. */
export const POST = publicRoute({ body: PasswordResetSchema }, async ({ body }) => ({
  reset: await resetPassword(body.token, body.password),
}));
