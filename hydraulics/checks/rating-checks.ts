import { pointIndexAt } from '../profile/grid';
import type { LimitZone, LineProfile, StretchResult } from '../profile/result-types';
import { suggestBreakPressureTanks } from '../design/suggest-tanks';
import type { PlannedTank } from '../design/break-pressure-tanks';
import { scatterWords, zoneValues } from './suction-checks';
import type { LineWarning, WarningValues } from './types';
import { chainage, chainageRange, metres, PRESSURE_CAUTION, speed } from './wording';

/**
 * The stretch whose rating a zone passes at its worst point. Inside a stretch that is the stretch;
 * at a boundary between two, pressure is the same on both sides, so the pipe passed is the one
 * with less margin (`marginM`), which may be the upstream one.
 */
function stretchAt(
  profile: LineProfile,
  chainageM: number,
  marginM: (stretch: StretchResult) => number,
): StretchResult {
  const point = pointIndexAt(profile.points.chainageM, chainageM);
  const own = profile.stretches[profile.points.stretchIndex[point]];
  const touching = profile.stretches.filter((s) => s.fromM <= chainageM && chainageM <= s.toM);
  return touching.reduce((weakest, s) => (marginM(s) < marginM(weakest) ? s : weakest), own);
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
    const stretch = stretchAt(profile, zone.worstChainageM, (s) => s.allowableHeadM);
    const tanks = tanksFor(zone, i === 0 ? -Infinity : zones[i - 1].toM);
    const values: WarningValues = {
      ...zoneValues(zone, profile),
      headM: stretch.allowableHeadM + zone.worstExcessM,
      limitHeadM: stretch.allowableHeadM,
      pipeId: stretch.pipe.id,
      pipeLabel: stretch.pipe.label,
      stretchIndex: stretch.index,
      waterTemperatureC: profile.settings.waterTemperatureC,
      safetyFactor: profile.settings.safetyFactor,
      tankChainagesM: tanks.map((tank) => tank.chainageM),
      ...(plan.feasible ? {} : { problem: plan.problem?.message ?? '' }),
    };
    const where = tanks.map((tank) => chainage(tank.chainageM)).join(', ');
    const suggestedFix =
      tanks.length > 0
        ? `Add a break-pressure tank at ${where} (the fewest that keep every pipe within its rating), or use a higher pressure class here.`
        : `Use a higher pressure class through this range${plan.feasible ? '' : `: ${plan.problem?.message ?? ''}`}.`;
    return {
      code: 'static-over-rating',
      severity: 'danger',
      at: { fromM: zone.fromM, toM: zone.toM },
      values,
      message:
        `With the line shut, static pressure from ${chainageRange(zone.fromM, zone.toM)} rises above the ` +
        `${metres(stretch.allowableHeadM)} allowed for ${stretch.pipe.label} (${ratingNote(profile)}), up to ` +
        `${metres(stretch.allowableHeadM + zone.worstExcessM)} at ${chainage(zone.worstChainageM)}. A pipe over its ` +
        `rating can burst. ${scatterWords(values)}${PRESSURE_CAUTION}`,
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
    const stretch = stretchAt(profile, zone.worstChainageM, (s) => s.allowableHeadM - s.surgeHeadM);
    const reach = profile.reaches.find((r) => zone.worstChainageM >= r.fromM && zone.worstChainageM <= r.toM);
    const closureS = reach?.criticalClosureTimeS ?? 0;
    const values: WarningValues = {
      ...zoneValues(zone, profile),
      headM: stretch.allowableHeadM + zone.worstExcessM,
      limitHeadM: stretch.allowableHeadM,
      otherHeadM: stretch.surgeHeadM,
      velocityMs: stretch.velocityMs,
      closureTimeS: closureS,
      pipeId: stretch.pipe.id,
      pipeLabel: stretch.pipe.label,
      stretchIndex: stretch.index,
    };
    return {
      code: 'surge-over-rating',
      severity: 'warning',
      at: { fromM: zone.fromM, toM: zone.toM },
      values,
      message:
        `If the flow of ${speed(stretch.velocityMs)} in ${stretch.pipe.label} stops suddenly (a valve or float shut in ` +
        `less than 2L/a = ${closureS.toFixed(1)} s), the pressure wave adds about ${metres(stretch.surgeHeadM)} ` +
        `(Joukowsky) to the static pressure, above the ${metres(stretch.allowableHeadM)} allowed from ` +
        `${chainageRange(zone.fromM, zone.toM)}. ${scatterWords(values)}${PRESSURE_CAUTION}`,
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
  return [
    ...staticWarnings(profile, ofKind('static-over-rating')),
    ...surgeWarnings(profile, ofKind('surge-over-rating')),
  ];
}
