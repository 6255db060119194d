import { NETWORK_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { deleteNetworkNode, updateNetworkNode } from '@/lib/data/network';
import { teamOfProject, inProjectUnits } from '@/lib/data/projects';
import { NetworkNodeParams, NetworkNodeSchema } from '@/lib/validations/network';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const PUT = teamRoute(
  {
    params: NetworkNodeParams,
    body: NetworkNodeSchema,
    bodyWords: inProjectUnits(NETWORK_WORDS),
    permission: 'design.edit',
    teamOf,
  },
  async ({ params, body }) => ({ node: await updateNetworkNode(params.projectId, params.nodeId, body) }),
);

export const DELETE = teamRoute(
  { params: NetworkNodeParams, permission: 'design.edit', teamOf },
  async ({ params }) => {
    await deleteNetworkNode(params.projectId, params.nodeId);
  },
);
