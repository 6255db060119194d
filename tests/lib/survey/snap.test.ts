import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { snapToRoute } from '@/lib/survey/snap';
import { projectToLocalPlan } from '@/hydraulics/survey/plan-projection';

type RoutePoint = { lat: number; lon: number; chainageM: number };

/** The definition: every leg for every target, nearest wins. */
function snapByEveryLeg(route: readonly RoutePoint[], targets: readonly { lat: number; lon: number }[]) {
  const plan = projectToLocalPlan(
    [...route, ...targets].map((p) => ({ latitudeDeg: p.lat, longitudeDeg: p.lon })),
  ).points;
  const xy = plan.slice(0, route.length);
  return plan.slice(route.length).map((t) => {
    let best = { chainageM: route[0].chainageM, offsetM: Math.hypot(t.eastM - xy[0].eastM, t.northM - xy[0].northM) };
    for (let i = 1; i < route.length; i += 1) {
      const a = xy[i - 1];
      const b = xy[i];
      const dx = b.eastM - a.eastM;
      const dy = b.northM - a.northM;
      const len2 = dx * dx + dy * dy;
      const u =
        len2 === 0 ? 0 : Math.max(0, Math.min(1, ((t.eastM - a.eastM) * dx + (t.northM - a.northM) * dy) / len2));
      const offsetM = Math.hypot(t.eastM - (a.eastM + u * dx), t.northM - (a.northM + u * dy));
      if (offsetM < best.offsetM)
        best = { chainageM: route[i - 1].chainageM + u * (route[i].chainageM - route[i - 1].chainageM), offsetM };
    }
    return best;
  });
}

/** A walked track with metre-level scatter: about 1 m steps wandering north-east, jittered. */
function walkedTrack(n: number, seed: number): RoutePoint[] {
  let s = seed;
  const rand = () => (s = (s * 1103515245 + 12345) % 2147483648) / 2147483648;
  const points: RoutePoint[] = [];
  let lat = 54.2;
  let lon = -2.9;
  for (let i = 0; i < n; i += 1) {
    lat += (0.6 + rand()) * 9e-6 + (rand() - 0.5) * 1e-5;
    lon += (rand() - 0.3) * 1.5e-5;
    points.push({ lat, lon, chainageM: i });
  }
  return points;
}

describe('snapToRoute', () => {
  it('matches the every-leg definition on random routes and waypoints', () => {
    const coordinate = fc.record({
      lat: fc.double({ min: 54.2, max: 54.21, noNaN: true }),
      lon: fc.double({ min: -2.91, max: -2.9, noNaN: true }),
    });
    fc.assert(
      fc.property(
        fc.array(coordinate, { minLength: 1, maxLength: 40 }),
        fc.array(coordinate, { minLength: 1, maxLength: 10 }),
        (raw, targets) => {
          const route = raw.map((p, i) => ({ ...p, chainageM: i * 10 }));
          const got = snapToRoute(route, targets);
          const want = snapByEveryLeg(route, targets);
          got.forEach((g, i) => {
            expect(g.offsetM).toBeCloseTo(want[i].offsetM, 6);
            expect(g.chainageM).toBeCloseTo(want[i].chainageM, 6);
          });
        },
      ),
      { numRuns: 200 },
    );
  });

  it('matches the definition on a walked track with scatter, including waypoints far off the line', () => {
    const route = walkedTrack(3000, 7);
    const targets = [route[10], route[1500], route[2999], { lat: 54.3, lon: -2.8 }, { lat: 54.1, lon: -3.0 }].map(
      (p) => ({ lat: p.lat + 2e-5, lon: p.lon - 1e-5 }),
    );
    const got = snapToRoute(route, targets);
    const want = snapByEveryLeg(route, targets);
    got.forEach((g, i) => {
      expect(g.offsetM).toBeCloseTo(want[i].offsetM, 6);
      expect(g.chainageM).toBeCloseTo(want[i].chainageM, 6);
    });
  });

  it('snaps 20 000 waypoints to a 100 000-point track in about a second, not minutes', () => {
    // Before: waypoints × track legs, 2 × 10⁹ leg checks for this case.
    const route = walkedTrack(100_000, 3);
    const targets = walkedTrack(20_000, 11);
    const start = performance.now();
    expect(snapToRoute(route, targets)).toHaveLength(20_000);
    expect(performance.now() - start).toBeLessThan(5000);
  });
});
