import type { LineAnalysis, ProfilePoints } from '../../hydraulics/index';

/** The profile columns as plain number arrays (typed arrays do not survive JSON). */
export type PointColumnsJson = { [K in keyof ProfilePoints]: number[] };

/** A line analysis as JSON: the same fields, columns as arrays. */
export type LineAnalysisJson = Omit<LineAnalysis, 'points'> & { points: PointColumnsJson };

/** Converts an analysis for a JSON response. */
export function analysisToJson(analysis: LineAnalysis): LineAnalysisJson {
  const points = {} as PointColumnsJson;
  for (const key of Object.keys(analysis.points) as (keyof ProfilePoints)[])
    points[key] = Array.from(analysis.points[key]);
  return { ...analysis, points };
}
