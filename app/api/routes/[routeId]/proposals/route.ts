import { parseQuery } from '@/lib/api/body';
import { teamRoute } from '@/lib/api/route';
import { routeProposals, teamOfRoute } from '@/lib/data/routes';
import { RouteParams, RouteProposalsQuerySchema } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

/**
 * Clean-up proposed on request over the stored route (`?smoothingWindow=5`, or
 * `?benchmarkPoint=12&benchmarkElevationM=402.5`),
 * each with its place on the profile. Nothing is written: the user accepts or rejects them through `cleanup`.
 */
export const GET = teamRoute({ params: RouteParams, permission: 'design.view', teamOf }, async ({ req, params }) => {
  const query = parseQuery(req, RouteProposalsQuerySchema);
  return routeProposals(params.routeId, query);
});
