import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { reverseRoute } from '../../../hydraulics/survey/route/reverse';
import { splitRoute } from '../../../hydraulics/survey/route/split';
import { joinRoutes } from '../../../hydraulics/survey/route/join';
import { trimRoute } from '../../../hydraulics/survey/route/trim';
import { elevationAtChainage } from '../../../hydraulics/survey/route/interpolate';
import { geodesicInverse } from '../../../hydraulics/survey/geodesic';
import type { RouteStation } from '../../../hydraulics/survey/types';

const route: RouteStation[] = [
  { chainageM: 0, elevationM: 812.4, label: 'intake' },
  { chainageM: 25, elevationM: 809.9 },
  { chainageM: 50, elevationM: 806.1 },
  { chainageM: 80, elevationM: 803.8, label: 'pump' },
  { chainageM: 120, elevationM: 799.5, label: 'tank' },
];

describe('reverseRoute', () => {
  it('reverses order and mirrors chainage in the same range', () => {
    const r = reverseRoute(route);
    expect(r.map((p) => p.chainageM)).toEqual([0, 40, 70, 95, 120]);
    expect(r.map((p) => p.elevationM)).toEqual([799.5, 803.8, 806.1, 809.9, 812.4]);
    expect(r[0].label).toBe('tank');
  });
});

describe('splitRoute', () => {
  it('splits at an existing station without interpolating', () => {
    const s = splitRoute(route, { chainageM: 80 });
    expect(s.splitStationInterpolated).toBe(false);
    expect(s.first.map((p) => p.chainageM)).toEqual([0, 25, 50, 80]);
    expect(s.second.map((p) => p.chainageM)).toEqual([0, 40]);
    expect(s.second[0].label).toBe('pump');
  });
  it('interpolates the height at a chainage between stations', () => {
    const s = splitRoute(route, { chainageM: 100 });
    expect(s.splitStationInterpolated).toBe(true);
    expect(s.splitElevationM).toBeCloseTo(803.8 + (799.5 - 803.8) * 0.5, 12);
    expect(s.first[s.first.length - 1]).toEqual({ chainageM: 100, elevationM: s.splitElevationM });
  });
  it('interpolates the position along the geodesic when stations are placed', () => {
    const placed: RouteStation[] = [
      { chainageM: 0, elevationM: 10, latitudeDeg: 45.5, longitudeDeg: 11.8 },
      { chainageM: 0, elevationM: 0, latitudeDeg: 45.49, longitudeDeg: 11.81 },
    ];
    placed[1].chainageM = geodesicInverse({
      latitude1Deg: 45.5,
      longitude1Deg: 11.8,
      latitude2Deg: 45.49,
      longitude2Deg: 11.81,
    }).distanceM;
    const s = splitRoute(placed, { chainageM: placed[1].chainageM / 4 });
    const mid = s.first[1];
    const d = geodesicInverse({
      latitude1Deg: 45.5,
      longitude1Deg: 11.8,
      latitude2Deg: mid.latitudeDeg as number,
      longitude2Deg: mid.longitudeDeg as number,
    });
    expect(d.distanceM).toBeCloseTo(placed[1].chainageM / 4, 6);
    expect(mid.elevationM).toBeCloseTo(7.5, 12);
  });
  it('refuses a split at or beyond the ends', () => {
    expect(() => splitRoute(route, { chainageM: 0 })).toThrow(
      'chainageM: the split must fall inside the route (0 m to 120 m), got 0 m',
    );
    expect(() => splitRoute(route, { chainageM: 130 })).toThrow(/must fall inside/);
  });
});

describe('joinRoutes', () => {
  it('joins end to start, merging the shared station and reporting a height step', () => {
    const a = route.slice(0, 4);
    const b: RouteStation[] = [
      { chainageM: 0, elevationM: 804.0 },
      { chainageM: 40, elevationM: 830.0, label: 'tank' },
    ];
    const j = joinRoutes(a, b);
    expect(j.stations.map((p) => p.chainageM)).toEqual([0, 25, 50, 80, 120]);
    expect(j.heightStepM).toBeCloseTo(0.2, 12);
    expect(j.junctionIndex).toBe(3);
  });
  it('bridges a gap given by the user', () => {
    const j = joinRoutes(
      route.slice(0, 2),
      [
        { chainageM: 0, elevationM: 1 },
        { chainageM: 10, elevationM: 2 },
      ],
      { gapM: 5 },
    );
    expect(j.stations.map((p) => p.chainageM)).toEqual([0, 25, 30, 40]);
    expect(j.junctionIndex).toBe(2);
  });
});

