import { teamRoute } from '@/lib/api/route';
import { getRouteDetail, teamOfRoute } from '@/lib/data/routes';
import { notFound } from '@/lib/errors';
import { deleteRoute, updateRoute } from '@/lib/data/route-writes';
import { RouteParams, UpdateRouteSchema } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

export const GET = teamRoute({ params: RouteParams, permission: 'design.view', teamOf }, async ({ params }) => {
  const detail = await getRouteDetail(params.routeId);
  if (!detail) throw notFound('Route not found');
  return detail;
});

export const PATCH = teamRoute(
  { params: RouteParams, body: UpdateRouteSchema, permission: 'survey.edit', teamOf },
  async ({ params, body }) => ({ route: await updateRoute(params.routeId, body) }),
);

export const DELETE = teamRoute({ params: RouteParams, permission: 'survey.edit', teamOf }, async ({ params }) => {
  await deleteRoute(params.routeId);
});
