import { describe, expect, it } from 'vitest';
import { ROUTE_PROFILE_POINTS, routeProfileSeries, thinRouteProfile } from '../../../lib/routes/profile-series';

/** A 100,000-point walk, 0.5 m apart, from a seed: a 60 m ridge and a 25 m sag under per-point height scatter. */
function walkedRoute(scatterM: number, seed = 11) {
  let s = seed >>> 0;
  const rand = () => (s = (Math.imul(s, 1664525) + 1013904223) >>> 0) / 2 ** 32;
  return Array.from({ length: 100_000 }, (_, i) => {
    const ground = 400 + 60 * Math.exp(-(((i - 30_000) / 6000) ** 2)) - 25 * Math.exp(-(((i - 70_000) / 4000) ** 2));
    return { chainageM: i * 0.5, elevationM: Math.round((ground + (rand() - 0.5) * 2 * scatterM) * 10) / 10 };
  });
}

describe('the route profile drawn with the one thinning', () => {
  it('keeps a walked GPS route near the drawing budget, its ends, a one-point spike and the real ridge and sag', () => {
    const points = walkedRoute(1.5);
    points[55_555] = { ...points[55_555], elevationM: 999 };
    const gps = points.map(() => ({ heightSource: 'gps' as const, confidenceM: null }));
    const thin = thinRouteProfile(points, gps);
    // Every local wiggle of the scatter would be about two thirds of the route; the budget plus the real turns is far
    // less.
    expect(thin.length).toBeLessThan(ROUTE_PROFILE_POINTS * 2);
    expect(thin[0]).toBe(points[0]);
    expect(thin[thin.length - 1]).toBe(points[points.length - 1]);
    expect(thin).toContain(points[55_555]);
    const highest = Math.max(...points.filter((_, i) => i !== 55_555).map((p) => p.elevationM));
    const lowestAfterRidge = Math.min(...points.slice(50_000).map((p) => p.elevationM));
    expect(thin.some((p) => p.elevationM === highest && p.chainageM < 20_000)).toBe(true);
    expect(thin.some((p) => p.elevationM === lowestAfterRidge)).toBe(true);
    for (let k = 1; k < thin.length; k++) expect(thin[k].chainageM).toBeGreaterThan(thin[k - 1].chainageM);
  });

  it('keeps every high and low of a levelled route, whose heights are worth a centimetre', () => {
    const points = Array.from({ length: 20_000 }, (_, i) => ({
      chainageM: i,
      elevationM: Math.round(100 * Math.sin(i / 700) + 5 * Math.sin(i / 37)),
    }));
    const level = points.map(() => ({ heightSource: 'level' as const, confidenceM: 0.01 }));
    const thin = new Set(thinRouteProfile(points, level));
    for (let i = 1; i < points.length - 1; i++) {
      const [a, b, c] = [points[i - 1].elevationM, points[i].elevationM, points[i + 1].elevationM];
      if ((b > a && b > c) || (b < a && b < c)) expect(thin.has(points[i])).toBe(true);
    }
  });

  it('draws the surveyed and the cleaned profile of the route page, leaving out unplaced and excluded points', () => {
    const p = (c: number | null, z: number, raw: number | null, excluded = false) => ({
      chainageM: c,
      elevationM: z,
      rawElevationM: raw,
      excluded,
      heightSource: 'level' as const,
      confidenceM: 0.01,
    });
    const { raw, cleaned } = routeProfileSeries([
      p(0, 10, 10.2),
      p(null, 11, 11),
      p(5, 12, null),
      p(10, 13, 14, true),
      p(15, 9, 9),
    ]);
    expect(raw).toEqual([
      { chainageM: 0, elevationM: 10.2 },
      { chainageM: 10, elevationM: 14 },
      { chainageM: 15, elevationM: 9 },
    ]);
    expect(cleaned).toEqual([
      { chainageM: 0, elevationM: 10 },
      { chainageM: 5, elevationM: 12 },
      { chainageM: 15, elevationM: 9 },
    ]);
  });
});
