import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { chainageAlongTrack } from '../../../hydraulics/survey/chainage';
import { detectCsvDialect, detectLineEnding } from '../../../lib/survey/csv-dialect';
import { guessGpsColumnMapping, guessStationColumnMapping, normaliseHeader } from '../../../lib/survey/column-mapping';
import { parseGpsCsv, previewGpsCsv } from '../../../lib/survey/gps-csv';
import { ParsedSurveySchema } from '../../../lib/survey/parsed-survey';
import { sniffSurveyFile } from '../../../lib/survey/sniff';
import { parseStationCsv } from '../../../lib/survey/station-csv';

const fixtureBytes = (name: string) =>
  new Uint8Array(readFileSync(path.join(__dirname, '../../fixtures/survey', name)));

describe('CSV dialect detection', () => {
  it.each([
    ['comma', 'lat,lon,ele\n45.5,11.8,800\n', ',', false],
    ['semicolon with decimal comma', 'lat;lon;ele\n45,5;11,8;800,5\n', ';', true],
    ['tab', 'lat\tlon\tele\n45.5\t11.8\t800\n', '\t', false],
    ['bar', 'lat|lon|ele\n45.5|11.8|800\n', '|', false],
  ])('%s', (_n, text, delimiter, decimalComma) => {
    const d = detectCsvDialect(text);
    expect(d.delimiter).toBe(delimiter);
    expect(d.decimalComma).toBe(decimalComma);
    expect(d.hasHeader).toBe(true);
  });
  it('sees a file without a header row', () => {
    expect(detectCsvDialect('45.5,11.8,800\n45.6,11.9,790\n').hasHeader).toBe(false);
  });
  it('names line endings, including mixed', () => {
    expect(detectLineEnding('a\r\nb\r\n')).toBe('crlf');
    expect(detectLineEnding('a\rb\r')).toBe('cr');
    expect(detectLineEnding('a\nb\r\nc')).toBe('mixed');
  });
});

describe('column mapping guess (separate from parsing, for the mapping screen)', () => {
  it('maps common phone-app headers', () => {
    const g = guessGpsColumnMapping([
      'Time (UTC)',
      'Latitude',
      'Longitude',
      'Altitude (ft)',
      'Name',
      'Vertical accuracy',
    ]);
    expect(g.mapping).toEqual({ time: 0, latitude: 1, longitude: 2, elevation: 3, name: 4, accuracy: 5 });
    expect(g.elevationUnit).toBe('ft');
    expect(g.accuracyIsVertical).toBe(true);
  });
  it('maps short and unit-suffixed names', () => {
    const g = guessGpsColumnMapping(['lat_deg', 'lng', 'ele_m', 'hAcc']);
    expect(g.mapping).toMatchObject({ latitude: 0, longitude: 1, elevation: 2, accuracy: 3, time: null, name: null });
    expect(g.elevationUnit).toBe('m');
    expect(g.accuracyIsVertical).toBe(false);
    expect(normaliseHeader('Höhe [m]')).toBe('hohe');
  });
  it('maps station tables', () => {
    const g = guessStationColumnMapping(['Chainage (ft)', 'RL', 'Remarks']);
    expect(g.mapping).toEqual({ chainage: 0, elevation: 1, name: 2 });
    expect(g.chainageUnit).toBe('ft');
  });
  it('preview gives dialect, headers and guess without parsing rows', () => {
    const p = previewGpsCsv('Lat;Lon;Altitude (ft)\n45,5;11,8;2600\n');
    expect(p.headers).toEqual(['Lat', 'Lon', 'Altitude (ft)']);
    expect(p.guess.elevationUnit).toBe('ft');
    expect(p.dialect.decimalComma).toBe(true);
  });
});

