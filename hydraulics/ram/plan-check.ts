/** How serious a planning check is: an error means the plan will not work as entered. */
export type PlanCheckSeverity = 'error' | 'warning' | 'info';

/** Every kind of finding the lift, storage, source and season checks can report. */
export type PlanCheckCode =
  | 'lift-ratio-beyond-table'
  | 'lift-ratio-below-table'
  | 'drive-flow-below-class'
  | 'drive-flow-above-class'
  | 'no-size-class'
  | 'supply-below-7x-delivered'
  | 'drive-length-vs-fall'
  | 'drive-length-vs-diameter'
  | 'drive-pipe-not-rigid'
  | 'fall-too-small'
  | 'too-little-back-pressure'
  | 'delivery-rating-unknown'
  | 'delivery-rating-below-working-head'
  | 'surge-over-delivery-rating'
  | 'below-planned-efficiency'
  | 'unusual-beat-rate'
  | 'supply-below-demand'
  | 'no-reserve'
  | 'tank-smaller-than-needed'
  | 'tank-too-low'
  | 'design-yield-above-dry-season'
  | 'no-dry-season-reading'
  | 'draw-exceeds-yield'
  | 'frost-date-unusual-for-hemisphere';

/**
 * The figures behind a finding, in SI (m, m³, m³/s) or as plain ratios; the screens word and
 * format them in the project's units (lib/lift/check-words.ts). All optional: each code fills the
 * ones its sentence needs.
 */
export interface PlanCheckValues {
  /** Effective lift over fall, or another dimensionless ratio the rule compares. */
  ratio?: number;
  /** The rule's lower and upper bound for `ratio`. */
  minRatio?: number;
  maxRatio?: number;
  /** Efficiency table in use: its label, first and last lift/fall and its last efficiency (0–1). */
  tableLabel?: string;
  tableStartRatio?: number;
  tableEndRatio?: number;
  tableEndEfficiency?: number;
  /** A table that reaches further, when one does and the user may choose it. */
  widerTableLabel?: string;
  widerTableEndRatio?: number;
  /** Flow compared with a limit, m³/s. */
  flowM3s?: number;
  limitFlowM3s?: number;
  /** Nominal drive-pipe size of a ram size class, mm (part of the class's name). */
  drivePipeNominalMm?: number;
  /** Whether the drive pipe is too long for the rule rather than too short. */
  tooLong?: boolean;
  /** A head or height compared with a limit, m. */
  headM?: number;
  limitHeadM?: number;
  /** Efficiencies, 0–1. */
  efficiency?: number;
  plannedEfficiency?: number;
  beatsPerMinute?: number;
  typicalBeatsPerMinute?: number;
  /** Volumes, m³. */
  volumeM3?: number;
  supplyVolumeM3?: number;
  demandVolumeM3?: number;
  /** A date as typed (MM-DD) and the hemisphere, for the season checks. */
  monthDay?: string;
  hemisphere?: 'north' | 'south';
}

/** One finding of a feasibility check, as data: code, typed figures, and its basis. */
export interface PlanCheck {
  /** Stable code for the UI and tests, e.g. `lift-ratio-beyond-table`. */
  code: PlanCheckCode;
  severity: PlanCheckSeverity;
  values: PlanCheckValues;
  /** Plain English in SI, for logs and as a fallback; screens word the check from `code` and `values`. */
  message: string;
  fix?: string;
  /** The published source of the rule, or "common practice, no source" / "from memory". */
  source: string;
}

/** True when no check is an error. */
export function passesChecks(checks: readonly PlanCheck[]): boolean {
  return checks.every((check) => check.severity !== 'error');
}
