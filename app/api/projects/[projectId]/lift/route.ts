import { teamRoute } from '@/lib/api/route';
import { getLiftSummary } from '@/lib/data/lift-summary';
import { teamOfProject } from '@/lib/data/projects';
import { ProjectParams } from '@/lib/validations/projects';

/** Plans, yields, demand, storage and seasonal tasks of a project, computed from its stored rows. */
export const GET = teamRoute(
  { params: ProjectParams, permission: 'design.view', teamOf: ({ projectId }) => teamOfProject(projectId) },
  async ({ params }) => ({ lift: await getLiftSummary(params.projectId) }),
);
