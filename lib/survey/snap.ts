import Flatbush from 'flatbush';
import { projectToLocalPlan } from '../../hydraulics/index';

export interface SnapResult {
  chainageM: number;
  /** Distance from the feature to the route line, metres (in the local plan). */
  offsetM: number;
}

interface PlanPoint {
  eastM: number;
  northM: number;
}

function nearestOnLeg(t: PlanPoint, a: PlanPoint, b: PlanPoint): { u: number; offsetM: number } {
  const dx = b.eastM - a.eastM;
  const dy = b.northM - a.northM;
  const len2 = dx * dx + dy * dy;
  const u = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((t.eastM - a.eastM) * dx + (t.northM - a.northM) * dy) / len2));
  return { u, offsetM: Math.hypot(t.eastM - (a.eastM + u * dx), t.northM - (a.northM + u * dy)) };
}

/**
 * Snaps positions to the nearest point on a route's polyline. Works in the route's local plan
 * (equirectangular about its centre), which is accurate to well under a metre over a few
 * kilometres; the chainage along the matched leg is scaled to the leg's geodesic length.
 * The legs go into a packed R-tree (flatbush). Each target looks at the legs whose boxes lie within
 * a search radius (first about one leg length, doubled until a leg is found); when the nearest of
 * them is farther than the radius, one more search at that distance is sure to hold the nearest
 * leg. The cost is about log(route points) per target instead of every leg for every target.
 * Ties go to the earlier leg.
 */
export function snapToRoute(
  route: readonly { lat: number; lon: number; chainageM: number }[],
  targets: readonly { lat: number; lon: number }[],
): SnapResult[] {
  if (targets.length === 0) return [];
  const plan = projectToLocalPlan(
    [...route, ...targets].map((p) => ({ latitudeDeg: p.lat, longitudeDeg: p.lon })),
  ).points;
  const routeXY = plan.slice(0, route.length);
  if (route.length < 2) {
    return plan.slice(route.length).map((t) => ({
      chainageM: route[0].chainageM,
      offsetM: Math.hypot(t.eastM - routeXY[0].eastM, t.northM - routeXY[0].northM),
    }));
  }
  const legs = new Flatbush(route.length - 1);
  for (let i = 1; i < route.length; i += 1) {
    const a = routeXY[i - 1];
    const b = routeXY[i];
    legs.add(
      Math.min(a.eastM, b.eastM),
      Math.min(a.northM, b.northM),
      Math.max(a.eastM, b.eastM),
      Math.max(a.northM, b.northM),
    );
  }
  legs.finish();
  let planLengthM = 0;
  for (let i = 1; i < route.length; i += 1)
    planLengthM += Math.hypot(routeXY[i].eastM - routeXY[i - 1].eastM, routeXY[i].northM - routeXY[i - 1].northM);
  const firstRadiusM = Math.max(1, (2 * planLengthM) / (route.length - 1));

  return plan.slice(route.length).map((t) => {
    let bestLeg = -1;
    let best = { u: 0, offsetM: Infinity };
    const consider = (leg: number) => {
      const found = nearestOnLeg(t, routeXY[leg], routeXY[leg + 1]);
      if (found.offsetM < best.offsetM || (found.offsetM === best.offsetM && leg < bestLeg)) {
        best = found;
        bestLeg = leg;
      }
    };
    let radiusM = firstRadiusM;
    // 64 rounds of ×4 outgrow any plan; the cap only guards against non-finite coordinates.
    for (let round = 0; round < 64; round += 1) {
      legs.search(t.eastM - radiusM, t.northM - radiusM, t.eastM + radiusM, t.northM + radiusM).forEach(consider);
      if (best.offsetM <= radiusM) break;
      // Every leg within best.offsetM has its box inside the next square, so that search is the last.
      radiusM = Number.isFinite(best.offsetM) ? best.offsetM : radiusM * 4;
    }
    if (bestLeg < 0) return { chainageM: route[0].chainageM, offsetM: NaN };
    const from = route[bestLeg];
    const to = route[bestLeg + 1];
    return { chainageM: from.chainageM + best.u * (to.chainageM - from.chainageM), offsetM: best.offsetM };
  });
}
