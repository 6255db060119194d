import type { ProfilePin } from '../chart/profile-types';
import type { CommentRecord } from './comment-types';

export interface CommentThread {
  thread: CommentRecord;
  replies: CommentRecord[];
  /** Number drawn in the pin on this line's profile; null when the thread is not pinned on it. */
  pin: string | null;
}

/** Chainage a comment is pinned at on `lineId`, or null. */
export function pinChainage(comment: CommentRecord, lineId: string | null): number | null {
  const a = comment.anchor;
  return (a.kind === 'line-chainage' || a.kind === 'warning') && a.lineId === lineId ? a.chainageM : null;
}

/** The comments of one revision (null: the working copy) grouped into threads, pins numbered along the line in the order they were made. */
export function threadsOf(comments: readonly CommentRecord[], revisionId: string | null, lineId: string | null): CommentThread[] {
  const mine = comments.filter((c) => c.revisionId === revisionId);
  let n = 0;
  return mine.filter((c) => !c.parentId).map((thread) => ({
    thread,
    replies: mine.filter((c) => c.parentId === thread.id),
    pin: pinChainage(thread, lineId) === null ? null : String(++n),
  }));
}

export function pinsOf(threads: readonly CommentThread[], lineId: string | null, selectedId: string | null): ProfilePin[] {
  return threads.flatMap(({ thread, pin }) => {
    const c = pinChainage(thread, lineId);
    return c === null || pin === null ? [] : [{ id: thread.id, chainageM: c, label: pin, resolved: thread.resolved, selected: thread.id === selectedId }];
  });
}
