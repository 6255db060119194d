import { XMLParser, XMLValidator } from 'fast-xml-parser';
import { SaxesParser } from 'saxes';
import { buildParsedSurvey, type DraftPoint } from './build-survey';
import { readNumberCell, readTimeCell } from './cells';
import { SurveyImportError } from './errors';
import {
  validateParsedSurvey,
  type HeightSourceName,
  type ParsedSurvey,
  type SurveyFeature,
  type SurveyImportWarning,
} from './parsed-survey';
import { snapToRoute } from './snap';

/** Waypoints placed along one route as features: far more than any walk marks. */
export const MAX_ROUTE_FEATURES = 20_000;

export interface GpxOptions {
  /** @default 'gps' */
  heightSource?: HeightSourceName;
  /** Build the route from waypoints, in file order, when the file has no track or route. @default false */
  useWaypointsAsRoute?: boolean;
  /** Waypoints farther than this from the route are still kept but flagged, metres. @default 50 */
  waypointFlagDistanceM?: number;
  onProgress?: (fraction: number) => void;
}

interface GpxPoint {
  lat?: string;
  lon?: string;
  ele?: string;
  time?: string;
  name?: string;
}

const LISTS = new Set(['trk', 'trkseg', 'trkpt', 'rte', 'rtept', 'wpt']);

/**
 * Runs an XML read. The parsers refuse entity declarations, external entities and extreme nesting
 * (so nothing is expanded or fetched) by throwing plain errors: those become the import's own
 * "not well-formed" refusal rather than a server error.
 */
function readXml<T>(read: () => T): T {
  try {
    return read();
  } catch (error) {
    if (error instanceof SurveyImportError) throw error;
    const reason = error instanceof Error ? error.message.slice(0, 160) : 'unreadable';
    throw new SurveyImportError(
      'broken-xml',
      `the GPX file uses XML Runnel does not read (entity declarations, external entities or nesting too deep): ${reason}`,
    );
  }
}

/**
 * Line of each <trkpt>, <rtept> and <wpt> in document order, from a SAX pass of the XML parser
 * (comments, CDATA and processing instructions cannot shift them, as a text scan would).
 */
function pointLines(text: string): Record<'trkpt' | 'rtept' | 'wpt', number[]> {
  const lines = { trkpt: [] as number[], rtept: [] as number[], wpt: [] as number[] };
  const parser = new SaxesParser();
  parser.on('opentagstart', (tag) => {
    const local = tag.name.slice(tag.name.indexOf(':') + 1);
    // The event comes after the character ending the name; a line break there belongs to the tag's line.
    if (local === 'trkpt' || local === 'rtept' || local === 'wpt')
      lines[local].push(parser.columnIndex === 0 ? parser.line - 1 : parser.line);
  });
  parser.write(text).close();
  return lines;
}

function readPoint(p: GpxPoint, line: number | undefined, what: string, eleRequired = true): DraftPoint {
  const at = (field: string) => ({ line, column: what, field });
  const lat = readNumberCell(p.lat, false, at('lat'));
  if (lat < -90 || lat > 90)
    throw new SurveyImportError('latitude-out-of-range', `lat="${lat}" is outside −90 to 90 degrees`, at('lat'));
  const lon = readNumberCell(p.lon, false, at('lon'));
  if (lon < -180 || lon > 180)
    throw new SurveyImportError('longitude-out-of-range', `lon="${lon}" is outside −180 to 180 degrees`, at('lon'));
  // GPX 1.1 gives <ele> in metres.
  const elevationM = !eleRequired && (p.ele ?? '').trim() === '' ? NaN : readNumberCell(p.ele, false, at('ele'));
  return { line, lat, lon, elevationM, label: p.name?.trim() || undefined, time: readTimeCell(p.time, at('time')) };
}

/**
 * Parses GPX 1.1: every track segment of every track, in order, becomes the route (else the
 * first route's points); waypoints become labelled features at the nearest chainage.
 */
