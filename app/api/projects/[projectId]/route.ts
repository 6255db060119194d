import { PROJECT_WORDS } from '@/lib/validations/field-word-tables';
import { teamRoute } from '@/lib/api/route';
import { deleteProject, getProject, teamOfProject, updateProject, inProjectUnits } from '@/lib/data/projects';
import { ProjectParams, UpdateProjectSchema } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'project.view', teamOf }, async ({ params }) => ({
  project: await getProject(params.projectId),
}));

export const PATCH = teamRoute(
  {
    params: ProjectParams,
    body: UpdateProjectSchema,
    bodyWords: inProjectUnits(PROJECT_WORDS),
    permission: 'project.edit',
    teamOf,
  },
  async ({ params, body }) => ({ project: await updateProject(params.projectId, body) }),
);

export const DELETE = teamRoute({ params: ProjectParams, permission: 'project.delete', teamOf }, async ({ params }) => {
  await deleteProject(params.projectId);
});
