import { teamRoute } from '@/lib/api/route';
import { createComment, listComments } from '@/lib/data/comments';
import { teamOfProject } from '@/lib/data/projects';
import { CreateCommentSchema } from '@/lib/validations/comments';
import { ProjectParams } from '@/lib/validations/projects';

const teamOf = ({ projectId }: { projectId: string }) => teamOfProject(projectId);

/** Review comments; a client reads those on approved and issued revisions only. */
export const GET = teamRoute(
  { params: ProjectParams, permission: 'project.view', teamOf },
  async ({ params, role }) => ({
    comments: await listComments(params.projectId, role),
  }),
);

/** Owners, designers and reviewers comment anywhere; surveyors on routes (checked with the anchor). */
export const POST = teamRoute(
  { params: ProjectParams, body: CreateCommentSchema, permission: 'comment.route', teamOf, status: 201 },
  async ({ params, body, user, role }) => ({ comment: await createComment(params.projectId, user, role, body) }),
);
