'use client';

import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { useState } from 'react';
import { projectRevisionsQuery } from '@/lib/queries/reviews';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import { LoadError } from '@/components/ui/load-error';
import { RevisionStatusBadge } from './revision-status-badge';
import { TableSkeleton } from '@/components/ui/widget-skeletons';

const day = (iso: string | null) => (iso ? iso.slice(0, 10) : '—');

/** The project's revisions, newest first, with two picked for a compare. */
export function RevisionsList({ projectId }: { projectId: string }) {
  const { data: revisions, isError, refetch } = useQuery(projectRevisionsQuery(projectId));
  const [picked, setPicked] = useState<string[]>([]);
  if (isError) return <LoadError what="Revisions" onRetry={() => void refetch()} />;
  if (!revisions) return <RevisionsListSkeleton />;
  const toggle = (id: string) => setPicked((p) => (p.includes(id) ? p.filter((x) => x !== id) : [...p.slice(-1), id]));
  return (
    <div className="space-y-3">
      <TableFrame
        head={
          <>
            <HeadCell>
              <span className="sr-only">Compare</span>
            </HeadCell>
            <HeadCell>Revision</HeadCell>
            <HeadCell>Status</HeadCell>
            <HeadCell>Note</HeadCell>
            <HeadCell>Designer</HeadCell>
            <HeadCell>Reviewer</HeadCell>
            <HeadCell>Made / reviewed</HeadCell>
          </>
        }
      >
        {revisions.map((r) => (
          <tr
            key={r.id}
            className="border-t border-creek-50 hover:bg-creek-50/50"
            data-testid="revision-row"
            data-number={r.number}
          >
            <td className="px-3 py-2.5">
              <input
                type="checkbox"
                aria-label={`Compare revision ${r.number}`}
                checked={picked.includes(r.id)}
                onChange={() => toggle(r.id)}
              />
            </td>
            <td className="px-4 py-2.5">
              <Link
                href={`/projects/${projectId}/reviews/${r.id}`}
                className="font-medium text-creek-700 underline-offset-2 hover:underline"
              >
                Revision {r.number}
              </Link>
            </td>
            <td className="px-4 py-2.5">
              <RevisionStatusBadge status={r.status} />
            </td>
            <td className="max-w-xs truncate px-4 py-2.5 text-creek-800" title={r.note}>
              {r.note || '—'}
            </td>
            <td className="px-4 py-2.5">{r.createdBy?.name ?? '—'}</td>
            <td className="px-4 py-2.5">{r.reviewedBy?.name ?? '—'}</td>
            <td className="tabular px-4 py-2.5">
              {day(r.createdAt)} / {day(r.reviewedAt)}
            </td>
          </tr>
        ))}
        {revisions.length === 0 && (
          <tr>
            <td colSpan={7} className="px-4 py-6 text-center text-creek-600">
              No revisions to show yet. A designer submits the working copy for review on this page; reviewers then
              approve it or send it back.
            </td>
          </tr>
        )}
      </TableFrame>
      {revisions.length > 1 &&
        (picked.length === 2 ? (
          <Link
            href={`/projects/${projectId}/reviews/compare?a=${picked[0]}&b=${picked[1]}`}
            className="inline-flex rounded-md bg-creek-700 px-3.5 py-2 text-sm font-medium text-white hover:bg-creek-800"
          >
            Compare the two picked
          </Link>
        ) : (
          <p className="text-sm text-creek-700">Tick two revisions to compare them.</p>
        ))}
    </div>
  );
}

export function RevisionsListSkeleton() {
  return <TableSkeleton label="Loading revisions" />;
}
