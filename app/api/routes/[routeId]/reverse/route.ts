import { teamRoute } from '@/lib/api/route';
import { teamOfRoute } from '@/lib/data/routes';
import { reverseRouteById } from '@/lib/data/route-edits';
import { RouteParams } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

export const POST = teamRoute({ params: RouteParams, permission: 'survey.edit', teamOf }, async ({ params }) =>
  reverseRouteById(params.routeId),
);
