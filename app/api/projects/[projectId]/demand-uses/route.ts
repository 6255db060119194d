import { teamRoute } from '@/lib/api/route';
import { createDemandUse, listDemandUses } from '@/lib/data/demand-uses';
import { inProjectUnits, teamOfProject } from '@/lib/data/projects';
import { demandUseWords } from '@/lib/validations/field-word-tables';
import { DemandUseSchema } from '@/lib/validations/demand-uses';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  uses: await listDemandUses(params.projectId),
}));

export const POST = teamRoute(
  {
    params: ProjectParams,
    body: DemandUseSchema,
    bodyWords: inProjectUnits(demandUseWords),
    permission: 'design.edit',
    teamOf,
    status: 201,
  },
  async ({ params, body }) => ({ use: await createDemandUse(params.projectId, body) }),
);
