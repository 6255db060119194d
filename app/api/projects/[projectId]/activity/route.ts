import { parseQuery } from '@/lib/api/body';
import { teamRoute } from '@/lib/api/route';
import { listActivity } from '@/lib/data/activity';
import { teamOfProject } from '@/lib/data/projects';
import { ActivityQuerySchema } from '@/lib/validations/activity';
import { ProjectParams } from '@/lib/validations/projects';

/** Who did what and when on the project, newest first; the team's, not the client's. */
export const GET = teamRoute(
  { params: ProjectParams, permission: 'design.view', teamOf: ({ projectId }) => teamOfProject(projectId) },
  async ({ params, req }) => {
    const query = parseQuery(req, ActivityQuerySchema, 'The feed filters are not valid');
    return listActivity(params.projectId, query);
  },
);
