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
export function findLimitRanges(args: LimitRangeArgs): LimitRange[] {
  const { chainageM, valueM, dropAtPointM, limitM, side } = args;
  const sign = side === 'below' ? -1 : 1;
  const tolerance = args.toleranceM ?? 1e-6;
  const mergeWithinM = Math.max(args.mergeWithinM ?? 0, 0);
  const ranges: LimitRange[] = [];
  let open = false;
  // The running figures live in a typed array, not in variables the helpers below capture: a
  // number assigned to a captured variable is boxed anew each time, and `note` and `inside` run
  // at every point of a long range.
  const FROM = 0;
  const WORST = 1;
  const WORST_AT = 2;
  const RECOVERY = 3;
  const run = new Float64Array(4);
  // A closed range waits here until the value has come back inside by more than mergeWithinM.
  let pending: LimitRange | null = null;
  const note = (excess: number, atM: number): void => {
    if (excess > run[WORST]) {
      run[WORST] = excess;
      run[WORST_AT] = atM;
    }
  };
  // Ends stay exact; a range whose worst excess is within the tolerance is rounding, not a finding.
  const flush = (): void => {
    if (pending !== null && pending.worstExcessM > tolerance) ranges.push(pending);
    pending = null;
  };
  const close = (toM: number): void => {
    open = false;
    if (!(toM > run[FROM])) return;
    pending = { fromM: run[FROM], toM, worstExcessM: run[WORST], worstChainageM: run[WORST_AT] };
    run[RECOVERY] = 0;
    if (mergeWithinM === 0) flush();
  };
  const openAt = (atM: number): void => {
    open = true;
    if (pending !== null) {
      run[FROM] = pending.fromM;
      run[WORST] = pending.worstExcessM;
      run[WORST_AT] = pending.worstChainageM;
      pending = null;
    } else {
      run[FROM] = atM;
      run[WORST] = 0;
    }
  };
  const inside = (byM: number): void => {
    if (pending === null) return;
    run[RECOVERY] = Math.max(run[RECOVERY], byM);
    if (run[RECOVERY] > mergeWithinM) flush();
  };
  const n = chainageM.length;
  const fixedLimit = typeof limitM === 'number' ? limitM : 0;
  const limits = typeof limitM === 'number' ? null : limitM;
  const pieceStretch = args.pieceStretch ?? null;
  for (let j = 0; j < n - 1; j++) {
    const limit = limits === null ? fixedLimit : limits[pieceStretch === null ? j : pieceStretch[j]];
    const c0 = chainageM[j];
    const c1 = chainageM[j + 1];
    const a = sign * (valueM[j] - limit);
    const b = sign * (valueM[j + 1] + (dropAtPointM === null ? 0 : dropAtPointM[j + 1]) - limit);
    if (a > 0 && !open) openAt(c0);
    else if (a <= 0 && open) close(c0);
    if (a <= 0) inside(-a);
    if (open) note(a, c0);
    if (a > 0 && b <= 0) {
      close(c0 + ((c1 - c0) * a) / (a - b));
      inside(-b);
    } else if (a <= 0 && b > 0) {
      openAt(c0 + ((c1 - c0) * -a) / (b - a));
    } else if (b <= 0) {
      inside(-b);
    }
    if (open) note(b, c1);
  }
  if (open) close(chainageM[n - 1]);
  flush();
  return ranges;
}
