import { HydraulicsInputError } from '../errors';

/** Input of `planBreakPressureTanks`: a static profile and the allowable head of its pipe. */
export interface TankPlanInput {
  /** Point chainages, m (strictly increasing). */
  chainageM: ArrayLike<number>;
  /** Ground elevation at each point, m (a new tank stands on the ground). */
  groundElevationM: ArrayLike<number>;
  /** Pipe elevation at each point, m (static pressure is measured at the pipe). */
  pipeElevationM: ArrayLike<number>;
  /**
   * Allowable static pressure head, one value or one per piece (point j to j+1), or one per stretch
   * with `pieceStretch`, m.
   */
  allowableHeadM: number | ArrayLike<number>;
  /** When given, `allowableHeadM` is indexed by stretch and this maps each piece to its stretch. */
  pieceStretch?: ArrayLike<number>;
  /** Static level at the first point planned (start level or the last tank's level), m. */
  startLevelM: number;
  /** Height of a new tank's water level above the ground at its site, m. @default 0 */
  tankWaterAboveGroundM?: number;
  /** First and last point to plan over. @default the whole profile */
  fromPoint?: number;
  toPoint?: number;
  /**
   * Head lost to friction and fittings from the line's start to each point at the design flow, m
   * (cumulative). A tank must sit high enough to push that flow over every summit after it.
   * @default no flow (only the static level has to clear the summits)
   */
  headLossToPointM?: ArrayLike<number>;
  /** Pressure head to keep above the pipe at summits after a tank while flowing, m. @default 0 */
  summitClearanceM?: number;
}

/** A planned break-pressure tank. */
export interface PlannedTank {
  chainageM: number;
  /** Water level it resets the static line to, m. */
  waterLevelM: number;
}

/** Result of a tank plan. */
export interface TankPlan {
  tanks: PlannedTank[];
  /** False when no set of tanks can keep the pipe within its rating (see `problem`). */
  feasible: boolean;
  problem?: { chainageM: number; message: string };
}

const EPS_M = 1e-9;

/** A position on the profile: piece index and a chainage inside it (or at its start). */
interface Position {
  piece: number;
  chainageM: number;
  pipeM: number;
  groundM: number;
}

function lerp(a: number, b: number, t: number): number {
  return a + t * (b - a);
}

/**
 * The fewest break-pressure tanks that keep the static pressure within the allowable head while
 * every tank stays high enough for the water to get over all the pipe downstream of it.
 *
 * Greedy: from each reset (the start, then each new tank) follow the static line to the first
 * chainage where it passes the rating; the "window" is everything from the reset to that
 * chainage. Put the next tank at the LOWEST usable site in the window (the latest one on a tie):
 * a site is usable when its water level is below the arriving static level and not below the
 * highest pipe anywhere downstream (tanks only ever lower the level, so a tank below a later
 * summit would leave the water unable to pass it). With one rating, even cover and no summit
 * ahead, that site is the window's end, "the last chainage where the static pressure is still
 * within the rating".
 *
 * Why it is minimal: beyond the window, a tank's reach (how far its static line stays within the
 * rating) depends only on its water level, and a lower level never reaches less far; usable
 * levels only shrink along the line. So the greedy tank reaches at least as far as any tank a plan
 * could put in the same window, and by induction after k tanks the greedy plan reaches at least
 * as far as any feasible plan with k tanks: when some plan covers the line with m tanks, the
 * greedy plan needs at most m. Checked against brute force in tests/hydraulics/design.
 */
