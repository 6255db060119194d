import { turningIndices } from './local-extremes';

export interface ThinOptions {
  /** Points wanted from the largest-triangle pass (the extremes and `keep` come on top). */
  targetPoints: number;
  /** Further series whose local highs and lows must also survive (e.g. the pipe line). */
  guardSeries?: readonly ArrayLike<number>[];
  /** Indices that must survive (tanks, stretch ends, devices). Out-of-range ones are ignored. */
  keep?: Iterable<number>;
  /**
   * Highs and lows that stand out by this much or less may go, m: a walked GPS route's scatter
   * (`surveyHeightScatterM`) makes a false high or low every few points, and keeping them all would
   * keep most of the route. @default 0: every local high and low is kept
   */
  reversalM?: number;
  /** Index range to thin, inclusive. @default the whole series */
  from?: number;
  to?: number;
}

/**
 * Largest-triangle-three-buckets (Steinarsson 2013, "Downsampling time series for visual
 * representation", ch. 4): one point per bucket, the one spanning the largest triangle with the
 * point kept before it and the mean of the next bucket.
 */
function largestTriangles(x: ArrayLike<number>, y: ArrayLike<number>, from: number, to: number, buckets: number): number[] {
  const chosen = [from];
  const inner = to - from - 1;
  if (buckets <= 0 || inner <= 0) return [from, to];
  const size = inner / buckets;
  let previous = from;
  for (let b = 0; b < buckets; b++) {
    const start = from + 1 + Math.floor(b * size);
    const end = Math.min(from + 1 + Math.floor((b + 1) * size), to);
    const nextStart = end;
    const nextEnd = Math.min(from + 1 + Math.floor((b + 2) * size), to + 1);
    let meanX = 0;
    let meanY = 0;
    for (let j = nextStart; j < nextEnd; j++) {
      meanX += x[j];
      meanY += y[j];
    }
    const count = Math.max(nextEnd - nextStart, 1);
    meanX = nextEnd > nextStart ? meanX / count : x[to];
    meanY = nextEnd > nextStart ? meanY / count : y[to];
    let best = start;
    let bestArea = -1;
    for (let j = start; j < end; j++) {
      const area = Math.abs((x[previous] - meanX) * (y[j] - y[previous]) - (x[previous] - x[j]) * (meanY - y[previous]));
      if (area > bestArea) {
        bestArea = area;
        best = j;
      }
    }
    if (end > start) {
      chosen.push(best);
      previous = best;
    }
  }
  chosen.push(to);
  return chosen;
}

/**
 * THE thinning of a long profile (route, line, import preview, exports). Indices of the points to
 * draw: the largest-triangle choice, plus EVERY local high and low of `y` and of each guard series
 * (those taller than `reversalM` when it is given), plus the ends and the `keep` indices. Between
 * two kept points the series stays within `reversalM` of the band they span (monotonic when 0), so
 * what is dropped can never hide a summit or a sag. Returns ascending indices into the original arrays.
 */
export function thinProfile(x: ArrayLike<number>, y: ArrayLike<number>, options: ThinOptions): number[] {
  const from = Math.max(options.from ?? 0, 0);
  const to = Math.min(options.to ?? y.length - 1, y.length - 1);
  if (to < from) return [];
  const count = to - from + 1;
  if (count <= Math.max(options.targetPoints, 2)) return Array.from({ length: count }, (_, i) => from + i);
  const marks = new Uint8Array(count);
  const mark = (i: number) => {
    if (i >= from && i <= to) marks[i - from] = 1;
  };
  for (const i of largestTriangles(x, y, from, to, Math.max(options.targetPoints - 2, 0))) mark(i);
  for (const series of [y, ...(options.guardSeries ?? [])]) for (const i of turningIndices(series, options.reversalM ?? 0, from, to)) mark(i);
  for (const i of options.keep ?? []) mark(i);
  const out: number[] = [];
  for (let k = 0; k < count; k++) if (marks[k] === 1) out.push(from + k);
  return out;
}

/** `thinProfile` over chainage/elevation points: the kept points themselves, in order. */
export function thinPoints<T extends { chainageM: number; elevationM: number }>(points: readonly T[], options: Omit<ThinOptions, 'from' | 'to' | 'guardSeries'>): T[] {
  const x = Float64Array.from(points, (p) => p.chainageM);
  const y = Float64Array.from(points, (p) => p.elevationM);
  return thinProfile(x, y, options).map((i) => points[i]);
}
