import type { ProfileChartData, ProfileChartOptions, ProfileFrame } from './profile-types';

export const PROFILE_LAYOUT = {
  width: 960,
  marginLeft: 70,
  marginRight: 70,
  top: 52,
  elevationHeight: 300,
  gap: 46,
  pressureHeight: 150,
  axisBelow: 40,
  /** The elevation panel grows or shrinks with the width so the exaggeration stays; within these heights. */
  minElevationHeight: 120,
  maxElevationHeight: 600,
} as const;

/** The plot width `auto` is worked out at, px: the default layout's, so every width draws the same exaggeration. */
const REFERENCE_PLOT_WIDTH = PROFILE_LAYOUT.width - PROFILE_LAYOUT.marginLeft - PROFILE_LAYOUT.marginRight;

/** Index of the last point at or before `chainageM` (0 when before the line). */
export function indexAtOrBefore(chainageM: ArrayLike<number>, value: number): number {
  let lo = 0;
  let hi = chainageM.length - 1;
  if (value <= chainageM[0]) return 0;
  if (value >= chainageM[hi]) return hi;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (chainageM[mid] <= value) lo = mid;
    else hi = mid;
  }
  return lo;
}

function rangeOf(series: readonly ArrayLike<number>[], from: number, to: number): [number, number] {
  let lo = Infinity;
  let hi = -Infinity;
  for (const s of series) {
    for (let i = from; i <= to; i++) {
      const v = s[i];
      if (v < lo) lo = v;
      if (v > hi) hi = v;
    }
  }
  return [lo, hi];
}

function padded([lo, hi]: [number, number], fraction: number, minSpan: number): [number, number] {
  const span = Math.max(hi - lo, minSpan);
  const mid = (lo + hi) / 2;
  return [mid - (span / 2) * (1 + fraction), mid + (span / 2) * (1 + fraction)];
}

/**
 * Lays the two panels out and builds their scales. Scales work in the project's display units
 * (so ticks fall on round feet or metres) and are wrapped to take SI values.
 *
 * The vertical exaggeration does not depend on the drawing's width, so the screen (any width), the
 * SVG file and the PDF show the same one: `auto` is the exaggeration that fits the visible lines in
 * the default elevation panel at the default width, a number is taken as it is; the elevation panel
 * then takes the height that exaggeration needs at this width (within min/max; outside them the
 * elevation range is widened or cut about the lines' middle, the exaggeration kept).
 */
export function profileFrame(data: ProfileChartData, options: ProfileChartOptions, legendHeight: number): ProfileFrame {
  const L = PROFILE_LAYOUT;
  const { points } = data;
  const n = points.chainageM.length;
  const width = options.width ?? L.width;
  const plotLeft = L.marginLeft;
  const plotRight = width - L.marginRight;
  const fullFrom = points.chainageM[0];
  const fullTo = points.chainageM[n - 1];
  const fromM = Math.max(options.view?.fromM ?? fullFrom, fullFrom);
  const toM = Math.min(options.view?.toM ?? fullTo, fullTo);
  const firstIndex = indexAtOrBefore(points.chainageM, fromM);
  const lastIndex = Math.min(
    indexAtOrBefore(points.chainageM, toM) + (points.chainageM[indexAtOrBefore(points.chainageM, toM)] < toM ? 1 : 0),
    n - 1,
  );

  const u = options.units;
  const viewSpanM = Math.max(toM - fromM, 1e-9);
  const pxPerM = (plotRight - plotLeft) / viewSpanM;
  const visible = rangeOf(
    [points.groundElevationM, points.pipeElevationM, points.staticHeadM, points.hydraulicGradeM],
    firstIndex,
    lastIndex,
  );
  const fitted = padded(visible, 0.08, 2);
  const fittedSpanM = fitted[1] - fitted[0];
  const exaggeration =
    typeof options.exaggeration === 'number' && options.exaggeration > 0
      ? options.exaggeration
      : L.elevationHeight / fittedSpanM / (REFERENCE_PLOT_WIDTH / viewSpanM);
  const elevationHeight = Math.min(
    Math.max(fittedSpanM * exaggeration * pxPerM, L.minElevationHeight),
    L.maxElevationHeight,
  );
  const spanM = elevationHeight / (exaggeration * pxPerM);
  const mid = (visible[0] + visible[1]) / 2;
  const elevationDomainM: [number, number] = [mid - spanM / 2, mid + spanM / 2];

  const elevationTop = L.top;
  const elevationBottom = elevationTop + elevationHeight;
  const pressureTop = elevationBottom + L.gap;
  const pressureBottom = pressureTop + L.pressureHeight;
  const height = pressureBottom + L.axisBelow + legendHeight;

  const pressureSeries = [points.pressureHeadM, points.staticPressureHeadM];
  const [pLo, pHi] = rangeOf(pressureSeries, firstIndex, lastIndex);
  const pressureDomainM = padded([Math.min(pLo, 0), Math.max(pHi, 1)], 0.1, 5);

  // Unit changes are linear, so the scales map metres straight to pixels (ticks in display units
  // are laid out in profile-axes.ts); plain arithmetic keeps 100,000-point paths fast.
  const linear = (d0: number, d1: number, r0: number, r1: number) => {
    const k = (r1 - r0) / (d1 - d0);
    return (v: number) => r0 + (v - d0) * k;
  };
  const x = linear(fromM, toM, plotLeft, plotRight);
  const yElevation = linear(elevationDomainM[0], elevationDomainM[1], elevationBottom, elevationTop);
  const yPressure = linear(pressureDomainM[0], pressureDomainM[1], pressureBottom, pressureTop);
  const chainageAt = linear(plotLeft, plotRight, fromM, toM);

  return {
    width,
    height,
    plotLeft,
    plotRight,
    elevationTop,
    elevationBottom,
    pressureTop,
    pressureBottom,
    fromM,
    toM,
    elevationDomainM,
    pressureDomainM,
    exaggeration,
    firstIndex,
    lastIndex,
    x,
    chainageAt,
    yElevation,
    yPressure,
    units: u,
  };
}
