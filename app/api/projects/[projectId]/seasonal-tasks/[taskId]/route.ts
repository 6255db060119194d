import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { deleteSeasonalTask, updateSeasonalTask } from '@/lib/data/seasonal-tasks';
import { SeasonalTaskParams } from '@/lib/validations/lift-common';
import { UpdateSeasonalTaskSchema } from '@/lib/validations/seasonal-tasks';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const PATCH = teamRoute(
  { params: SeasonalTaskParams, body: UpdateSeasonalTaskSchema, permission: 'design.edit', teamOf },
  async ({ params, body }) => ({ task: await updateSeasonalTask(params.projectId, params.taskId, body) }),
);

export const DELETE = teamRoute(
  { params: SeasonalTaskParams, permission: 'design.edit', teamOf },
  async ({ params }) => {
    await deleteSeasonalTask(params.projectId, params.taskId);
  },
);
