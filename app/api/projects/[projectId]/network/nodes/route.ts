import { NETWORK_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { createNetworkNode } from '@/lib/data/network';
import { teamOfProject, inProjectUnits } from '@/lib/data/projects';
import { NetworkNodeSchema } from '@/lib/validations/network';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const POST = teamRoute(
  {
    params: ProjectParams,
    body: NetworkNodeSchema,
    bodyWords: inProjectUnits(NETWORK_WORDS),
    permission: 'design.edit',
    teamOf,
    status: 201,
  },
  async ({ params, body }) => ({ node: await createNetworkNode(params.projectId, body) }),
);
