import { teamRoute } from '@/lib/api/route';
import { createNetworkLink } from '@/lib/data/network';
import { teamOfProject } from '@/lib/data/projects';
import { NetworkLinkSchema } from '@/lib/validations/network';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const POST = teamRoute(
  { params: ProjectParams, body: NetworkLinkSchema, permission: 'design.edit', teamOf, status: 201 },
  async ({ params, body }) => ({ link: await createNetworkLink(params.projectId, body) }),
);
