import type { LineAnalysis } from '../../hydraulics';

type Plain<T> = T extends Float64Array | Int32Array ? number[] : T extends object ? { [K in keyof T]: Plain<T[K]> } : T;
export type LineAnalysisJson = Plain<LineAnalysis>;

/** The core keeps per-station results in typed arrays; JSON needs plain arrays. */
export function analysisToJson(analysis: LineAnalysis): LineAnalysisJson {
  const points = Object.fromEntries(
    Object.entries(analysis.points).map(([key, values]) => [key, Array.from(values as ArrayLike<number>)]),
  );
  return { ...analysis, points } as unknown as LineAnalysisJson;
}
