import { applyLineFixes } from '../design/apply-fixes';
import { profileModel } from '../profile/analyze-profile';
import type { LineProfile } from '../profile/result-types';
import type { LineInput } from '../profile/types';
import { airAndSedimentWarnings } from './air-checks';
import { deliveryWarnings } from './delivery-checks';
import { ratingWarnings } from './rating-checks';
import { siteAltitudeWarnings, suctionWarnings } from './suction-checks';
import type { LineWarning, WarningCode, WarningSeverity } from './types';
import { velocityWarnings } from './velocity-checks';

/** A line analysis: the profile and the warnings found on it. */
export interface LineAnalysis extends LineProfile {
  /** Warnings, most serious first, then along the line. */
  warnings: LineWarning[];
}

const SEVERITY_ORDER: Record<WarningSeverity, number> = { danger: 0, warning: 1, info: 2 };

function startOf(warning: LineWarning): number {
  return 'chainageM' in warning.at ? warning.at.chainageM : warning.at.fromM;
}

/**
 * Analyses a line (see `analyzeProfile`) and runs every check on it: suction and siphon limits,
 * outlet residual, gravity flow, unreachable tanks, static and surge pressure against the pipe
 * ratings, air-release valves and washouts, velocity band. Throws `HydraulicsInputError` for bad
 * input.
 */
export function analyzeLine(input: LineInput): LineAnalysis {
  const { profile, warnings } = checkedLine(input);
  return { ...profile, warnings: foldIntoPipeFix(input, warnings) };
}

/** Results of the flow that the pipe being too small causes; they go with the pipe change that clears them. */
const FLOW_CONSEQUENCES: ReadonlySet<WarningCode> = new Set<WarningCode>([
  'negative-pressure',
  'siphon-limit',
  'vapour-limit',
  'tank-not-reached',
]);

/**
 * One cause, one item: when the outlet is short because the pipe is too small and one pipe change
 * fixes it, the suction and unreachable-tank items that the same change clears are the same cause
 * seen elsewhere on the line. They are folded into that one danger (`values.alsoClears`), so the
 * list shows one item with its one-click fix instead of five.
 */
function foldIntoPipeFix(input: LineInput, warnings: LineWarning[]): LineWarning[] {
  const short = warnings.find((w) => w.code === 'residual-below-target' && w.fixes.length > 0);
  if (!short || !warnings.some((w) => FLOW_CONSEQUENCES.has(w.code))) return warnings;
  const after = checkedLine(applyLineFixes(input, short.fixes)).warnings;
  const remains = (w: LineWarning) => after.some((a) => a.code === w.code);
  const folded = warnings.filter((w) => FLOW_CONSEQUENCES.has(w.code) && !remains(w));
  if (folded.length === 0) return warnings;
  const alsoClears = [...new Set(folded.map((w) => w.code))];
  return warnings
    .filter((w) => !folded.includes(w))
    .map((w) =>
      w === short
        ? {
            ...w,
            values: { ...w.values, alsoClears },
            message: `${w.message} The same change also clears the ${alsoClears.join(', ')} found at this flow.`,
          }
        : w,
    );
}

function checkedLine(input: LineInput): { profile: LineProfile; warnings: LineWarning[] } {
  const model = profileModel(input);
  const { profile } = model;
  const warnings = [
    ...deliveryWarnings(model),
    ...suctionWarnings(profile),
    ...siteAltitudeWarnings(profile),
    ...ratingWarnings(profile),
    ...airAndSedimentWarnings(profile, input.devices ?? []),
    ...velocityWarnings(profile),
  ].sort((a, b) => SEVERITY_ORDER[a.severity] - SEVERITY_ORDER[b.severity] || startOf(a) - startOf(b));
  return { profile, warnings };
}
