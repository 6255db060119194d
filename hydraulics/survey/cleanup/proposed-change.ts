import { HydraulicsInputError } from '../../errors';

export type CleanupKind =
  | 'grade-spike'
  | 'median-outlier'
  | 'duplicate'
  | 'chainage-backwards'
  | 'time-backwards'
  | 'smoothing'
  | 'benchmark-offset';

/** A change the user can accept or reject; the raw point is never touched until they accept. */
export type ProposedChange =
  | { kind: CleanupKind; index: number; field: 'elevationM'; from: number; to: number; reason: string }
  | { kind: CleanupKind; index: number; field: 'deleted'; from: false; to: true; reason: string };

/**
 * Returns a new array with the accepted changes applied (deleted points removed). The input
 * array and its points are left as they were, so raw and cleaned can be shown side by side.
 * Two accepted elevation changes to the same point are ambiguous and rejected.
 */
export function applyAcceptedChanges<T extends { elevationM: number }>(
  points: readonly T[],
  accepted: readonly ProposedChange[],
): T[] {
  const elevation = new Map<number, number>();
  const deleted = new Set<number>();
  accepted.forEach((c, i) => {
    if (!Number.isInteger(c.index) || c.index < 0 || c.index >= points.length) {
      throw new HydraulicsInputError('accepted.index', `point ${c.index} does not exist`, i);
    }
    if (c.field === 'deleted') {
      deleted.add(c.index);
    } else {
      if (elevation.has(c.index)) {
        throw new HydraulicsInputError('accepted', `two elevation changes for point ${c.index}; accept only one`, i);
      }
      elevation.set(c.index, c.to);
    }
  });
  const out: T[] = [];
  points.forEach((p, i) => {
    if (deleted.has(i)) return;
    const z = elevation.get(i);
    out.push(z === undefined ? { ...p } : { ...p, elevationM: z });
  });
  return out;
}
