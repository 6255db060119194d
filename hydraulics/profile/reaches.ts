import type { PointEvents } from './grade-lines';
import type { ProfileGrid } from './grid';
import type { StretchHydraulics } from './stretch-hydraulics';

/**
 * A reach: the part of the line between two head resets (the start, each break-pressure tank,
 * the end). Each reach must carry the flow on its own head, so the line's gravity flow is the
 * smallest reach capacity.
 */
export interface Reach {
  /** First and last grid point of the reach. */
  fromPoint: number;
  toPoint: number;
  /** Head at the reach's start: the line start head or the tank's water level, m. */
  startHeadM: number;
  /** Head the reach must still have at its end: next tank's level or the end requirement, m. */
  requiredEndHeadM: number;
  /** Slope length of each stretch inside the reach, m (indexed by stretch). */
  lengthByStretchM: Float64Array;
  /** Sum of fitting K inside the reach per stretch whose velocity applies. */
  kByStretch: Float64Array;
}

/** Splits the grid into reaches at the break-pressure tanks and sums lengths and K per stretch. */
export function buildReaches(
  grid: ProfileGrid,
  events: PointEvents,
  stretchCount: number,
  startHeadM: number,
  requiredEndHeadM: number,
): Reach[] {
  const n = grid.chainageM.length;
  const reaches: Reach[] = [];
  const open = (fromPoint: number, head: number): Reach => ({
    fromPoint,
    toPoint: n - 1,
    startHeadM: head,
    requiredEndHeadM,
    lengthByStretchM: new Float64Array(stretchCount),
    kByStretch: new Float64Array(stretchCount),
  });
  let current = open(0, startHeadM);
  reaches.push(current);
  const { points, kAt, tankLevelM } = events;
  for (let e = 0; e < points.length; e++) {
    const j = points[e];
    const tankLevel = tankLevelM[e];
    if (tankLevel === tankLevel && j > 0) {
      current.toPoint = j;
      current.requiredEndHeadM = tankLevel;
      current = open(j, tankLevel);
      reaches.push(current);
    } else if (tankLevel === tankLevel) {
      current.startHeadM = Math.min(current.startHeadM, tankLevel);
    }
    current.kByStretch[grid.pieceStretch[j < n - 1 ? j : n - 2]] += kAt[e];
  }
  // Lengths by stretch, reach by reach: pieces from one reach's first point to the next one's.
  const { pieceStretch, pieceSlopeLengthM } = grid;
  for (const reach of reaches) {
    const lengths = reach.lengthByStretchM;
    const last = Math.min(reach.toPoint, n - 1);
    for (let j = reach.fromPoint; j < last; j++) lengths[pieceStretch[j]] += pieceSlopeLengthM[j];
  }
  return reaches;
}

/** Friction plus fitting loss of a reach at the given stretch hydraulics, m. */
export function reachHeadLossM(reach: Reach, hydraulics: StretchHydraulics): number {
  let loss = 0;
  for (let s = 0; s < reach.lengthByStretchM.length; s++) {
    loss +=
      hydraulics.frictionGradient[s] * reach.lengthByStretchM[s] + reach.kByStretch[s] * hydraulics.velocityHeadM[s];
  }
  return loss;
}
