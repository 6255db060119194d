import { readFileSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { parseGpx } from '../../../lib/survey/gpx';
import { looksLikeGpx } from '../../../lib/survey/detect-format';
import { parseInclinometerCsv } from '../../../lib/survey/inclinometer-csv';
import { parseLevelBookCsv } from '../../../lib/survey/level-book-csv';

const fixture = (name: string) => readFileSync(path.join(__dirname, '../../fixtures/survey', name), 'utf8');

describe('parseGpx (GPX 1.1)', () => {
  it('joins track segments in order and flags the join', () => {
    const s = parseGpx(fixture('walked-route.gpx'));
    expect(s.points).toHaveLength(8);
    expect(s.points.map((p) => p.elevationM)).toEqual([812.4, 809.9, 806.1, 803.8, 799.5, 796.2, 793.0, 790.7]);
    expect(s.points[3].time).toBe('2024-05-04T07:13:00.000Z');
    expect(s.warnings.map((w) => w.code)).toContain('gpx-segments-joined');
    expect(s.stats.format).toBe('gpx');
  });

  it('snaps waypoints to the nearest chainage as labelled features', () => {
    const s = parseGpx(fixture('walked-route.gpx'));
    const [box, gully] = s.features ?? [];
    expect(box).toMatchObject({ label: 'Alder Spring box', chainageM: 0, elevationM: 812.6, line: 3 });
    expect(box.offsetM).toBeLessThan(2);
    // The gully waypoint sits ~1.6 m east of track point 4 (index 3).
    expect(Math.abs(gully.chainageM - s.points[3].chainageM)).toBeLessThan(2);
    expect(gully.offsetM).toBeLessThan(2);
    expect(gully.elevationM).toBeUndefined();
    expect(s.warnings.some((w) => w.code === 'waypoint-far-from-route')).toBe(false);
  });

  it('gives the line of a bad point from the XML parser: a commented-out point or a <trkpt in a comment does not shift it', () => {
    const gpx = [
      '<?xml version="1.0"?>',
      '<gpx version="1.1" creator="test" xmlns="http://www.topografix.com/GPX/1/1">',
      '<!-- <trkpt lat="1" lon="1"><ele>1</ele></trkpt>',
      '     <trkpt lat="2" lon="2"><ele>2</ele></trkpt> -->',
      '<trk><trkseg>',
      '<trkpt lat="45.5" lon="11.8"><ele>800</ele></trkpt>',
      '<trkpt',
      '   lat="95" lon="11.9"><ele>790</ele></trkpt>',
      '</trkseg></trk></gpx>',
    ].join('\n');
    let caught: unknown;
    try {
      parseGpx(gpx);
    } catch (error) {
      caught = error;
    }
    expect(caught).toMatchObject({ code: 'latitude-out-of-range', line: 7 });
  });

  it('a waypoints-only file becomes a route when the user says so', () => {
    const s = parseGpx(fixture('waypoints-only.gpx'), { useWaypointsAsRoute: true });
    expect(s.points.map((p) => p.label)).toEqual(['Intake', 'Bend', 'Trough']);
    expect(s.features).toBeUndefined();
  });

  it('uses route points when there is no track, with namespace prefixes', () => {
    const s = parseGpx(
      '<?xml version="1.0"?><g:gpx xmlns:g="http://www.topografix.com/GPX/1/1" version="1.1"><g:rte><g:rtept lat="45.5" lon="11.8"><g:ele>800</g:ele></g:rtept><g:rtept lat="45.501" lon="11.8"><g:ele>790</g:ele></g:rtept></g:rte></g:gpx>',
    );
    expect(s.points).toHaveLength(2);
    expect(s.points[1].chainageM).toBeGreaterThan(110);
  });

  it('reports progress up to 1', () => {
    const seen: number[] = [];
    parseGpx(fixture('walked-route.gpx'), { onProgress: (f) => seen.push(f) });
    expect(seen[seen.length - 1]).toBe(1);
    expect(seen).toEqual([...seen].sort((a, b) => a - b));
  });

  it('tells GPX from CSV by content', () => {
    expect(looksLikeGpx(fixture('walked-route.gpx'))).toBe(true);
    expect(looksLikeGpx('lat,lon,ele\n')).toBe(false);
  });
});

describe('field-book CSVs', () => {
  it('inclinometer traverse: legs reduced to chainage and height from the first mark', () => {
    const s = parseInclinometerCsv(fixture('inclinometer.csv'), {
      startElevationM: 812.4,
      startLabel: 'Alder Spring intake',
    });
    expect(s.points).toHaveLength(6);
    expect(s.points[0]).toMatchObject({
      chainageM: 0,
      elevationM: 812.4,
      label: 'Alder Spring intake',
      heightSource: 'inclinometer',
    });
    const rad = Math.PI / 180;
    expect(s.points[1].chainageM).toBeCloseTo(30 * Math.cos(4.5 * rad), 12);
    expect(s.points[1].elevationM).toBeCloseTo(812.4 - 30 * Math.sin(4.5 * rad), 12);
    expect(s.points[3].label).toBe('Gully');
    expect(s.stats.totalSlopeLengthM).toBeCloseTo(30 + 30 + 25.5 + 30 + 28.2, 9);
  });

  it('inclinometer in percent grade (unit read from the header)', () => {
    const s = parseInclinometerCsv('to,slope_distance,grade_%\nA,10,100\n', { startElevationM: 0 });
    expect(s.points[1].elevationM).toBeCloseTo(10 / Math.SQRT2, 12);
  });

  it('level book: the published PNG Unitech example (Level Books & Arithmetic Checks) reduces to its levels, with closure', () => {
    const s = parseLevelBookCsv(fixture('level-book.csv'), {
      startElevationM: 40,
      method: 'height-of-collimation',
      closingElevationM: 42.88,
    });
    const published = [40.0, 44.323, 47.026, 53.123, 44.567, 42.849, 44.132, 42.883];
    s.points.forEach((p, i) => expect(p.elevationM).toBeCloseTo(published[i], 3));
    expect(s.points[3].label).toBe('D');
    expect(s.points[0].heightSource).toBe('level');
    expect(s.stats.closureErrorM).toBeCloseTo(0.003, 9);
    expect(s.warnings.find((w) => w.code === 'level-closure')?.message).toBe(
      'the run closes 3 mm above the known closing level',
    );
  });

  it('level book by rise and fall, hose level', () => {
    const s = parseLevelBookCsv(fixture('level-book.csv'), { startElevationM: 40, hoseLevel: true });
    expect(s.points[7].elevationM).toBeCloseTo(42.883, 9);
    expect(s.points[7].heightSource).toBe('hose-level');
  });
});
