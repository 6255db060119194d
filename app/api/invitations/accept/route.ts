import { publicRoute } from '@/lib/api/route';
import { hashPassword } from '@/lib/auth/password';
import { userFromRequest } from '@/lib/auth/session';
import { acceptInvitation } from '@/lib/data/invitations';
import { AppError } from '@/lib/errors';
import { AcceptInvitationSchema } from '@/lib/validations/auth';

/**
 * Accepts an invitation from its link. Signed in: joins with that account (it must be the invited
 * address). Not signed in: name and password make a new account for the invited address.
 */
export const POST = publicRoute({ body: AcceptInvitationSchema }, async ({ req, body }) => {
  const user = await userFromRequest(req);
  if (user) return { joined: await acceptInvitation(body.token, { as: 'signed-in', user }) };
  if (!body.name || !body.password) {
    const fields: Record<string, string[]> = {};
    if (!body.name) fields.name = ['Enter your name'];
    if (!body.password) fields.password = ['Choose a password'];
    throw new AppError(
      'bad_request',
      'Enter your name and a password to create your account, or sign in first',
      fields,
    );
  }
  const passwordHash = await hashPassword(body.password);
  return { joined: await acceptInvitation(body.token, { as: 'new-account', name: body.name, passwordHash }) };
});
