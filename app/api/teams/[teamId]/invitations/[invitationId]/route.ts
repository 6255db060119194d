import { teamRoute } from '@/lib/api/route';
import { revokeInvitation } from '@/lib/data/invitations';
import { teamOfTeamPath } from '@/lib/data/teams';
import { InvitationParams } from '@/lib/validations/teams';

const teamOf = teamOfTeamPath;

/** Withdraws an open invitation: its link stops working at once. */
export const DELETE = teamRoute({ params: InvitationParams, permission: 'team.manage', teamOf }, async ({ params }) => {
  await revokeInvitation(params.teamId, params.invitationId);
});
