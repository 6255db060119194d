import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { createSeasonalTask, listSeasonalTasks } from '@/lib/data/seasonal-tasks';
import { ProjectParams } from '@/lib/validations/projects';
import { SeasonalTaskSchema } from '@/lib/validations/seasonal-tasks';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  tasks: await listSeasonalTasks(params.projectId),
}));

export const POST = teamRoute(
  { params: ProjectParams, body: SeasonalTaskSchema, permission: 'design.edit', teamOf, status: 201 },
  async ({ params, body }) => ({ task: await createSeasonalTask(params.projectId, body) }),
);
