import { models } from '../../models';

export interface SessionUser {
  id: string;
  email: string;
  name: string;
  sessionVersion: number;
}

/** Ends every session of the user: tokens carry the version they were issued with. */
export async function bumpSessionVersion(userId: string): Promise<void> {
  const { User } = models();
  await User.increment('sessionVersion', { where: { id: userId } });
}
