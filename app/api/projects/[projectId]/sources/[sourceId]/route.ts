import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { deleteSource, updateSource } from '@/lib/data/water-sources';
import { SourceParams } from '@/lib/validations/lift-common';
import { WaterSourceSchema } from '@/lib/validations/water-sources';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const PUT = teamRoute(
  { params: SourceParams, body: WaterSourceSchema, permission: 'design.edit', teamOf },
  async ({ params, body }) => ({ source: await updateSource(params.projectId, params.sourceId, body) }),
);

export const DELETE = teamRoute({ params: SourceParams, permission: 'design.edit', teamOf }, async ({ params }) => {
  await deleteSource(params.projectId, params.sourceId);
});
