import { models } from '../../models';
import type { Role } from '../roles';

/** The caller's role on a team, or null when they are not a member. Always read fresh. */
export async function roleOnTeam(userId: string, teamId: string): Promise<Role | null> {
  const membership = await models().Membership.findOne({ where: { userId, teamId }, attributes: ['role'], raw: true });
  return membership?.role ?? null;
}
