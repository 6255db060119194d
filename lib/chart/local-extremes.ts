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