export function parseGpx(text: string, options: GpxOptions = {}): ParsedSurvey {
  const progress = options.onProgress ?? (() => undefined);
  const valid = XMLValidator.validate(text);
  if (valid !== true) {
    throw new SurveyImportError('broken-xml', `the GPX file is not well-formed XML: ${valid.err.msg}`, {
      line: valid.err.line,
      column: `character ${valid.err.col}`,
    });
  }
  progress(0.3);
  const doc = readXml(() =>
    new XMLParser({
      ignoreAttributes: false,
      attributeNamePrefix: '',
      removeNSPrefix: true,
      parseTagValue: false,
      parseAttributeValue: false,
      isArray: (name) => LISTS.has(name),
    }).parse(text),
  ) as { gpx?: { trk?: { trkseg?: { trkpt?: GpxPoint[] }[] }[]; rte?: { rtept?: GpxPoint[] }[]; wpt?: GpxPoint[] } };
  const gpx = doc.gpx;
  if (!gpx || typeof gpx !== 'object')
    throw new SurveyImportError('not-gpx', 'the XML file has no <gpx> root element, so it is not a GPX file');
  progress(0.6);

  const warnings: SurveyImportWarning[] = [];
  const segments = (gpx.trk ?? []).flatMap((t) => t.trkseg ?? []).filter((s) => (s.trkpt ?? []).length > 0);
  const { trkpt: trkLines, rtept: rteLines, wpt: wptLines } = readXml(() => pointLines(text));
  const waypoints = gpx.wpt ?? [];
  let drafts: DraftPoint[];
  let routeFromWaypoints = false;
  if (segments.length > 0) {
    let k = 0;
    drafts = segments.flatMap((s) => (s.trkpt ?? []).map((p) => readPoint(p, trkLines[k++], 'trkpt')));
    if (segments.length > 1) {
      warnings.push({
        code: 'gpx-segments-joined',
        message: `${segments.length} track segments were joined end to start in file order; check the joins`,
      });
    }
  } else if ((gpx.rte ?? []).some((r) => (r.rtept ?? []).length > 0)) {
    let k = 0;
    drafts = (gpx.rte ?? []).flatMap((r) => (r.rtept ?? []).map((p) => readPoint(p, rteLines[k++], 'rtept')));
  } else if (waypoints.length > 0 && options.useWaypointsAsRoute) {
    drafts = waypoints.map((p, i) => readPoint(p, wptLines[i], 'wpt'));
    routeFromWaypoints = true;
  } else if (waypoints.length > 0) {
    throw new SurveyImportError(
      'gpx-only-waypoints',
      `the GPX file has ${waypoints.length} waypoints but no track or route; import the waypoints as the route only if they were taken in order along it`,
    );
  } else {
    throw new SurveyImportError(
      'gpx-no-track',
      'the GPX file has no track (<trk>), route (<rte>) or waypoints (<wpt>)',
    );
  }
  const survey = buildParsedSurvey({
    format: 'gpx',
    drafts,
    heightSource: options.heightSource ?? 'gps',
    rowsRead: drafts.length,
    warnings,
  });
  progress(0.9);
  if (!routeFromWaypoints && waypoints.length > MAX_ROUTE_FEATURES) {
    throw new SurveyImportError(
      'too-many-points',
      `the GPX file has ${waypoints.length.toLocaleString('en-US')} waypoints besides its track; at most ${MAX_ROUTE_FEATURES.toLocaleString('en-US')} can be placed along a route`,
    );
  }
  if (!routeFromWaypoints && waypoints.length > 0) {
    const flagM = options.waypointFlagDistanceM ?? 50;
    const wpts = waypoints.map((p, i) => readPoint(p, wptLines[i], 'wpt', false));
    const snapped = snapToRoute(
      survey.points.map((p) => ({ lat: p.lat as number, lon: p.lon as number, chainageM: p.chainageM })),
      wpts.map((w) => ({ lat: w.lat as number, lon: w.lon as number })),
    );
    const features: SurveyFeature[] = wpts.map((w, i) => ({
      label: w.label ?? `waypoint ${i + 1}`,
      chainageM: snapped[i].chainageM,
      offsetM: snapped[i].offsetM,
      lat: w.lat,
      lon: w.lon,
      ...(Number.isFinite(w.elevationM) ? { elevationM: w.elevationM } : {}),
      ...(w.line !== undefined ? { line: w.line } : {}),
    }));
    features.forEach((f) => {
      if (f.offsetM > flagM) {
        survey.warnings.push({
          code: 'waypoint-far-from-route',
          message: `waypoint “${f.label}” is ${f.offsetM.toFixed(0)} m from the route; it was placed at chainage ${f.chainageM.toFixed(0)} m`,
          line: f.line,
        });
      }
    });
    progress(1);
    return validateParsedSurvey({ ...survey, features });
  }
  progress(1);
  return survey;
}
