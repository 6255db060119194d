import { describe, expect, it } from 'vitest';
import {
  geodesicDirect,
  geodesicDistanceM,
  geodesicInverse,
  geodesicInterpolate,
} from '../../../hydraulics/survey/geodesic';
import { HydraulicsInputError } from '../../../hydraulics/errors';

// Source for every [P] value below: core.md §6.2, [R27] C.F.F. Karney, GeographicLib
// documentation examples (JS geographiclib-geodesic README, Python/Ruby docs), values repeated in
// unit tests of independent ports (SwiftyGeographicLib, pygeodesy). The library is exact to
// round-off, so published digits are compared to within the last digit shown.
describe('geodesicInverse on WGS84', () => {
  it('JFK → LHR: s12 = 5 551 759.400318679 m, azimuths and arc as published [P][R27]', () => {
    const r = geodesicInverse({ latitude1Deg: 40.6, longitude1Deg: -73.8, latitude2Deg: 51.6, longitude2Deg: -0.5 });
    expect(Math.abs(r.distanceM - 5_551_759.400318679)).toBeLessThan(1e-6);
    expect(r.azimuth1Deg).toBeCloseTo(51.19888284557982, 12);
    expect(r.azimuth2Deg).toBeCloseTo(107.82177673551425, 12);
    expect(r.arcDeg).toBeCloseTo(49.94131021789904, 12);
  });

  it('equator antipodal (0,0) → (0,180) = 20 003 931.458625447 m [P][R27]', () => {
    const r = geodesicInverse({ latitude1Deg: 0, longitude1Deg: 0, latitude2Deg: 0, longitude2Deg: 180 });
    expect(Math.abs(r.distanceM - 20_003_931.458625447)).toBeLessThan(1e-6);
  });

  it('Wellington → Salamanca prints 19959679.267 m (geographiclib-geodesic README example) [P][R27]', () => {
    const r = geodesicInverse({
      latitude1Deg: -41.32,
      longitude1Deg: 174.81,
      latitude2Deg: 40.96,
      longitude2Deg: -5.5,
    });
    expect(r.distanceM.toFixed(3)).toBe('19959679.267');
  });

  it.each([
    // core.md §6.3 [C]: ellipsoid (Vincenty) column, computed values, compared to 1 mm.
    ['45°N, Δlon 0.01°', 45, 0, 45, 0.01, 788.468],
    ['45°N → 45.01°N', 45, 0, 45.01, 0, 1111.319],
    ['equator, Δlon 0.01°', 0, 0, 0, 0.01, 1113.195],
    ['(−1.0, 36.0) → (−1.009, 36.009)', -1, 36, -1.009, 36.009, 1412.025],
  ])('short leg %s matches the core.md §6.3 ellipsoidal value [C]', (_name, la1, lo1, la2, lo2, expected) => {
    const r = geodesicInverse({ latitude1Deg: la1, longitude1Deg: lo1, latitude2Deg: la2, longitude2Deg: lo2 });
    expect(Math.abs(r.distanceM - expected)).toBeLessThan(0.0006);
  });

  it('is symmetric: A→B and B→A have the same length', () => {
    const ab = geodesicInverse({ latitude1Deg: 45.5, longitude1Deg: 11.8, latitude2Deg: 45.49, longitude2Deg: 11.81 });
    const ba = geodesicInverse({ latitude1Deg: 45.49, longitude1Deg: 11.81, latitude2Deg: 45.5, longitude2Deg: 11.8 });
    expect(ab.distanceM).toBeCloseTo(ba.distanceM, 9);
  });

  it('rejects latitude 91 and longitude 181 with the field named', () => {
    expect(() => geodesicInverse({ latitude1Deg: 91, longitude1Deg: 0, latitude2Deg: 0, longitude2Deg: 0 })).toThrow(
      /latitude1Deg: must be between -90 and 90 degrees/,
    );
    expect(() => geodesicInverse({ latitude1Deg: 0, longitude1Deg: 0, latitude2Deg: 0, longitude2Deg: 181 })).toThrow(
      HydraulicsInputError,
    );
    expect(() =>
      geodesicInverse({ latitude1Deg: Number.NaN, longitude1Deg: 0, latitude2Deg: 0, longitude2Deg: 0 }),
    ).toThrow(/finite number/);
  });
});

