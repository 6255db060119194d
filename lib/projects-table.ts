import { z } from 'zod';
import type { ProjectSummary } from './data/projects';

const SORT_KEYS = ['name', 'updatedAt', 'unitSystem'] as const;
export type ProjectSortKey = (typeof SORT_KEYS)[number];
export interface ProjectTableState {
  search: string;
  sort: ProjectSortKey;
  descending: boolean;
  showArchived: boolean;
}

export const DEFAULT_PROJECT_TABLE: ProjectTableState = {
  search: '',
  sort: 'updatedAt',
  descending: true,
  showArchived: false,
};

/** Newest first by date; A to Z otherwise. */
const descendingByDefault = (sort: ProjectSortKey) => sort === 'updatedAt';

// The table's search, order and archive choice live in the address (?q=&sort=&dir=&archived=1), so a
// reload, the back button or a shared link shows the same rows. A hand-edited address never fails:
// anything unreadable falls back to the default.
const TableParams = z.object({
  q: z.string().max(200).catch(''),
  sort: z.enum(SORT_KEYS).catch(DEFAULT_PROJECT_TABLE.sort),
  dir: z.enum(['asc', 'desc']).optional().catch(undefined),
  archived: z.literal('1').optional().catch(undefined),
});

export function projectTableStateFromParams(params: URLSearchParams): ProjectTableState {
  const read = TableParams.parse({
    q: params.get('q') ?? '',
    sort: params.get('sort') ?? undefined,
    dir: params.get('dir') ?? undefined,
    archived: params.get('archived') ?? undefined,
  });
  return {
    search: read.q,
    sort: read.sort,
    descending: read.dir === undefined ? descendingByDefault(read.sort) : read.dir === 'desc',
    showArchived: read.archived === '1',
  };
}

/** The address query for a table state, naming only what differs from the default ('' when nothing does). */
export function projectTableParams(state: ProjectTableState): string {
  const params = new URLSearchParams();
  if (state.search !== '') params.set('q', state.search);
  if (state.sort !== DEFAULT_PROJECT_TABLE.sort) params.set('sort', state.sort);
  if (state.descending !== descendingByDefault(state.sort)) params.set('dir', state.descending ? 'desc' : 'asc');
  if (state.showArchived) params.set('archived', '1');
  return params.toString();
}

/** Clicking a column heading: the same column flips its order, a new one starts in its natural order. */
export function sortedBy(state: ProjectTableState, key: ProjectSortKey): ProjectTableState {
  return { ...state, sort: key, descending: state.sort === key ? !state.descending : descendingByDefault(key) };
}

/** Filters and orders the projects table; kept out of the component so it is testable. */
export function visibleProjects(projects: ProjectSummary[], state: ProjectTableState): ProjectSummary[] {
  const needle = state.search.trim().toLowerCase();
  const rows = projects.filter(
    (p) =>
      (state.showArchived || !p.archived) &&
      (needle === '' || p.name.toLowerCase().includes(needle) || p.description.toLowerCase().includes(needle)),
  );
  const direction = state.descending ? -1 : 1;
  return [...rows].sort(
    (a, b) => direction * String(a[state.sort]).localeCompare(String(b[state.sort]), 'en', { sensitivity: 'base' }),
  );
}
