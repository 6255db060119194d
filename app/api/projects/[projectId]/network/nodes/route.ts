import { teamRoute } from '@/lib/api/route';
import { createNetworkNode } from '@/lib/data/network';
import { teamOfProject } from '@/lib/data/projects';
import { NetworkNodeSchema } from '@/lib/validations/network';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const POST = teamRoute(
  { params: ProjectParams, body: NetworkNodeSchema, permission: 'design.edit', teamOf, status: 201 },
  async ({ params, body }) => ({ node: await createNetworkNode(params.projectId, body) }),
);
