import { teamRoute } from '@/lib/api/route';
import { applyChosenSizes } from '@/lib/data/network-apply-sizes';
import { teamOfProject } from '@/lib/data/projects';
import { NetworkJobParams } from '@/lib/validations/network';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** Writes the pipes a finished sizing run chose to the network's pipes and lines, in one transaction. */
export const POST = teamRoute(
  { params: NetworkJobParams, permission: 'design.edit', teamOf },
  async ({ params, user }) => ({
    applied: await applyChosenSizes(params.projectId, user.id, params.jobId),
  }),
);
