import type { SurveyPoint } from '../survey/parsed-survey';
import type { PointRecord } from './edit-ops';

/** What a new point is given; the rest follows from it being new. */
export type NewPointFields = Omit<PointRecord, 'rawElevationM' | 'excluded' | 'dismissedChecks'>;

/**
 * A point that enters a route: its height is both the surveyed and the cleaned one, it is kept and no check is
 * dismissed yet.
 */
export function newPointRecord(fields: NewPointFields): PointRecord {
  // Field by field, not by spreading: an import makes one per point of a 100,000-point file.
  return {
    latitude: fields.latitude,
    longitude: fields.longitude,
    chainageM: fields.chainageM,
    slopeChainageM: fields.slopeChainageM,
    elevationM: fields.elevationM,
    rawElevationM: fields.elevationM,
    label: fields.label,
    heightSource: fields.heightSource,
    confidenceM: fields.confidenceM,
    recordedAt: fields.recordedAt,
    excluded: false,
    dismissedChecks: [],
  };
}

/** A parsed survey point as a new point of the route. */
export function surveyPointRecord(p: SurveyPoint, slopeChainageM: number | null): PointRecord {
  return newPointRecord({
    latitude: p.lat ?? null,
    longitude: p.lon ?? null,
    chainageM: p.chainageM,
    slopeChainageM,
    elevationM: p.elevationM,
    label: p.label ?? null,
    heightSource: p.heightSource,
    confidenceM: p.confidence ?? null,
    recordedAt: p.time ?? null,
  });
}
