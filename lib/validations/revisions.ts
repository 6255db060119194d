import { z } from 'zod';
import { safeText, uuid } from './common';

export const RevisionParams = z.strictObject({ revisionId: uuid('Revision id') });
export const RevisionLineParams = z.strictObject({ revisionId: uuid('Revision id'), lineId: uuid('Line id') });
export const RevisionPairParams = z.strictObject({
  revisionId: uuid('Revision id'),
  otherId: uuid('Other revision id'),
});

const note = safeText('Note', 4000).transform((s) => s.trim());

/**
 * A new revision: a note, and whether to submit it for review at once. Status is never sent: it is the cycle's to set.
 */
export const CreateRevisionSchema = z.strictObject({
  note: note.default(''),
  submit: z.boolean({ error: 'Submit must be true or false' }).default(false),
});
export type CreateRevisionInput = z.input<typeof CreateRevisionSchema>;

/** A step of the review cycle, with an optional note (why changes are wanted). */
export const RevisionActionSchema = z.strictObject({ note: note.default('') }).optional();
export type RevisionActionInput = z.input<typeof RevisionActionSchema>;
