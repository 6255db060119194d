import { inRouteUnits } from '@/lib/data/line-routes';
import { ROUTE_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { teamOfRoute } from '@/lib/data/routes';
import { splitRouteById } from '@/lib/data/route-edits';
import { RouteParams, SplitRouteSchema } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

/** This route keeps the part before the chainage; a new route (201) holds the rest. */
export const POST = teamRoute(
  {
    params: RouteParams,
    body: SplitRouteSchema,
    bodyWords: inRouteUnits(ROUTE_WORDS),
    permission: 'survey.edit',
    teamOf,
    status: 201,
  },
  async ({ params, body, user }) => splitRouteById(params.routeId, user.id, body),
);
