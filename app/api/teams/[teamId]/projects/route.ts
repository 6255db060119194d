import { teamRoute } from '@/lib/api/route';
import { createProject, listProjects } from '@/lib/data/projects';
import { teamOfTeamPath } from '@/lib/data/teams';
import { CreateProjectSchema } from '@/lib/validations/projects';
import { TeamParams } from '@/lib/validations/teams';

const teamOf = teamOfTeamPath;

export const GET = teamRoute({ params: TeamParams, permission: 'project.view', teamOf }, async ({ teamId }) => ({
  projects: await listProjects(teamId),
}));

export const POST = teamRoute(
  { params: TeamParams, body: CreateProjectSchema, permission: 'project.create', teamOf, status: 201 },
  async ({ teamId, user, body }) => ({ project: await createProject(teamId, user.id, body) }),
);
