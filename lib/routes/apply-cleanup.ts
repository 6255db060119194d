import type { CleanupKind, ProposedChange } from '../../hydraulics/index';
import { RouteEditError } from './errors';
import { DETECTED_KINDS } from './proposals';
import type { RoutePointView } from './types';

/**
 * Both height checks question the same thing (is this height right?), so rejecting one finding
 * at a point answers both; otherwise the other check would re-propose the height just kept.
 */
const HEIGHT_CHECKS: readonly CleanupKind[] = ['grade-spike', 'median-outlier'];

/** Heights are compared to a tenth of a millimetre: JSON round trips keep far more. */
const SAME_HEIGHT_M = 1e-4;

export interface CleanupDecisions {
  accept: readonly ProposedChange[];
  reject: readonly ProposedChange[];
}

/**
 * Applies the user's decisions. Accepted height changes set the cleaned height (the raw height
 * stays); accepted deletions exclude the point from the cleaned profile (it stays in the table);
 * rejected findings of the automatic checks are remembered so they are not proposed again.
 * A proposal made on heights that have since changed is refused as a conflict.
 */
export function applyCleanupDecisions(
  points: readonly RoutePointView[],
  decisions: CleanupDecisions,
): RoutePointView[] {
  const bySeq = new Map(points.map((p, i) => [p.seq, i]));
  const out = points.map((p) => ({ ...p, dismissedChecks: [...p.dismissedChecks] }));
  const touched = new Map<number, 'accept' | 'reject'>();
  const heightSet = new Set<number>();
  const locate = (c: ProposedChange, verb: 'accept' | 'reject') => {
    const i = bySeq.get(c.index);
    if (i === undefined)
      throw new RouteEditError('index', `there is no point ${c.index + 1} on this route`, { pointNumber: c.index + 1 });
    const other = touched.get(c.index);
    if (other && other !== verb)
      throw new RouteEditError('index', 'a proposal for this point is both accepted and rejected', {
        pointNumber: c.index + 1,
      });
    touched.set(c.index, verb);
    return i;
  };
  for (const c of decisions.accept) {
    const i = locate(c, 'accept');
    const p = out[i];
    if (p.excluded) {
      throw new RouteEditError('index', 'this point is already out of the cleaned profile; reload the route', {
        pointNumber: i + 1,
        kind: 'conflict',
      });
    }
    if (c.field === 'deleted') {
      p.excluded = true;
      continue;
    }
    if (heightSet.has(i))
      throw new RouteEditError('index', 'two height changes for one point; accept only one', { pointNumber: i + 1 });
    if (Math.abs(points[i].elevationM - c.from) > SAME_HEIGHT_M) {
      throw new RouteEditError(
        'from',
        `the height changed to ${points[i].elevationM.toFixed(2)} m since this was proposed (from ${c.from.toFixed(2)} m); reload the route`,
        {
          pointNumber: i + 1,
          kind: 'conflict',
        },
      );
    }
    heightSet.add(i);
    p.elevationM = c.to;
  }
  for (const c of decisions.reject) {
    const i = locate(c, 'reject');
    if (!DETECTED_KINDS.has(c.kind)) continue;
    const kinds = HEIGHT_CHECKS.includes(c.kind) ? HEIGHT_CHECKS : [c.kind];
    for (const k of kinds) if (!out[i].dismissedChecks.includes(k)) out[i].dismissedChecks.push(k);
  }
  return out;
}
