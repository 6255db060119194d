import { parseQuery } from '@/lib/api/body';
import { inRouteUnits } from '@/lib/data/line-routes';
import { ROUTE_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { getRoutePointsPage, teamOfRoute } from '@/lib/data/routes';
import { saveRoutePoints } from '@/lib/data/route-writes';
import {
  firstPointNumberOf,
  MAX_POINTS_JSON_BYTES,
  RouteParams,
  RoutePointsQuerySchema,
  SavePointsSchema,
} from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

/**
 * A page of the route's rows by seq (`?offset=0&limit=50`, at most 500): the route table reads these, never the whole
 * route.
 */
export const GET = teamRoute({ params: RouteParams, permission: 'design.view', teamOf }, async ({ req, params }) => {
  const query = parseQuery(req, RoutePointsQuerySchema);
  return getRoutePointsPage(params.routeId, query.offset, query.limit);
});

/**
 * Saves the edited route in one transaction, whole or (with `window`) the page of rows edited; raw
 * survey heights are kept from the stored points. Answers with the route's view, not its points.
 */
export const PUT = teamRoute(
  {
    params: RouteParams,
    body: SavePointsSchema,
    bodyWords: { ...inRouteUnits(ROUTE_WORDS), firstNumberOf: firstPointNumberOf },
    permission: 'survey.edit',
    teamOf,
    maxBodyBytes: MAX_POINTS_JSON_BYTES,
  },
  async ({ params, body }) => saveRoutePoints(params.routeId, body),
);