describe('trimRoute', () => {
  it('keeps the part between two chainages with interpolated ends, rebased to 0', () => {
    const t = trimRoute(route, { fromChainageM: 10, toChainageM: 100 });
    expect(t.map((p) => p.chainageM)).toEqual([0, 15, 40, 70, 90]);
    expect(t[0].elevationM).toBeCloseTo(812.4 + (809.9 - 812.4) * 0.4, 12);
    expect(trimRoute(route, { fromChainageM: 25, toChainageM: 80, rebase: false }).map((p) => p.chainageM)).toEqual([
      25, 50, 80,
    ]);
  });
  it('rejects an empty or outside range', () => {
    expect(() => trimRoute(route, { fromChainageM: 50, toChainageM: 50 })).toThrow(/0 ≤ from < to ≤ 120 m/);
  });
});

describe('properties (fast-check)', () => {
  const routes = fc
    .array(
      fc.record({
        run: fc.double({ min: 0.5, max: 200, noNaN: true }),
        z: fc.double({ min: -100, max: 3000, noNaN: true }),
      }),
      { minLength: 2, maxLength: 40 },
    )
    .map((legs) => {
      let c = 0;
      return legs.map((l, i) => {
        if (i > 0) c += l.run;
        return { chainageM: c, elevationM: l.z };
      });
    });

  it('reversing twice is the identity (to 1e-9 m)', () => {
    fc.assert(
      fc.property(routes, (r) => {
        const rr = reverseRoute(reverseRoute(r));
        rr.forEach((p, i) => {
          expect(p.chainageM).toBeCloseTo(r[i].chainageM, 9);
          expect(p.elevationM).toBe(r[i].elevationM);
        });
      }),
    );
  });

  it('split at a station then join gives the original (to 1e-9 m)', () => {
    fc.assert(
      fc.property(
        routes.filter((r) => r.length >= 3),
        fc.nat(),
        (r, k) => {
          const at = 1 + (k % (r.length - 2));
          const s = splitRoute(r, { chainageM: r[at].chainageM });
          const j = joinRoutes(s.first, s.second).stations;
          expect(j).toHaveLength(r.length);
          j.forEach((p, i) => {
            expect(p.chainageM).toBeCloseTo(r[i].chainageM, 9);
            expect(p.elevationM).toBe(r[i].elevationM);
          });
        },
      ),
    );
  });

  it('split between stations then join gives the original profile plus one station on its grade', () => {
    fc.assert(
      fc.property(routes, fc.double({ min: 0.01, max: 0.99, noNaN: true }), (r, f) => {
        const c = r[0].chainageM + f * (r[r.length - 1].chainageM - r[0].chainageM);
        fc.pre(!r.some((p) => p.chainageM === c));
        const j = joinRoutes(splitRoute(r, { chainageM: c }).first, splitRoute(r, { chainageM: c }).second).stations;
        expect(j).toHaveLength(r.length + 1);
        const extra = j.find((p) => Math.abs(p.chainageM - c) < 1e-9);
        expect(extra?.elevationM).toBeCloseTo(elevationAtChainage(r, c), 6);
        const rest = j.filter((p) => p !== extra);
        rest.forEach((p, i) => expect(p.chainageM).toBeCloseTo(r[i].chainageM, 6));
      }),
    );
  });

  it('route edits never mutate their inputs', () => {
    fc.assert(
      fc.property(routes, (r) => {
        const copy = structuredClone(r);
        reverseRoute(r);
        if (r[r.length - 1].chainageM > r[0].chainageM)
          trimRoute(r, { fromChainageM: r[0].chainageM, toChainageM: r[r.length - 1].chainageM });
        joinRoutes(r, r);
        expect(r).toEqual(copy);
      }),
    );
  });
});
