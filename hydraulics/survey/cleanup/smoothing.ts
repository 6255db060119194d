import type { ProposedChange } from './proposed-change';
import { movingMedian } from './moving-median';
import type { RouteStation } from '../types';
import { HydraulicsInputError } from '../../errors';
import { assertFiniteNumber } from '../guards';

/** Moving-median smoothing of heights, one proposal per height that would change. */
export function proposeSmoothing(points: readonly RouteStation[], options: { windowSize: number }): ProposedChange[] {
  const smoothed = movingMedian(points.map((p) => p.elevationM), options.windowSize);
  const changes: ProposedChange[] = [];
  points.forEach((p, i) => {
    if (smoothed[i] !== p.elevationM) {
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
