import { pointIndexAt } from '../profile/grid';
import type { LimitZone, LineProfile, StretchResult } from '../profile/result-types';
import { suggestBreakPressureTanks } from '../design/suggest-tanks';
import type { PlannedTank } from '../design/break-pressure-tanks';
import type { LineWarning } from './types';
import { chainage, chainageRange, metres, PRESSURE_CAUTION, speed } from './wording';

function stretchAt(profile: LineProfile, chainageM: number): StretchResult {
  const point = pointIndexAt(profile.points.chainageM, chainageM);
  return profile.stretches[profile.points.stretchIndex[point]];
}

function ratingNote(profile: LineProfile): string {
  const s = profile.settings;
  return `rating derated for ${s.waterTemperatureC} C water, divided by the safety factor ${s.safetyFactor}`;
}

/**
 * Static pressure (line shut) above the allowable head: danger, the pipe can burst. The fix is the
 * minimal set of break-pressure tanks from `suggestBreakPressureTanks`, each tank given to the
 * first over-rating range at or after it.
 */
function staticWarnings(profile: LineProfile, zones: readonly LimitZone[]): LineWarning[] {
  if (zones.length === 0) return [];
  const plan = suggestBreakPressureTanks(profile);
  const tanksFor = (zone: LimitZone, previousToM: number): PlannedTank[] =>
    plan.tanks.filter((tank) => tank.chainageM > previousToM && tank.chainageM <= zone.toM);
  return zones.map((zone, i) => {
    const stretch = stretchAt(profile, zone.worstChainageM);
    const tanks = tanksFor(zone, i === 0 ? -Infinity : zones[i - 1].toM);
    const where = tanks.map((tank) => chainage(tank.chainageM)).join(', ');
    const suggestedFix =
      tanks.length > 0
        ? `Add a break-pressure tank at ${where} (the fewest that keep every pipe within its rating), or use a higher pressure class here.`
        : `Use a higher pressure class through this range${plan.feasible ? '' : `: ${plan.problem?.message ?? ''}`}.`;
    return {
      code: 'static-over-rating',
      severity: 'danger',
      at: { fromM: zone.fromM, toM: zone.toM },
      message:
        `With the line shut, static pressure from ${chainageRange(zone.fromM, zone.toM)} rises above the ` +
        `${metres(stretch.allowableHeadM)} allowed for ${stretch.pipe.label} (${ratingNote(profile)}), up to ` +
        `${metres(stretch.allowableHeadM + zone.worstExcessM)} at ${chainage(zone.worstChainageM)}. A pipe over its ` +
        `rating can burst. ${PRESSURE_CAUTION}`,
      suggestedFix,
      fixes: tanks.map((tank) => ({
        kind: 'add-device' as const,
        device: 'break-pressure-tank' as const,
        chainageM: tank.chainageM,
        waterLevelM: tank.waterLevelM,
      })),
    };
  });
}

/** Static pressure plus a sudden-stop (Joukowsky) surge above the allowable head: a warning. */
function surgeWarnings(profile: LineProfile, zones: readonly LimitZone[]): LineWarning[] {
  return zones.map((zone) => {
    const stretch = stretchAt(profile, zone.worstChainageM);
    const reach = profile.reaches.find((r) => zone.worstChainageM >= r.fromM && zone.worstChainageM <= r.toM);
    const closureS = reach?.criticalClosureTimeS ?? 0;
    return {
      code: 'surge-over-rating',
      severity: 'warning',
      at: { fromM: zone.fromM, toM: zone.toM },
      message:
        `If the flow of ${speed(stretch.velocityMs)} in ${stretch.pipe.label} stops suddenly (a valve or float shut in ` +
        `less than 2L/a = ${closureS.toFixed(1)} s), the pressure wave adds about ${metres(stretch.surgeHeadM)} ` +
        `(Joukowsky) to the static pressure, above the ${metres(stretch.allowableHeadM)} allowed from ` +
        `${chainageRange(zone.fromM, zone.toM)}. ${PRESSURE_CAUTION}`,
      suggestedFix:
        `Close valves slowly (much longer than ${closureS.toFixed(1)} s), use slow-closing float valves, ` +
        'or use a higher pressure class through this range.',
      fixes: [],
    };
  });
}

/** Static and surge pressure against the (derated, safety-factored) pipe ratings. */
export function ratingWarnings(profile: LineProfile): LineWarning[] {
  const ofKind = (kind: LimitZone['kind']) => profile.zones.filter((zone) => zone.kind === kind);
  return [...staticWarnings(profile, ofKind('static-over-rating')), ...surgeWarnings(profile, ofKind('surge-over-rating'))];
}