export function planBreakPressureTanks(input: TankPlanInput): TankPlan {
  const from = input.fromPoint ?? 0;
  const to = input.toPoint ?? input.chainageM.length - 1;
  if (!(to > from)) throw new HydraulicsInputError('toPoint', `must be after fromPoint (${from}), got ${to}`);
  const planner = new TankPlanner(input, from, to);

  const tanks: PlannedTank[] = [];
  const { chainageM, groundElevationM, pipeElevationM } = input;
  let level = input.startLevelM;
  let at: Position = {
    piece: from,
    chainageM: chainageM[from],
    pipeM: pipeElevationM[from],
    groundM: groundElevationM[from],
  };
  const fail = (chainage: number, message: string): TankPlan => ({
    tanks,
    feasible: false,
    problem: { chainageM: chainage, message },
  });

  // Every tank lowers the level by at least (rating - cover) > 0, so the loop ends; the cap only
  // guards against a caller's NaN.
  for (let guard = 0; guard < 1_000_000; guard++) {
    const over = firstOverRating(
      chainageM,
      groundElevationM,
      pipeElevationM,
      planner.allowFixed,
      planner.allowByPiece,
      planner.pieceStretch,
      at,
      level,
      to,
    );
    if (over === null) return { tanks, feasible: true };
    if (over.chainageM <= at.chainageM + EPS_M) {
      return fail(
        over.chainageM,
        'the pipe here is over its rating even right below a tank: use a higher pressure class',
      );
    }
    const chosen = planner.lowestSite(at, over, level);
    if (chosen === null) {
      return fail(
        over.chainageM,
        'every tank site low enough to protect the pipe lies below a summit further on, which the water could not pass: use a higher pressure class',
      );
    }
    tanks.push({ chainageM: chosen.chainageM, waterLevelM: chosen.groundM + planner.raise });
    level = chosen.groundM + planner.raise;
    at = chosen;
  }
  return fail(at.chainageM, 'tank planning did not converge');
}

/**
 * The planner's per-point work. A class with its figures as fields, not closures made per call: a
 * closure made anew each call is a new call target for the engine's optimised code, and the
 * numbers passing through it end up boxed, megabytes per plan on a 100,000-station line.
 */
class TankPlanner {
  readonly chainageM: ArrayLike<number>;
  readonly groundElevationM: ArrayLike<number>;
  readonly pipeElevationM: ArrayLike<number>;
  readonly allowFixed: number;
  readonly allowByPiece: ArrayLike<number> | null;
  readonly pieceStretch: ArrayLike<number> | null;
  readonly lossTo: ArrayLike<number> | null;
  readonly raise: number;
  readonly clearance: number;
  readonly n: number;
  readonly to: number;
  /**
   * Highest "pipe plus loss to reach it" at or after each point: a tank at point k must hold at
   * least highestAhead[k] - loss(k) + clearance for the design flow to pass every summit ahead.
   */
  readonly highestAhead: Float64Array;
  // The best site so far, as numbers (a Position is made once, for the chosen site): on falling
  // ground nearly every point of a long window is a new best.
  found = false;
  bestPiece = 0;
  bestChainageM = 0;
  bestPipeM = 0;
  bestGroundM = 0;
  level = 0;

  constructor(input: TankPlanInput, from: number, to: number) {
    this.chainageM = input.chainageM;
    this.groundElevationM = input.groundElevationM;
    this.pipeElevationM = input.pipeElevationM;
    this.allowFixed = typeof input.allowableHeadM === 'number' ? input.allowableHeadM : 0;
    this.allowByPiece = typeof input.allowableHeadM === 'number' ? null : input.allowableHeadM;
    this.pieceStretch = input.pieceStretch ?? null;
    this.lossTo = input.headLossToPointM ?? null;
    this.raise = input.tankWaterAboveGroundM ?? 0;
    this.clearance = input.summitClearanceM ?? 0;
    this.n = input.chainageM.length;
    this.to = to;
    const { pipeElevationM, lossTo } = this;
    const highestAhead = new Float64Array(to + 1);
    // The running highest kept in a local: read back from the array, each point would wait on the store before it.
    let highest = pipeElevationM[to] + (lossTo === null ? 0 : lossTo[to]);
    highestAhead[to] = highest;
    for (let k = to - 1; k >= from; k--) {
      highest = Math.max(pipeElevationM[k] + (lossTo === null ? 0 : lossTo[k]), highest);
      highestAhead[k] = highest;
    }
    this.highestAhead = highestAhead;
  }

