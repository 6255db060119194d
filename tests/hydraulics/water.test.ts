import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { HydraulicsInputError } from '../../hydraulics/errors';
import {
  atmosphericHeadM,
  atmosphericPressurePa,
  vapourHeadM,
  waterDensityKgM3,
  waterDynamicViscosityPaS,
  waterKinematicViscosityM2s,
  waterVapourPressurePa,
} from '../../hydraulics/water';

const MM2S = 1e-6;

describe('density of water', () => {
  // Published tables print 4-5 figures; tolerance half a unit in the last printed digit plus the
  // 0.03 kg/m³ between air-saturated and air-free water.
  it.each([
    [0, 999.8, 0.06, 'Tupper, Introduction to Naval Architecture, Table 5.1 [R23]'],
    [10, 999.7, 0.06, 'EngineersEdge water table [R23]'],
    [15, 999.1, 0.06, 'ICT 1928-29 via Encyclopedia of Environmental Science & Engineering, App. Table 2 [R23]'],
    [20, 998.2, 0.06, 'EngineersEdge water table [R23]'],
    [30, 995.6, 0.08, 'ICT / EngineersEdge [R23]'],
  ])('at %d °C is %d kg/m³ (%s)', (temperatureC, published, tolerance) => {
    expect(Math.abs(waterDensityKgM3(temperatureC) - published)).toBeLessThan(tolerance);
  });
  it('peaks near 4 °C at 1000.00 kg/m³ (ICT [R23]; the ICT litre is 1.000028 dm³, hence 0.03 tolerance)', () => {
    expect(Math.abs(waterDensityKgM3(4) - 1000.0)).toBeLessThan(0.03);
    expect(waterDensityKgM3(4)).toBeGreaterThan(waterDensityKgM3(2));
    expect(waterDensityKgM3(4)).toBeGreaterThan(waterDensityKgM3(6));
  });
});

describe('viscosity of water', () => {
  it('μ(20 °C) = 1.002 mPa·s (EngineersEdge [R23]; modern scale)', () => {
    expect(waterDynamicViscosityPaS(20)).toBeCloseTo(1.002e-3, 9);
  });
  // Modern table values to 3-4 figures; the correlation reproduces them within 0.3 %.
  it.each([
    [0, 1.787, 'Tupper Table 5.1 / EngineersEdge [R23]'],
    [10, 1.306, 'Tupper Table 5.1 [R23]'],
    [20, 1.004, 'Tupper Table 5.1 / EngineersEdge [R23]'],
    [30, 0.801, 'Tupper Table 5.1 / EngineersEdge [R23]'],
  ])('ν(%d °C) = %d mm²/s (%s)', (temperatureC, published) => {
    const nu = waterKinematicViscosityM2s(temperatureC) / MM2S;
    expect(Math.abs(nu - published) / published).toBeLessThan(0.003);
  });
  it('matches the Landolt-Börnstein regression values of core.md §1.6 [C]', () => {
    expect(waterKinematicViscosityM2s(15) / MM2S).toBeCloseTo(1.1392, 4);
    expect(waterKinematicViscosityM2s(25) / MM2S).toBeCloseTo(0.8929, 4);
  });
  it('falls steadily with temperature', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 39.9, noNaN: true }), (t) => {
        expect(waterKinematicViscosityM2s(t + 0.1)).toBeLessThan(waterKinematicViscosityM2s(t));
      }),
    );
  });
});

describe('vapour pressure and the siphon limit', () => {
  it('Buck form values of core.md §1.6 [C], regression', () => {
    expect(waterVapourPressurePa(0)).toBeCloseTo(611.21, 2);
    expect(Math.round(waterVapourPressurePa(10))).toBe(1228);
    expect(Math.round(waterVapourPressurePa(20))).toBe(2338);
    expect(vapourHeadM(20)).toBeCloseTo(0.239, 3);
  });
  it.each([
    [0, 10.33],
    [500, 9.74],
    [1000, 9.17],
    [1500, 8.63],
  ])(
    'theoretical siphon lift at %d m altitude is %d m (industrialmonitordirect.com siphon article [R7]; cold water at 10 °C assumed, printed to 0.01 m)',
    (altitudeM, published) => {
      expect(Math.abs(atmosphericHeadM({ altitudeM, temperatureC: 10 }) - published)).toBeLessThan(0.011);
    },
  );
  it('ISA pressure: 101 325 Pa at sea level, falling with altitude', () => {
    expect(atmosphericPressurePa(0)).toBe(101325);
    expect(atmosphericHeadM({ altitudeM: 3000, temperatureC: 10 })).toBeCloseTo(7.15, 2); // core.md §1.6 [C]
  });
});

describe('bad input', () => {
  it('names the field and never returns NaN', () => {
    expect(() => waterDensityKgM3(-1)).toThrow(HydraulicsInputError);
    expect(() => waterDensityKgM3(41)).toThrow(/temperatureC: must be between 0 and 40 °C, got 41/);
    expect(() => waterKinematicViscosityM2s(Number.NaN)).toThrow(/temperatureC: must be a finite number/);
    expect(() => atmosphericPressurePa(Number.POSITIVE_INFINITY)).toThrow(/altitudeM/);
    expect(() => atmosphericHeadM({ altitudeM: 20_000, temperatureC: 10 })).toThrow(/altitudeM: must be between/);
  });
});
