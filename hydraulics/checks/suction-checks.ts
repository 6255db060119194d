import { pointIndexAt } from '../profile/grid';
import { findLimitRanges } from '../profile/limit-zones';
import type { LimitZone, LineProfile } from '../profile/result-types';
import type { LineWarning, WarningValues } from './types';
import { chainage, chainageRange, metres, PRESSURE_CAUTION } from './wording';

function zonesOf(profile: LineProfile, kind: LimitZone['kind']): LimitZone[] {
  return profile.zones.filter((zone) => zone.kind === kind);
}

/** The figures every zone warning carries; `withinScatter` when the worst excess is inside the survey's scatter. */
export function zoneValues(zone: LimitZone, profile: LineProfile): WarningValues {
  const scatterM = profile.settings.heightScatterM;
  return {
    fromM: zone.fromM,
    toM: zone.toM,
    worstChainageM: zone.worstChainageM,
    scatterM,
    withinScatter: scatterM > 0 && zone.worstExcessM <= scatterM,
  };
}

/** A sentence for a result that the survey cannot tell from its limit, or ''. */
export function scatterWords(values: WarningValues): string {
  return values.withinScatter
    ? `The worst figure lies within the survey's height scatter of ${metres(values.scatterM ?? 0)} of the limit: ` +
        'it may or may not be passed; check the heights here with a level before deciding. '
    : '';
}

/**
 * Suction while flowing. Below zero: a warning, because good practice keeps the grade line above
 * the pipe ("never negative", Jordan p.52 via ITACA [R1]; suction draws in dirty water and air).
 * Below the practical siphon limit ([R7], 7.5 m) or the vapour limit (atmospheric minus vapour
 * head at the site): danger, the water column can break and the flow stop.
 */
export function suctionWarnings(profile: LineProfile): LineWarning[] {
  const { limits } = profile;
  const warnings: LineWarning[] = trueSiphonWarnings(profile);
  // With no flow the flowing grade is the static line: suction there is the true siphon above, not "while flowing".
  const flowingSuction = profile.flowM3s > 0 ? zonesOf(profile, 'negative-pressure') : [];
  warnings.push(
    ...flowingSuction.map((zone): LineWarning => {
      const values: WarningValues = { ...zoneValues(zone, profile), headM: -zone.worstExcessM, limitHeadM: 0 };
      return {
        code: 'negative-pressure',
        severity: 'warning',
        at: { fromM: zone.fromM, toM: zone.toM },
        values,
        message:
          `While flowing, the pressure falls below atmospheric from ${chainageRange(zone.fromM, zone.toM)} ` +
          `(down to -${metres(zone.worstExcessM)} at ${chainage(zone.worstChainageM)}): the pipe runs above the ` +
          `hydraulic grade line. Suction can draw dirty water in at joints and lets air come out of the water ` +
          `and block the line. ${scatterWords(values)}${PRESSURE_CAUTION}`,
        suggestedFix:
          'Lay the pipe lower through this range or route it below the grade line; or use a larger pipe ' +
          'upstream so less head is lost before it.',
        fixes: [],
      };
    }),
  );
  if (limits.siphonLimitHeadM < limits.vapourLimitHeadM) {
    for (const zone of zonesOf(profile, 'siphon-limit')) {
      const values: WarningValues = {
        ...zoneValues(zone, profile),
        headM: -(limits.siphonLimitHeadM + zone.worstExcessM),
        limitHeadM: limits.siphonLimitHeadM,
      };
      warnings.push({
        code: 'siphon-limit',
        severity: 'danger',
        at: { fromM: zone.fromM, toM: zone.toM },
        values,
        message:
          `Suction passes the practical siphon limit of ${metres(limits.siphonLimitHeadM)} from ` +
          `${chainageRange(zone.fromM, zone.toM)}: water may start to vaporise there and the flow can break. ` +
          `${scatterWords(values)}${PRESSURE_CAUTION}`,
        suggestedFix: 'Lower the pipe through this range or choose a route that stays below the grade line.',
        fixes: [],
      });
    }
  }
  for (const zone of zonesOf(profile, 'vapour-limit')) {
    const values: WarningValues = {
      ...zoneValues(zone, profile),
      headM: -(limits.vapourLimitHeadM + zone.worstExcessM),
      limitHeadM: limits.vapourLimitHeadM,
      atmosphericHeadM: limits.atmosphericHeadM,
      siteAltitudeM: limits.siteAltitudeM,
    };
    warnings.push({
      code: 'vapour-limit',
      severity: 'danger',
      at: { fromM: zone.fromM, toM: zone.toM },
      values,
      message:
        `Suction would pass the vapour limit of ${metres(limits.vapourLimitHeadM)} (atmospheric head ` +
        `${metres(limits.atmosphericHeadM)} at ${metres(limits.siteAltitudeM)} altitude less the vapour head) from ` +
        `${chainageRange(zone.fromM, zone.toM)}: the water boils, the column breaks and the computed flow ` +
        `cannot happen. ${scatterWords(values)}${PRESSURE_CAUTION}`,
      suggestedFix: 'Lower the pipe through this range, route around the rise, or pump instead of siphoning.',
      fixes: [],
    });
  }
  return warnings;
}

