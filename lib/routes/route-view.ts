import { surveyHeightScatterM } from '../../hydraulics/index';
import { thinProfile } from '../chart/thin-profile';
import { ROUTE_PROFILE_POINTS, routeThinOptions } from './profile-series';
import type { CheckedPoint, ProposalPlace, RouteDetail, RoutePlanStation, RouteProposal, RouteView } from './types';

/** Where each proposal sits: its point's chainage and surveyed height. */
export function proposalPlacesOf(
  points: readonly CheckedPoint[],
  proposals: readonly RouteProposal[],
): ProposalPlace[] {
  // seq is the point's position along the route (0..n-1), so it indexes the ordered points.
  return proposals.map((p) => {
    const point = points[p.index]?.seq === p.index ? points[p.index] : points.find((q) => q.seq === p.index);
    return { chainageM: point?.chainageM ?? 0, rawElevationM: point?.rawElevationM ?? 0 };
  });
}

/**
 * The route page's drawing data from the whole route, on the server: both profiles thinned by the
 * one thinning (highs and lows taller than the survey's scatter kept), the plan at the cleaned
 * profile's kept points, the height range of every kept point. Linear in the points (plus the
 * scatter's median), on typed arrays: a 100,000-point route is read on every first visit.
 */
export function routeViewOf(
  detail: Omit<RouteDetail, 'points'>,
  points: readonly CheckedPoint[],
  profilePoints = ROUTE_PROFILE_POINTS,
): RouteView {
  const n = points.length;
  const x = new Float64Array(n);
  const rawY = new Float64Array(n);
  const kept: CheckedPoint[] = [];
  let lowM = Infinity;
  let highM = -Infinity;
  let positioned = n > 0;
  for (let i = 0; i < n; i++) {
    const p = points[i];
    x[i] = p.chainageM;
    rawY[i] = p.rawElevationM;
    if (p.latitude === null || p.longitude === null) positioned = false;
    if (p.excluded) continue;
    kept.push(p);
    if (p.elevationM < lowM) lowM = p.elevationM;
    if (p.elevationM > highM) highM = p.elevationM;
  }
  const scatterM = surveyHeightScatterM(points);
  const keptX = Float64Array.from(kept, (p) => p.chainageM);
  const keptY = Float64Array.from(kept, (p) => p.elevationM);
  const rawAt = thinProfile(x, rawY, routeThinOptions(scatterM, profilePoints));
  const keptAt = thinProfile(
    keptX,
    keptY,
    routeThinOptions(kept.length === n ? scatterM : surveyHeightScatterM(kept), profilePoints),
  );
  const plan: RoutePlanStation[] = [];
  for (const i of keptAt) {
    const p = kept[i];
    if (p.latitude !== null && p.longitude !== null)
      plan.push({ chainageM: p.chainageM, latitudeDeg: p.latitude, longitudeDeg: p.longitude });
  }
  return {
    route: detail.route,
    heightRangeM: kept.length > 0 ? { lowM, highM } : null,
    positioned,
    profile: {
      raw: rawAt.map((i) => ({ chainageM: x[i], elevationM: rawY[i] })),
      cleaned: keptAt.map((i) => ({ chainageM: keptX[i], elevationM: keptY[i] })),
    },
    plan,
    proposals: detail.proposals,
    proposalPlaces: proposalPlacesOf(points, detail.proposals),
    gpsWarning: detail.gpsWarning,
  };
}
