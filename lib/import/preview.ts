import { routeGpsWarning } from '../routes/gps-warning';
import { surveyPointRecord } from '../routes/new-point';
import { thinRouteProfile } from '../routes/profile-series';
import { detectRouteProposals } from '../routes/proposals';
import type { RoutePointView } from '../routes/types';
import type { ParsedSurvey } from '../survey/parsed-survey';
import type { ImportPreview } from './protocol';

/** Warnings sent to the screen; the rest are counted. */
const SHOWN_WARNINGS = 100;

/** The parsed survey as the route page will see it once saved (same checks, same warning). */
export function pointViewsOf(survey: ParsedSurvey): RoutePointView[] {
  return survey.points.map((p, i) => ({ seq: i, ...surveyPointRecord(p, null) }));
}

export function buildImportPreview(survey: ParsedSurvey): ImportPreview {
  const points = pointViewsOf(survey);
  return {
    stats: survey.stats,
    warnings: survey.warnings.slice(0, SHOWN_WARNINGS),
    warningCount: survey.warnings.length,
    features: survey.features ?? [],
    profile: thinRouteProfile(
      points.map((p) => ({ chainageM: p.chainageM, elevationM: p.elevationM })),
      points,
    ),
    proposals: detectRouteProposals(points),
    gpsWarning: routeGpsWarning(points),
  };
}
