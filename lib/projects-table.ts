import type { ProjectSummary } from './data/projects';

export type ProjectSortKey = 'name' | 'updatedAt' | 'unitSystem';
export interface ProjectTableState { search: string; sort: ProjectSortKey; descending: boolean; showArchived: boolean }

/** Filters and orders the projects table; kept out of the component so it is testable. */
export function visibleProjects(projects: ProjectSummary[], state: ProjectTableState): ProjectSummary[] {
  const needle = state.search.trim().toLowerCase();
  const rows = projects.filter(
    (p) =>
      (state.showArchived || !p.archived) &&
      (needle === '' || p.name.toLowerCase().includes(needle) || p.description.toLowerCase().includes(needle)),
  );
  const direction = state.descending ? -1 : 1;
  return [...rows].sort((a, b) => direction * String(a[state.sort]).localeCompare(String(b[state.sort]), 'en', { sensitivity: 'base' }));
}
