import { surveyHeightScatterM, type HeightConfidence } from '../../hydraulics/index';
import { thinPoints, type ThinOptions } from '../chart/thin-profile';

export interface ProfilePoint {
  chainageM: number;
  elevationM: number;
}

/** Points a route's long profile is drawn with, about (the kept highs and lows come on top). */
export const ROUTE_PROFILE_POINTS = 1500;

/**
 * A route's profile thinned for drawing by the one profile thinning (lib/chart/thin-profile.ts):
 * every high and low that stands out by more than the survey's own height scatter
 * (`surveyHeightScatterM` of the points' stated confidence) is kept; the smaller ones are that
 * scatter, and keeping them would keep most of a walked GPS route.
 */
export function thinRouteProfile<T extends ProfilePoint>(
  points: readonly T[],
  confidence: readonly HeightConfidence[],
  targetPoints = ROUTE_PROFILE_POINTS,
): T[] {
  return thinPoints(points, routeThinOptions(surveyHeightScatterM(confidence), targetPoints));
}

/** The route profile's thinning options, for callers that hold the series as arrays (`thinProfile`). */
export function routeThinOptions(scatterM: number, targetPoints = ROUTE_PROFILE_POINTS): ThinOptions {
  return { targetPoints, reversalM: scatterM };
}

interface PlacedPoint extends HeightConfidence {
  chainageM: number | null;
  elevationM: number;
  rawElevationM: number | null;
  excluded: boolean;
}

/** The two profiles of the route page: as surveyed, and as cleaned (excluded points left out). */
export function routeProfileSeries(points: readonly PlacedPoint[]): { raw: ProfilePoint[]; cleaned: ProfilePoint[] } {
  const placed = points.filter((p) => p.chainageM !== null);
  const surveyed = placed.filter((p) => p.rawElevationM !== null);
  const kept = placed.filter((p) => !p.excluded);
  return {
    raw: thinRouteProfile(
      surveyed.map((p) => ({ chainageM: p.chainageM as number, elevationM: p.rawElevationM as number })),
      surveyed,
    ),
    cleaned: thinRouteProfile(
      kept.map((p) => ({ chainageM: p.chainageM as number, elevationM: p.elevationM })),
      kept,
    ),
  };
}

/**
 * The server's thinned profile with one page of rows as edited on screen: the profile's points
 * within the page's stored chainage span give way to the page's own (thinned) points, so an edit
 * shows on the chart before it is saved.
 */
export function withPageEdits(
  profile: readonly ProfilePoint[],
  span: { fromM: number; toM: number } | null,
  page: readonly ProfilePoint[],
): ProfilePoint[] {
  const outside =
    span === null ? [...profile] : profile.filter((p) => p.chainageM < span.fromM || p.chainageM > span.toM);
  return [...outside, ...page].sort((a, b) => a.chainageM - b.chainageM);
}
