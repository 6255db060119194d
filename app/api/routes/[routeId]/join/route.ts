import { inRouteUnits } from '@/lib/data/line-routes';
import { ROUTE_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { teamOfRoute } from '@/lib/data/routes';
import { joinRoutesById } from '@/lib/data/route-edits';
import { JoinRoutesSchema, RouteParams } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

/** A new route (201): this one with the other joined onto its end. */
export const POST = teamRoute(
  {
    params: RouteParams,
    body: JoinRoutesSchema,
    bodyWords: inRouteUnits(ROUTE_WORDS),
    permission: 'survey.edit',
    teamOf,
    status: 201,
  },
  async ({ params, body, user }) => ({ route: await joinRoutesById(params.routeId, user.id, body) }),
);
