import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { addCommissioningReading } from '@/lib/data/ram-commissioning';
import { RamSiteParams } from '@/lib/validations/lift-common';
import { CommissioningReadingSchema } from '@/lib/validations/ram-sites';

export const POST = teamRoute(
  {
    params: RamSiteParams,
    body: CommissioningReadingSchema,
    permission: 'design.edit',
    teamOf: ({ projectId }) => teamOfProject(projectId),
    status: 201,
  },
  async ({ params, body, user }) => addCommissioningReading(params.projectId, params.siteId, user.id, body),
);