describe('parseGpsCsv', () => {
  it('imports the phone-track fixture with ellipsoidal chainage, labels, times and confidences', () => {
    const { text } = sniffSurveyFile(fixtureBytes('phone-track.csv'));
    const s = parseGpsCsv(text);
    expect(ParsedSurveySchema.safeParse(s).success).toBe(true);
    expect(s.points).toHaveLength(8);
    expect(s.points[0]).toMatchObject({
      order: 0,
      lat: 45.5012,
      lon: 11.8024,
      chainageM: 0,
      elevationM: 812.4,
      label: 'Alder Spring intake',
      heightSource: 'gps',
      time: '2024-05-04T07:10:00.000Z',
    });
    // Horizontal accuracy 3.9 m × 1.5 (consumer vertical/horizontal ratio, core.md §6.4 [R28], low authority).
    expect(s.points[0].confidence).toBeCloseTo(5.85, 12);
    const track = chainageAlongTrack(
      s.points.map((p) => ({ latitudeDeg: p.lat as number, longitudeDeg: p.lon as number, elevationM: p.elevationM })),
    );
    expect(s.points[7].chainageM).toBeCloseTo(track.totalHorizontalM, 9);
    expect(s.stats.totalSlopeLengthM).toBeCloseTo(track.totalSlopeM, 9);
    expect(s.stats).toMatchObject({
      format: 'gps-csv',
      pointCount: 8,
      rowsRead: 8,
      minElevationM: 790.7,
      maxElevationM: 812.4,
      duplicateCount: 0,
    });
    expect(s.warnings.map((w) => w.code)).toContain('consumer-gps-heights');
  });

  it('reads BOM + CRLF + semicolons + decimal commas + feet (handheld export)', () => {
    const sniffed = sniffSurveyFile(fixtureBytes('handheld-semicolon.csv'));
    expect(sniffed.hadByteOrderMark).toBe(true);
    const s = parseGpsCsv(sniffed.text);
    expect(s.points).toHaveLength(8);
    expect(s.points[0].lat).toBe(45.5012);
    // 2665.4 ft × 0.3048 m/ft (international foot) = 812.41 m; the file is rounded to 0.1 ft.
    expect(s.points[0].elevationM).toBeCloseTo(2665.4 * 0.3048, 9);
    expect(Math.abs(s.points[7].elevationM - 790.7)).toBeLessThan(0.02);
  });

  it('mixed line endings work and keep the right line numbers', () => {
    const s = parseGpsCsv('lat,lon,ele\r\n45.5,11.8,800\n45.5001,11.8001,799\r45.5002,11.8002,798\r\n');
    expect(s.points.map((p) => p.elevationM)).toEqual([800, 799, 798]);
  });

  it('tab-delimited files work', () => {
    expect(parseGpsCsv('lat\tlon\tele\n45.5\t11.8\t800\n45.6\t11.9\t790\n').points).toHaveLength(2);
  });

  it('duplicate points are kept and flagged with their line', () => {
    const s = parseGpsCsv(
      'lat,lon,ele\n45.5,11.8,800\n45.5001,11.8001,799\n45.5001,11.8001,799\n45.5002,11.8002,798\n',
    );
    expect(s.points).toHaveLength(4);
    expect(s.stats.duplicateCount).toBe(1);
    expect(s.warnings.find((w) => w.code === 'duplicate-point')).toEqual({
      code: 'duplicate-point',
      message: 'exact duplicate of point 2',
      line: 4,
      index: 2,
    });
  });

  it('GPS time going backwards is flagged, not dropped', () => {
    const s = parseGpsCsv(
      'lat,lon,ele,time\n45.5,11.8,800,2024-05-04T07:10:00Z\n45.5001,11.8001,799,2024-05-04T07:09:00Z\n',
    );
    expect(s.warnings.find((w) => w.code === 'time-backwards')?.line).toBe(3);
  });

  it('honours a corrected mapping from the mapping screen', () => {
    const s = parseGpsCsv('a,b,c\n45.5,11.8,800\n45.6,11.9,790\n', {
      mapping: { latitude: 0, longitude: 1, elevation: 2, time: null, name: null, accuracy: null },
      heightSource: 'gnss',
    });
    expect(s.points[1]).toMatchObject({ lat: 45.6, heightSource: 'gnss', confidence: 0.02 });
    expect(s.warnings.some((w) => w.code === 'consumer-gps-heights')).toBe(false);
  });

  it('reports progress from 0 to 1, never going back', () => {
    const rows = Array.from({ length: 5000 }, (_, i) => `${(45.5 + i * 1e-5).toFixed(6)},11.8,${800 - i * 0.01}`);
    const seen: number[] = [];
    parseGpsCsv(`lat,lon,ele\n${rows.join('\n')}\n`, { onProgress: (f) => seen.push(f) });
    expect(seen.length).toBeGreaterThan(10);
    expect(seen[seen.length - 1]).toBe(1);
    expect(seen.every((f, i) => f >= 0 && f <= 1 && (i === 0 || f > seen[i - 1]))).toBe(true);
  });
});

describe('parseStationCsv', () => {
  it('imports the station fixture with typed heights and slope length', () => {
    const s = parseStationCsv(sniffSurveyFile(fixtureBytes('stations.csv')).text);
    expect(s.points.map((p) => p.chainageM)).toEqual([0, 25, 50, 80, 120, 160, 200, 235]);
    expect(s.points[3].label).toBe('Gully crossing');
    expect(s.points[0].heightSource).toBe('typed');
    expect(s.points[0].confidence).toBeUndefined();
    expect(s.stats.totalHorizontalLengthM).toBe(235);
    expect(s.stats.totalSlopeLengthM).toBeGreaterThan(235);
  });
  it('converts feet in both columns (0.3048 m/ft)', () => {
    const s = parseStationCsv('Chainage (ft),Elevation (ft)\n0,1000\n100,990\n');
    expect(s.points[1].chainageM).toBeCloseTo(30.48, 12);
    expect(s.points[1].elevationM).toBeCloseTo(301.752, 9);
  });
  it('an exactly repeated row is flagged as a duplicate', () => {
    const s = parseStationCsv('chainage,elevation\n0,100\n10,99\n10,99\n20,98\n');
    expect(s.stats.duplicateCount).toBe(1);
    expect(s.warnings[0]).toMatchObject({ code: 'duplicate-point', line: 4 });
  });
});
