'use client';

import { LoadError } from '@/components/ui/load-error';
import Link from 'next/link';
import { useCommentThreads } from './use-comment-threads';
import { commentPlaceHref } from '@/lib/review/comment-place';
import { ListSkeleton } from '@/components/ui/widget-skeletons';

/** Every thread on the working copy, open ones first, each linking to the page where its pin is. */
export function WorkingCopyComments({ projectId }: { projectId: string }) {
  const { threads, isError, isPending, refetch } = useCommentThreads(projectId, null, [], true);
  if (isError) return <LoadError what="The comments" onRetry={() => void refetch()} />;
  if (isPending) return <CommentsSkeleton />;
  const ordered = [...threads].sort((a, b) => Number(a.thread.resolved) - Number(b.thread.resolved));
  if (ordered.length === 0)
    return (
      <p className="text-sm text-creek-700">
        No comments on the working copy yet. Pin one on a line&apos;s long profile, a route&apos;s ground profile or the
        network schematic.
      </p>
    );
  return (
    <ul className="divide-y divide-creek-50 text-sm" data-testid="working-copy-comments">
      {ordered.map(({ thread, replies }) => {
        const href = commentPlaceHref(projectId, thread);
        return (
          <li
            key={thread.id}
            className="flex flex-wrap items-baseline justify-between gap-2 py-2"
            data-comment-id={thread.id}
            data-resolved={thread.resolved ? 'yes' : 'no'}
          >
            <span className="min-w-0 flex-1">
              <span className="text-creek-900">
                {thread.body.length > 140 ? `${thread.body.slice(0, 140)}…` : thread.body}
              </span>
              <span className="block text-xs text-creek-600">
                {thread.author?.name ?? 'a former member'} · {thread.anchorNow.words}
                {replies.length ? ` · ${replies.length} repl${replies.length === 1 ? 'y' : 'ies'}` : ''}
                {thread.resolved ? ' · resolved' : ''}
              </span>
            </span>
            {href && (
              <Link href={href} className="text-xs font-medium text-creek-700 underline">
                Show where it is pinned
              </Link>
            )}
          </li>
        );
      })}
    </ul>
  );
}

export function CommentsSkeleton() {
  return <ListSkeleton label="Loading comments" />;
}
