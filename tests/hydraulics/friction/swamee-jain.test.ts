import { describe, expect, it } from 'vitest';
import { colebrookFrictionFactor } from '../../../hydraulics/friction/colebrook';
import { swameeJainFrictionFactor } from '../../../hydraulics/friction/swamee-jain';

describe('Swamee-Jain', () => {
  it('calculatorlib.com worked example: ε/D = 0.0015, Re = 1e5 → f = 0.02394 [R19] (printed to 4 figures)', () => {
    expect(swameeJainFrictionFactor({ reynolds: 1e5, relativeRoughness: 0.0015 })).toBeCloseTo(0.02394, 5);
  });
  it('stays within the stated ±1 % of Colebrook inside its range except near Re = 5000 (core.md §1.3: −0.7…+3.1 %)', () => {
    for (const reynolds of [1e5, 1e6, 1e7]) {
      for (const relativeRoughness of [1e-5, 1e-4, 1e-3, 1e-2]) {
        const ratio =
          swameeJainFrictionFactor({ reynolds, relativeRoughness }) /
          colebrookFrictionFactor({ reynolds, relativeRoughness });
        expect(Math.abs(ratio - 1)).toBeLessThan(0.015);
      }
    }
  });
  it('rejects relative roughness above 0.1', () => {
    expect(() => swameeJainFrictionFactor({ reynolds: 1e5, relativeRoughness: 0.2 })).toThrow(
      /relativeRoughness: must be between 0 and 0.1/,
    );
  });
});
