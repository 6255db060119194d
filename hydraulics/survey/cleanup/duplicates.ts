import type { ProposedChange } from './proposed-change';
import type { RouteStation } from '../types';

function sameStation(a: RouteStation, b: RouteStation): boolean {
  return (
    a.chainageM === b.chainageM &&
    a.elevationM === b.elevationM &&
    a.latitudeDeg === b.latitudeDeg &&
    a.longitudeDeg === b.longitudeDeg &&
    a.timeS === b.timeS
  );
}

/** Orders optional numbers: absent first, then by value (NaN last, so it never sits between equals). */
function compareOptional(a: number | undefined, b: number | undefined): number {
  if (a === b) return 0;
  if (a === undefined) return -1;
  if (b === undefined) return 1;
  if (Number.isNaN(a)) return Number.isNaN(b) ? 0 : 1;
  if (Number.isNaN(b)) return -1;
  return a < b ? -1 : 1;
}

/**
 * Exact duplicates: a point identical in position, height and time to an earlier one (a
 * receiver logging while standing still, or a file pasted twice). Proposes deleting the later copy.
 * Point indices are sorted by (chainage, height, latitude, longitude, time, index), so identical
 * points end up side by side with the earliest first: O(n log n) however many points share a
 * chainage (a long stand-still or a hostile file once made a per-chainage scan quadratic).
 */
export function detectDuplicates(points: readonly RouteStation[]): ProposedChange[] {
  const order = Array.from({ length: points.length }, (_, i) => i);
  order.sort((i, j) => {
    const a = points[i];
    const b = points[j];
    return (
      compareOptional(a.chainageM, b.chainageM) ||
      compareOptional(a.elevationM, b.elevationM) ||
      compareOptional(a.latitudeDeg, b.latitudeDeg) ||
      compareOptional(a.longitudeDeg, b.longitudeDeg) ||
      compareOptional(a.timeS, b.timeS) ||
      i - j
    );
  });
  const changes: ProposedChange[] = [];
  let first = order[0];
  for (let k = 1; k < order.length; k += 1) {
    const i = order[k];
    if (sameStation(points[first], points[i])) {
      changes.push({
        kind: 'duplicate',
        index: i,
        field: 'deleted',
        from: false,
        to: true,
        reason: `exact duplicate of point ${first + 1}`,
      });
    } else {
      first = i;
    }
  }
  return changes.sort((x, y) => x.index - y.index);
}
