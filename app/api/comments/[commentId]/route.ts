import { teamRoute } from '@/lib/api/route';
import { setCommentResolved, teamOfComment } from '@/lib/data/comments';
import { CommentParams, UpdateCommentSchema } from '@/lib/validations/comments';

/** Resolve or reopen a thread. */
export const PATCH = teamRoute(
  {
    params: CommentParams,
    body: UpdateCommentSchema,
    permission: 'comment.route',
    teamOf: ({ commentId }) => teamOfComment(commentId),
  },
  async ({ params, body, user, role }) => ({
    comment: await setCommentResolved(params.commentId, user, role, body.resolved),
  }),
);
