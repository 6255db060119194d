import type { PointDrops } from './grade-lines';

/** A chainage range where a quantity passes a limit, with exact (interpolated) ends. */
export interface LimitRange {
  /** Where the quantity first passes the limit, m. */
  fromM: number;
  /** Where it comes back inside the limit, m. */
  toM: number;
  /** Largest amount by which the limit is passed inside the range, m. */
  worstExcessM: number;
  /** Chainage of the largest excess, m. */
  worstChainageM: number;
}

/** Arguments of `findLimitRanges`. */
export interface LimitRangeArgs {
  /** Point chainages, m (strictly increasing). */
  chainageM: Float64Array;
  /** Value just downstream of each point, m. */
  valueM: Float64Array;
  /** Value lost AT each point (upstream value = value + drop); null when the line has no steps. */
  dropAtPointM: Float64Array | null;
  /** A fixed limit, or one limit per piece (point j to j+1), or per stretch with `pieceStretch`. */
  limitM: number | Float64Array;
  /** When given, `limitM` is indexed by stretch and this maps each piece to its stretch. */
  pieceStretch?: Int32Array;
  /** `below`: the range where value < limit; `above`: where value > limit. */
  side: 'below' | 'above';
  /** Excess that still counts as within the limit (rounding of a value placed exactly on it), m. @default 1e-6 */
  toleranceM?: number;
  /**
   * Hysteresis, m: a range only ends once the value comes back inside the limit by more than
   * this; ranges separated by a smaller return merge into one with its worst point (the survey
   * cannot resolve the gap; profile-and-checks.md §1.3). @default 0
   */
  mergeWithinM?: number;
}

/**
 * Ranges where a piecewise-linear quantity passes a limit. On each piece the excess is linear, so
 * a crossing inside a piece is found exactly by linear interpolation; a step at a point (a tank
 * reset, a fitting, a change of pipe rating) starts or ends a range at that point's chainage.
 * One pass, no per-point allocation.
 */
/**
 * The ranges found so far and the one being followed. A class, not closures made per call: a
 * closure made anew on each call is a new call target each time, which the engine's optimised
 * code does not expect, and its numbers then end up boxed at every point.
 */
class RangeCollector {
  readonly ranges: LimitRange[] = [];
  open = false;
  fromM = 0;
  worstExcessM = 0;
  worstChainageM = 0;
  /** A closed range waits here until the value has come back inside by more than mergeWithinM. */
  pending: LimitRange | null = null;
  recoveryM = 0;

  constructor(
    private readonly tolerance: number,
    private readonly mergeWithinM: number,
  ) {}

  note(excess: number, atM: number): void {
    if (excess > this.worstExcessM) {
      this.worstExcessM = excess;
      this.worstChainageM = atM;
    }
  }

  /** Ends stay exact; a range whose worst excess is within the tolerance is rounding, not a finding. */
  flush(): void {
    if (this.pending !== null && this.pending.worstExcessM > this.tolerance) this.ranges.push(this.pending);
    this.pending = null;
  }

  close(toM: number): void {
    this.open = false;
    if (!(toM > this.fromM)) return;
    this.pending = { fromM: this.fromM, toM, worstExcessM: this.worstExcessM, worstChainageM: this.worstChainageM };
    this.recoveryM = 0;
    if (this.mergeWithinM === 0) this.flush();
  }

  openAt(atM: number): void {
    this.open = true;
    if (this.pending !== null) {
      ({ fromM: this.fromM, worstExcessM: this.worstExcessM, worstChainageM: this.worstChainageM } = this.pending);
      this.pending = null;
    } else {
      this.fromM = atM;
      this.worstExcessM = 0;
    }
  }

  inside(byM: number): void {
    if (this.pending === null) return;
    this.recoveryM = Math.max(this.recoveryM, byM);
    if (this.recoveryM > this.mergeWithinM) this.flush();
  }

