'use client';

import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { LoadError } from '@/components/ui/load-error';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { projectLinesQuery } from '@/lib/queries/lines';
import { useLineActions } from './line-actions';
import { TableSkeleton } from '@/components/ui/widget-skeletons';

/** The project's lines (working copy) with their route and last save; review status belongs to revisions. */
export function LinesTable({ projectId, canEdit }: { projectId: string; canEdit: boolean }) {
  const { data: lines, isError, refetch } = useQuery(projectLinesQuery(projectId));
  const actions = useLineActions(projectId);
  if (isError) {
    return <LoadError what="Lines" onRetry={() => void refetch()} />;
  }
  if (!lines) return <LinesTableSkeleton />;
  return (
    <div className="space-y-2">
      <FormMessage message={actions.notice?.text} tone={actions.notice?.tone} />
      <TableFrame
        head={
          <>
            <HeadCell>Line</HeadCell>
            <HeadCell>Route</HeadCell>
            <HeadCell>Stretches / devices</HeadCell>
            <HeadCell>Last saved by</HeadCell>
            {canEdit && (
              <HeadCell>
                <span className="sr-only">Actions</span>
              </HeadCell>
            )}
          </>
        }
      >
        {lines.map((l) => (
          <tr key={l.id} className="border-t border-creek-50 hover:bg-creek-50/50" data-testid="line-row">
            <td className="px-4 py-2.5">
              <Link
                href={`/projects/${projectId}/lines/${l.id}`}
                className="font-medium text-creek-700 underline-offset-2 hover:underline"
              >
                {l.name}
              </Link>
            </td>
            <td className="px-4 py-2.5 text-creek-800">
              {l.routeName ?? 'route removed: pick another on the line page'}
            </td>
            <td className="tabular px-4 py-2.5">
              {l.stretchCount} / {l.deviceCount}
            </td>
            <td className="px-4 py-2.5">{l.preparedBy ?? '—'}</td>
            {canEdit && (
              <td className="whitespace-nowrap px-4 py-2.5 text-right">
                <Button
                  tone="quiet"
                  className="px-2 py-1 text-xs"
                  disabled={actions.copying || !l.routeId}
                  onClick={() => void actions.copy(l)}
                  aria-label={`Duplicate ${l.name}`}
                  title={
                    l.routeId ? 'A copy on the same route, to try another design' : 'Pick a route for this line first'
                  }
                >
                  Duplicate
                </Button>{' '}
                <Button
                  tone="quiet"
                  className="px-2 py-1 text-xs text-clay-700"
                  onClick={() => actions.askDelete(l)}
                  aria-label={`Delete ${l.name}`}
                >
                  Delete
                </Button>
              </td>
            )}
          </tr>
        ))}
        {lines.length === 0 && (
          <tr>
            <td colSpan={canEdit ? 5 : 4} className="px-4 py-6 text-center text-creek-700">
              No lines yet.{' '}
              {canEdit
                ? 'Start one above: pick a survey route and name the line; it starts with one pipe from the first station to the last.'
                : 'A designer starts lines from the survey routes.'}
            </td>
          </tr>
        )}
      </TableFrame>
      {actions.dialog}
    </div>
  );
}

export function LinesTableSkeleton() {
  return <TableSkeleton label="Loading lines" />;
}
