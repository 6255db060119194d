import { teamRoute } from '@/lib/api/route';
import { addMember, listMembers, teamExists } from '@/lib/data/teams';
import { AddMemberSchema, TeamParams } from '@/lib/validations/teams';

const teamOf = ({ teamId }: { teamId: string }) => teamExists(teamId);

export const GET = teamRoute({ params: TeamParams, permission: 'team.view', teamOf }, async ({ teamId, user, role }) => ({
  members: await listMembers(teamId, { userId: user.id, role }),
}));

export const POST = teamRoute(
  { params: TeamParams, body: AddMemberSchema, permission: 'team.manage', teamOf, status: 201 },
  async ({ teamId, body }) => ({ member: await addMember(teamId, body.email, body.role) }),
);
