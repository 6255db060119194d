import { describe, expect, it } from 'vitest';
import { analyzeProfile, type LineInput } from '../../../hydraulics/index';
import { darcyFrictionFactor } from '../../../hydraulics/friction/darcy-weisbach';
import { hazenWilliamsHeadLoss } from '../../../hydraulics/friction/hazen-williams';
import { waterKinematicViscosityM2s } from '../../../hydraulics/water';
import { DEFAULT_LINE_SETTINGS } from '../../../hydraulics/profile/settings';
import { simpleLine, testPipe } from './fixtures';

/**
 * Velocity head, entrance and exit losses at the ends of a line, and the default friction formula,
 * against published worked examples (docs/references/profile-and-checks.md §5, [R40]).
 */
const relative = (actual: number, expected: number) => Math.abs(actual - expected) / expected;
const NU_20C = waterKinematicViscosityM2s(20);

/** Roughness that makes Colebrook give friction factor f at Reynolds number re in bore d (Colebrook solved for ε). */
function roughnessFor(f: number, re: number, d: number): number {
  return 3.7 * d * (10 ** (-1 / (2 * Math.sqrt(f))) - 2.51 / (re * Math.sqrt(f)));
}

describe('a free jet at the end of a pipe from a reservoir (Katz, Automotive Aerodynamics, Example 9.8, pp. 382-383 [R40])', () => {
  // Published: 22 m above the outlet, L = 202 m, D = 0.3 m, f = 0.015, two local losses K = 0.3 each → 6.07 m/s, 0.429
  // m³/s.
  const d = 0.3;
  const published = { velocityMs: 6.07, flowM3s: 0.429, lossesM: 20.12, jetHeadM: 1.88 };
  const roughnessM = roughnessFor(0.015, (published.velocityMs * d) / NU_20C, d);
  // Pipe from 20 m (2 m under the water at 22 m) falling to the outlet at 0 m over a 202 m slope length.
  const horizontalM = Math.sqrt(202 ** 2 - 20 ** 2);
  const line: LineInput = {
    ...simpleLine(
      [
        [0, 20],
        [horizontalM / 2, 10],
        [horizontalM, 0],
      ],
      22,
      0,
      testPipe({ insideDiameterM: d, outsideDiameterM: 0.33, wallM: 0.015, roughnessM }),
    ),
    flow: { kind: 'find' },
    // The two K = 0.3 losses: one at the entrance, one fitting part-way down.
    fittings: [{ chainageM: horizontalM / 2, k: 0.3, label: 'bend' }],
    settings: { entranceLossK: 0.3 },
  };

  it("the roughness chosen gives the example's f = 0.015 at its Reynolds number", () => {
    expect(
      darcyFrictionFactor({ reynolds: (published.velocityMs * d) / NU_20C, relativeRoughness: roughnessM / d }),
    ).toBeCloseTo(0.015, 6);
  });

  it('finds the published jet velocity and flow (±1 %): the jet keeps its velocity head', () => {
    const profile = analyzeProfile(line);
    const velocity = profile.flowM3s / ((Math.PI * d * d) / 4);
    expect(relative(velocity, published.velocityMs)).toBeLessThan(0.01);
    expect(relative(profile.flowM3s, published.flowM3s)).toBeLessThan(0.01);
    // Friction and fittings use all but the jet's velocity head (published 20.12 m and 1.88 m; g = 9.8 there).
    const jetHeadM = velocity ** 2 / (2 * 9.80665);
    expect(relative(jetHeadM, published.jetHeadM)).toBeLessThan(0.02);
    expect(
      relative(profile.totals.frictionLossM + profile.totals.minorLossM - jetHeadM, published.lossesM),
    ).toBeLessThan(0.01);
    // The grade at the outlet is the outlet itself: zero pressure in the free jet.
    expect(profile.end.residualHeadM).toBeCloseTo(0, 6);
  });

  it('without the velocity head and entrance loss the flow would come out about 5 % high (the defect this fixes)', () => {
    const withoutEnds = Math.sqrt((1 + 0.3 + 0.3 + (0.015 * 202) / 0.3) / (0.3 + (0.015 * 202) / 0.3));
    expect(withoutEnds).toBeGreaterThan(1.04);
    const profile = analyzeProfile(line);
    const velocity = profile.flowM3s / ((Math.PI * d * d) / 4);
    expect(relative(velocity, published.velocityMs * withoutEnds)).toBeGreaterThan(0.03);
  });
});

