export interface ProfilePoint {
  chainageM: number;
  elevationM: number;
}

/**
 * Thins a long profile for drawing: the points are cut into buckets along the route and each
 * bucket keeps its lowest and highest point, in order, so a spike or a low point never vanishes
 * from the picture. Profiles within the budget are returned as they are.
 */
export function thinProfile<T extends ProfilePoint>(points: readonly T[], maxPoints = 1500): T[] {
  if (points.length <= maxPoints) return [...points];
  const buckets = Math.max(1, Math.floor((maxPoints - 2) / 2));
  const size = (points.length - 2) / buckets;
  const out: T[] = [points[0]];
  for (let b = 0; b < buckets; b += 1) {
    const from = 1 + Math.floor(b * size);
    const to = Math.min(points.length - 1, 1 + Math.floor((b + 1) * size));
    let lo = from;
    let hi = from;
    for (let i = from; i < to; i += 1) {
      if (points[i].elevationM < points[lo].elevationM) lo = i;
      if (points[i].elevationM > points[hi].elevationM) hi = i;
    }
    if (to > from) {
      out.push(points[Math.min(lo, hi)]);
      if (lo !== hi) out.push(points[Math.max(lo, hi)]);
    }
  }
  out.push(points[points.length - 1]);
  return out;
}
