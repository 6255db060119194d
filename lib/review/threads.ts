import type { ProfilePin } from '../chart/profile-types';
import type { CommentAnchor } from './anchors';
import type { CommentRecord } from './comment-types';

export interface CommentThread {
  thread: CommentRecord;
  replies: CommentRecord[];
  /**
   * Number drawn in the thread's pin (on a profile or the schematic); null when the thread has no pin in this scope.
   */
  pin: string | null;
}

/**
 * What a screen lists: threads pinned on one line's profile, one route's profile or the network
 * schematic (these get numbered pins), and threads on the whole project (listed, never pinned).
 */
export type ThreadScope =
  { kind: 'line'; lineId: string } | { kind: 'route'; routeId: string } | { kind: 'network' } | { kind: 'project' };

/** Chainage a comment is pinned at on `lineId`, or null. */
export function pinChainage(comment: Pick<CommentRecord, 'anchor'>, lineId: string | null): number | null {
  const a = comment.anchor;
  return (a.kind === 'line-chainage' || a.kind === 'warning') && a.lineId === lineId ? a.chainageM : null;
}

/** Chainage a comment is pinned at on survey route `routeId`, or null. */
export function routePinChainage(comment: Pick<CommentRecord, 'anchor'>, routeId: string): number | null {
  const a = comment.anchor;
  return a.kind === 'route-chainage' && a.routeId === routeId ? a.chainageM : null;
}

/** The network part a comment is pinned to, or null. */
export function networkPart(comment: Pick<CommentRecord, 'anchor'>): { part: 'node' | 'link'; partId: string } | null {
  const a = comment.anchor;
  return a.kind === 'network' ? { part: a.part, partId: a.partId } : null;
}

function pinned(anchor: CommentAnchor, scope: ThreadScope): boolean {
  switch (scope.kind) {
    case 'line':
      return (anchor.kind === 'line-chainage' || anchor.kind === 'warning') && anchor.lineId === scope.lineId;
    case 'route':
      return anchor.kind === 'route-chainage' && anchor.routeId === scope.routeId;
    case 'network':
      return anchor.kind === 'network';
    case 'project':
      return anchor.kind === 'project';
  }
}

/**
 * The comments of one revision (null: the working copy) grouped into threads, pins numbered in the
 * order the threads were made. A thread pinned in one of `scopes` (a line, a route, the network)
 * gets a number, one on the whole project is listed unnumbered when the project scope is asked for;
 * `listAll` keeps every other thread too (other lines, routes), unnumbered.
 */
export function threadsOf(
  comments: readonly CommentRecord[],
  revisionId: string | null,
  scopes: readonly ThreadScope[],
  listAll = false,
): CommentThread[] {
  const mine = comments.filter((c) => c.revisionId === revisionId);
  const listed = (c: CommentRecord) => scopes.some((scope) => pinned(c.anchor, scope));
  const hasPin = (c: CommentRecord) => scopes.some((scope) => scope.kind !== 'project' && pinned(c.anchor, scope));
  let n = 0;
  return mine
    .filter((c) => !c.parentId && (listAll || listed(c)))
    .map((thread) => ({
      thread,
      replies: mine.filter((c) => c.parentId === thread.id),
      pin: hasPin(thread) ? String(++n) : null,
    }));
}

/** Pins on a long profile: `at` gives each thread's chainage there (a line's or a route's), or null. */
export function pinsOf(
  threads: readonly CommentThread[],
  at: (comment: CommentRecord) => number | null,
  selectedId: string | null,
): ProfilePin[] {
  return threads.flatMap(({ thread, pin }) => {
    const c = at(thread);
    return c === null || pin === null
      ? []
      : [{ id: thread.id, chainageM: c, label: pin, resolved: thread.resolved, selected: thread.id === selectedId }];
  });
}

/** A comment pinned to a part of the network, as the schematic draws it. */
export interface NetworkPin {
  id: string;
  part: 'node' | 'link';
  partId: string;
  label: string;
  resolved: boolean;
  selected: boolean;
}

export function networkPinsOf(threads: readonly CommentThread[], selectedId: string | null): NetworkPin[] {
  return threads.flatMap(({ thread, pin }) => {
    const part = networkPart(thread);
    return part === null || pin === null
      ? []
      : [{ id: thread.id, ...part, label: pin, resolved: thread.resolved, selected: thread.id === selectedId }];
  });
}