  /** One piece from c0 to c1, with the excess a just downstream of its start and b arriving at its end. */
  step(a: number, b: number, c0: number, c1: number): void {
    if (a > 0 && !this.open) this.openAt(c0);
    else if (a <= 0 && this.open) this.close(c0);
    if (a <= 0) this.inside(-a);
    if (this.open) this.note(a, c0);
    if (a > 0 && b <= 0) {
      this.close(c0 + ((c1 - c0) * a) / (a - b));
      this.inside(-b);
    } else if (a <= 0 && b > 0) {
      this.openAt(c0 + ((c1 - c0) * -a) / (b - a));
    } else if (b <= 0) {
      this.inside(-b);
    }
    if (this.open) this.note(b, c1);
  }

  /**
   * `step` for the two common cases, without a call: a piece wholly inside the limit with nothing
   * pending (no change at all), or wholly past it inside an open range (only the worst excess). A
   * call that is not inlined passes its numbers boxed, megabytes per 100,000-point sweep.
   */
  fastStep(a: number, b: number, c0: number, c1: number): void {
    if (a <= 0 && b <= 0 && !this.open && this.pending === null) return;
    if (a > 0 && b > 0 && this.open) {
      if (a > this.worstExcessM) {
        this.worstExcessM = a;
        this.worstChainageM = c0;
      }
      if (b > this.worstExcessM) {
        this.worstExcessM = b;
        this.worstChainageM = c1;
      }
      return;
    }
    this.step(a, b, c0, c1);
  }

  /** Nothing open and nothing waiting to merge: a piece wholly inside the limit changes nothing. */
  idle(): boolean {
    return !this.open && this.pending === null;
  }

  finish(lastM: number): LimitRange[] {
    if (this.open) this.close(lastM);
    this.flush();
    return this.ranges;
  }
}

export function findLimitRanges(args: LimitRangeArgs): LimitRange[] {
  const { limitM } = args;
  const r = new RangeCollector(args.toleranceM ?? 1e-6, Math.max(args.mergeWithinM ?? 0, 0));

  sweep(
    r,
    args.chainageM,
    args.valueM,
    args.dropAtPointM,
    typeof limitM === 'number' ? limitM : 0,
    typeof limitM === 'number' ? null : limitM,
    args.pieceStretch ?? null,
    args.side === 'below' ? -1 : 1,
  );
  return r.finish(args.chainageM[args.chainageM.length - 1]);
}

/**
 * The per-point loop of `findLimitRanges`, apart from its argument object: callers pass objects
 * of different shapes, and the loop's optimised code should not depend on them.
 */
function sweep(
  r: RangeCollector,
  chainageM: Float64Array,
  valueM: Float64Array,
  dropAtPointM: Float64Array | null,
  fixedLimit: number,
  limits: Float64Array | null,
  pieceStretch: Int32Array | null,
  sign: number,
): void {
  const n = chainageM.length;
  // A limit array of one value per piece even for a fixed limit: a number that is either an
  // argument or an array element is boxed at every point by the engine's optimised code.
  const limitAt = limits ?? new Float64Array(1).fill(fixedLimit);
  const byStretch = limits !== null && pieceStretch !== null;
  for (let j = 0; j < n - 1; j++) {
    const limit = limitAt[limits === null ? 0 : byStretch ? pieceStretch[j] : j];
    const a = sign * (valueM[j] - limit);
    const b = sign * (valueM[j + 1] + (dropAtPointM === null ? 0 : dropAtPointM[j + 1]) - limit);
    r.fastStep(a, b, chainageM[j], chainageM[j + 1]);
  }
}

/** Arguments of `findProfileLimitRanges`. */
export interface ProfileLimitArgs {
  chainageM: Float64Array;
  /** Stretch of each piece (point j to j+1). */
  pieceStretch: Int32Array;
  /** The flowing pressure just downstream of each point, checked for falling below three fixed limits. */
  flowingM: Float64Array;
  flowingLimitsM: readonly [number, number, number];
  /** The static pressure just downstream of each point, checked for rising above per-stretch limits. */
  stillM: Float64Array;
  stillLimitsByStretchM: readonly Float64Array[];
  /** Drops at the event points: `hydraulicM` for the flowing pressure, `staticM` for the static. */
  drops: PointDrops;
  /** As in `findLimitRanges`. */
  toleranceM?: number;
  mergeWithinM?: number;
}

