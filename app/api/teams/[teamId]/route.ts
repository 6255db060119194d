import { teamRoute } from '@/lib/api/route';
import { getTeam, renameTeam, teamOfTeamPath } from '@/lib/data/teams';
import { RenameTeamSchema, TeamParams } from '@/lib/validations/teams';

const teamOf = teamOfTeamPath;

export const GET = teamRoute({ params: TeamParams, permission: 'team.view', teamOf }, async ({ teamId, role }) => ({
  team: { ...(await getTeam(teamId))!, role },
}));

export const PATCH = teamRoute(
  { params: TeamParams, body: RenameTeamSchema, permission: 'team.manage', teamOf },
  async ({ teamId, body }) => ({ team: await renameTeam(teamId, body.name) }),
);
