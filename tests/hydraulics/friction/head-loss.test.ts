import { describe, expect, it } from 'vitest';
import { findPipe } from '../../../hydraulics/catalogue';
import { darcyWeisbachHeadLoss } from '../../../hydraulics/friction/darcy-weisbach';
import { hazenWilliamsHeadLoss } from '../../../hydraulics/friction/hazen-williams';
import { pipeHeadLossM } from '../../../hydraulics/friction/head-loss';
import { waterKinematicViscosityM2s } from '../../../hydraulics/water';

const pipe = findPipe('pe100-iso4427-sdr11-63mm')!;

describe('pipeHeadLossM', () => {
  it('dispatches to Hazen-Williams with the pipe C and inside diameter', () => {
    expect(pipeHeadLossM({ method: 'hazen-williams', flowM3s: 0.002, lengthM: 500, pipe })).toBe(
      hazenWilliamsHeadLoss({ flowM3s: 0.002, lengthM: 500, diameterM: pipe.insideDiameterM, c: pipe.hazenWilliamsC }),
    );
  });
  it('dispatches to Darcy-Weisbach with the viscosity at the water temperature', () => {
    const cold = pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: 0.002, lengthM: 500, pipe, temperatureC: 5 });
    expect(cold).toBeCloseTo(
      darcyWeisbachHeadLoss({
        flowM3s: 0.002,
        lengthM: 500,
        diameterM: pipe.insideDiameterM,
        roughnessM: pipe.roughnessM,
        kinematicViscosityM2s: waterKinematicViscosityM2s(5),
      }),
      12,
    );
    // Colder water is more viscous: more friction in a smooth pipe.
    expect(cold).toBeGreaterThan(
      pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: 0.002, lengthM: 500, pipe, temperatureC: 30 }),
    );
  });
  it('Darcy-Weisbach and Hazen-Williams (C 150) agree within 2.5 % for 10 L/s in 100 mm smooth pipe (core.md §8.3 [C])', () => {
    const smooth = { insideDiameterM: 0.1, hazenWilliamsC: 150, roughnessM: 1.5e-6 };
    const dw = pipeHeadLossM({
      method: 'darcy-weisbach',
      flowM3s: 0.01,
      lengthM: 1000,
      pipe: smooth,
      temperatureC: 20,
    });
    const hw = pipeHeadLossM({ method: 'hazen-williams', flowM3s: 0.01, lengthM: 1000, pipe: smooth });
    expect(Math.abs(dw - hw) / hw).toBeLessThan(0.03);
  });
  it('is sign-aware and zero at zero flow for both methods', () => {
    for (const method of ['hazen-williams', 'darcy-weisbach'] as const) {
      const forward = pipeHeadLossM({ method, flowM3s: 0.0015, lengthM: 120, pipe });
      expect(forward).toBeGreaterThan(0);
      expect(pipeHeadLossM({ method, flowM3s: -0.0015, lengthM: 120, pipe })).toBe(-forward);
      expect(pipeHeadLossM({ method, flowM3s: 0, lengthM: 120, pipe })).toBe(0);
    }
  });
  it('rejects bad input naming the field', () => {
    expect(() => pipeHeadLossM({ method: 'hazen-williams', flowM3s: Number.NaN, lengthM: 1, pipe })).toThrow(/flowM3s/);
    expect(() => pipeHeadLossM({ method: 'hazen-williams', flowM3s: 0.001, lengthM: -5, pipe })).toThrow(/lengthM/);
    expect(() =>
      pipeHeadLossM({ method: 'hazen-williams', flowM3s: 0.001, lengthM: 5, pipe: { ...pipe, insideDiameterM: 0 } }),
    ).toThrow(/pipe.insideDiameterM/);
    expect(() =>
      pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: 0.001, lengthM: 5, pipe, temperatureC: 80 }),
    ).toThrow(/temperatureC/);
    expect(() => pipeHeadLossM({ method: 'manning' as never, flowM3s: 0.001, lengthM: 5, pipe })).toThrow(/method/);
  });
});
