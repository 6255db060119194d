'use client';

import { LoadError } from '@/components/ui/load-error';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { projectLinesQuery } from '@/lib/queries/lines';

/** The project's lines (working copy) with their route and last save; review status belongs to revisions. */
export function LinesTable({ projectId }: { projectId: string }) {
  const { data: lines = [], isError, refetch } = useQuery(projectLinesQuery(projectId));
  if (isError) {
    return <LoadError what="Lines" onRetry={() => void refetch()} />;
  }
  return (
    <TableFrame head={<><HeadCell>Line</HeadCell><HeadCell>Route</HeadCell><HeadCell>Stretches / devices</HeadCell><HeadCell>Last saved by</HeadCell></>}>
          {lines.map((l) => (
            <tr key={l.id} className="border-t border-creek-50 hover:bg-creek-50/50">
              <td className="px-4 py-2.5"><Link href={`/projects/${projectId}/lines/${l.id}`} className="font-medium text-creek-700 underline-offset-2 hover:underline">{l.name}</Link></td>
              <td className="px-4 py-2.5 text-creek-800">{l.routeName ?? 'route removed'}</td>
              <td className="tabular px-4 py-2.5">{l.stretchCount} / {l.deviceCount}</td>
              <td className="px-4 py-2.5">{l.preparedBy ?? '—'}</td>
            </tr>
          ))}
          {lines.length === 0 && <tr><td colSpan={4} className="px-4 py-6 text-center text-creek-600">No lines yet.</td></tr>}
    </TableFrame>
  );
}
