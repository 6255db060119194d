import { teamRoute } from '@/lib/api/route';
import { getNetworkRun } from '@/lib/data/network-runs';
import { teamOfProject } from '@/lib/data/projects';
import { NetworkJobParams } from '@/lib/validations/network';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: NetworkJobParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  run: await getNetworkRun(params.projectId, params.jobId),
}));
