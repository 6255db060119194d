import { analyzeLine, type LineAnalysis } from '../../hydraulics/index';
import { lineInputOf } from '../lines/line-input';
import type { DesignSnapshot, SnapshotLine } from './snapshot-types';

/**
 * A frozen line's analysis: the same core on the same frozen input, so it reads the same every time. Null when the line
 * could not be frozen with stations.
 */
export function analyseSnapshotLine(line: SnapshotLine): LineAnalysis | null {
  if (line.problem || line.stations.length < 2) return null;
  return analyzeLine(lineInputOf(line.design, line.stations, line.context));
}

export function snapshotLine(snapshot: DesignSnapshot, lineId: string): SnapshotLine | null {
  return snapshot.lines.find((l) => l.id === lineId) ?? null;
}

/** Names of what a comment on this revision can point at (lines, routes, network nodes and links), by id. */
export function snapshotPartNames(snapshot: DesignSnapshot): Map<string, string> {
  const names = new Map<string, string>();
  for (const line of snapshot.lines) {
    names.set(line.id, line.name);
    if (line.routeId && line.routeName) names.set(line.routeId, line.routeName);
  }
  for (const part of [...(snapshot.network?.nodes ?? []), ...(snapshot.network?.links ?? [])])
    names.set(part.id, part.name);
  return names;
}
