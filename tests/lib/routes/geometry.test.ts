import { describe, expect, it } from 'vitest';
import { Geodesic } from 'geographiclib-geodesic';
import { computeRouteGeometry, type GeometryInput } from '../../../lib/routes/geometry';
import { RouteEditError } from '../../../lib/routes/errors';

const station = (c: number | null, z: number, excluded = false): GeometryInput => ({
  latitude: null,
  longitude: null,
  chainageM: c,
  elevationM: z,
  excluded,
});
const placed = (lat: number, lon: number, z: number, excluded = false): GeometryInput => ({
  latitude: lat,
  longitude: lon,
  chainageM: null,
  elevationM: z,
  excluded,
});

describe('computeRouteGeometry', () => {
  it('station profiles keep their chainage; slope length is the sum of √(run² + rise²)', () => {
    const g = computeRouteGeometry([station(0, 100), station(30, 96), station(70, 99)]);
    expect(g.positioned).toBe(false);
    expect(g.points.map((p) => p.chainageM)).toEqual([0, 30, 70]);
    expect(g.lengthM).toBe(70);
    // 3-4-5 and 40-3 legs: 30.2655 + 40.1123
    expect(g.slopeLengthM).toBeCloseTo(Math.hypot(30, 4) + Math.hypot(40, 3), 12);
  });

  // Checked against the reference library itself (C.F.F. Karney, GeographicLib, geographiclib-geodesic 2.2.0 [R27]).
  it('positioned routes are measured on the WGS84 ellipsoid, whatever chainage was typed', () => {
    const pts = [placed(54.2, -2.9, 300), { ...placed(54.201, -2.9, 290), chainageM: 5 }, placed(54.201, -2.898, 280)];
    const g = computeRouteGeometry(pts);
    const leg1 = Geodesic.WGS84.Inverse(54.2, -2.9, 54.201, -2.9).s12 as number;
    const leg2 = Geodesic.WGS84.Inverse(54.201, -2.9, 54.201, -2.898).s12 as number;
    expect(g.positioned).toBe(true);
    expect(g.points[1].chainageM).toBeCloseTo(leg1, 9);
    expect(g.lengthM).toBeCloseTo(leg1 + leg2, 9);
  });

  it('excluded points are skipped in length and sit at the chainage of the kept point before them', () => {
    const g = computeRouteGeometry([placed(54.2, -2.9, 300), placed(54.3, -2.9, 500, true), placed(54.201, -2.9, 290)]);
    const leg = Geodesic.WGS84.Inverse(54.2, -2.9, 54.201, -2.9).s12 as number;
    expect(g.lengthM).toBeCloseTo(leg, 9);
    expect(g.points[1].chainageM).toBe(0);
    expect(g.points[2].chainageM).toBeCloseTo(leg, 9);
  });

  it('refuses chainage going backwards or missing, naming the point', () => {
    expect(() => computeRouteGeometry([station(0, 1), station(50, 2), station(40, 3)])).toThrow(
      'point 3: chainage 40.00 m is less than 50.00 m at point 2; points must run in order along the route',
    );
    expect(() => computeRouteGeometry([station(0, 1), station(null, 2)])).toThrow(RouteEditError);
    // An excluded point out of order does not block the save.
    expect(computeRouteGeometry([station(0, 1), station(40, 3, true), station(30, 2)]).lengthM).toBe(30);
  });

  it('does not change its input', () => {
    const input = [station(0, 1), station(10, 2)];
    const copy = structuredClone(input);
    computeRouteGeometry(input);
    expect(input).toEqual(copy);
  });
});
