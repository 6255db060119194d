import type { LimitZone, LineProfile } from '../profile/result-types';
import type { LineWarning } from './types';
import { chainage, chainageRange, metres, PRESSURE_CAUTION } from './wording';

function zonesOf(profile: LineProfile, kind: LimitZone['kind']): LimitZone[] {
  return profile.zones.filter((zone) => zone.kind === kind);
}

/**
 * Suction while flowing. Below zero: a warning, because good practice keeps the grade line above
 * the pipe ("never negative", Jordan p.52 via ITACA [R1]; suction draws in dirty water and air).
 * Below the practical siphon limit ([R7], 7.5 m) or the vapour limit (atmospheric minus vapour
 * head at the site): danger, the water column can break and the flow stop.
 */
export function suctionWarnings(profile: LineProfile): LineWarning[] {
  const { limits } = profile;
  const warnings: LineWarning[] = zonesOf(profile, 'negative-pressure').map((zone) => ({
    code: 'negative-pressure',
    severity: 'warning',
    at: { fromM: zone.fromM, toM: zone.toM },
    message:
      `While flowing, the pressure falls below atmospheric from ${chainageRange(zone.fromM, zone.toM)} ` +
      `(down to -${metres(zone.worstExcessM)} at ${chainage(zone.worstChainageM)}): the pipe runs above the ` +
      `hydraulic grade line. Suction can draw dirty water in at joints and lets air come out of the water ` +
      `and block the line. ${PRESSURE_CAUTION}`,
    suggestedFix:
      'Lay the pipe lower through this range or route it below the grade line; or use a larger pipe ' +
      'upstream so less head is lost before it.',
    fixes: [],
  }));
  if (limits.siphonLimitHeadM < limits.vapourLimitHeadM) {
    for (const zone of zonesOf(profile, 'siphon-limit')) {
      warnings.push({
        code: 'siphon-limit',
        severity: 'danger',
        at: { fromM: zone.fromM, toM: zone.toM },
        message:
          `Suction passes the practical siphon limit of ${metres(limits.siphonLimitHeadM)} from ` +
          `${chainageRange(zone.fromM, zone.toM)}: water may start to vaporise there and the flow can break. ` +
          PRESSURE_CAUTION,
        suggestedFix: 'Lower the pipe through this range or choose a route that stays below the grade line.',
        fixes: [],
      });
    }
  }
  for (const zone of zonesOf(profile, 'vapour-limit')) {
    warnings.push({
      code: 'vapour-limit',
      severity: 'danger',
      at: { fromM: zone.fromM, toM: zone.toM },
      message:
        `Suction would pass the vapour limit of ${metres(limits.vapourLimitHeadM)} (atmospheric head ` +
        `${metres(limits.atmosphericHeadM)} at ${metres(limits.siteAltitudeM)} altitude less the vapour head) from ` +
        `${chainageRange(zone.fromM, zone.toM)}: the water boils, the column breaks and the computed flow ` +
        `cannot happen. ${PRESSURE_CAUTION}`,
      suggestedFix: 'Lower the pipe through this range, route around the rise, or pump instead of siphoning.',
      fixes: [],
    });
  }
  return warnings;
}
