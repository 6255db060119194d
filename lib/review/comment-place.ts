import type { CommentRecord } from './comment-types';

/**
 * The page of the working copy where a thread's pin is drawn (with the thread picked), or null for one on the whole
 * project or whose anchor is gone.
 */
export function commentPlaceHref(
  projectId: string,
  comment: Pick<CommentRecord, 'id' | 'anchor' | 'anchorNow'>,
): string | null {
  if (comment.anchorNow.state === 'gone') return null;
  const a = comment.anchor;
  const picked = `?comment=${comment.id}`;
  switch (a.kind) {
    case 'line-chainage':
    case 'warning':
      return `/projects/${projectId}/lines/${a.lineId}${picked}`;
    case 'route-chainage':
      return `/projects/${projectId}/routes/${a.routeId}${picked}`;
    case 'network':
      return `/projects/${projectId}/network${picked}`;
    case 'project':
      return null;
  }
}
