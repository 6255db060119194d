/** The chainage window shown on the profile. */
export interface ChainageView {
  fromM: number;
  toM: number;
}

/** Narrowest window the zoom goes to, m: a few stations, never a sliver. */
export const MIN_VIEW_M = 20;

/** Keeps a window inside the line and at least MIN_VIEW_M wide (or the whole line when shorter). */
export function clampView(view: ChainageView, firstM: number, lastM: number): ChainageView {
  const full = lastM - firstM;
  const span = Math.min(Math.max(view.toM - view.fromM, Math.min(MIN_VIEW_M, full)), full);
  const from = Math.min(Math.max(view.fromM, firstM), lastM - span);
  return { fromM: from, toM: from + span };
}

/** Zooms by `factor` (<1 in, >1 out) keeping `aboutM` at the same place on screen. */
export function zoomView(
  view: ChainageView,
  factor: number,
  aboutM: number,
  firstM: number,
  lastM: number,
): ChainageView {
  const t = (aboutM - view.fromM) / (view.toM - view.fromM);
  const span = (view.toM - view.fromM) * factor;
  return clampView({ fromM: aboutM - t * span, toM: aboutM - t * span + span }, firstM, lastM);
}

/** Moves the window along the line by `deltaM`. */
export function panView(view: ChainageView, deltaM: number, firstM: number, lastM: number): ChainageView {
  return clampView({ fromM: view.fromM + deltaM, toM: view.toM + deltaM }, firstM, lastM);
}

/** A window round a range with some margin each side (for jumping to a warning). */
export function viewAround(fromM: number, toM: number, firstM: number, lastM: number): ChainageView {
  const span = Math.max(toM - fromM, MIN_VIEW_M * 5);
  const margin = span * 0.35;
  return clampView({ fromM: fromM - margin, toM: toM + margin }, firstM, lastM);
}
