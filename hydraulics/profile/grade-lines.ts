import type { ProfileGrid } from './grid';

/**
 * Where the line's head is reset or lost locally: the few points that carry a fitting or a
 * break-pressure tank, in chainage order. Kept sparse: a 100,000-point line has a handful.
 */
export interface PointEvents {
  /** Grid points with an event, strictly increasing. */
  points: number[];
  /** Sum of fitting K at each event point (applied with the velocity of the pipe leaving the point). */
  kAt: number[];
  /** Water level of a break-pressure tank at each event point, NaN where there is none. */
  tankLevelM: number[];
}

/** Head lost AT the event points, m: the line just upstream of a point is its value there plus the drop. */
export interface PointDrops {
  /** The event points (`PointEvents.points`); the drop is zero at every other point. */
  points: readonly number[];
  /** Fitting losses plus a tank reset of the hydraulic grade, m. */
  hydraulicM: number[];
  /** Tank reset of the static line, m. */
  staticM: number[];
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
  /** Head lost at the event points. */
  drops: PointDrops;
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
  const staticHeadM = new Float64Array(n);
  const hydraulicGradeM = new Float64Array(n);
  const frictionLossM = new Float64Array(n);
  const minorLossM = new Float64Array(n);
  const eventCount = events.points.length;
  const drops: PointDrops = {
    points: events.points,
    hydraulicM: new Array<number>(eventCount).fill(0),
    staticM: new Array<number>(eventCount).fill(0),
  };
  // Start values read from a typed array like every other number in the loop: a loop variable that
  // starts as an argument is boxed at every point by the engine's optimised code.
  const starts = Float64Array.of(startHeadM, staticStartM);
  let grade = starts[0];
  let level = starts[1];
  let friction = 0;
  let minor = 0;
  let tankDrop = 0;
  const tankArrivals: { point: number; headM: number }[] = [];
  let e = 0;
  let nextEvent = eventCount > 0 ? events.points[0] : -1;
  for (let j = 0; j < n; j++) {
    if (j > 0) {
      const loss = frictionGradient[pieceStretch[j - 1]] * pieceSlopeLengthM[j - 1];
      friction += loss;
      grade -= loss;
    }
    if (j === nextEvent) {
      const arriving = grade;
      const tankLevel = events.tankLevelM[e];
      if (tankLevel === tankLevel) {
        tankArrivals.push({ point: j, headM: grade });
        if (grade > tankLevel) {
          tankDrop += grade - tankLevel;
          grade = tankLevel;
        }
        if (level > tankLevel) {
          drops.staticM[e] = level - tankLevel;
          level = tankLevel;
        }
      }
      const k = events.kAt[e];
      if (k !== 0) {
        const fitting = k * velocityHeadM[pieceStretch[j < n - 1 ? j : n - 2]];
        minor += fitting;
        grade -= fitting;
      }
      drops.hydraulicM[e] = arriving - grade;
      e++;
      nextEvent = e < eventCount ? events.points[e] : -1;
    }
    hydraulicGradeM[j] = grade;
    staticHeadM[j] = level;
    frictionLossM[j] = friction;
    minorLossM[j] = minor;
  }
  return { staticHeadM, hydraulicGradeM, frictionLossM, minorLossM, drops, breakPressureDropM: tankDrop, tankArrivals };
}
