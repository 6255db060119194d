import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { colebrookFrictionFactor, colebrookResidual, colebrookUnchecked } from '../../../hydraulics/friction/colebrook';

describe('Colebrook-White', () => {
  // Moody-chart spot values, Colebrook solved to 1e-15 (core.md §1.3 [C], regression; printed to
  // 5 decimals, so the tolerance is half a unit in the last place).
  it.each([
    [4e3, 0, 0.03991],
    [1e4, 1e-4, 0.03104],
    [1e5, 0, 0.01799],
    [1e5, 1e-3, 0.02217],
    [1e6, 1e-2, 0.03796],
    [1e7, 1e-5, 0.009],
    [1e8, 0.05, 0.07155],
  ])('Re %d, ε/D %d → f = %d', (reynolds, relativeRoughness, expected) => {
    expect(Math.abs(colebrookFrictionFactor({ reynolds, relativeRoughness }) - expected)).toBeLessThanOrEqual(5e-6);
  });
  it('Re 1e5, ε/D 0.0015 → 0.023736 (core.md §1.3 [C], the Swamee-Jain example pipe)', () => {
    expect(colebrookFrictionFactor({ reynolds: 1e5, relativeRoughness: 0.0015 })).toBeCloseTo(0.023736, 6);
  });
  it('tends to the fully-rough limit [2 log10(3.7 D/ε)]⁻² (core.md §1.3 [C])', () => {
    expect(colebrookFrictionFactor({ reynolds: 1e12, relativeRoughness: 1e-3 })).toBeCloseTo(0.019635, 6);
  });
  it('property: residual below 1e-12 across the chart', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 3, max: 8, noNaN: true }),
        fc.oneof(fc.constant(0), fc.double({ min: 1e-7, max: 0.05, noNaN: true })),
        (logRe, relativeRoughness) => {
          const options = { reynolds: 10 ** logRe, relativeRoughness };
          expect(Math.abs(colebrookResidual(options, colebrookFrictionFactor(options)))).toBeLessThan(1e-12);
        },
      ),
      { numRuns: 500 },
    );
  });
  it('rejects bad input', () => {
    expect(() => colebrookFrictionFactor({ reynolds: 0, relativeRoughness: 0 })).toThrow(
      /reynolds: must be greater than 0/,
    );
    expect(() => colebrookFrictionFactor({ reynolds: 1e5, relativeRoughness: -1e-4 })).toThrow(/relativeRoughness/);
    expect(() => colebrookFrictionFactor({ reynolds: Number.NaN, relativeRoughness: 0 })).toThrow(/reynolds/);
  });
});

describe('colebrookUnchecked from a warm start (the network solver restarts each pipe from its last factor)', () => {
  it('lands on the same factor from any positive start, near or far', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 4000, max: 1e8, noNaN: true }),
        fc.double({ min: 0, max: 0.05, noNaN: true }),
        fc.double({ min: 0.5, max: 20, noNaN: true }),
        (reynolds, relativeRoughness, start) => {
          const cold = colebrookUnchecked(reynolds, relativeRoughness);
          const warm = colebrookUnchecked(reynolds, relativeRoughness, start);
          expect(Math.abs(warm - cold) / cold).toBeLessThan(1e-13);
          expect(Math.abs(colebrookResidual({ reynolds, relativeRoughness }, warm))).toBeLessThan(1e-12);
        },
      ),
    );
  });
});
