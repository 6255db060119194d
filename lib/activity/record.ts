import 'server-only';
import type { Transaction } from 'sequelize';
import { models } from '../../models';
import { notifyForActivity } from '../notifications/from-activity';
import type { ActivityKind } from './kinds';

export type { ActivityKind } from './kinds';

export interface ActivityInput {
  projectId: string;
  /** Null only for changes no person made (a migration). */
  actorUserId: string | null;
  kind: ActivityKind;
  subjectType?: 'route' | 'line' | 'revision' | 'comment' | 'project';
  subjectId?: string | null;
  /** One sentence a person reads in the feed. */
  summary: string;
  /** Details by kind; `mentions` (user ids) on comments, `revisionNumber` on revisions. */
  data?: { mentions?: string[]; revisionNumber?: number; [key: string]: unknown };
}

// A line autosaves every half second of editing: one feed entry per person and line per this window.
const EDIT_WINDOW_MS = 15 * 60_000;

/**
 * The one way an activity row is written, inside the transaction of the change it describes, so
 * the feed never claims a change that was rolled back.
 */
export async function recordActivity(transaction: Transaction, input: ActivityInput): Promise<void> {
  const { Activity } = models();
  if (input.kind === 'line.edited' && input.subjectId) {
    const recent = await Activity.findOne({
      where: {
        projectId: input.projectId,
        kind: 'line.edited',
        subjectId: input.subjectId,
        actorUserId: input.actorUserId,
      },
      order: [['createdAt', 'DESC']],
      transaction,
    });
    if (recent && Date.now() - recent.createdAt.getTime() < EDIT_WINDOW_MS) {
      const saves = Number((recent.data as { saves?: number }).saves ?? 1) + 1;
      await recent.update({ data: { ...recent.data, saves } }, { transaction });
      return;
    }
  }
  await Activity.create(
    {
      projectId: input.projectId,
      actorUserId: input.actorUserId,
      kind: input.kind,
      subjectType: input.subjectType ?? null,
      subjectId: input.subjectId ?? null,
      summary: input.summary,
      data: { saves: input.kind === 'line.edited' ? 1 : undefined, ...input.data },
    },
    { transaction },
  );
  // Reviews and mentions reach people by mail, queued in this same transaction.
  await notifyForActivity(transaction, input);
}
