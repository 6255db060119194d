import { defaultVerticalUncertaintyM, type HeightSource } from './height-source';

/**
 * Ceiling on the scatter taken from a route's stated height confidence, m. A consumer GPS states
 * (or is given by default) its ABSOLUTE vertical error, up to 15 m; the point-to-point scatter of
 * one walk, which is what makes false highs and lows, is a few metres. Common practice, no source.
 */
export const WALKED_SCATTER_CAP_M = 5;

/** One surveyed point's height confidence as stored with the route. */
export interface HeightConfidence {
  heightSource?: HeightSource;
  /** Vertical uncertainty stated for the point, m; null or absent: the source's default. */
  confidenceM?: number | null;
}

/**
 * How far a route's heights scatter about the real ground, m: the median of the points' stated
 * confidence (or their source's default, see `DEFAULT_VERTICAL_UNCERTAINTY`), capped at
 * `WALKED_SCATTER_CAP_M` (profile-and-checks.md §1.1). 0 when no point says anything (typed heights): taken as exact. A
 * level
 * book (0.01 m) or hose level (0.05 m) gives a scatter below any tolerance, so nothing changes.
 */
export function surveyHeightScatterM(points: readonly HeightConfidence[]): number {
  // A typed array sorts numerically without a comparator: a 100,000-point walk is read on every page view.
  const all = new Float64Array(points.length);
  let count = 0;
  for (const p of points) {
    const stated =
      p.confidenceM ?? (p.heightSource === undefined ? undefined : defaultVerticalUncertaintyM(p.heightSource));
    if (stated !== undefined && Number.isFinite(stated) && stated >= 0) all[count++] = stated;
  }
  if (count === 0) return 0;
  const known = all.subarray(0, count).sort();
  const mid = known.length >> 1;
  const median = known.length % 2 === 1 ? known[mid] : (known[mid - 1] + known[mid]) / 2;
  return Math.min(median, WALKED_SCATTER_CAP_M);
}