/**
 * Every limit range of a profile in one pass: the flowing pressure below three fixed limits (zero,
 * the siphon limit, the vapour limit) and the static pressure above one or more per-stretch limits
 * (the allowable head, and with surge the allowable head less the surge). Same arithmetic, same
 * ranges as one `findLimitRanges` call per limit; one pass reads each value once.
 */
export function findProfileLimitRanges(args: ProfileLimitArgs): { flowing: LimitRange[][]; still: LimitRange[][] } {
  const { chainageM, stillLimitsByStretchM } = args;
  const aboveCount = stillLimitsByStretchM.length;
  if (aboveCount < 1 || aboveCount > 2) throw new RangeError(`one or two static limits, got ${aboveCount}`);
  const tolerance = args.toleranceM ?? 1e-6;
  const merge = Math.max(args.mergeWithinM ?? 0, 0);
  // Three below the flowing limits, then one or two above the static ones.
  const collectors = Array.from({ length: 3 + aboveCount }, () => new RangeCollector(tolerance, merge));
  sweepProfile(args, collectors);
  const lastM = chainageM[chainageM.length - 1];
  const ranges = collectors.map((r) => r.finish(lastM));
  return { flowing: ranges.slice(0, 3), still: ranges.slice(3) };
}

/**
 * The per-piece loop of `findProfileLimitRanges`, in a function of its own that ends with the
 * loop (the code after a loop, in the same function, lacked type feedback and threw the optimised
 * loop back to the interpreter on every call). Each piece's excesses go through one call site of
 * `fastStep`, in a loop over the collectors: with five call sites the engine inlined four, and the
 * fifth passed its numbers boxed, half a megabyte per sweep.
 */
function sweepProfile(args: ProfileLimitArgs, collectors: readonly RangeCollector[]): void {
  const { chainageM, pieceStretch, flowingM: flowValue, stillM: stillValue, stillLimitsByStretchM, drops } = args;
  // Limits read from a typed array like the per-point values, so none is boxed in the loop.
  const limits = Float64Array.of(...args.flowingLimitsM, Math.max(...args.flowingLimitsM));
  const limitA = stillLimitsByStretchM[0];
  // With one static limit there is no fifth collector; the second limit is the first again.
  const limitB = stillLimitsByStretchM[stillLimitsByStretchM.length - 1];
  const count = collectors.length;
  const dropPoints = drops.points;
  let e = 0;
  while (e < dropPoints.length && dropPoints[e] < 1) e++;
  const n = chainageM.length;
  // While every collector is idle (nothing open, nothing waiting to merge), a piece inside all
  // the limits changes nothing and is passed over. On most lines that is most pieces.
  let quiet = true;
  for (let j = 0; j < n - 1; j++) {
    const start = flowValue[j];
    let end = flowValue[j + 1];
    const stillStart = stillValue[j];
    let stillEnd = stillValue[j + 1];
    // The value arriving at an event point is its value there plus the drop at it.
    if (e < dropPoints.length && dropPoints[e] === j + 1) {
      end += drops.hydraulicM[e];
      stillEnd += drops.staticM[e];
      e++;
    }
    const stretch = pieceStretch[j];
    const a = limitA[stretch];
    const b = limitB[stretch];
    const highest = limits[3];
    if (
      quiet &&
      start >= highest &&
      end >= highest &&
      stillStart <= a &&
      stillEnd <= a &&
      stillStart <= b &&
      stillEnd <= b
    )
      continue;
    const c0 = chainageM[j];
    const c1 = chainageM[j + 1];
    quiet = true;
    for (let k = 0; k < count; k++) {
      const collector = collectors[k];
      const limit = k < 3 ? limits[k] : k === 3 ? a : b;
      // Below the flowing limits the excess is limit - value; above the static ones, value - limit.
      const first = k < 3 ? -(start - limit) : stillStart - limit;
      const last = k < 3 ? -(end - limit) : stillEnd - limit;
      collector.fastStep(first, last, c0, c1);
      quiet = quiet && collector.idle();
    }
  }
}
