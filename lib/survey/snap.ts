import { projectToLocalPlan } from '../../hydraulics/survey/plan-projection';

export interface SnapResult {
  chainageM: number;
  /** Distance from the feature to the route line, metres (in the local plan). */
  offsetM: number;
}

/**
 * Snaps positions to the nearest point on a route's polyline. Works in the route's local plan
 * (equirectangular about its centre), which is accurate to well under a metre over a few
 * kilometres; the chainage along the matched leg is scaled to the leg's geodesic length.
 */
export function snapToRoute(
  route: readonly { lat: number; lon: number; chainageM: number }[],
  targets: readonly { lat: number; lon: number }[],
): SnapResult[] {
  const plan = projectToLocalPlan([...route, ...targets].map((p) => ({ latitudeDeg: p.lat, longitudeDeg: p.lon }))).points;
  const routeXY = plan.slice(0, route.length);
  return plan.slice(route.length).map((t) => {
    let best: SnapResult = { chainageM: route[0].chainageM, offsetM: Math.hypot(t.eastM - routeXY[0].eastM, t.northM - routeXY[0].northM) };
    for (let i = 1; i < route.length; i += 1) {
      const a = routeXY[i - 1];
      const b = routeXY[i];
      const dx = b.eastM - a.eastM;
      const dy = b.northM - a.northM;
      const len2 = dx * dx + dy * dy;
      const u = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((t.eastM - a.eastM) * dx + (t.northM - a.northM) * dy) / len2));
      const offsetM = Math.hypot(t.eastM - (a.eastM + u * dx), t.northM - (a.northM + u * dy));
      if (offsetM < best.offsetM) {
        best = { chainageM: route[i - 1].chainageM + u * (route[i].chainageM - route[i - 1].chainageM), offsetM };
      }
    }
    return best;
  });
}
