import { TANK_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { teamOfProject, inProjectUnits } from '@/lib/data/projects';
import { createTank, listTanks } from '@/lib/data/tanks';
import { ProjectParams } from '@/lib/validations/projects';
import { TankSchema } from '@/lib/validations/tanks';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  tanks: await listTanks(params.projectId),
}));

export const POST = teamRoute(
  {
    params: ProjectParams,
    body: TankSchema,
    bodyWords: inProjectUnits(TANK_WORDS),
    permission: 'design.edit',
    teamOf,
    status: 201,
  },
  async ({ params, body, user }) => ({ tank: await createTank(params.projectId, user.id, body) }),
);
