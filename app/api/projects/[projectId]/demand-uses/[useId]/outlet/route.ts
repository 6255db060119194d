import { teamRoute } from '@/lib/api/route';
import { tieDemandUse } from '@/lib/data/network';
import { teamOfProject } from '@/lib/data/projects';
import { DemandUseParams } from '@/lib/validations/lift-common';
import { DemandUseOutletSchema } from '@/lib/validations/network';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** Which outlet of the network a demand use is drawn at. */
export const PUT = teamRoute(
  { params: DemandUseParams, body: DemandUseOutletSchema, permission: 'design.edit', teamOf },
  async ({ params, body }) => {
    await tieDemandUse(params.projectId, params.useId, body.outletNodeId);
    return { useId: params.useId, outletNodeId: body.outletNodeId };
  },
);
