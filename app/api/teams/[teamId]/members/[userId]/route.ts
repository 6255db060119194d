import { teamRoute } from '@/lib/api/route';
import { changeRole, removeMember, teamOfTeamPath } from '@/lib/data/teams';
import { ChangeRoleSchema, MemberParams } from '@/lib/validations/teams';

const teamOf = teamOfTeamPath;

export const PATCH = teamRoute(
  { params: MemberParams, body: ChangeRoleSchema, permission: 'team.manage', teamOf },
  async ({ params, body }) => ({ member: await changeRole(params.teamId, params.userId, body.role) }),
);

export const DELETE = teamRoute({ params: MemberParams, permission: 'team.manage', teamOf }, async ({ params }) => {
  await removeMember(params.teamId, params.userId);
});
