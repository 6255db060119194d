import type { LengthUnit } from './cells';
import { SurveyImportError } from './errors';

/** Which column (0-based index) holds each value; null when the file has none. */
export interface GpsColumnMapping {
  latitude: number | null;
  longitude: number | null;
  elevation: number | null;
  time: number | null;
  name: number | null;
  accuracy: number | null;
}

export interface StationColumnMapping {
  chainage: number | null;
  elevation: number | null;
  name: number | null;
}

export interface ColumnGuess<M> {
  mapping: M;
  elevationUnit: LengthUnit;
  /** Whether the accuracy column is a vertical figure (else horizontal). */
  accuracyIsVertical: boolean;
}

/** Header words per value, compared after lower-casing and stripping units and punctuation. */
const SYNONYMS: Record<keyof GpsColumnMapping | 'chainage', string[]> = {
  latitude: ['lat', 'latitude', 'latitudedeg', 'latdeg', 'y', 'breite', 'latitud'],
  longitude: ['lon', 'lng', 'long', 'longitude', 'longitudedeg', 'londeg', 'x', 'lange', 'laenge', 'longitud'],
  elevation: [
    'ele',
    'elev',
    'elevation',
    'alt',
    'altitude',
    'height',
    'z',
    'hohe',
    'hoehe',
    'altitud',
    'elevationm',
    'altitudem',
    'rl',
    'level',
    'reducedlevel',
  ],
  time: ['time', 'timestamp', 'datetime', 'date', 'utc', 'timeutc', 'gpstime', 'zeit', 'fecha'],
  name: [
    'name',
    'label',
    'desc',
    'description',
    'comment',
    'note',
    'notes',
    'feature',
    'id',
    'point',
    'station',
    'remarks',
  ],
  accuracy: [
    'accuracy',
    'acc',
    'hacc',
    'vacc',
    'horizontalaccuracy',
    'verticalaccuracy',
    'altitudeaccuracy',
    'hdop',
    'precision',
    'error',
  ],
  chainage: ['chainage', 'ch', 'station', 'sta', 'distance', 'dist', 'km', 'offset', 'along', 'chainagem', 'distancem'],
};

/** No column name is longer; a longer header cell is cut before the patterns below run on it. */
const MAX_HEADER_CHARS = 120;

/** “Altitude (ft)” → “altitude”; “Lat.” → “lat”; “Höhe” → “hohe”. */
export function normaliseHeader(header: string): string {
  return header
    .slice(0, MAX_HEADER_CHARS)
    .normalize('NFD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/\((.*?)\)|\[(.*?)\]/g, '')
    .trim()
    .replace(/[\s_\-.]+(ft|feet|m|metres|meters|deg|degrees|utc)$/, '')
    .replace(/[^a-z]/g, '');
}

function find(headers: readonly string[], key: keyof typeof SYNONYMS, taken: Set<number>): number | null {
  const names = headers.map(normaliseHeader);
  const i = names.findIndex((n, k) => !taken.has(k) && SYNONYMS[key].includes(n));
  if (i >= 0) {
    taken.add(i);
    return i;
  }
  return null;
}

/** Elevation in feet when its header says so (“ele_ft”, “Altitude (feet)”, “elev [ft]”). */
export function guessElevationUnit(header: string | undefined): LengthUnit {
  if (!header) return 'm';
  return /(\bft\b|feet|foot|_ft\b|\(ft\)|\[ft\])/i.test(header.slice(0, MAX_HEADER_CHARS)) ? 'ft' : 'm';
}

/**
 * Guesses the mapping of a phone/handheld CSV from its header names. Separate from parsing so a
 * mapping screen can show the guess and let the user correct it before the import runs.
 */
export function guessGpsColumnMapping(headers: readonly string[]): ColumnGuess<GpsColumnMapping> {
  const taken = new Set<number>();
  // Order matters: specific names are claimed before generic ones like “id” or “x”.
  const latitude = find(headers, 'latitude', taken);
  const longitude = find(headers, 'longitude', taken);
  const elevation = find(headers, 'elevation', taken);
  const time = find(headers, 'time', taken);
  const accuracy = find(headers, 'accuracy', taken);
  const name = find(headers, 'name', taken);
  const accHeader = accuracy === null ? '' : normaliseHeader(headers[accuracy]);
  return {
    mapping: { latitude, longitude, elevation, time, name, accuracy },
    elevationUnit: guessElevationUnit(elevation === null ? undefined : headers[elevation]),
    accuracyIsVertical: /^(vacc|verticalaccuracy|altitudeaccuracy)$/.test(accHeader),
  };
}

/** Guesses the chainage, elevation and label columns of a station/elevation CSV. */
export function guessStationColumnMapping(
  headers: readonly string[],
): ColumnGuess<StationColumnMapping> & { chainageUnit: LengthUnit } {
  const taken = new Set<number>();
  const chainage = find(headers, 'chainage', taken);
  const elevation = find(headers, 'elevation', taken);
  const name = find(headers, 'name', taken);
  return {
    mapping: { chainage, elevation, name },
    elevationUnit: guessElevationUnit(elevation === null ? undefined : headers[elevation]),
    chainageUnit: guessElevationUnit(chainage === null ? undefined : headers[chainage]),
    accuracyIsVertical: true,
  };
}

/** A mapping chosen on screen may point past the file's last column; say which and how many there are. */
export function assertMappingInRange(
  mapping: Readonly<Record<string, number | null>>,
  headers: readonly string[],
): void {
  for (const [field, index] of Object.entries(mapping)) {
    if (index !== null && (index < 0 || index >= headers.length)) {
      throw new SurveyImportError(
        'missing-column',
        `the ${field} column is set to column ${index + 1}, but the file has ${headers.length} columns (${headers.map((h) => `“${h}”`).join(', ')})`,
        { field, line: 1 },
      );
    }
  }
}
