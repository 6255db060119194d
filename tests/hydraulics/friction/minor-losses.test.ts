import { describe, expect, it } from 'vitest';
import {
  FITTING_LOSS_COEFFICIENTS,
  minorLossHeadM,
  suddenExpansionLossCoefficient,
  totalLossCoefficient,
} from '../../../hydraulics/friction/minor-losses';

describe('fitting loss coefficients', () => {
  it('carry the published values (Munson, Young & Okiishi, Table 8.2; exit Fig. 8.25; sharp entrance per fluids/Crane)', () => {
    expect(FITTING_LOSS_COEFFICIENTS['globe-valve-open'].k).toBe(10);
    expect(FITTING_LOSS_COEFFICIENTS['gate-valve-open'].k).toBe(0.15);
    expect(FITTING_LOSS_COEFFICIENTS['elbow-90-threaded'].k).toBe(1.5);
    expect(FITTING_LOSS_COEFFICIENTS['tee-branch-threaded'].k).toBe(2.0);
    expect(FITTING_LOSS_COEFFICIENTS['swing-check-valve'].k).toBe(2);
    expect(FITTING_LOSS_COEFFICIENTS.exit.k).toBe(1.0);
    expect(FITTING_LOSS_COEFFICIENTS['entrance-sharp'].k).toBe(0.5);
  });
  it('every entry names a source, and recalled values say so', () => {
    for (const entry of Object.values(FITTING_LOSS_COEFFICIENTS)) {
      expect(entry.source.length).toBeGreaterThan(10);
      expect(entry.k).toBeGreaterThan(0);
    }
    expect(FITTING_LOSS_COEFFICIENTS['entrance-projecting'].source).toMatch(/from memory/);
  });
  it('a gate valve closing raises K steeply (¼, ½, ¾ closed: 0.26, 2.1, 17)', () => {
    const ks = [
      'gate-valve-open',
      'gate-valve-quarter-closed',
      'gate-valve-half-closed',
      'gate-valve-three-quarters-closed',
    ].map((kind) => FITTING_LOSS_COEFFICIENTS[kind as keyof typeof FITTING_LOSS_COEFFICIENTS].k);
    expect(ks).toEqual([0.15, 0.26, 2.1, 17]);
  });
});

describe('minorLossHeadM', () => {
  it('ΣK·v²/2g: entrance + exit + 2 threaded elbows at 1.5 m/s', () => {
    const kTotal = totalLossCoefficient([
      { kind: 'entrance-sharp', count: 1 },
      { kind: 'exit', count: 1 },
      { kind: 'elbow-90-threaded', count: 2 },
    ]);
    expect(kTotal).toBeCloseTo(4.5, 12);
    expect(minorLossHeadM({ kTotal, velocityMs: 1.5 })).toBeCloseTo((4.5 * 2.25) / (2 * 9.80665), 12);
  });
  it('is sign-aware and zero at rest', () => {
    expect(minorLossHeadM({ kTotal: 3, velocityMs: -2 })).toBeCloseTo(
      -minorLossHeadM({ kTotal: 3, velocityMs: 2 }),
      14,
    );
    expect(minorLossHeadM({ kTotal: 3, velocityMs: 0 })).toBe(0);
  });
  it('sudden expansion K = (1 − (d₁/d₂)²)²: 0 for no change, → 1 into a tank', () => {
    expect(suddenExpansionLossCoefficient({ smallDiameterM: 0.05, largeDiameterM: 0.05 })).toBe(0);
    expect(suddenExpansionLossCoefficient({ smallDiameterM: 0.05, largeDiameterM: 0.1 })).toBeCloseTo(0.5625, 14);
    expect(suddenExpansionLossCoefficient({ smallDiameterM: 0.05, largeDiameterM: 50 })).toBeCloseTo(1, 5);
  });
  it('rejects bad input naming the field and row', () => {
    expect(() => minorLossHeadM({ kTotal: -1, velocityMs: 1 })).toThrow(/kTotal/);
    expect(() => minorLossHeadM({ kTotal: 1, velocityMs: Number.NaN })).toThrow(/velocityMs/);
    expect(() =>
      totalLossCoefficient([
        { kind: 'exit', count: 1 },
        { kind: 'elbow-90-threaded', count: 1.5 },
      ]),
    ).toThrow(/fittings.count\[1\]: must be a whole number/);
    expect(() => totalLossCoefficient([{ kind: 'teapot' as never, count: 1 }])).toThrow(
      /fittings.kind\[0\]: unknown fitting/,
    );
    expect(() => suddenExpansionLossCoefficient({ smallDiameterM: 0.1, largeDiameterM: 0.05 })).toThrow(
      /largeDiameterM/,
    );
  });
});
