'use client';

import { LoadError } from '@/components/ui/load-error';
import { HeadCell, TableFrame } from '@/components/ui/table-frame';
import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { formatDistance, formatNumber, formatQuantity } from '@/lib/units';
import type { UnitSystem } from '@/lib/units';
import { projectRoutesQuery } from '@/lib/queries/routes';
import { FORMAT_LABELS } from './format-labels';
import { TableSkeleton } from '@/components/ui/widget-skeletons';

export interface RoutesListProps {
  projectId: string;
  unitSystem: UnitSystem;
}

/** The project's routes with their length, points and where they came from. */
export function RoutesList({ projectId, unitSystem }: RoutesListProps) {
  const { data: routes, isError, refetch } = useQuery(projectRoutesQuery(projectId));
  if (isError) {
    return <LoadError what="Routes" onRetry={() => void refetch()} />;
  }
  if (!routes) return <RoutesListSkeleton />;
  return (
    <TableFrame
      head={
        <>
          <HeadCell>Route</HeadCell>
          <HeadCell>Length</HeadCell>
          <HeadCell>Along the ground</HeadCell>
          <HeadCell>Points</HeadCell>
          <HeadCell>From</HeadCell>
        </>
      }
    >
      {routes.map((r) => (
        <tr key={r.id} className="border-t border-creek-50 hover:bg-creek-50/50">
          <td className="px-4 py-2.5">
            <Link
              href={`/projects/${projectId}/routes/${r.id}`}
              className="font-medium text-creek-700 underline-offset-2 hover:underline"
            >
              {r.name}
            </Link>
            {r.notes && <p className="max-w-md truncate text-xs text-creek-600">{r.notes}</p>}
          </td>
          <td className="tabular px-4 py-2.5">{r.pointCount > 1 ? formatDistance(r.lengthM, unitSystem) : '—'}</td>
          <td className="tabular px-4 py-2.5">
            {r.pointCount > 1 ? formatQuantity('length', r.slopeLengthM, unitSystem, 0) : '—'}
          </td>
          <td className="tabular px-4 py-2.5">{formatNumber(r.pointCount, 0)}</td>
          <td className="px-4 py-2.5 text-creek-700">
            {r.sourceFormat ? FORMAT_LABELS[r.sourceFormat] : '—'}
            {r.sourceFile && (
              <span className="block max-w-[14rem] truncate text-xs text-creek-600">{r.sourceFile.fileName}</span>
            )}
          </td>
        </tr>
      ))}
      {routes.length === 0 && (
        <tr>
          <td colSpan={5} className="px-4 py-6 text-center text-creek-600">
            No routes yet. Import a walked track or field book, or sketch one.
          </td>
        </tr>
      )}
    </TableFrame>
  );
}

export function RoutesListSkeleton() {
  return <TableSkeleton label="Loading routes" />;
}
