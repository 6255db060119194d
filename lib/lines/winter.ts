import { findLowPoints, type LineWarning, type LowPoint } from '../../hydraulics/index';
import type { LineDesign } from '../validations/line-design';

/** Extra cover below the frost depth a one-click "lay it deeper" fix asks for, m (common practice, no source). */
export const FROST_COVER_MARGIN_M = 0.15;

export type WinterTreatmentChoice = NonNullable<LineDesign['winter']>['treatment'];

/** The pipe profile of an analysed line, as the winter plan reads it. */
export interface WinterProfileInput {
  points: { chainageM: ArrayLike<number>; groundElevationM: ArrayLike<number>; pipeElevationM: ArrayLike<number> };
  /**
   * Rise or fall that counts as a high or low point, m (`highLowToleranceM` of the analysis, so drains sit where the
   * washout check finds sags).
   */
  airPointToleranceM: number;
}

export type WinterFix = { kind: 'drain-for-winter' } | { kind: 'deeper-cover'; coverM: number };

export interface LineWinterPlan {
  treatment: WinterTreatmentChoice;
  /** False when the design does not say and the line is taken as buried. */
  chosen: boolean;
  frostDepthM: number | null;
  /** Least cover over the pipe along the line and where, m. */
  shallowestCoverM: number;
  shallowestCoverAtM: number;
  /** Low points of the pipe where the line is drained (interior sags, by chainage). */
  drainPoints: LowPoint[];
  /** Ends of the line lower than the pipe next to them: water gathers there too. */
  lowEnds: LowPoint[];
  /** Set when the pipe lies shallower than the frost depth and the line is not drained. */
  warning: { message: string; fixes: WinterFix[] } | null;
}

function lowEndsOf(chainageM: ArrayLike<number>, pipeM: ArrayLike<number>): LowPoint[] {
  const last = chainageM.length - 1;
  const ends: LowPoint[] = [];
  if (last >= 1 && pipeM[0] < pipeM[1]) ends.push({ index: 0, chainageM: chainageM[0], elevationM: pipeM[0] });
  if (last >= 1 && pipeM[last] < pipeM[last - 1])
    ends.push({ index: last, chainageM: chainageM[last], elevationM: pipeM[last] });
  return ends;
}

/**
 * How the line is kept through winter: the designer's choice, the least cover against the site's
 * frost depth, and for a drained line its drain points (the low points of the pipe profile). A line
 * shallower than the frost depth that is not drained is warned about, with the two fixes: drain it,
 * or lay it deeper (only offered when `deeperCoverFixable`, i.e. the cover comes from the line's setting).
 */
export function lineWinterPlan(
  profile: WinterProfileInput,
  winter: LineDesign['winter'],
  frostDepthM: number | null,
  deeperCoverFixable: boolean,
): LineWinterPlan {
  const { chainageM, groundElevationM, pipeElevationM } = profile.points;
  let shallowest = 0;
  for (let i = 1; i < chainageM.length; i++) {
    if (groundElevationM[i] - pipeElevationM[i] < groundElevationM[shallowest] - pipeElevationM[shallowest])
      shallowest = i;
  }
  const shallowestCoverM = groundElevationM[shallowest] - pipeElevationM[shallowest];
  const treatment: WinterTreatmentChoice = winter?.treatment ?? 'buried-below-frost';
  const drained = treatment === 'drained-for-winter';
  const tooShallow = frostDepthM !== null && shallowestCoverM <= frostDepthM;
  const drainPoints = findLowPoints({
    chainageM: Array.from(chainageM),
    elevationM: Array.from(pipeElevationM),
    prominenceM: profile.airPointToleranceM,
  });
  const fixes: WinterFix[] = [{ kind: 'drain-for-winter' }];
  if (deeperCoverFixable && frostDepthM !== null)
    fixes.push({ kind: 'deeper-cover', coverM: Math.round((frostDepthM + FROST_COVER_MARGIN_M) * 100) / 100 });
  return {
    treatment,
    chosen: winter !== undefined,
    frostDepthM,
    shallowestCoverM,
    shallowestCoverAtM: chainageM[shallowest],
    drainPoints,
    lowEnds: lowEndsOf(chainageM, pipeElevationM),
    warning:
      tooShallow && !drained
        ? {
            message:
              'The pipe lies no deeper than frost reaches: water left in it can freeze and split the pipe or its fittings.',
            fixes,
          }
        : null,
  };
}

export interface DrainPoint {
  chainageM: number;
  elevationM: number;
  place: 'low start' | 'low point' | 'low end';
}

/** Every place a drained line is opened, by chainage: a low start, the low points, a low end. */
export function drainPointsOf(plan: Pick<LineWinterPlan, 'drainPoints' | 'lowEnds'>): DrainPoint[] {
  const ends = plan.lowEnds.map((p): DrainPoint => ({
    chainageM: p.chainageM,
    elevationM: p.elevationM,
    place: p.index === 0 ? 'low start' : 'low end',
  }));
  const lows = plan.drainPoints.map((p): DrainPoint => ({
    chainageM: p.chainageM,
    elevationM: p.elevationM,
    place: 'low point',
  }));
  return [...ends, ...lows].sort((a, b) => a.chainageM - b.chainageM);
}

/**
 * The winter findings as line warnings, so they count in the answers and stand in "What to fix"
 * with the line's other items: a pipe shallower than frost on a line that is not drained; a line
 * taken as buried below frost whose pipe lies on the surface (0 cover: a contradiction, whatever the
 * frost depth); a drain-down task past its date on a line that needs draining. The fixes live in
 * the Winter panel, so these carry no one-click fix.
 */
export function winterWarnings(plan: LineWinterPlan, overdueDrainDownOn: string | null = null): LineWarning[] {
  const out: LineWarning[] = [];
  const at = { chainageM: plan.shallowestCoverAtM };
  if (plan.warning) {
    out.push({
      code: 'winter-frost',
      severity: 'warning',
      at,
      values: {
        chainageM: plan.shallowestCoverAtM,
        coverM: plan.shallowestCoverM,
        frostDepthM: plan.frostDepthM ?? undefined,
      },
      message: plan.warning.message,
      suggestedFix: 'Drain the line for winter, or lay it deeper (Winter panel).',
      fixes: [],
    });
  }
  if (plan.treatment === 'buried-below-frost' && plan.shallowestCoverM <= 1e-9) {
    out.push({
      code: 'winter-cover-contradiction',
      severity: 'warning',
      at,
      values: { chainageM: plan.shallowestCoverAtM, coverM: plan.shallowestCoverM },
      message: 'The line is taken as buried below frost depth, but the pipe lies on the surface (no cover) here.',
      suggestedFix: 'Give the stations their cover, or choose to drain the line for winter.',
      fixes: [],
    });
  }
  const needsDraining = plan.treatment === 'drained-for-winter' || plan.warning !== null;
  if (overdueDrainDownOn && needsDraining) {
    out.push({
      code: 'drain-down-overdue',
      severity: 'warning',
      at: { chainageM: plan.drainPoints[0]?.chainageM ?? plan.shallowestCoverAtM },
      values: { dueOn: overdueDrainDownOn },
      message: `The drain-down task due on ${overdueDrainDownOn} is not done: water left in this line can freeze.`,
      suggestedFix: 'Open the drains at the low points and tick the task done on the lift page.',
      fixes: [],
    });
  }
  return out;
}
