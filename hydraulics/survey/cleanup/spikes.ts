import type { ProposedChange } from './proposed-change';
import { movingMedian } from './moving-median';
import { assertFiniteNumber, assertPositive } from '../../input-guards';
import type { RouteStation } from '../types';

export interface GradeSpikeOptions {
  /** Grade (rise/run, e.g. 0.5 = 50 %) both legs must exceed, in opposite directions. */
  gradeThreshold: number;
}

function assertStations(points: readonly RouteStation[]): void {
  points.forEach((p, i) => {
    assertFiniteNumber(p.chainageM, 'points.chainageM', i);
    assertFiniteNumber(p.elevationM, 'points.elevationM', i);
  });
}

/**
 * A point is a spike when the grade from its previous neighbour and the grade to its next one
 * both exceed the threshold and have opposite signs (up-then-down or down-then-up). The proposal
 * puts it back on the straight line between its neighbours.
 */
export function detectGradeSpikes(points: readonly RouteStation[], options: GradeSpikeOptions): ProposedChange[] {
  assertPositive(options.gradeThreshold, 'gradeThreshold');
  assertStations(points);
  const changes: ProposedChange[] = [];
  for (let i = 1; i < points.length - 1; i += 1) {
    const [a, p, b] = [points[i - 1], points[i], points[i + 1]];
    const runIn = p.chainageM - a.chainageM;
    const runOut = b.chainageM - p.chainageM;
    if (runIn <= 0 || runOut <= 0) continue; // zero or backwards legs are reported by the order/duplicate checks
    const gradeIn = (p.elevationM - a.elevationM) / runIn;
    const gradeOut = (b.elevationM - p.elevationM) / runOut;
    if (
      Math.abs(gradeIn) > options.gradeThreshold &&
      Math.abs(gradeOut) > options.gradeThreshold &&
      Math.sign(gradeIn) !== Math.sign(gradeOut)
    ) {
      const to = a.elevationM + ((b.elevationM - a.elevationM) * runIn) / (runIn + runOut);
      changes.push({
        kind: 'grade-spike',
        index: i,
        field: 'elevationM',
        from: p.elevationM,
        to,
        reason: `spike: grade ${(gradeIn * 100).toFixed(0)} % in and ${(gradeOut * 100).toFixed(0)} % out, both steeper than ${(options.gradeThreshold * 100).toFixed(0)} %`,
      });
    }
  }
  return changes;
}

export interface MedianOutlierOptions {
  /** Odd number of points in the moving median. */
  windowSize: number;
  /** How far from the local median a height may sit before it is flagged, metres. */
  toleranceM: number;
}

/** Flags heights more than `toleranceM` from the moving median; proposes the median instead. */
export function detectMedianOutliers(points: readonly RouteStation[], options: MedianOutlierOptions): ProposedChange[] {
  assertPositive(options.toleranceM, 'toleranceM');
  assertStations(points);
  const medians = movingMedian(
    points.map((p) => p.elevationM),
    options.windowSize,
  );
  const changes: ProposedChange[] = [];
  points.forEach((p, i) => {
    const offM = p.elevationM - medians[i];
    if (Math.abs(offM) > options.toleranceM) {
      changes.push({
        kind: 'median-outlier',
        index: i,
        field: 'elevationM',
        from: p.elevationM,
        to: medians[i],
        reason: `outlier: ${offM.toFixed(2)} m from the median of ${options.windowSize} neighbouring points (limit ${options.toleranceM} m)`,
      });
    }
  });
  return changes;
}
