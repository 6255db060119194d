'use client';

import { useQuery } from '@tanstack/react-query';
import { useSearchParams } from 'next/navigation';
import { useMemo, useState } from 'react';
import { projectCommentsQuery } from '@/lib/queries/reviews';
import { threadsOf, type ThreadScope } from '@/lib/review/threads';

/**
 * The threads one screen shows (of a revision, or of the working copy when `revisionId` is null),
 * the one picked in the list, and the project's comments as react-query keeps them. A thread named
 * in the address (`?comment=<id>`, from a link in the list of all comments) starts picked.
 */
export function useCommentThreads(
  projectId: string,
  revisionId: string | null,
  scopes: readonly ThreadScope[],
  listAll = false,
) {
  const { data, isError, isPending, refetch } = useQuery(projectCommentsQuery(projectId));
  const comments = useMemo(() => data ?? [], [data]);
  const wanted = useSearchParams().get('comment');
  const [selectedId, setSelectedId] = useState<string | null>(() =>
    wanted && comments.some((c) => c.id === wanted) ? wanted : null,
  );
  // Scopes are compared by value: callers pass a fresh array each render.
  const key = JSON.stringify(scopes);
  const threads = useMemo(
    () => threadsOf(comments, revisionId, JSON.parse(key) as ThreadScope[], listAll),
    [comments, revisionId, key, listAll],
  );
  return { threads, selectedId, setSelectedId, isError, isPending, refetch };
}
