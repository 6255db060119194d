import { NETWORK_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { deleteNetworkLink, updateNetworkLink } from '@/lib/data/network';
import { teamOfProject, inProjectUnits } from '@/lib/data/projects';
import { NetworkLinkParams, NetworkLinkSchema } from '@/lib/validations/network';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const PUT = teamRoute(
  {
    params: NetworkLinkParams,
    body: NetworkLinkSchema,
    bodyWords: inProjectUnits(NETWORK_WORDS),
    permission: 'design.edit',
    teamOf,
  },
  async ({ params, body }) => ({ link: await updateNetworkLink(params.projectId, params.linkId, body) }),
);

export const DELETE = teamRoute(
  { params: NetworkLinkParams, permission: 'design.edit', teamOf },
  async ({ params }) => {
    await deleteNetworkLink(params.projectId, params.linkId);
  },
);
