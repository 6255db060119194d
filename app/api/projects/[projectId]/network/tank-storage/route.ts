import { teamRoute } from '@/lib/api/route';
import { tankStorageOfProject } from '@/lib/data/network-tank-storage';
import { teamOfProject } from '@/lib/data/projects';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** Each tank's storage sized from the outlets it serves in the network (solved on the worker pool). */
export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  storage: await tankStorageOfProject(params.projectId),
}));
