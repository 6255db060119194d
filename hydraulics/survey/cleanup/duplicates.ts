import type { ProposedChange } from './proposed-change';
import type { RouteStation } from '../types';

// A template string, not JSON.stringify: this runs once per point on 100 000-point tracks.
function keyOf(p: RouteStation): string {
  return `${p.chainageM}|${p.elevationM}|${p.latitudeDeg}|${p.longitudeDeg}|${p.timeS}`;
}

/**
 * Exact duplicates: a point identical in position, height and time to an earlier one (a
 * receiver logging while standing still, or a file pasted twice). Proposes deleting the later copy.
 */
export function detectDuplicates(points: readonly RouteStation[]): ProposedChange[] {
  const firstSeen = new Map<string, number>();
  const changes: ProposedChange[] = [];
  points.forEach((p, i) => {
    const key = keyOf(p);
    const first = firstSeen.get(key);
    if (first === undefined) {
      firstSeen.set(key, i);
      return;
    }
    changes.push({ kind: 'duplicate', index: i, field: 'deleted', from: false, to: true, reason: `exact duplicate of point ${first + 1}` });
  });
  return changes;
}
