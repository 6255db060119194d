import type { DraftState } from './draft';

/**
 * Unsaved edits of route tables, kept while the person moves between the project's pages in this
 * browser tab (the route page's component is unmounted on a section change). Keyed by route and by
 * the saved version the edits were made on: edits on a version that has since been saved over are
 * not brought back on top of it. Memory only: a reload or a closed tab is warned about instead.
 */
const kept = new Map<string, { baseUpdatedAt: string; state: DraftState }>();

export function keepDraft(routeId: string, baseUpdatedAt: string, state: DraftState): void {
  if (state.dirty) kept.set(routeId, { baseUpdatedAt, state });
  else kept.delete(routeId);
}

/** The kept edits made on this saved version, or null. */
export function keptDraft(routeId: string, baseUpdatedAt: string): DraftState | null {
  const entry = kept.get(routeId);
  if (!entry) return null;
  if (entry.baseUpdatedAt !== baseUpdatedAt) {
    kept.delete(routeId);
    return null;
  }
  return entry.state;
}