  /** Head lost from the start to chainage c inside piece `piece`, m (linear along the piece). */
  lossAt(piece: number, c: number): number {
    const { lossTo, chainageM } = this;
    if (lossTo === null) return 0;
    const c0 = chainageM[piece];
    const c1 = piece + 1 < this.n ? chainageM[piece + 1] : c0;
    return c1 > c0 ? lerp(lossTo[piece], lossTo[piece + 1], (c - c0) / (c1 - c0)) : lossTo[piece];
  }

  floorAt(ahead: number, piece: number, c: number): number {
    return ahead - this.lossAt(piece, c) + this.clearance;
  }

  consider(piece: number, siteChainageM: number, pipeM: number, groundM: number, floorM: number): void {
    const siteLevel = groundM + this.raise;
    if (siteLevel < floorM - EPS_M || siteLevel >= this.level - EPS_M) return;
    const allow =
      this.allowByPiece === null
        ? this.allowFixed
        : this.allowByPiece[this.pieceStretch === null ? piece : this.pieceStretch[piece]];
    if (siteLevel - pipeM > allow + EPS_M) return;
    if (!this.found || siteLevel <= this.bestGroundM + this.raise) {
      this.found = true;
      this.bestPiece = piece;
      this.bestChainageM = siteChainageM;
      this.bestPipeM = pipeM;
      this.bestGroundM = groundM;
    }
  }

  /**
   * The sites of piece k between `at` and `over`: its start point (not the start of the window)
   * and the point inside it where the tank level on the ground comes down to the floor set by the
   * summits ahead (both vary linearly along the piece): the lowest usable site.
   */
  considerPiece(at: Position, over: Position, k: number): void {
    const { chainageM, groundElevationM, pipeElevationM, highestAhead, raise } = this;
    const pieceEndM = k === over.piece ? over.chainageM : chainageM[k + 1];
    if (k > at.piece) {
      this.consider(
        k,
        chainageM[k],
        pipeElevationM[k],
        groundElevationM[k],
        this.floorAt(highestAhead[k], k, chainageM[k]),
      );
    }
    const c0 = k === at.piece ? at.chainageM : chainageM[k];
    const g0 = k === at.piece ? at.groundM : groundElevationM[k];
    const g1 = k === over.piece ? over.groundM : groundElevationM[k + 1];
    const f0 = g0 + raise - this.floorAt(highestAhead[k + 1], k, c0);
    const f1 = g1 + raise - this.floorAt(highestAhead[k + 1], k, pieceEndM);
    if (f0 * f1 < 0) {
      const t = f0 / (f0 - f1);
      const z0 = k === at.piece ? at.pipeM : pipeElevationM[k];
      const z1 = k === over.piece ? over.pipeM : pipeElevationM[k + 1];
      const c = lerp(c0, pieceEndM, t);
      this.consider(k, c, lerp(z0, z1, t), lerp(g0, g1, t), this.floorAt(highestAhead[k + 1], k, c));
    }
  }

