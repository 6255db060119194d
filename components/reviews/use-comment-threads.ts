'use client';

import { useQuery } from '@tanstack/react-query';
import { useMemo, useState } from 'react';
import { projectCommentsQuery } from '@/lib/queries/reviews';
import { threadsOf, type ThreadScope } from '@/lib/review/threads';

/**
 * The threads one screen shows (of a revision, or of the working copy when `revisionId` is null),
 * the one picked in the list, and the project's comments as react-query keeps them.
 */
export function useCommentThreads(projectId: string, revisionId: string | null, scopes: readonly ThreadScope[], listAll = false) {
  const { data: comments = [], isError, refetch } = useQuery(projectCommentsQuery(projectId));
  const [selectedId, setSelectedId] = useState<string | null>(null);
  // Scopes are compared by value: callers pass a fresh array each render.
  const key = JSON.stringify(scopes);
  const threads = useMemo(() => threadsOf(comments, revisionId, JSON.parse(key) as ThreadScope[], listAll), [comments, revisionId, key, listAll]);
  return { threads, selectedId, setSelectedId, isError, refetch };
}
