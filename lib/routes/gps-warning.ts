import { consumerGpsHeightWarning, type GpsHeightWarning, type HeightDecision } from '../../hydraulics/index';
import type { CheckedPoint } from './types';

/**
 * The decisions a route's heights feed straight away: the fall from end to end (static head of
 * a gravity line) and the depth of the lowest point below the start (the highest static pressure
 * if the line is full and closed). A loud warning when either rests on consumer-GPS heights.
 */
export function routeGpsWarning(
  points: readonly Pick<CheckedPoint, 'excluded' | 'elevationM' | 'heightSource'>[],
): GpsHeightWarning | null {
  const kept = points.filter((p) => !p.excluded);
  if (kept.length < 2) return null;
  const first = kept[0];
  const last = kept[kept.length - 1];
  let lowIndex = 0;
  kept.forEach((p, i) => {
    if (p.elevationM < kept[lowIndex].elevationM) lowIndex = i;
  });
  const decisions: HeightDecision[] = [
    {
      label: 'fall from the start to the end of the route',
      elevationDifferenceM: first.elevationM - last.elevationM,
      pointIndices: [0, kept.length - 1],
    },
    {
      label: 'depth of the lowest point below the start',
      elevationDifferenceM: first.elevationM - kept[lowIndex].elevationM,
      pointIndices: [0, lowIndex],
    },
  ];
  return consumerGpsHeightWarning({ heightSources: kept.map((p) => p.heightSource), decisions });
}
