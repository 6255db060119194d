import { publicRoute } from '@/lib/api/route';
import { requestSignUp } from '@/lib/accounts/sign-up';
import { SignUpSchema } from '@/lib/validations/auth';

/**
 * Sign up: mails a confirmation link; the account (and its own team) is made when the link is
 * used. The answer is the same whether or not the address already has an account.
 */
export const POST = publicRoute({ body: SignUpSchema, status: 202 }, async ({ body }) => {
  await requestSignUp(body);
  return { status: 'check-your-mail', email: body.email };
});
