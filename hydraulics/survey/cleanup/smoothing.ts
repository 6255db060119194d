import type { ProposedChange } from './proposed-change';
import { movingMedian } from './moving-median';
import { findTurningPoints } from '../../checks/air-points';
import { DEFAULT_LINE_SETTINGS } from '../../profile/settings';
import type { RouteStation } from '../types';
import { HydraulicsInputError } from '../../errors';
import { assertFiniteNumber } from '../../input-guards';

/**
 * Moving-median smoothing of heights, one proposal per height that would change. A median flattens
 * a narrow summit or sag, and those decide air valves and washouts: a high or low that stands out by
 * more than `keepTurningPointsM` (the high/low rule of the line checks, with the survey's scatter;
 * profile-and-checks.md §1.2) and that the smoothed profile still shows within a window of it is
 * real ground, and keeps its height, as the route's ends do. A lone spike leaves no high in the
 * smoothed profile and is smoothed away.
 */
export function proposeSmoothing(
  points: readonly RouteStation[],
  options: { windowSize: number; keepTurningPointsM?: number },
): ProposedChange[] {
  const heights = points.map((p) => p.elevationM);
  const smoothed = movingMedian(heights, options.windowSize);
  const toleranceM = options.keepTurningPointsM ?? DEFAULT_LINE_SETTINGS.airPointToleranceM;
  const raw = findTurningPoints(heights, toleranceM);
  const still = findTurningPoints(smoothed, toleranceM);
  const half = (options.windowSize - 1) / 2;
  const near = (candidates: readonly number[], i: number) => candidates.some((j) => Math.abs(j - i) <= half);
  const kept = new Set([
    ...raw.highs.filter((i) => near(still.highs, i)),
    ...raw.lows.filter((i) => near(still.lows, i)),
  ]);
  const changes: ProposedChange[] = [];
  points.forEach((p, i) => {
    if (smoothed[i] !== p.elevationM && !kept.has(i)) {
      changes.push({
        kind: 'smoothing',
        index: i,
        field: 'elevationM',
        from: p.elevationM,
        to: smoothed[i],
        reason: `moving median of ${options.windowSize} points`,
      });
    }
  });
  return changes;
}

/**
 * Shifts every height by one amount so the point at `index` takes the known elevation of a
 * benchmark (e.g. a GPS profile tied to a spring box of surveyed level).
 */
export function proposeBenchmarkOffset(
  points: readonly RouteStation[],
  options: { index: number; knownElevationM: number; benchmarkLabel?: string },
): ProposedChange[] {
  assertFiniteNumber(options.knownElevationM, 'knownElevationM');
  if (!Number.isInteger(options.index) || options.index < 0 || options.index >= points.length) {
    throw new HydraulicsInputError('index', `point ${options.index} does not exist`);
  }
  const offsetM = options.knownElevationM - points[options.index].elevationM;
  if (offsetM === 0) return [];
  const name = options.benchmarkLabel ?? `point ${options.index + 1}`;
  return points.map((p, i) => ({
    kind: 'benchmark-offset' as const,
    index: i,
    field: 'elevationM' as const,
    from: p.elevationM,
    to: p.elevationM + offsetM,
    reason: `offset ${offsetM >= 0 ? '+' : ''}${offsetM.toFixed(3)} m to tie ${name} to its known elevation ${options.knownElevationM} m`,
  }));
}
