/** How serious a planning check is: an error means the plan will not work as entered. */
export type PlanCheckSeverity = 'error' | 'warning' | 'info';

/** One finding of a feasibility check, with the reason, a suggested fix and its basis. */
export interface PlanCheck {
  /** Stable code for the UI and tests, e.g. `lift-ratio-beyond-table`. */
  code: string;
  severity: PlanCheckSeverity;
  message: string;
  fix?: string;
  /** The published source of the rule, or "common practice, no source" / "from memory". */
  source: string;
}

/** True when no check is an error. */
export function passesChecks(checks: readonly PlanCheck[]): boolean {
  return checks.every((check) => check.severity !== 'error');
}
