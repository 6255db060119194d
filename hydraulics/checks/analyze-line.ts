import { profileModel } from '../profile/analyze-profile';
import type { LineProfile } from '../profile/result-types';
import type { LineInput } from '../profile/types';
import { airAndSedimentWarnings } from './air-checks';
import { deliveryWarnings } from './delivery-checks';
import { ratingWarnings } from './rating-checks';
import { siteAltitudeWarnings, suctionWarnings } from './suction-checks';
import type { LineWarning, WarningSeverity } from './types';
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
  return { ...profile, warnings };
}
