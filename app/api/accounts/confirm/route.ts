import { publicRoute } from '@/lib/api/route';
import { confirmSignUp } from '@/lib/accounts/sign-up';
import { ConfirmSignUpSchema } from '@/lib/validations/auth';

/** Confirms the address of a sign-up from its mailed link: the account exists from here on. */
export const POST = publicRoute({ body: ConfirmSignUpSchema }, async ({ body }) => ({
  confirmed: await confirmSignUp(body.token),
}));