describe('flow between two reservoirs (Katz, Example 9.13 inputs, p. 388 [R40]; result computed, §5.2)', () => {
  // 5 m between the water levels, L = 300 m, D = 0.1 m, f = 0.02, entrance 0.5, valve 0.2, exit 1.0.
  const d = 0.1;
  const expectedVelocityMs = Math.sqrt((2 * 9.80665 * 5) / ((0.02 * 300) / d + 0.5 + 0.2 + 1.0));
  const roughnessM = roughnessFor(0.02, (expectedVelocityMs * d) / NU_20C, d);
  const line: LineInput = {
    ...simpleLine(
      [
        [0, -2],
        [150, -2],
        [300, -2],
      ],
      5,
      0,
      testPipe({ insideDiameterM: d, roughnessM }),
    ),
    end: { kind: 'tank-inlet', elevationM: 0 },
    flow: { kind: 'find' },
    fittings: [{ chainageM: 150, k: 0.2, label: 'valve' }],
  };

  it('hand result: v = 1.2607 m/s, Q = 9.902 L/s', () => {
    expect(expectedVelocityMs).toBeCloseTo(1.2607, 4);
    expect(((expectedVelocityMs * Math.PI * d * d) / 4) * 1000).toBeCloseTo(9.902, 3);
  });

  it('the line finds the same flow (±0.5 %) with the default sharp entrance (K = 0.5) and the exit velocity head', () => {
    const profile = analyzeProfile(line);
    expect(profile.settings.entranceLossK).toBe(0.5);
    const velocity = profile.flowM3s / ((Math.PI * d * d) / 4);
    expect(relative(velocity, expectedVelocityMs)).toBeLessThan(0.005);
    // The grade arrives at the lower water level: nothing left over, nothing missing.
    expect(profile.end.hydraulicGradeM).toBeCloseTo(0, 3);
    // Just inside the entrance the grade is (1 + 0.5)·v²/2g below the upper water level.
    expect(5 - profile.points.hydraulicGradeM[0]).toBeCloseTo((1.5 * velocity ** 2) / (2 * 9.80665), 6);
  });

  it('a break-pressure tank part-way takes the velocity head and entrance again on its outlet side', () => {
    const withTank = analyzeProfile({
      ...line,
      flow: { kind: 'design', flowM3s: 0.005 },
      devices: [{ kind: 'break-pressure-tank', chainageM: 150, waterLevelM: 3 }],
    });
    const v = 0.005 / ((Math.PI * d * d) / 4);
    const tankPoint = Array.from(withTank.points.chainageM).indexOf(150);
    // Below the tank: its level, less the valve's K = 0.2, the velocity head and the entrance, all at v.
    expect(3 - withTank.points.hydraulicGradeM[tankPoint]).toBeCloseTo(((0.2 + 1.5) * v ** 2) / (2 * 9.80665), 6);
  });
});

describe('the default friction formula (§5.1)', () => {
  it('is Darcy-Weisbach with Colebrook, and every profile says which formula it used', () => {
    expect(DEFAULT_LINE_SETTINGS.frictionMethod).toBe('darcy-weisbach');
    const profile = analyzeProfile(
      simpleLine(
        [
          [0, 10],
          [100, 0],
        ],
        12,
        0.001,
      ),
    );
    expect(profile.settings.frictionMethod).toBe('darcy-weisbach');
    expect(
      analyzeProfile({
        ...simpleLine(
          [
            [0, 10],
            [100, 0],
          ],
          12,
          0.001,
        ),
        settings: { frictionMethod: 'hazen-williams' },
      }).settings.frictionMethod,
    ).toBe('hazen-williams');
  });

  it('Hazen-Williams with C = 150 gives less loss than a smooth pipe in small bores: 25 mm at 1 m/s 0.0471 against 0.0500 m/m, 15 mm at 0.5 m/s 0.0237 against 0.0284 (§5.1)', () => {
    for (const [d, v, hw, smooth] of [
      [0.025, 1, 0.0471, 0.05],
      [0.015, 0.5, 0.0237, 0.0284],
    ]) {
      const q = (v * Math.PI * d * d) / 4;
      const hwLoss = hazenWilliamsHeadLoss({ flowM3s: q, lengthM: 1, diameterM: d, c: 150 });
      const f = darcyFrictionFactor({ reynolds: (v * d) / NU_20C, relativeRoughness: 0 });
      const smoothLoss = (f * v * v) / (2 * 9.80665 * d);
      expect(hwLoss).toBeCloseTo(hw, 4);
      expect(smoothLoss).toBeCloseTo(smooth, 3);
      expect(hwLoss).toBeLessThan(smoothLoss);
    }
  });
});
