import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { listRoutes } from '@/lib/data/routes';
import { createRoute } from '@/lib/data/route-writes';
import { ProjectParams } from '@/lib/validations/projects';
import { CreateRouteSchema } from '@/lib/validations/routes';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  routes: await listRoutes(params.projectId),
}));

/** An empty route to sketch or type points into when no survey file exists yet. */
export const POST = teamRoute(
  { params: ProjectParams, body: CreateRouteSchema, permission: 'survey.edit', teamOf, status: 201 },
  async ({ params, body, user }) => ({ route: await createRoute(params.projectId, user.id, body) }),
);
