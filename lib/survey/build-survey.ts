import {
  chainageAlongTrack,
  DEFAULT_VERTICAL_UNCERTAINTY,
  defaultVerticalUncertaintyM,
  detectDuplicates,
  detectOutOfOrder,
  slopeLengthOfProfile,
  type GeoPosition,
  type RouteStation,
} from '../../hydraulics/index';
import { MAX_ROUTE_POINTS } from '../validations/routes';
import { SurveyImportError } from './errors';
import { utcInstantMs } from './local-time';
import {
  validateParsedSurvey,
  type HeightSourceName,
  type ParsedSurvey,
  type SurveyFormat,
  type SurveyImportWarning,
  type SurveyPoint,
} from './parsed-survey';

/** A row read from a file, before chainage and checks. `line` is where it came from. */
export interface DraftPoint {
  line?: number;
  lat?: number;
  lon?: number;
  /** Known for station files and field books; computed from lat/lon otherwise. */
  chainageM?: number;
  elevationM: number;
  label?: string;
  confidence?: number;
  time?: string;
}

export interface BuildSurveyInput {
  format: SurveyFormat;
  drafts: readonly DraftPoint[];
  heightSource: HeightSourceName;
  rowsRead: number;
  warnings?: SurveyImportWarning[];
  closureErrorM?: number;
}

/**
 * Turns read rows into the one ParsedSurvey shape: chainage along the WGS84 ellipsoid for
 * positioned points, default confidences per height source, duplicates and backward times
 * flagged (never dropped), a loud note for consumer-GPS heights, and a final zod check.
 */
export function buildParsedSurvey(input: BuildSurveyInput): ParsedSurvey {
  const { drafts, heightSource } = input;
  if (drafts.length > MAX_ROUTE_POINTS) {
    throw new SurveyImportError(
      'too-many-points',
      `the file has ${drafts.length.toLocaleString('en-US')} points; a route can hold at most ${MAX_ROUTE_POINTS.toLocaleString('en-US')} (split the file, or thin the track on the receiver)`,
    );
  }
  if (drafts.length < 2) {
    throw new SurveyImportError('too-few-points', `a route needs at least two points; the file has ${drafts.length}`);
  }
  const warnings: SurveyImportWarning[] = [...(input.warnings ?? [])];
  const positioned = drafts.every((d) => d.lat !== undefined && d.lon !== undefined);
  // One object per point serves the chainage (when positioned) and the order checks; chainage is filled in below.
  const stations: RouteStation[] = drafts.map((d) => ({
    chainageM: 0,
    elevationM: d.elevationM,
    latitudeDeg: d.lat,
    longitudeDeg: d.lon,
    timeS: d.time === undefined ? undefined : utcInstantMs(d.time) / 1000,
  }));
  let chainages: number[];
  let totalSlopeLengthM: number;
  if (drafts.every((d) => d.chainageM !== undefined)) {
    chainages = drafts.map((d) => d.chainageM as number);
    totalSlopeLengthM = slopeLengthOfProfile(
      drafts.map((d, i) => ({ chainageM: chainages[i], elevationM: d.elevationM })),
    );
  } else if (positioned) {
    // Positioned: every station has its latitude and longitude.
    const track = chainageAlongTrack(stations as GeoPosition[]);
    chainages = track.horizontalChainageM;
    totalSlopeLengthM = track.totalSlopeM;
  } else {
    throw new SurveyImportError('missing-column', 'each point needs either a chainage or a latitude and longitude');
  }
  const fallback = defaultVerticalUncertaintyM(heightSource);
  // Built by assignment, not by spreading optional fields: this runs once per point on 100 000-point files.
  const points = drafts.map((d, i) => {
    const point: SurveyPoint = { order: i, chainageM: chainages[i], elevationM: d.elevationM, heightSource };
    if (d.lat !== undefined) point.lat = d.lat;
    if (d.lon !== undefined) point.lon = d.lon;
    if (d.label !== undefined && d.label !== '') point.label = d.label;
    const confidence = d.confidence ?? fallback;
    if (confidence !== undefined) point.confidence = confidence;
    if (d.time !== undefined) point.time = d.time;
    return point;
  });
  for (let i = 0; i < stations.length; i++) stations[i].chainageM = chainages[i];
  const duplicates = detectDuplicates(stations);
  if (drafts.length - duplicates.length < 2) {
    throw new SurveyImportError(
      'too-few-points',
      `the file's ${drafts.length} points are all copies of one point (same place, height and time); a route needs at least two different points`,
      { line: drafts[drafts.length - 1].line },
    );
  }
  for (const c of [...duplicates, ...detectOutOfOrder(stations).filter((c) => c.kind === 'time-backwards')]) {
    warnings.push({
      code: c.kind === 'duplicate' ? 'duplicate-point' : c.kind,
      message: c.reason,
      line: drafts[c.index].line,
      index: c.index,
    });
  }
  if (heightSource === 'gps') {
    warnings.push({
      code: 'consumer-gps-heights',
      message:
        `Heights come from a consumer GPS; their vertical error can reach ${DEFAULT_VERTICAL_UNCERTAINTY.gps.uncertaintyM} m ` +
        '(GPS SPS Performance Standard). Do not choose pressure class, break-pressure tanks or pump lift on them without checking key heights by levelling.',
    });
  }
  let min = Infinity;
  let max = -Infinity;
  for (const d of drafts) {
    min = Math.min(min, d.elevationM);
    max = Math.max(max, d.elevationM);
  }
  return validateParsedSurvey({
    points,
    warnings,
    stats: {
      format: input.format,
      pointCount: points.length,
      rowsRead: input.rowsRead,
      totalHorizontalLengthM: chainages[chainages.length - 1] - chainages[0],
      totalSlopeLengthM,
      minElevationM: min,
      maxElevationM: max,
      duplicateCount: duplicates.length,
      ...(input.closureErrorM !== undefined ? { closureErrorM: input.closureErrorM } : {}),
    },
  });
}
