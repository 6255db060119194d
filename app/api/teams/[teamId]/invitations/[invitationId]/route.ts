import { teamRoute } from '@/lib/api/route';
import { revokeInvitation } from '@/lib/data/invitations';
import { teamExists } from '@/lib/data/teams';
import { InvitationParams } from '@/lib/validations/teams';

const teamOf = ({ teamId }: { teamId: string }) => teamExists(teamId);

/** Withdraws an open invitation: its link stops working at once. */
export const DELETE = teamRoute({ params: InvitationParams, permission: 'team.manage', teamOf }, async ({ params }) => {
  await revokeInvitation(params.teamId, params.invitationId);
});
