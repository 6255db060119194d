import type { LineDeviceKind } from '../profile/types';

/** How serious a warning is: `danger` can hurt people or wreck the line; `warning` will cause trouble; `info` is advice. */
export type WarningSeverity = 'danger' | 'warning' | 'info';

/** Stable codes of the line checks (the app maps them to its own labels). */
export type WarningCode =
  | 'negative-pressure'
  | 'siphon-limit'
  | 'vapour-limit'
  | 'residual-below-target'
  | 'no-gravity-flow'
  | 'tank-not-reached'
  | 'static-over-rating'
  | 'surge-over-rating'
  | 'air-release-needed'
  | 'washout-needed'
  | 'velocity-low'
  | 'velocity-high';

/** A change one click could apply to the line input (see `applyLineFixes`). */
export type LineFix =
  /** Add a device at a chainage (a tank gets the stated water level, or the ground level). */
  | { kind: 'add-device'; device: LineDeviceKind; chainageM: number; waterLevelM?: number }
  /** Give stretch `stretchIndex` the catalogue pipe `pipeId`. */
  | { kind: 'change-pipe'; stretchIndex: number; pipeId: string };

/** Where a warning applies: one chainage or a range, m. */
export type WarningPlace = { chainageM: number } | { fromM: number; toM: number };

/** One finding of the line checks. */
export interface LineWarning {
  code: WarningCode;
  severity: WarningSeverity;
  at: WarningPlace;
  /** Plain words: what is wrong and why it matters (pressure messages carry the caution). */
  message: string;
  /** Plain words: what to do about it. */
  suggestedFix: string;
  /** Changes that apply the fix in one step; empty when the fix needs the designer's judgement. */
  fixes: LineFix[];
}
