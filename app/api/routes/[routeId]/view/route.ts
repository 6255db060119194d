import { parseQuery } from '@/lib/api/body';
import { teamRoute } from '@/lib/api/route';
import { getRouteView, teamOfRoute } from '@/lib/data/routes';
import { notFound } from '@/lib/errors';
import { RouteParams, RouteViewQuerySchema } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

/**
 * What the route page draws above its table: header, profile thinned on the server (`?profilePoints=N`), plan,
 * proposals.
 */
export const GET = teamRoute({ params: RouteParams, permission: 'design.view', teamOf }, async ({ req, params }) => {
  const query = parseQuery(req, RouteViewQuerySchema);
  const view = await getRouteView(params.routeId, query.profilePoints);
  if (!view) throw notFound('Route not found');
  return view;
});
