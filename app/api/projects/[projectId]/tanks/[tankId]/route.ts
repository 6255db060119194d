import { TANK_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { teamOfProject, inProjectUnits } from '@/lib/data/projects';
import { deleteTank, updateTank } from '@/lib/data/tanks';
import { TankParams } from '@/lib/validations/lift-common';
import { TankSchema } from '@/lib/validations/tanks';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const PUT = teamRoute(
  { params: TankParams, body: TankSchema, bodyWords: inProjectUnits(TANK_WORDS), permission: 'design.edit', teamOf },
  async ({ params, body }) => ({ tank: await updateTank(params.projectId, params.tankId, body) }),
);

export const DELETE = teamRoute({ params: TankParams, permission: 'design.edit', teamOf }, async ({ params }) => {
  await deleteTank(params.projectId, params.tankId);
});
