import { highLowToleranceM, type LineAnalysis, type LineWarning } from '../../hydraulics/index';
import type { LineDesign } from '../validations/line-design';
import type { LineSiteContext } from './ram-start';
import { lineWinterPlan, winterWarnings, type LineWinterPlan } from './winter';

/**
 * What a line shows under "What to fix": the analysis's items and the winter findings, and the winter plan they came
 * from.
 */
export interface LineFixItems {
  winter: LineWinterPlan;
  warnings: LineWarning[];
}

/**
 * The one list of a line's items, for the line page, its PDF and the tests that count them: the core's
 * warnings, then the winter findings (pipe shallower than frost, buried-with-no-cover, drain-down
 * overdue). `deeperCoverFixable` says whether the cover comes from the line's setting (no station
 * carries its own), so "lay it deeper" can be offered.
 */
export function lineFixItems(
  analysis: LineAnalysis,
  winter: LineDesign['winter'],
  context: Pick<LineSiteContext, 'frostDepthM' | 'overdueDrainDownOn'>,
  deeperCoverFixable: boolean,
): LineFixItems {
  const plan = lineWinterPlan(
    { points: analysis.points, airPointToleranceM: highLowToleranceM(analysis.settings) },
    winter,
    context.frostDepthM,
    deeperCoverFixable,
  );
  return {
    winter: plan,
    warnings: [...analysis.warnings, ...winterWarnings(plan, context.overdueDrainDownOn ?? null)],
  };
}
