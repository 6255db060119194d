import type { LineDeviceKind } from '../profile/types';

/**
 * How serious a warning is: `danger` can hurt people or wreck the line; `warning` will cause trouble; `info` is advice.
 */
export type WarningSeverity = 'danger' | 'warning' | 'info';

/** Stable codes of the line checks (the app maps them to its own labels). */
export type WarningCode =
  | 'negative-pressure'
  | 'true-siphon'
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
  | 'velocity-high'
  | 'site-altitude-assumed'
  | 'winter-frost'
  | 'winter-cover-contradiction'
  | 'drain-down-overdue'
  | 'device-misplaced';

/** A change one click could apply to the line input (see `applyLineFixes`). */
export type LineFix =
  /** Add a device at a chainage (a tank gets the stated water level, or the ground level). */
  | { kind: 'add-device'; device: LineDeviceKind; chainageM: number; waterLevelM?: number }
  /** Give stretch `stretchIndex` the catalogue pipe `pipeId`. */
  | { kind: 'change-pipe'; stretchIndex: number; pipeId: string };

/** Where a warning applies: one chainage or a range, m. */
export type WarningPlace = { chainageM: number } | { fromM: number; toM: number };

/**
 * The figures of a warning, typed and in SI, so the app can word them in the project's units
 * (the core's `message` is the plain SI fallback). Each code fills the fields it speaks of.
 */
export interface WarningValues {
  /** The point the warning is about (a summit, a sag, the outlet, a tank), m of chainage. */
  chainageM?: number;
  /** The range it covers, m of chainage. */
  fromM?: number;
  toM?: number;
  /** Where a limit is passed the most, m of chainage. */
  worstChainageM?: number;
  /** Elevation of the pipe at `chainageM`, m. */
  elevationM?: number;
  /** The head the warning is about (the worst pressure head, the residual, the arriving grade), m. */
  headM?: number;
  /** The limit or target it is held against (allowable head, siphon limit, needed residual), m. */
  limitHeadM?: number;
  /** A second head: the water level a tank needs, the start head, the Joukowsky surge, m. */
  otherHeadM?: number;
  /** Atmospheric head at the site and the site altitude, m (vapour limit). */
  atmosphericHeadM?: number;
  siteAltitudeM?: number;
  /** Flow, m3/s, and a second flow (what the line carries by gravity), m3/s. */
  flowM3s?: number;
  capacityM3s?: number;
  /** Velocity and its limit, m/s. */
  velocityMs?: number;
  limitVelocityMs?: number;
  /** Critical closure time 2L/a, s. */
  closureTimeS?: number;
  /** The pipe concerned (catalogue or custom id and its label), and its stretch (0-based). */
  pipeId?: string;
  pipeLabel?: string;
  stretchIndex?: number;
  /** The pipe a fix proposes and what it would give, m. */
  toPipeId?: string;
  toPipeLabel?: string;
  fixedHeadM?: number;
  /** Rating derating: water temperature, C, and the safety factor. */
  waterTemperatureC?: number;
  safetyFactor?: number;
  /** Break-pressure tanks a fix proposes, m of chainage. */
  tankChainagesM?: number[];
  /** Pressure at a summit is below atmospheric while flowing (an automatic air valve would draw air in). */
  underSuction?: boolean;
  /** The survey's height scatter on this line, m (0: heights taken as exact). */
  scatterM?: number;
  /** How many small highs or lows within the scatter this item stands for (the members). */
  memberCount?: number;
  /** The worst figure lies within the survey's height scatter of its limit. */
  withinScatter?: boolean;
  /** Items the same one-click fix clears, folded into this one (one cause, one item). */
  alsoClears?: WarningCode[];
  /** A second chainage: where a misplaced device's point really is, m. */
  otherChainageM?: number;
  /** The device a warning is about. */
  deviceKind?: LineDeviceKind;
  /** Cover over the pipe and the site's frost depth, m (winter items). */
  coverM?: number;
  frostDepthM?: number;
  /** A task's due date, ISO yyyy-mm-dd (winter items). */
  dueOn?: string;
  /** No gravity fix exists (break-pressure tanks cannot solve it): the reason, in SI words. */
  problem?: string;
}

/** One finding of the line checks. */
export interface LineWarning {
  code: WarningCode;
  severity: WarningSeverity;
  at: WarningPlace;
  /** The figures, typed and in SI, for wording in the project's units. */
  values: WarningValues;
  /** Small highs or lows this item groups (within the survey's scatter), m of chainage; a click shows them. */
  memberChainagesM?: number[];
  /**
   * Plain words in SI: what is wrong and why it matters (pressure messages carry the caution). For logs and fallback.
   */
  message: string;
  /** Plain words: what to do about it. */
  suggestedFix: string;
  /** Changes that apply the fix in one step; empty when the fix needs the designer's judgement. */
  fixes: LineFix[];
}
