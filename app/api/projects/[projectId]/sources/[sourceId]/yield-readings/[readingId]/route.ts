import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { deleteYieldReading } from '@/lib/data/water-sources';
import { YieldReadingParams } from '@/lib/validations/lift-common';

export const DELETE = teamRoute(
  { params: YieldReadingParams, permission: 'yield.log', teamOf: ({ projectId }) => teamOfProject(projectId) },
  async ({ params }) => {
    await deleteYieldReading(params.projectId, params.sourceId, params.readingId);
  },
);
