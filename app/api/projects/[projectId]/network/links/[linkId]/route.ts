import { teamRoute } from '@/lib/api/route';
import { deleteNetworkLink, updateNetworkLink } from '@/lib/data/network';
import { teamOfProject } from '@/lib/data/projects';
import { NetworkLinkParams, NetworkLinkSchema } from '@/lib/validations/network';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const PUT = teamRoute(
  { params: NetworkLinkParams, body: NetworkLinkSchema, permission: 'design.edit', teamOf },
  async ({ params, body }) => ({ link: await updateNetworkLink(params.projectId, params.linkId, body) }),
);

export const DELETE = teamRoute({ params: NetworkLinkParams, permission: 'design.edit', teamOf }, async ({ params }) => {
  await deleteNetworkLink(params.projectId, params.linkId);
});
