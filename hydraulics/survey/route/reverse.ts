import { assertOrderedStations } from './ordered-stations';
import type { RouteStation } from '../types';

/**
 * The same route walked the other way: order reversed and chainage mirrored within the same
 * range (first station keeps the original start chainage). Heights and positions are unchanged.
 */
export function reverseRoute<T extends RouteStation>(points: readonly T[]): T[] {
  assertOrderedStations(points);
  const startM = points[0].chainageM;
  const endM = points[points.length - 1].chainageM;
  return points
    .slice()
    .reverse()
    .map((p) => ({ ...p, chainageM: startM + (endM - p.chainageM) }));
}
