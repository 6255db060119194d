import { describe, expect, it } from 'vitest';
import { geodesicInverse, locateOnRoute } from '../../../hydraulics/survey';

// Hand computation with the WGS84 radii of curvature (docs/references/core.md §6.1, §6.1a):
// a = 6 378 137 m, f = 1/298.257223563 (NGA TR8350.2); M = a(1−e²)/(1−e² sin²φ)^1.5, N = a/(1−e² sin²φ)^0.5.
const A = 6_378_137;
const F = 1 / 298.257223563;
const E2 = F * (2 - F);
const rad = (deg: number) => (deg * Math.PI) / 180;
const primeVertical = (latDeg: number) => A / Math.sqrt(1 - E2 * Math.sin(rad(latDeg)) ** 2);

describe('locateOnRoute', () => {
  // A route due north along longitude 2.9° W, pegged 0 m and 1000 m at its ends.
  const meridianRoute = [
    { chainageM: 0, latitudeDeg: 54.0, longitudeDeg: -2.9 },
    { chainageM: 1000, latitudeDeg: 54.01, longitudeDeg: -2.9 },
  ];

  it('a point beside the middle of a north-running route: half way, off the line by N·cos φ·Δλ', () => {
    const found = locateOnRoute(meridianRoute, { latitudeDeg: 54.005, longitudeDeg: -2.899 })!;
    // Half the latitude span: the meridian arc is M·Δφ and M barely changes over 0.01°, so 500 m to a few mm.
    expect(found.chainageM).toBeCloseTo(500, 1);
    const offsetByHand = primeVertical(54.005) * Math.cos(rad(54.005)) * rad(0.001); // ≈ 65.6 m
    expect(offsetByHand).toBeGreaterThan(65);
    expect(found.offsetM).toBeCloseTo(offsetByHand, 1);
    expect(found.stationIndex).toBe(0);
  });

  it('a point past the end is placed at the end, with its distance to that station', () => {
    const position = { latitudeDeg: 54.012, longitudeDeg: -2.9 };
    const found = locateOnRoute(meridianRoute, position)!;
    expect(found.chainageM).toBe(1000);
    const direct = geodesicInverse({
      latitude1Deg: 54.012,
      longitude1Deg: -2.9,
      latitude2Deg: 54.01,
      longitude2Deg: -2.9,
    }).distanceM;
    expect(found.offsetM).toBeCloseTo(direct, 3);
  });

  it('picks the nearest of several stretches and skips stations without a position', () => {
    const route = [
      { chainageM: 0, latitudeDeg: 54.0, longitudeDeg: -2.9 },
      { chainageM: 500, latitudeDeg: null, longitudeDeg: null },
      { chainageM: 1000, latitudeDeg: 54.01, longitudeDeg: -2.9 },
      { chainageM: 1700, latitudeDeg: 54.01, longitudeDeg: -2.89 },
    ];
    // Beside the second (east-running) stretch, a little south of it, 40 % of the way along.
    const found = locateOnRoute(route, { latitudeDeg: 54.0098, longitudeDeg: -2.896 })!;
    expect(found.stationIndex).toBe(2);
    expect(found.chainageM).toBeCloseTo(1000 + 0.4 * 700, 0);
    // 0.0002° of latitude is M·Δφ ≈ 22.3 m (M ≈ 6.385e6 m at 54°).
    expect(found.offsetM).toBeCloseTo(22.3, 0);
  });

  it('gives null for a route with no positions, and refuses a position off the globe', () => {
    expect(locateOnRoute([{ chainageM: 0 }, { chainageM: 10 }], { latitudeDeg: 54, longitudeDeg: -2 })).toBeNull();
    expect(() => locateOnRoute(meridianRoute, { latitudeDeg: 95, longitudeDeg: -2 })).toThrow(/latitude/);
  });
});
