import { teamRoute } from '@/lib/api/route';
import { teamOfRoute } from '@/lib/data/routes';
import { decideCleanup } from '@/lib/data/route-writes';
import { CleanupDecisionSchema, MAX_POINTS_JSON_BYTES, RouteParams } from '@/lib/validations/routes';

const teamOf = ({ routeId }: { routeId: string }) => teamOfRoute(routeId);

/** Accepts and rejects clean-up proposals (height fixes, exclusions, smoothing, benchmark offsets). */
export const POST = teamRoute(
  {
    params: RouteParams,
    body: CleanupDecisionSchema,
    permission: 'survey.edit',
    teamOf,
    maxBodyBytes: MAX_POINTS_JSON_BYTES,
  },
  async ({ params, body, user }) => decideCleanup(params.routeId, body, user.id),
);