/**
 * Pipe above the static line (the source's water level, or a tank's): a true siphon. It does not
 * fill or start by itself, must be primed, and loses its prime as air comes out of the water and
 * gathers at the summit; an automatic air valve there lets air in and stops it (BC Factsheet
 * 590.304-5 "Water Flow, Air Locks and Siphons" [R10]; [R7]; profile-and-checks.md §2.2). Reported whether or not water
 * flows.
 */
export function trueSiphonWarnings(profile: LineProfile): LineWarning[] {
  const { chainageM, staticPressureHeadM, pipeElevationM } = profile.points;
  const ranges = findLimitRanges({
    chainageM,
    valueM: staticPressureHeadM,
    dropAtPointM: null,
    limitM: 0,
    side: 'below',
    mergeWithinM: profile.settings.heightScatterM,
  });
  return ranges.map((range) => {
    const zone: LimitZone = { kind: 'negative-pressure', ...range };
    const top = pointIndexAt(chainageM, range.worstChainageM);
    const values: WarningValues = {
      ...zoneValues(zone, profile),
      headM: range.worstExcessM,
      chainageM: range.worstChainageM,
      elevationM: pipeElevationM[top],
    };
    return {
      code: 'true-siphon',
      severity: 'danger',
      at: { fromM: range.fromM, toM: range.toM },
      values,
      message:
        `From ${chainageRange(range.fromM, range.toM)} the pipe rises above the water level that feeds it (up to ` +
        `${metres(range.worstExcessM)} above it at ${chainage(range.worstChainageM)}): this is a true siphon. It will not fill ` +
        'or start by itself, must be primed, and loses its prime as air gathers at the summit; an automatic air valve ' +
        `there would let air in and stop it. ${scatterWords(values)}${PRESSURE_CAUTION}`,
      suggestedFix:
        'Route the pipe below the source level, or lower the summit by trenching; if a siphon cannot be avoided, fit a priming point and a manual air release at the summit and plan to re-prime it.',
      fixes: [],
    };
  });
}

/**
 * On an assumed datum (a level book started at 100 m) the highest ground says nothing about the
 * site's altitude, so the suction limits taken from it may be far off: say so until the altitude is
 * given; a warning where the line has suction (the limits matter there), advice otherwise
 * (profile-and-checks.md §6).
 */
export function siteAltitudeWarnings(profile: LineProfile): LineWarning[] {
  const { limits, settings, points } = profile;
  if (settings.heightDatum !== 'assumed' || limits.siteAltitudeBasis !== 'highest-ground') return [];
  let worst = 0;
  for (let i = 1; i < points.chainageM.length; i++) {
    if (
      Math.min(points.pressureHeadM[i], points.staticPressureHeadM[i]) <
      Math.min(points.pressureHeadM[worst], points.staticPressureHeadM[worst])
    )
      worst = i;
  }
  const deepestM = Math.min(points.pressureHeadM[worst], points.staticPressureHeadM[worst]);
  const suction = deepestM < 0;
  return [
    {
      code: 'site-altitude-assumed',
      severity: suction ? 'warning' : 'info',
      at: { chainageM: points.chainageM[suction ? worst : 0] },
      values: {
        siteAltitudeM: limits.siteAltitudeM,
        ...(suction ? { headM: deepestM, chainageM: points.chainageM[worst] } : {}),
      },
      message:
        `The heights of this route are on an assumed datum, so the site altitude (${metres(limits.siteAltitudeM)} m, the highest ground in that datum) ` +
        `is a guess, and the siphon and vapour limits that depend on it may be wrong${suction ? ` where the line has suction (down to ${metres(deepestM)} m at ${chainage(points.chainageM[worst])})` : ''}.`,
      suggestedFix: "Enter the site's altitude above sea level (from a map or a phone) in the line's settings.",
      fixes: [],
    },
  ];
}