describe('geodesicDirect on WGS84', () => {
  it('20 000 km SW of Perth → (32.11195529, −63.95925278) (README example, 8 decimals) [P][R27]', () => {
    const r = geodesicDirect({ latitudeDeg: -32.06, longitudeDeg: 115.74, azimuthDeg: 225, distanceM: 20_000e3 });
    expect(r.latitudeDeg.toFixed(8)).toBe('32.11195529');
    expect(r.longitudeDeg.toFixed(8)).toBe('-63.95925278');
  });

  it('from JFK, azimuth 45°, 10 000 km (GeographicLib-based Swift port test) [P][R27]', () => {
    const r = geodesicDirect({ latitudeDeg: 40.6, longitudeDeg: -73.8, azimuthDeg: 45, distanceM: 10_000e3 });
    expect(r.latitudeDeg).toBeCloseTo(32.642844327605523, 12);
    expect(r.longitudeDeg).toBeCloseTo(49.011039583224175, 12);
    expect(r.azimuthDeg).toBeCloseTo(140.366230465350952, 12);
    expect(r.arcDeg).toBeCloseTo(89.958719298608429, 12);
  });

  it('from JFK, azimuth 51°, 5 500 km → (51.884565, −1.141173), azi2 107.189397 (pygeodesy example, 6 decimals) [P][R27]', () => {
    const r = geodesicDirect({ latitudeDeg: 40.6, longitudeDeg: -73.8, azimuthDeg: 51, distanceM: 5_500e3 });
    expect(r.latitudeDeg.toFixed(6)).toBe('51.884565');
    expect(r.longitudeDeg.toFixed(6)).toBe('-1.141173');
    expect(r.azimuthDeg.toFixed(6)).toBe('107.189397');
  });

  it('direct undoes inverse (round trip to 1 µm)', () => {
    const inv = geodesicInverse({ latitude1Deg: 40.6, longitude1Deg: -73.8, latitude2Deg: 51.6, longitude2Deg: -0.5 });
    const dir = geodesicDirect({
      latitudeDeg: 40.6,
      longitudeDeg: -73.8,
      azimuthDeg: inv.azimuth1Deg,
      distanceM: inv.distanceM,
    });
    expect(dir.latitudeDeg).toBeCloseTo(51.6, 10);
    expect(dir.longitudeDeg).toBeCloseTo(-0.5, 10);
  });
});

describe('geodesicInterpolate', () => {
  it('the midpoint is half the distance from each end', () => {
    const a = { latitude1Deg: 45.5, longitude1Deg: 11.8, latitude2Deg: 45.49, longitude2Deg: 11.82 };
    const m = geodesicInterpolate({ ...a, fraction: 0.5 });
    const total = geodesicInverse(a).distanceM;
    const first = geodesicInverse({
      latitude1Deg: 45.5,
      longitude1Deg: 11.8,
      latitude2Deg: m.latitudeDeg,
      longitude2Deg: m.longitudeDeg,
    }).distanceM;
    expect(first).toBeCloseTo(total / 2, 6);
  });
});

describe('geodesicDistanceM (the distance alone, for whole tracks)', () => {
  it('JFK → LHR: s12 = 5 551 759.400318679 m as published [P][R27]', () => {
    expect(Math.abs(geodesicDistanceM(40.6, -73.8, 51.6, -0.5) - 5_551_759.400318679)).toBeLessThan(1e-6);
  });
  it('equals geodesicInverse to the last bit on short walked legs, long legs and near-antipodal pairs', () => {
    const pairs: [number, number, number, number][] = [
      [54.2, -2.9, 54.200027, -2.899994],
      [-33.9, 151.2, -33.899981, 151.200013],
      [0, 0, 0.5, 179.5],
      [10, 20, 10, 20],
      [89.9, 0, -89.9, 180],
    ];
    for (const [a, b, c, d] of pairs) {
      const full = geodesicInverse({ latitude1Deg: a, longitude1Deg: b, latitude2Deg: c, longitude2Deg: d }).distanceM;
      expect(geodesicDistanceM(a, b, c, d)).toBe(full);
    }
  });
});
