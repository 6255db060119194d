'use client';

import { TableFrame } from '@/components/ui/table-frame';
import { LoadError } from '@/components/ui/load-error';
import { useQuery } from '@tanstack/react-query';
import Link from 'next/link';
import { usePathname, useSearchParams } from 'next/navigation';
import {
  projectTableParams,
  projectTableStateFromParams,
  sortedBy,
  visibleProjects,
  type ProjectSortKey,
  type ProjectTableState,
} from '@/lib/projects-table';
import { teamProjectsQuery } from '@/lib/queries/projects';

const COLUMNS: { key: ProjectSortKey; label: string }[] = [
  { key: 'name', label: 'Project' },
  { key: 'unitSystem', label: 'Units' },
  { key: 'updatedAt', label: 'Last changed' },
];

export function ProjectsTable({ teamId }: { teamId: string }) {
  const { data: projects = [], isError, refetch } = useQuery(teamProjectsQuery(teamId));
  const pathname = usePathname();
  const state = projectTableStateFromParams(useSearchParams());
  const rows = visibleProjects(projects, state);

  // The browser's own history call: Next.js keeps useSearchParams in step without asking the server again.
  function setState(change: (s: ProjectTableState) => ProjectTableState) {
    const query = projectTableParams(change(state));
    window.history.replaceState(null, '', query ? `${pathname}?${query}` : pathname);
  }

  function sortBy(key: ProjectSortKey) {
    setState((s) => sortedBy(s, key));
  }

  if (isError) {
    return <LoadError what="Projects" onRetry={() => void refetch()} />;
  }

  return (
    <div className="space-y-3">
      <div className="flex flex-wrap items-end gap-4">
        <label className="text-sm">
          <span className="block font-medium text-creek-900">Search projects</span>
          <input
            type="search"
            value={state.search}
            onChange={(e) => setState((s) => ({ ...s, search: e.target.value }))}
            className="mt-1 w-64 max-w-full rounded-md border border-creek-200 px-3 py-1.5"
            placeholder="Name or description"
          />
        </label>
        <label className="flex items-center gap-2 text-sm text-creek-800">
          <input
            type="checkbox"
            checked={state.showArchived}
            onChange={(e) => setState((s) => ({ ...s, showArchived: e.target.checked }))}
          />
          Show archived
        </label>
      </div>
      <TableFrame
        head={
          <>
            {COLUMNS.map((c) => (
              <th
                key={c.key}
                scope="col"
                className="px-4 py-2 font-medium"
                aria-sort={state.sort === c.key ? (state.descending ? 'descending' : 'ascending') : 'none'}
              >
                <button type="button" onClick={() => sortBy(c.key)} className="inline-flex items-center gap-1">
                  {c.label}
                  <span aria-hidden>{state.sort === c.key ? (state.descending ? '▾' : '▴') : '·'}</span>
                </button>
              </th>
            ))}
          </>
        }
      >
        {rows.map((p) => (
          <tr key={p.id} className="border-t border-creek-50 hover:bg-creek-50/50">
            <td className="px-4 py-2.5">
              <Link
                href={`/projects/${p.id}`}
                className="font-medium text-creek-700 underline-offset-2 hover:underline"
              >
                {p.name}
              </Link>
              {p.archived && <span className="ml-2 rounded bg-stone-100 px-1.5 text-xs text-stone-600">archived</span>}
              {p.description && <p className="max-w-xl truncate text-xs text-creek-600">{p.description}</p>}
            </td>
            <td className="px-4 py-2.5">{p.unitSystem === 'us' ? 'US customary' : 'Metric'}</td>
            <td className="tabular px-4 py-2.5 text-creek-700">{new Date(p.updatedAt).toISOString().slice(0, 10)}</td>
          </tr>
        ))}
        {rows.length === 0 && (
          <tr>
            <td colSpan={3} className="px-4 py-6 text-center text-creek-600">
              {projects.length === 0
                ? 'No projects yet. Owners and designers start one under “Start a project”; it then leads on to importing the pipe route.'
                : 'No project matches: clear the filter to see them all.'}
            </td>
          </tr>
        )}
      </TableFrame>
    </div>
  );
}
