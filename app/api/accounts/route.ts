import { publicRoute } from '@/lib/api/route';
import { createAccount } from '@/lib/auth/users';
import { SignUpSchema } from '@/lib/validations/auth';

/** Sign up: a new account with a team of its own. */
export const POST = publicRoute({ body: SignUpSchema, status: 201 }, async ({ body }) => {
  const user = await createAccount(body);
  return { user: { id: user.id, email: user.email, name: user.name } };
});
