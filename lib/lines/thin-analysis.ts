import type { LineAnalysis, ProfilePoints } from '../../hydraulics/index';
import { thinProfile } from '../chart/thin-profile';

/**
 * An analysis with its profile cut to about `maxPoints` points for a caller that only draws it:
 * the largest-triangle choice on the pipe line plus every local high and low of the ground, pipe,
 * grade and pressure lines and every inserted point (stretch ends, fittings, tanks), so no summit,
 * sag or pressure extreme is lost. Stretch, reach and warning figures are untouched.
 */
export function thinAnalysis(analysis: LineAnalysis, maxPoints: number): LineAnalysis {
  const p = analysis.points;
  const inserted: number[] = [];
  p.stationIndex.forEach((s, i) => {
    if (s < 0) inserted.push(i);
  });
  const keep = thinProfile(p.chainageM, p.pipeElevationM, {
    targetPoints: maxPoints,
    guardSeries: [p.groundElevationM, p.hydraulicGradeM, p.pressureHeadM, p.staticPressureHeadM],
    keep: inserted,
  });
  if (keep.length === p.chainageM.length) return analysis;
  const points = {} as ProfilePoints;
  for (const key of Object.keys(p) as (keyof ProfilePoints)[]) {
    const column = p[key];
    const Kind = column.constructor as Float64ArrayConstructor | Int32ArrayConstructor;
    const out = new Kind(keep.length);
    keep.forEach((index, k) => {
      out[k] = column[index];
    });
    (points as unknown as Record<string, ArrayLike<number>>)[key] = out;
  }
  return { ...analysis, points };
}
