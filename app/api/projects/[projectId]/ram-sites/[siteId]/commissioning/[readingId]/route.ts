import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { deleteCommissioningReading } from '@/lib/data/ram-commissioning';
import { CommissioningParams } from '@/lib/validations/lift-common';

export const DELETE = teamRoute(
  { params: CommissioningParams, permission: 'design.edit', teamOf: ({ projectId }) => teamOfProject(projectId) },
  async ({ params }) => {
    await deleteCommissioningReading(params.projectId, params.siteId, params.readingId);
  },
);
