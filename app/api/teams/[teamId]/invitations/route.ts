import { teamRoute } from '@/lib/api/route';
import { inviteToTeam, listOpenInvitations } from '@/lib/data/invitations';
import { teamOfTeamPath } from '@/lib/data/teams';
import { InviteMemberSchema, TeamParams } from '@/lib/validations/teams';

const teamOf = teamOfTeamPath;

export const GET = teamRoute({ params: TeamParams, permission: 'team.manage', teamOf }, async ({ teamId }) => ({
  invitations: await listOpenInvitations(teamId),
}));

/** Invites an address with a role; the link goes out by mail through the job queue. */
export const POST = teamRoute(
  { params: TeamParams, body: InviteMemberSchema, permission: 'team.manage', teamOf, status: 201 },
  async ({ teamId, user, body }) => ({ invitation: await inviteToTeam(teamId, user, body.email, body.role) }),
);
