import { describe, expect, it } from 'vitest';
import { chainageAlongTrack, slopeLengthOfProfile } from '../../../hydraulics/survey/chainage';
import { projectToLocalPlan, MEAN_EARTH_RADIUS_M } from '../../../hydraulics/survey/plan-projection';

describe('chainageAlongTrack', () => {
  it('keeps horizontal (ellipsoidal) and slope (3-D) chainage separately', () => {
    // Legs from core.md §6.3 [C]: 45°N Δlon 0.01° = 788.468 m; 45°N → 45.01°N = 1111.319 m.
    const t = chainageAlongTrack([
      { latitudeDeg: 45, longitudeDeg: 0, elevationM: 100 },
      { latitudeDeg: 45, longitudeDeg: 0.01, elevationM: 160 },
      { latitudeDeg: 45.01, longitudeDeg: 0.01, elevationM: 160 },
    ]);
    expect(t.legHorizontalM[0]).toBeCloseTo(788.468, 3);
    expect(t.horizontalChainageM[0]).toBe(0);
    expect(t.legSlopeM[0]).toBeCloseTo(Math.hypot(t.legHorizontalM[0], 60), 9);
    expect(t.legSlopeM[1]).toBeCloseTo(t.legHorizontalM[1], 9); // flat leg: no extra length
    expect(t.totalHorizontalM).toBeCloseTo(t.legHorizontalM[0] + t.legHorizontalM[1], 9);
    expect(t.totalSlopeM).toBeGreaterThan(t.totalHorizontalM);
    expect(t.slopeChainageM).toHaveLength(3);
  });

  it('a single point has zero length', () => {
    const t = chainageAlongTrack([{ latitudeDeg: 45, longitudeDeg: 0, elevationM: 1 }]);
    expect(t.totalHorizontalM).toBe(0);
    expect(t.totalSlopeM).toBe(0);
  });

  it('names the bad point', () => {
    expect(() =>
      chainageAlongTrack([
        { latitudeDeg: 45, longitudeDeg: 0, elevationM: 1 },
        { latitudeDeg: 91, longitudeDeg: 0, elevationM: 1 },
      ]),
    ).toThrow('points.latitudeDeg[1]: must be between -90 and 90 degrees, got 91');
  });

  it('slopeLengthOfProfile adds √(Δchainage² + Δz²) per leg (3-4-5 triangles)', () => {
    expect(
      slopeLengthOfProfile([
        { chainageM: 0, elevationM: 0 },
        { chainageM: 3, elevationM: 4 },
        { chainageM: 6, elevationM: 0 },
      ]),
    ).toBe(10);
  });
});

describe('projectToLocalPlan (equirectangular about the route centre)', () => {
  it('0.01° of latitude is R₁·0.01·π/180 = 1111.951 m north (core.md §6.3 haversine column [C])', () => {
    const plan = projectToLocalPlan([
      { latitudeDeg: 45, longitudeDeg: 0 },
      { latitudeDeg: 45.01, longitudeDeg: 0 },
    ]);
    expect(plan.points[1].northM - plan.points[0].northM).toBeCloseTo(1111.951, 3);
    expect(MEAN_EARTH_RADIUS_M).toBe(6_371_008.8);
  });

  it('the centre maps to (0,0) and short legs agree with the ellipsoid within 0.5 %', () => {
    const pts = [
      { latitudeDeg: 45.5012, longitudeDeg: 11.8024 },
      { latitudeDeg: 45.4999, longitudeDeg: 11.8039 },
    ];
    const plan = projectToLocalPlan(pts);
    expect(plan.originLatitudeDeg).toBeCloseTo(45.50055, 9);
    expect(plan.points[0].eastM).toBeCloseTo(-plan.points[1].eastM, 9);
    const planLen = Math.hypot(
      plan.points[1].eastM - plan.points[0].eastM,
      plan.points[1].northM - plan.points[0].northM,
    );
    const geo = chainageAlongTrack(pts.map((p) => ({ ...p, elevationM: 0 }))).totalHorizontalM;
    expect(Math.abs(planLen / geo - 1)).toBeLessThan(0.005);
  });
});
