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
  /**
   * Pixel columns the range is drawn across. When given, of each series' highs and lows only the
   * highest and the lowest in each column are kept, with the column's first and last point: a
   * column of pixels shows one vertical stroke from its lowest to its highest point, so the others
   * cannot be seen. On a noisy 100,000-station
   * line this cuts the drawn points from tens of thousands to a few per column.
   */
  columns?: number;
  /** Index range to thin, inclusive. @default the whole series */
  from?: number;
  to?: number;
}

/**
 * Largest-triangle-three-buckets (Steinarsson 2013, "Downsampling time series for visual
 * representation", ch. 4): one point per bucket, the one spanning the largest triangle with the
 * point kept before it and the mean of the next bucket.
 */
function largestTriangles(
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  from: number,
  to: number,
  buckets: number,
): number[] {
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
      const area = Math.abs(
        (x[previous] - meanX) * (y[j] - y[previous]) - (x[previous] - x[j]) * (meanY - y[previous]),
      );
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

/** Column of `columns` equal columns across [x0, x0 + columns / perM] that `xi` falls in. */
const columnOf = (xi: number, x0: number, perM: number, columns: number) =>
  Math.max(0, Math.min(Math.floor((xi - x0) * perM), columns - 1));

/**
 * Marks the first and last index of each of `columns` equal columns of x across [x[from], x[to]]
 * (x ascends): with each column's highest and lowest turn, the four points per column of M4
 * aggregation (Jugel et al. 2014, "M4: A Visualization-Oriented Time Series Data Aggregation",
 * PVLDB 7(10)), which draw the same pixels as the whole series.
 */
function markColumnEnds(
  x: ArrayLike<number>,
  from: number,
  to: number,
  columns: number,
  mark: (i: number) => void,
): void {
  const x0 = x[from];
  const perM = columns / (x[to] - x0 || 1);
  let start = from;
  mark(from);
  for (let c = columnOf(x[from], x0, perM, columns) + 1; c < columns; c++) {
    // First index in column c (binary search from the last one found).
    let lo = start;
    let hi = to + 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (columnOf(x[mid], x0, perM, columns) < c) lo = mid + 1;
      else hi = mid;
    }
    if (lo > to) break;
    mark(lo - 1);
    mark(lo);
    start = lo;
  }
  mark(to);
}

/**
 * Marks, of the ascending `turns` of `y`, the highest and the lowest in each of `columns` equal
 * columns of x across [x[from], x[to]] (first of equals): the per-column minimum and maximum of M4
 * aggregation, taken over the turns (a column's lowest or highest point is a turn or one of its
 * two end points).
 */
function markColumnExtremes(
  turns: readonly number[],
  x: ArrayLike<number>,
  y: ArrayLike<number>,
  from: number,
  to: number,
  columns: number,
  mark: (i: number) => void,
): void {
  if (turns.length === 0) return;
  const x0 = x[from];
  const perM = columns / (x[to] - x0 || 1);
  let column = -1;
  let high = -1;
  let low = -1;
  for (const i of turns) {
    const c = columnOf(x[i], x0, perM, columns);
    if (c !== column) {
      if (column >= 0) {
        mark(high);
        mark(low);
      }
      column = c;
      high = i;
      low = i;
    } else if (y[i] > y[high]) high = i;
    else if (y[i] < y[low]) low = i;
  }
  mark(high);
  mark(low);
}

/**
 * THE thinning of a long profile (route, line, import preview, exports). Indices of the points to
 * draw: the largest-triangle choice, plus EVERY local high and low of `y` and of each guard series
 * (those taller than `reversalM` when it is given), plus the ends and the `keep` indices. Between
 * two kept points the series stays within `reversalM` of the band they span (monotonic when 0), so
 * what is dropped can never hide a summit or a sag. With `columns`, only each column's first and last
 * point and highest and lowest high-or-low stay: every column then still spans the heights the
 * whole series reaches in it (with `reversalM` 0).
 * Returns ascending indices into the original arrays.
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
  const columns = options.columns !== undefined && options.columns >= 1 ? Math.floor(options.columns) : 0;
  if (columns > 0) markColumnEnds(x, from, to, columns, mark);
  for (const series of [y, ...(options.guardSeries ?? [])]) {
    const turns = turningIndices(series, options.reversalM ?? 0, from, to);
    if (columns > 0) markColumnExtremes(turns, x, series, from, to, columns, mark);
    else for (const i of turns) mark(i);
  }
  for (const i of options.keep ?? []) mark(i);
  const out: number[] = [];
  for (let k = 0; k < count; k++) if (marks[k] === 1) out.push(from + k);
  return out;
}

/** `thinProfile` over chainage/elevation points: the kept points themselves, in order. */
export function thinPoints<T extends { chainageM: number; elevationM: number }>(
  points: readonly T[],
  options: Omit<ThinOptions, 'from' | 'to' | 'guardSeries'>,
): T[] {
  const x = Float64Array.from(points, (p) => p.chainageM);
  const y = Float64Array.from(points, (p) => p.elevationM);
  return thinProfile(x, y, options).map((i) => points[i]);
}
