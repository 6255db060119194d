import { NETWORK_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { createNetworkLink } from '@/lib/data/network';
import { teamOfProject, inProjectUnits } from '@/lib/data/projects';
import { NetworkLinkSchema } from '@/lib/validations/network';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const POST = teamRoute(
  {
    params: ProjectParams,
    body: NetworkLinkSchema,
    bodyWords: inProjectUnits(NETWORK_WORDS),
    permission: 'design.edit',
    teamOf,
    status: 201,
  },
  async ({ params, body }) => ({ link: await createNetworkLink(params.projectId, body) }),
);
