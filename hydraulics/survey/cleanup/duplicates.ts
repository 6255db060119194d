import type { ProposedChange } from './proposed-change';
import type { RouteStation } from '../types';

function sameStation(a: RouteStation, b: RouteStation): boolean {
  return a.chainageM === b.chainageM && a.elevationM === b.elevationM && a.latitudeDeg === b.latitudeDeg && a.longitudeDeg === b.longitudeDeg && a.timeS === b.timeS;
}

/**
 * Exact duplicates: a point identical in position, height and time to an earlier one (a
 * receiver logging while standing still, or a file pasted twice). Proposes deleting the later copy.
 * Points are grouped by chainage (a number key, no string building: this runs on 100 000-point
 * tracks) and only points sharing a chainage are compared field by field.
 */
export function detectDuplicates(points: readonly RouteStation[]): ProposedChange[] {
  const byChainage = new Map<number, number[]>();
  const changes: ProposedChange[] = [];
  points.forEach((p, i) => {
    const candidates = byChainage.get(p.chainageM);
    if (candidates === undefined) {
      byChainage.set(p.chainageM, [i]);
      return;
    }
    const first = candidates.find((j) => sameStation(points[j], p));
    if (first === undefined) {
      candidates.push(i);
      return;
    }
    changes.push({ kind: 'duplicate', index: i, field: 'deleted', from: false, to: true, reason: `exact duplicate of point ${first + 1}` });
  });
  return changes;
}
