import { HydraulicsInputError } from '../../errors';
import { assertFiniteNumber } from '../../input-guards';
import type { RouteStation } from '../types';
import { interpolateStation } from './interpolate';
import { assertOrderedStations } from './ordered-stations';

function stationAt<T extends RouteStation>(points: readonly T[], c: number): T | RouteStation {
  const exact = points.find((p) => p.chainageM === c);
  if (exact) return { ...exact };
  const after = points.findIndex((p) => p.chainageM > c);
  return interpolateStation(points[after - 1], points[after], c);
}

/**
 * Keeps the part of a route between two chainages, with interpolated end stations where none
 * stood. Chainage restarts at 0 unless `rebase` is false.
 */
export function trimRoute<T extends RouteStation>(
  points: readonly T[],
  options: { fromChainageM: number; toChainageM: number; rebase?: boolean },
): (T | RouteStation)[] {
  assertOrderedStations(points);
  const { fromChainageM: from, toChainageM: to } = options;
  assertFiniteNumber(from, 'fromChainageM');
  assertFiniteNumber(to, 'toChainageM');
  const startM = points[0].chainageM;
  const endM = points[points.length - 1].chainageM;
  if (from < startM || to > endM || from >= to) {
    throw new HydraulicsInputError(
      'fromChainageM',
      `the kept part must satisfy ${startM} ≤ from < to ≤ ${endM} m, got ${from} to ${to} m`,
    );
  }
  const inner = points.filter((p) => p.chainageM > from && p.chainageM < to).map((p) => ({ ...p }));
  const kept = [stationAt(points, from), ...inner, stationAt(points, to)];
  const shiftM = options.rebase === false ? 0 : from;
  return kept.map((p) => ({ ...p, chainageM: p.chainageM - shiftM }));
}
