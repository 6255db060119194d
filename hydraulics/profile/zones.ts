import type { GradeLines } from './grade-lines';
import type { ProfileGrid } from './grid';
import { findLimitRanges, findThreeLimitRanges } from './limit-zones';
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
  const chainageM = grid.chainageM;
  const mergeWithinM = z.heightScatterM ?? 0;
  const flowing = { chainageM, valueM: z.pressureHeadM, dropAtPointM: lines.hydraulicDropAtPointM, mergeWithinM };
  const still = { chainageM, valueM: z.staticPressureHeadM, dropAtPointM: lines.staticDropAtPointM, mergeWithinM };
  const tag =
    (kind: LimitKind) =>
    (range: Omit<LimitZone, 'kind'>): LimitZone => ({ kind, ...range });
  const [negative, siphon, vapour] = findThreeLimitRanges({ ...flowing, side: 'below' }, [
    0,
    -z.limits.siphonLimitHeadM,
    -z.limits.vapourLimitHeadM,
  ]);
  const zones: LimitZone[] = [
    ...negative.map(tag('negative-pressure')),
    ...siphon.map(tag('siphon-limit')),
    ...vapour.map(tag('vapour-limit')),
    ...findLimitRanges({ ...still, limitM: z.allowableHeadM, pieceStretch: grid.pieceStretch, side: 'above' }).map(
      tag('static-over-rating'),
    ),
  ];
  if (z.surgeHeadM.some((head) => head > 0)) {
    const surgeLimit = z.allowableHeadM.map((allowable, s) => allowable - z.surgeHeadM[s]);
    zones.push(
      ...findLimitRanges({ ...still, limitM: surgeLimit, pieceStretch: grid.pieceStretch, side: 'above' }).map(
        tag('surge-over-rating'),
      ),
    );
  }
  return zones;
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
