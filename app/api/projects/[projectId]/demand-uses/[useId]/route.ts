import { teamRoute } from '@/lib/api/route';
import { deleteDemandUse, updateDemandUse } from '@/lib/data/demand-uses';
import { inProjectUnits, teamOfProject } from '@/lib/data/projects';
import { demandUseWords } from '@/lib/validations/field-word-tables';
import { DemandUseSchema } from '@/lib/validations/demand-uses';
import { DemandUseParams } from '@/lib/validations/lift-common';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const PUT = teamRoute(
  {
    params: DemandUseParams,
    body: DemandUseSchema,
    bodyWords: inProjectUnits(demandUseWords),
    permission: 'design.edit',
    teamOf,
  },
  async ({ params, body }) => ({ use: await updateDemandUse(params.projectId, params.useId, body) }),
);

export const DELETE = teamRoute({ params: DemandUseParams, permission: 'design.edit', teamOf }, async ({ params }) => {
  await deleteDemandUse(params.projectId, params.useId);
});
