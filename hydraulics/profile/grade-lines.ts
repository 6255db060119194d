import type { ProfileGrid } from './grid';

/** Where the line's head is reset or lost locally, point by point (dense, length n). */
export interface PointEvents {
  /** Sum of fitting K at each point (applied with the velocity of the pipe leaving the point). */
  kAtPoint: Float64Array;
  /** Water level of a break-pressure tank at each point, NaN where there is none. */
  tankLevelAtPoint: Float64Array;
}

/** Static line and hydraulic grade line along the grid, with the local drops that make them. */
export interface GradeLines {
  /** Static head line (no flow), m above datum. */
  staticHeadM: Float64Array;
  /** Hydraulic grade line while flowing, m above datum (value just downstream of each point). */
  hydraulicGradeM: Float64Array;
  /** Cumulative friction loss from the start, m. */
  frictionLossM: Float64Array;
  /** Cumulative fitting loss from the start, m. */
  minorLossM: Float64Array;
  /** Head lost AT each point (fitting losses plus a tank reset), m: HGL upstream = HGL + drop. */
  hydraulicDropAtPointM: Float64Array;
  /** Static head lost at each point (tank resets), m. */
  staticDropAtPointM: Float64Array;
  /** Head dissipated in break-pressure tanks, m (sum). */
  breakPressureDropM: number;
  /** Hydraulic grade arriving at each tank point (before its reset), in chainage order. */
  tankArrivals: { point: number; headM: number }[];
}

/**
 * One pass along the grid. A break-pressure tank sets both lines to the LOWER of the arriving line
 * and its water level: a tank the line cannot reach drains instead of lifting the grade, so the
 * hydraulic grade never rises along the flow. Fittings at a tank act on its outlet side.
 */
export function computeGradeLines(
  grid: ProfileGrid,
  events: PointEvents,
  frictionGradient: Float64Array,
  velocityHeadM: Float64Array,
  startHeadM: number,
  staticStartM: number,
): GradeLines {
  const n = grid.chainageM.length;
  const { pieceStretch, pieceSlopeLengthM } = grid;
  const { kAtPoint, tankLevelAtPoint } = events;
  const staticHeadM = new Float64Array(n);
  const hydraulicGradeM = new Float64Array(n);
  const frictionLossM = new Float64Array(n);
  const minorLossM = new Float64Array(n);
  const hydraulicDropAtPointM = new Float64Array(n);
  const staticDropAtPointM = new Float64Array(n);
  // Start values read from a typed array like every other number in the loop: a loop variable that
  // starts as an argument is boxed at every point by the engine's optimised code.
  const starts = Float64Array.of(startHeadM, staticStartM);
  let grade = starts[0];
  let level = starts[1];
  let friction = 0;
  let minor = 0;
  let tankDrop = 0;
  const tankArrivals: { point: number; headM: number }[] = [];
  for (let j = 0; j < n; j++) {
    if (j > 0) {
      const loss = frictionGradient[pieceStretch[j - 1]] * pieceSlopeLengthM[j - 1];
      friction += loss;
      grade -= loss;
    }
    const arriving = grade;
    const tankLevel = tankLevelAtPoint[j];
    if (tankLevel === tankLevel) {
      tankArrivals.push({ point: j, headM: grade });
      if (grade > tankLevel) {
        tankDrop += grade - tankLevel;
        grade = tankLevel;
      }
      if (level > tankLevel) {
        staticDropAtPointM[j] = level - tankLevel;
        level = tankLevel;
      }
    }
    const k = kAtPoint[j];
    if (k !== 0) {
      const fitting = k * velocityHeadM[pieceStretch[j < n - 1 ? j : n - 2]];
      minor += fitting;
      grade -= fitting;
    }
    hydraulicDropAtPointM[j] = arriving - grade;
    hydraulicGradeM[j] = grade;
    staticHeadM[j] = level;
    frictionLossM[j] = friction;
    minorLossM[j] = minor;
  }
  return {
    staticHeadM,
    hydraulicGradeM,
    frictionLossM,
    minorLossM,
    hydraulicDropAtPointM,
    staticDropAtPointM,
    breakPressureDropM: tankDrop,
    tankArrivals,
  };
}
