import { teamRoute } from '@/lib/api/route';
import { teamOfProject } from '@/lib/data/projects';
import { createRevision, listRevisions } from '@/lib/data/revisions';
import { ProjectParams } from '@/lib/validations/projects';
import { CreateRevisionSchema } from '@/lib/validations/revisions';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** The project's revisions; a client sees the approved and issued ones only. */
export const GET = teamRoute(
  { params: ProjectParams, permission: 'project.view', teamOf },
  async ({ params, role }) => ({
    revisions: await listRevisions(params.projectId, role),
  }),
);

export const POST = teamRoute(
  { params: ProjectParams, body: CreateRevisionSchema, permission: 'design.edit', teamOf, status: 201 },
  async ({ params, user, body }) => ({ revision: await createRevision(params.projectId, user, body) }),
);
