import 'server-only';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import { enqueueNotification } from './enqueue';
import type { NotificationKind } from './kinds';

/** The part of a project activity a notification needs (the activity feed's own record shape). */
export interface ActivityForNotice {
  projectId: string;
  actorUserId: string | null;
  kind: string;
  summary: string;
  /** What the activity is about: a revision's mail links to that revision. */
  subjectType?: string | null;
  subjectId?: string | null;
  /** `revisionId` on a comment made on a revision: its mail links to that revision. */
  data?: { mentions?: string[]; authorUserId?: string; revisionId?: string; [key: string]: unknown };
}

/** The page the mail opens: the revision the activity is about when there is one, else the project. */
function pathOf(projectId: string, activity: ActivityForNotice): string {
  const revisionId = activity.subjectType === 'revision' ? activity.subjectId : activity.data?.revisionId;
  return revisionId ? `/projects/${projectId}/reviews/${revisionId}` : `/projects/${projectId}`;
}

/** Which activity kinds people are told of, and who: the revision's author, those mentioned, or the reviewers. */
const NOTICE_OF: Record<
  string,
  { kind: NotificationKind; recipients: (a: ActivityForNotice) => string[] | undefined }
> = {
  'revision.submitted': { kind: 'revision-submitted', recipients: () => undefined },
  'revision.approved': {
    kind: 'revision-approved',
    recipients: (a) => (a.data?.authorUserId ? [a.data.authorUserId] : []),
  },
  'revision.changes-requested': {
    kind: 'revision-changes-requested',
    recipients: (a) => (a.data?.authorUserId ? [a.data.authorUserId] : []),
  },
  'comment.added': { kind: 'comment-mention', recipients: (a) => a.data?.mentions ?? [] },
};

/**
 * Turns a recorded project activity into notification mail, in the activity's own transaction.
 * Called by the activity recorder for every activity; kinds nobody is told of are skipped.
 */
export async function notifyForActivity(transaction: Transaction, activity: ActivityForNotice): Promise<number> {
  const notice = NOTICE_OF[activity.kind];
  if (!notice) return 0;
  const recipientIds = notice.recipients(activity);
  if (recipientIds && recipientIds.length === 0) return 0;
  const project = await models().Project.findByPk(activity.projectId, {
    attributes: ['id', 'teamId', 'name'],
    transaction,
  });
  if (!project) return 0;
  return enqueueNotification(transaction, {
    kind: notice.kind,
    teamId: project.teamId,
    actorId: activity.actorUserId,
    recipientIds,
    summary: `${project.name}: ${activity.summary}`,
    path: pathOf(project.id, activity),
  });
}
