import { createRevision } from '@/lib/data/revisions';
import type { RevisionStatus } from '@/lib/review/statuses';
import { models } from '@/models';

/** A revision of the fixture project made by `authorId` (the designer by default), moved straight to `status`. */
export async function createRevisionFixture(
  f: { projectId: string; users: Record<string, { id: string; email: string }> },
  status: RevisionStatus = 'submitted',
  authorId = f.users.designer.id,
): Promise<{ id: string; number: number }> {
  const author = await models().User.findByPk(authorId);
  if (!author) throw new Error('fixture author is gone');
  const made = await createRevision(
    f.projectId,
    { id: author.id, email: author.email, name: author.name, sessionVersion: author.sessionVersion },
    { note: 'Fixture revision', submit: false },
  );
  const reviewed = ['approved', 'issued', 'superseded', 'changes-requested'].includes(status);
  await models().Revision.update(
    { status, ...(reviewed ? { reviewedBy: f.users.reviewer.id, reviewedAt: new Date('2026-12-01T09:00:00Z') } : {}) },
    { where: { id: made.id } },
  );
  return { id: made.id, number: made.number };
}

/** A comment by the reviewer on the working copy, pinned at ch. 120 m of the fixture line. */
export async function createCommentFixture(f: {
  projectId: string;
  lineId: string;
  users: Record<string, { id: string }>;
}): Promise<{ id: string }> {
  const row = await models().Comment.create({
    projectId: f.projectId,
    revisionId: null,
    parentId: null,
    authorId: f.users.reviewer.id,
    body: 'Is the class right in the sag?',
    anchor: { kind: 'line-chainage', lineId: f.lineId, chainageM: 120 },
  });
  return { id: row.id };
}
