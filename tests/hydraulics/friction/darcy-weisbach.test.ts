import { describe, expect, it } from 'vitest';
import { colebrookFrictionFactor } from '../../../hydraulics/friction/colebrook';
import {
  darcyFrictionFactor,
  darcyFrictionFactorUnchecked,
  darcyLossExponentUnchecked,
  darcyWeisbachHeadLoss,
} from '../../../hydraulics/friction/darcy-weisbach';

describe('darcyFrictionFactor regimes', () => {
  it('laminar f = 64/Re: Re 128 → 0.5 (fluids friction_laminar docstring [R16])', () => {
    expect(darcyFrictionFactor({ reynolds: 128, relativeRoughness: 0.001 })).toBe(0.5);
  });
  it('Colebrook from Re 4000 on', () => {
    expect(darcyFrictionFactor({ reynolds: 4000, relativeRoughness: 1e-4 })).toBe(
      colebrookFrictionFactor({ reynolds: 4000, relativeRoughness: 1e-4 }),
    );
  });
  it('transition: linear in Re between 0.032 at 2000 and Colebrook at 4000 (documented choice, no source)', () => {
    const at4000 = colebrookFrictionFactor({ reynolds: 4000, relativeRoughness: 0 });
    expect(darcyFrictionFactor({ reynolds: 2000, relativeRoughness: 0 })).toBeCloseTo(0.032, 15);
    expect(darcyFrictionFactor({ reynolds: 3000, relativeRoughness: 0 })).toBeCloseTo((0.032 + at4000) / 2, 15);
    expect(darcyFrictionFactor({ reynolds: 1999.999999, relativeRoughness: 0 })).toBeCloseTo(0.032, 8);
  });
});

describe('darcyWeisbachHeadLoss', () => {
  it('core.md §8.3 [C]: 10 L/s, D 100 mm, ε 0.0015 mm, ν 1.004e-6, 1 km → 14.235 m (f 0.017222)', () => {
    const loss = darcyWeisbachHeadLoss({
      flowM3s: 0.01,
      lengthM: 1000,
      diameterM: 0.1,
      roughnessM: 1.5e-6,
      kinematicViscosityM2s: 1.004e-6,
    });
    expect(loss).toBeCloseTo(14.235, 2);
  });
  it('defaults to water at 20 °C', () => {
    const withDefault = darcyWeisbachHeadLoss({ flowM3s: 0.01, lengthM: 1000, diameterM: 0.1, roughnessM: 1.5e-6 });
    expect(withDefault).toBeGreaterThan(14.2);
    expect(withDefault).toBeLessThan(14.27);
  });
  it('is sign-aware, zero at zero flow and at zero length', () => {
    const options = { lengthM: 300, diameterM: 0.05, roughnessM: 1.5e-6 };
    const forward = darcyWeisbachHeadLoss({ ...options, flowM3s: 0.002 });
    expect(darcyWeisbachHeadLoss({ ...options, flowM3s: -0.002 })).toBe(-forward);
    expect(darcyWeisbachHeadLoss({ ...options, flowM3s: 0 })).toBe(0);
    expect(darcyWeisbachHeadLoss({ ...options, flowM3s: 0.002, lengthM: 0 })).toBe(0);
  });
  it('laminar loss is 32 ν L V / (g D²)', () => {
    const loss = darcyWeisbachHeadLoss({
      flowM3s: 1e-6,
      lengthM: 10,
      diameterM: 0.02,
      roughnessM: 0,
      kinematicViscosityM2s: 1e-6,
    });
    const velocity = 1e-6 / (0.25 * Math.PI * 0.02 ** 2);
    expect(loss).toBeCloseTo((32 * 1e-6 * 10 * velocity) / (9.80665 * 0.02 ** 2), 14);
  });
  it('rejects bad input naming the field', () => {
    const ok = { flowM3s: 0.01, lengthM: 10, diameterM: 0.1, roughnessM: 1e-5 };
    expect(() => darcyWeisbachHeadLoss({ ...ok, diameterM: -0.1 })).toThrow(/diameterM/);
    expect(() => darcyWeisbachHeadLoss({ ...ok, roughnessM: Number.NaN })).toThrow(/roughnessM/);
    expect(() => darcyWeisbachHeadLoss({ ...ok, roughnessM: 0.05 })).toThrow(/roughnessM: must be at most/);
    expect(() => darcyWeisbachHeadLoss({ ...ok, kinematicViscosityM2s: 0 })).toThrow(/kinematicViscosityM2s/);
    expect(() => darcyWeisbachHeadLoss({ ...ok, flowM3s: Number.NEGATIVE_INFINITY })).toThrow(/flowM3s/);
  });
});

describe('darcyLossExponentUnchecked (the slope the network solver steps with)', () => {
  // d ln h / d ln Q against a central difference of the loss itself, h = f(Re)·(L/D)·V²/2g, in all three bands.
  const lossAt = (q: number, relativeRoughness: number) => {
    const d = 0.05;
    const v = q / ((Math.PI * d * d) / 4);
    const re = (v * d) / 1.004e-6;
    return { h: (darcyFrictionFactorUnchecked(re, relativeRoughness) * v * v) / (d * 2 * 9.80665), re };
  };
  it.each([
    ['laminar', 5e-5, 0],
    ['transition', 1.2e-4, 1e-4],
    ['smooth turbulent', 2e-3, 3e-5],
    ['rough turbulent', 2e-2, 0.01],
  ])('matches the numerical slope in %s flow', (_band, q, relativeRoughness) => {
    const step = 1e-6;
    const up = lossAt(q * (1 + step), relativeRoughness).h;
    const down = lossAt(q * (1 - step), relativeRoughness).h;
    const numeric = (Math.log(up) - Math.log(down)) / (Math.log(1 + step) - Math.log(1 - step));
    const { h, re } = lossAt(q, relativeRoughness);
    const f = (h * 0.05 * 2 * 9.80665) / (q / ((Math.PI * 0.05 * 0.05) / 4)) ** 2;
    expect(darcyLossExponentUnchecked(re, relativeRoughness, f)).toBeCloseTo(numeric, 5);
  });
});
