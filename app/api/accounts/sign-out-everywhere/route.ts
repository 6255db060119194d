import { userRoute } from '@/lib/api/route';
import { bumpSessionVersion } from '@/lib/auth/users';

/** Ends every session of the caller, on every device. */
export const POST = userRoute({}, async ({ user }) => {
  await bumpSessionVersion(user.id);
  return { signedOut: true };
});
