import type { CommentAnchor } from './anchors';

/** Where a comment's anchor lies in the current working copy. */
export interface AnchorNow {
  state: 'present' | 'gone';
  /** e.g. "line Spring box to house, ch. 420 m (inside the line now)" or why it is gone. */
  words: string;
}

export interface CommentRecord {
  id: string;
  projectId: string;
  revisionId: string | null;
  revisionNumber: number | null;
  parentId: string | null;
  author: { id: string; name: string } | null;
  body: string;
  anchor: CommentAnchor;
  anchorNow: AnchorNow;
  mentions: { id: string; name: string }[];
  resolved: boolean;
  resolvedBy: { id: string; name: string } | null;
  resolvedAt: string | null;
  createdAt: string;
}
