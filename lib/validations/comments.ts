import { z } from 'zod';
import { CommentAnchorSchema } from '../review/anchors';
import { safeText, uuid } from './common';

export const CommentParams = z.strictObject({ commentId: uuid('Comment id') });

/** A new comment or reply. A reply takes its thread's revision and anchor, so it sends neither. */
export const CreateCommentSchema = z.strictObject({
  body: safeText('Comment', 8000)
    .transform((s) => s.trim())
    .pipe(z.string().min(1, 'Write something first')),
  revisionId: uuid('Revision id').nullable().default(null),
  parentId: uuid('Reply-to comment id').nullable().default(null),
  anchor: CommentAnchorSchema.default({ kind: 'project' }),
  mentions: z
    .array(uuid('Mentioned member id'), { error: 'Mentions must be a list of member ids' })
    .max(20, 'Mention at most 20 people')
    .default([]),
});
export type CreateCommentInput = z.input<typeof CreateCommentSchema>;

export const UpdateCommentSchema = z.strictObject({ resolved: z.boolean({ error: 'Resolved must be true or false' }) });
export type UpdateCommentInput = z.input<typeof UpdateCommentSchema>;
