import { analyzeLine, type LineAnalysis } from '../../hydraulics/index';
import { lineInputOf } from '../lines/line-input';
import type { DesignSnapshot, SnapshotLine } from './snapshot-types';

/** A frozen line's analysis: the same core on the same frozen input, so it reads the same every time. Null when the line could not be frozen with stations. */
export function analyseSnapshotLine(line: SnapshotLine): LineAnalysis | null {
  if (line.problem || line.stations.length < 2) return null;
  return analyzeLine(lineInputOf(line.design, line.stations, line.context));
}

export function snapshotLine(snapshot: DesignSnapshot, lineId: string): SnapshotLine | null {
  return snapshot.lines.find((l) => l.id === lineId) ?? null;
}