  /**
   * `considerPiece` for the whole pieces strictly inside the window, with the loss at their ends
   * read from the points (the same numbers `lossAt` gives there): a window can hold most of a
   * 100,000-point line, and this loop is the planner's cost.
   */
  considerInnerPieces(fromPiece: number, toPiece: number): void {
    const { chainageM, groundElevationM, pipeElevationM, highestAhead, raise, clearance, lossTo } = this;
    for (let k = fromPiece; k < toPiece; k++) {
      const lossStart = lossTo === null ? 0 : lossTo[k];
      // lerp(loss[k], loss[k + 1], 1), written out so the sums match `lossAt` to the last bit.
      const lossEnd = lossTo === null ? 0 : lossStart + (lossTo[k + 1] - lossStart);
      const g0 = groundElevationM[k];
      const g1 = groundElevationM[k + 1];
      const pointFloor = highestAhead[k] - lossStart + clearance;
      const siteLevel = g0 + raise;
      // The common case on a long window, a site that fails the first two tests of `consider`, costs no call.
      if (!(siteLevel < pointFloor - EPS_M || siteLevel >= this.level - EPS_M)) {
        this.consider(k, chainageM[k], pipeElevationM[k], g0, pointFloor);
      }
      const aheadM = highestAhead[k + 1];
      const f0 = g0 + raise - (aheadM - lossStart + clearance);
      const f1 = g1 + raise - (aheadM - lossEnd + clearance);
      if (f0 * f1 < 0) {
        const t = f0 / (f0 - f1);
        const c = lerp(chainageM[k], chainageM[k + 1], t);
        this.consider(
          k,
          c,
          lerp(pipeElevationM[k], pipeElevationM[k + 1], t),
          lerp(g0, g1, t),
          this.floorAt(aheadM, k, c),
        );
      }
    }
  }

  /**
   * The lowest usable tank site from `at` to `over` with the static line at `level` (the latest
   * one on a tie), or null when there is none.
   */
  lowestSite(at: Position, over: Position, level: number): Position | null {
    this.found = false;
    this.level = level;
    this.considerPiece(at, over, at.piece);
    this.considerInnerPieces(at.piece + 1, over.piece);
    if (over.piece > at.piece) this.considerPiece(at, over, over.piece);
    const overLoss = this.lossAt(over.piece, over.chainageM);
    const aheadOfOver = Math.max(
      over.pipeM + overLoss,
      over.piece + 1 <= this.to ? this.highestAhead[over.piece + 1] : over.pipeM + overLoss,
    );
    this.consider(
      over.piece,
      over.chainageM,
      over.pipeM,
      over.groundM,
      this.floorAt(aheadOfOver, over.piece, over.chainageM),
    );
    if (!this.found) return null;
    return { piece: this.bestPiece, chainageM: this.bestChainageM, pipeM: this.bestPipeM, groundM: this.bestGroundM };
  }
}

/** First position at or after `at` where `level` minus the pipe passes the allowable head. */
function firstOverRating(
  chainageM: ArrayLike<number>,
  groundElevationM: ArrayLike<number>,
  pipeElevationM: ArrayLike<number>,
  allowFixed: number,
  allowByPiece: ArrayLike<number> | null,
  pieceStretch: ArrayLike<number> | null,
  at: Position,
  level: number,
  to: number,
): Position | null {
  // The fixed limit and the start's pipe elevation read from typed arrays like the per-point values: a
  // number that is either an argument (or a field) or an array element is boxed at every point.
  const allowAt = allowByPiece ?? Float64Array.of(allowFixed);
  const atPipeM = Float64Array.of(at.pipeM);
  for (let j = at.piece; j < to; j++) {
    const limit = allowAt[allowByPiece === null ? 0 : pieceStretch === null ? j : pieceStretch[j]];
    const first = j === at.piece;
    const z0 = first ? atPipeM[0] : pipeElevationM[j];
    const startExcess = level - z0 - limit;
    if (startExcess > EPS_M)
      return {
        piece: j,
        chainageM: first ? at.chainageM : chainageM[j],
        pipeM: z0,
        groundM: first ? at.groundM : groundElevationM[j],
      };
    const endExcess = level - pipeElevationM[j + 1] - limit;
    if (endExcess > EPS_M) {
      const c0 = first ? at.chainageM : chainageM[j];
      const g0 = first ? at.groundM : groundElevationM[j];
      // Fraction of the way from c0 to the next point where the excess reaches zero.
      const t = -startExcess / (endExcess - startExcess);
      return {
        piece: j,
        chainageM: lerp(c0, chainageM[j + 1], t),
        pipeM: lerp(z0, pipeElevationM[j + 1], t),
        groundM: lerp(g0, groundElevationM[j + 1], t),
      };
    }
  }
  return null;
}
