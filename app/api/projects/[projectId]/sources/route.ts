import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { createSource, listSources } from '@/lib/data/water-sources';
import { ProjectParams } from '@/lib/validations/projects';
import { WaterSourceSchema } from '@/lib/validations/water-sources';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  sources: await listSources(params.projectId),
}));

export const POST = teamRoute(
  { params: ProjectParams, body: WaterSourceSchema, permission: 'design.edit', teamOf, status: 201 },
  async ({ params, body, user }) => ({ source: await createSource(params.projectId, user.id, body) }),
);
