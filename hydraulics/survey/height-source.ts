/** Where a station's height came from. */
export const HEIGHT_SOURCES = [
  'gps',
  'gnss',
  'level',
  'hose-level',
  'inclinometer',
  'altimeter',
  'map',
  'typed',
] as const;
export type HeightSource = (typeof HEIGHT_SOURCES)[number];

export interface VerticalUncertaintyDefault {
  /** Vertical uncertainty, metres (95 % where the source states a level). */
  uncertaintyM: number | undefined;
  source: string;
}

/**
 * Default vertical uncertainty per height source, used when the file gives none. Values with a
 * published figure name it (core.md §6.4, [R28]); the rest are marked as common practice.
 */
export const DEFAULT_VERTICAL_UNCERTAINTY: Readonly<Record<HeightSource, VerticalUncertaintyDefault>> = {
  gps: {
    uncertaintyM: 15,
    source:
      'U.S. DoD, GPS Standard Positioning Service Performance Standard 2020 §3.4: vertical ≤ 15 m (95 %, global average) [R28]',
  },
  gnss: {
    uncertaintyM: 0.02,
    source: 'coordinately.org summary of gps.gov: RTK 1–2 cm [R28]',
  },
  level: { uncertaintyM: 0.01, source: 'common practice, no source (closed runs with an automatic level)' },
  'hose-level': { uncertaintyM: 0.05, source: 'common practice, no source' },
  inclinometer: { uncertaintyM: 0.5, source: 'common practice, no source (hand clinometer over a route)' },
  altimeter: { uncertaintyM: 3, source: 'common practice, no source (barometric, drifts with weather)' },
  map: { uncertaintyM: 10, source: 'common practice, no source (about one contour interval)' },
  typed: { uncertaintyM: undefined, source: 'unknown: typed by a person' },
};

/** Default uncertainty (metres) for a height source; undefined when nothing can be assumed. */
export function defaultVerticalUncertaintyM(source: HeightSource): number | undefined {
  return DEFAULT_VERTICAL_UNCERTAINTY[source].uncertaintyM;
}

/** Whether a route's heights are above sea level, or on a datum the surveyor set (a level book started at 100 m). */
export type HeightDatum = 'geodetic' | 'assumed';

/**
 * Sources whose heights are above sea level (satellite, barometric, map). A level, hose level or
 * clinometer only gives differences, hung on a start height the surveyor chose; typed heights may
 * be either, so they count as assumed (profile-and-checks.md §6).
 */
const GEODETIC_SOURCES: ReadonlySet<HeightSource> = new Set<HeightSource>(['gps', 'gnss', 'altimeter', 'map']);

/** The datum of a route's heights: geodetic only when every point with a known source is on one. */
export function heightDatumOf(sources: readonly (HeightSource | undefined)[]): HeightDatum {
  let known = 0;
  for (const source of sources) {
    if (source === undefined) continue;
    known += 1;
    if (!GEODETIC_SOURCES.has(source)) return 'assumed';
  }
  return known > 0 ? 'geodetic' : 'assumed';
}
