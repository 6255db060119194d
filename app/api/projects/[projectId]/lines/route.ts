import { teamRoute } from '@/lib/api/route';
import { createLine, listLines } from '@/lib/data/lines';
import { teamOfProject, unitSystemOfProject } from '@/lib/data/projects';
import { NEW_LINE_WORDS } from '@/lib/validations/field-word-tables';
import { CreateLineSchema } from '@/lib/validations/lines';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

export const GET = teamRoute({ params: ProjectParams, permission: 'design.view', teamOf }, async ({ params }) => ({
  lines: await listLines(params.projectId),
}));

export const POST = teamRoute(
  {
    params: ProjectParams,
    body: CreateLineSchema,
    permission: 'design.edit',
    teamOf,
    status: 201,
    bodyWords: { table: NEW_LINE_WORDS, unitsOf: ({ projectId }) => unitSystemOfProject(projectId) },
  },
  async ({ params, user, body }) => ({ line: await createLine(params.projectId, user.id, body) }),
);
