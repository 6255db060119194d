import { teamRoute } from '@/lib/api/route';
import { startNetworkRun } from '@/lib/data/network-runs';
import { teamOfProject } from '@/lib/data/projects';
import { NetworkRunSchema } from '@/lib/validations/network';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** Starts a solve, a 24-hour day or least-cost sizing; answers at once with the run to poll. */
export const POST = teamRoute(
  { params: ProjectParams, body: NetworkRunSchema, permission: 'design.view', teamOf, status: 202 },
  async ({ params, body, user }) => ({ run: await startNetworkRun(params.projectId, user.id, body) }),
);
