import { teamRoute } from '@/lib/api/route';
import { listMembers, teamOfTeamPath } from '@/lib/data/teams';
import { TeamParams } from '@/lib/validations/teams';

const teamOf = teamOfTeamPath;

// Members join only by accepting an invitation (../invitations), never by being added directly.
export const GET = teamRoute(
  { params: TeamParams, permission: 'team.view', teamOf },
  async ({ teamId, user, role }) => ({
    members: await listMembers(teamId, { userId: user.id, role }),
  }),
);
