import { inRouteUnits } from '@/lib/data/line-routes';
import { ROUTE_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { teamOfRoute } from '@/lib/data/routes';
import { saveRoutePoints } from '@/lib/data/route-writes';
import { MAX_POINTS_JSON_BYTES, RouteParams, SavePointsSchema } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

/** Saves the whole edited route in one transaction; raw survey heights are kept from the stored points. */
export const PUT = teamRoute(
  { params: RouteParams, body: SavePointsSchema, bodyWords: inRouteUnits(ROUTE_WORDS), permission: 'survey.edit', teamOf, maxBodyBytes: MAX_POINTS_JSON_BYTES },
  async ({ params, body }) => saveRoutePoints(params.routeId, body),
);
