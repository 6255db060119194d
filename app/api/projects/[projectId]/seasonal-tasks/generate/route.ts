import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { generateSeasonalTasks } from '@/lib/data/seasonal-tasks';
import { ProjectParams } from '@/lib/validations/projects';
import { GenerateSeasonalTasksSchema } from '@/lib/validations/seasonal-tasks';

/** Adds a year's drain-down, silt, intake-screen and valve tasks from the site's frost dates. */
export const POST = teamRoute(
  {
    params: ProjectParams,
    body: GenerateSeasonalTasksSchema,
    permission: 'design.edit',
    teamOf: ({ projectId }) => teamOfProject(projectId),
    status: 201,
  },
  async ({ params, body }) => ({ tasks: await generateSeasonalTasks(params.projectId, body) }),
);
