import type { DraftState } from './draft';

/**
 * Unsaved edits of route tables, kept while the person moves between the project's pages in this
 * browser tab (the route page's component is unmounted on a section change). Keyed by route and by
 * the saved version the edits were made on: edits on a version that has since been saved over are
 * not brought back on top of it. Memory only: a reload or a closed tab is warned about instead.
 */
const kept = new Map<string, { baseUpdatedAt: string; offset: number; state: DraftState }>();

/** Keeps (or, once clean, forgets) the edits of the page of rows starting at `offset` (a seq). */
export function keepDraft(routeId: string, baseUpdatedAt: string, state: DraftState, offset = 0): void {
  if (state.dirty) kept.set(routeId, { baseUpdatedAt, offset, state });
  else kept.delete(routeId);
}

/**
 * Where the kept edits of a route are (the seq their page starts at), so the page opens there again; null when none.
 */
export function keptDraftOffset(routeId: string): number | null {
  return kept.get(routeId)?.offset ?? null;
}

/** The kept edits made on this saved version of this page of rows, or null. */
export function keptDraft(routeId: string, baseUpdatedAt: string, offset = 0): DraftState | null {
  const entry = kept.get(routeId);
  if (!entry) return null;
  if (entry.baseUpdatedAt !== baseUpdatedAt || entry.offset !== offset) {
    kept.delete(routeId);
    return null;
  }
  return entry.state;
}
