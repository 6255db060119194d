import { teamRoute } from '@/lib/api/route';
import { networkView } from '@/lib/data/network-view';
import { teamOfProject } from '@/lib/data/projects';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  network: await networkView(params.projectId),
}));
