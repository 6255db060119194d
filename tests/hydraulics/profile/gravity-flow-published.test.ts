import { describe, expect, it } from 'vitest';
import { analyzeProfile } from '../../../hydraulics/index';
import { simpleLine, testPipe } from './fixtures';

/**
 * The gravity flow the core finds between two fixed water levels ("find"), checked against the
 * flow forms of the formulas solved by hand, outside the core (core.md §8.4).
 */
const relative = (actual: number, expected: number) => Math.abs(actual - expected) / expected;
const G = 9.80665;

function findFlow(lengthM: number, diameterM: number, fallM: number, settings: Record<string, unknown> = {}) {
  const base = simpleLine(
    [
      [0, 100],
      [lengthM / 2, 100],
      [lengthM, 100],
    ],
    100 + fallM,
    0,
    testPipe({ insideDiameterM: diameterM, outsideDiameterM: diameterM * 1.1, wallM: diameterM * 0.05 }),
  );
  // These checks are of the friction formulas: Hazen-Williams unless the test asks otherwise, no entrance loss K
  // (the velocity head itself, 1 × v²/2g, stays: under 0.3 % of these falls; line-ends-published.test.ts checks it).
  return analyzeProfile({
    ...base,
    end: { kind: 'tank-inlet', elevationM: 100 },
    flow: { kind: 'find' },
    settings: { frictionMethod: 'hazen-williams', entranceLossK: 0, ...settings },
  }).flowM3s;
}

describe('gravity flow between two levels against published flow formulas', () => {
  it('Hazen-Williams flow form Q = 0.2784·C·D^2.63·S^0.54 (Fair, Geyer & Okun Eq. 5.34 [R5] in SI): 1 km of 100 mm, C 150, 14.629 m fall → 10.00 L/s (±1 %)', () => {
    const hand = 0.2784 * 150 * 0.1 ** 2.63 * (14.629 / 1000) ** 0.54;
    expect(hand * 1000).toBeCloseTo(10.0, 1);
    expect(relative(findFlow(1000, 0.1, 14.629), hand)).toBeLessThan(0.01);
  });

  it('US exercise (700 gpm, 8,500 ft of 8-in PVC, C 150 loses 61.5 ft, hydrauliclearning [R19] via core.md §1.2 #5): a 61.5 ft fall carries about 700 gpm (±1 %)', () => {
    const gpm = (findFlow(8500 * 0.3048, 8 * 0.0254, 61.5 * 0.3048) * 60) / 3.785411784e-3;
    expect(relative(gpm, 700)).toBeLessThan(0.01);
  });

  it('Darcy-Weisbach with Colebrook solved for velocity (explicit, core.md §8.4): 1 km of 100 mm smooth pipe, 14.235 m fall → 10.00 L/s (±1 %)', () => {
    const d = 0.1;
    const s = 14.235 / 1000;
    const nu = 1.004e-6;
    const root = Math.sqrt(2 * G * d * s);
    const velocity = -2 * root * Math.log10(1.5e-6 / (3.7 * d) + (2.51 * nu) / (d * root));
    const hand = (velocity * Math.PI * d * d) / 4;
    expect(hand * 1000).toBeCloseTo(10.0, 1);
    expect(relative(findFlow(1000, d, 14.235, { frictionMethod: 'darcy-weisbach' }), hand)).toBeLessThan(0.01);
  });

  it("doubling the fall raises the Hazen-Williams flow by 2^0.54 (the formula's slope exponent; ±0.5 %)", () => {
    expect(relative(findFlow(1000, 0.1, 20) / findFlow(1000, 0.1, 10), 2 ** 0.54)).toBeLessThan(0.005);
  });
});
