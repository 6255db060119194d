import { publicRoute } from '@/lib/api/route';
import { requestPasswordReset } from '@/lib/accounts/password-reset';
import { PasswordResetRequestSchema } from '@/lib/validations/auth';

/** Asks for a reset link. The answer is the same whether or not the address has an account. */
export const POST = publicRoute({ body: PasswordResetRequestSchema, status: 202 }, async ({ body }) => {
  await requestPasswordReset(body.email);
  return { status: 'check-your-mail', email: body.email };
});
