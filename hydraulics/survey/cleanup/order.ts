import type { ProposedChange } from './proposed-change';
import type { RouteStation } from '../types';

/**
 * Points out of order: chainage lower than a point before it, or a GPS time earlier than a
 * fix before it. Proposes deleting the stray point; the user may instead fix it by hand.
 */
export function detectOutOfOrder(points: readonly RouteStation[]): ProposedChange[] {
  const changes: ProposedChange[] = [];
  let maxChainageM = -Infinity;
  let maxTimeS = -Infinity;
  points.forEach((p, i) => {
    if (p.chainageM < maxChainageM) {
      changes.push({
        kind: 'chainage-backwards',
        index: i,
        field: 'deleted',
        from: false,
        to: true,
        reason: `chainage goes backwards: ${p.chainageM.toFixed(2)} m after ${maxChainageM.toFixed(2)} m`,
      });
    } else {
      maxChainageM = p.chainageM;
    }
    if (p.timeS !== undefined) {
      if (p.timeS < maxTimeS) {
        changes.push({
          kind: 'time-backwards',
          index: i,
          field: 'deleted',
          from: false,
          to: true,
          reason: `GPS time goes backwards: ${new Date(p.timeS * 1000).toISOString()} after ${new Date(maxTimeS * 1000).toISOString()}`,
        });
      } else {
        maxTimeS = p.timeS;
      }
    }
  });
  return changes;
}
