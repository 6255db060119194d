import type { GradeLines } from './grade-lines';
import type { ProfileGrid } from './grid';
import { findProfileLimitRanges } from './limit-zones';
import type { LimitCrossing, LimitKind, LimitZone, PressureLimits } from './result-types';

/** Inputs of `computeZones`. */
export interface ZoneInputs {
  grid: ProfileGrid;
  lines: GradeLines;
  pressureHeadM: Float64Array;
  staticPressureHeadM: Float64Array;
  /** Allowable pressure head per stretch, m. */
  allowableHeadM: Float64Array;
  /** Sudden-stop surge head per stretch, m (all zero to skip the surge zones). */
  surgeHeadM: Float64Array;
  limits: PressureLimits;
  /** Survey height scatter, m: zones closer than it can resolve merge (see `findLimitRanges`). @default 0 */
  heightScatterM?: number;
}

/**
 * Every limit zone of the profile with exact ends: flowing pressure below zero, below the
 * practical siphon limit and below the vapour limit; static pressure above the allowable head;
 * static pressure plus the sudden-stop surge above the allowable head.
 */
export function computeZones(z: ZoneInputs): LimitZone[] {
  const { grid, lines } = z;
  const surgeOn = z.surgeHeadM.some((head) => head > 0);
  const tag =
    (kind: LimitKind) =>
    (range: Omit<LimitZone, 'kind'>): LimitZone => ({ kind, ...range });
  const { flowing, still } = findProfileLimitRanges({
    chainageM: grid.chainageM,
    pieceStretch: grid.pieceStretch,
    flowingM: z.pressureHeadM,
    flowingLimitsM: [0, -z.limits.siphonLimitHeadM, -z.limits.vapourLimitHeadM],
    stillM: z.staticPressureHeadM,
    drops: lines.drops,
    stillLimitsByStretchM: surgeOn
      ? [z.allowableHeadM, z.allowableHeadM.map((allowable, s) => allowable - z.surgeHeadM[s])]
      : [z.allowableHeadM],
    mergeWithinM: z.heightScatterM ?? 0,
  });
  const [negative, siphon, vapour] = flowing;
  const [overRating, surgeOverRating = []] = still;
  return [
    ...negative.map(tag('negative-pressure')),
    ...siphon.map(tag('siphon-limit')),
    ...vapour.map(tag('vapour-limit')),
    ...overRating.map(tag('static-over-rating')),
    ...surgeOverRating.map(tag('surge-over-rating')),
  ];
}

/** Zone ends that lie inside the line, as crossings in chainage order. */
export function zoneCrossings(zones: readonly LimitZone[], firstM: number, lastM: number): LimitCrossing[] {
  const crossings: LimitCrossing[] = [];
  for (const zone of zones) {
    if (zone.fromM > firstM) crossings.push({ kind: zone.kind, chainageM: zone.fromM, entering: true });
    if (zone.toM < lastM) crossings.push({ kind: zone.kind, chainageM: zone.toM, entering: false });
  }
  return crossings.sort((a, b) => a.chainageM - b.chainageM);
}
