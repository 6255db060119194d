/**
 * Indices of the local highs and lows of a series, in order. A run of equal values counts as one
 * high (or low) when both neighbours of the run are lower (or higher); both ends of such a flat
 * run are returned so a flat summit stays flat when drawn. The first and last index are not
 * included (they are kept anyway by the thinning).
 */
export function localExtremeIndices(y: ArrayLike<number>, from = 0, to = y.length - 1): number[] {
  const out: number[] = [];
  let runStart = from;
  // Direction of the last change before the current run: +1 rising, -1 falling, 0 none yet.
  let before = 0;
  for (let i = from + 1; i <= to + 1; i++) {
    if (i <= to && y[i] === y[runStart]) continue;
    const runEnd = i - 1;
    const after = i > to ? 0 : y[i] > y[runStart] ? 1 : -1;
    if (runStart > from && runEnd < to && before !== 0 && after !== 0 && before !== after) {
      out.push(runStart);
      if (runEnd !== runStart) out.push(runEnd);
    }
    before = after;
    runStart = i;
  }
  return out;
}

/**
 * Indices of the turns of a series that rises or falls by MORE than `reversal` before it turns
 * back (a zigzag filter), in order: a summit or sag that stands out by more than `reversal` on both
 * sides. Between two consecutive turns (and from an end to its nearest turn) the series stays
 * within `reversal` of the band the two points span, so nothing taller than `reversal` is hidden.
 * With `reversal` 0 every local high and low counts (`localExtremeIndices`). One pass, linear.
 */
export function turningIndices(y: ArrayLike<number>, reversal: number, from = 0, to = y.length - 1): number[] {
  if (!(reversal > 0)) return localExtremeIndices(y, from, to);
  const out: number[] = [];
  let direction = 0; // +1 rising towards a high, -1 falling towards a low, 0 not yet known
  let high = from;
  let low = from;
  for (let i = from + 1; i <= to; i++) {
    if (direction === 0) {
      if (y[i] > y[high]) high = i;
      if (y[i] < y[low]) low = i;
      if (y[high] - y[low] <= reversal) continue;
      // The first move larger than `reversal`: the extreme it started from is a turn (unless it is the end).
      const first = high > low ? low : high;
      if (first > from) out.push(first);
      direction = high > low ? 1 : -1;
    } else if (direction === 1) {
      if (y[i] > y[high]) high = i;
      else if (y[high] - y[i] > reversal) {
        out.push(high);
        direction = -1;
        low = i;
      }
    } else if (y[i] < y[low]) low = i;
    else if (y[i] - y[low] > reversal) {
      out.push(low);
      direction = 1;
      high = i;
    }
  }
  return out;
}
