import { inRouteUnits } from '@/lib/data/line-routes';
import { ROUTE_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { teamOfRoute } from '@/lib/data/routes';
import { trimRouteById } from '@/lib/data/route-edits';
import { RouteParams, TrimRouteSchema } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

export const POST = teamRoute(
  {
    params: RouteParams,
    body: TrimRouteSchema,
    bodyWords: inRouteUnits(ROUTE_WORDS),
    permission: 'survey.edit',
    teamOf,
  },
  async ({ params, body }) => trimRouteById(params.routeId, body),
);
