import { describe, expect, it } from 'vitest';
import { HydraulicsInputError } from '../../hydraulics/errors';
import {
  flowFromM3s,
  flowToM3s,
  headFromM,
  headMToPressurePa,
  headToM,
  lengthFromM,
  lengthToM,
  pressureFromPa,
  pressurePaToHeadM,
  pressureToPa,
} from '../../hydraulics/units';

/** 60 °F, the temperature plumbing head-pressure tables are commonly worked at (assumed, not printed). */
const SIXTY_F_IN_C = (60 - 32) / 1.8;

describe('lengths', () => {
  it('uses the exact inch and foot', () => {
    expect(lengthToM(1, 'in')).toBe(0.0254);
    expect(lengthToM(1, 'ft')).toBeCloseTo(0.3048, 15);
    expect(lengthToM(250, 'mm')).toBeCloseTo(0.25, 15);
    expect(lengthFromM(0.3048, 'in')).toBeCloseTo(12, 12);
  });
});

describe('flows', () => {
  it('US gallon = 231 in³ = 3.785 411 784 L exactly (NIST Handbook 44, from memory)', () => {
    expect(flowToM3s(60, 'US gpm')).toBeCloseTo(3.785411784e-3, 15);
  });
  it('imperial gallon = 4.546 09 L exactly (from memory)', () => {
    expect(flowToM3s(1, 'imp gpm') * 60).toBeCloseTo(4.54609e-3, 15);
  });
  it('1 ft³/s = 448.831 US gpm (core.md §7 [C], regression)', () => {
    expect(flowFromM3s(0.3048 ** 3, 'US gpm')).toBeCloseTo(448.831, 3);
  });
  it('converts L/s, L/min, m³/day and US gal/day', () => {
    expect(flowToM3s(1, 'L/s')).toBe(1e-3);
    expect(flowFromM3s(1e-3, 'L/min')).toBeCloseTo(60, 12);
    expect(flowFromM3s(1, 'm3/day')).toBe(86400);
    expect(flowFromM3s(flowToM3s(1440, 'US gal/day'), 'US gpm')).toBeCloseTo(1, 12);
  });
  it('round-trips every unit', () => {
    for (const unit of ['m3/s', 'L/s', 'L/min', 'US gpm', 'imp gpm', 'm3/day', 'US gal/day'] as const) {
      expect(flowFromM3s(flowToM3s(12.5, unit), unit)).toBeCloseTo(12.5, 12);
    }
  });
});

describe('pressures', () => {
  it('1 psi = 6894.757 Pa (core.md §7 [C] from exact lb, g_n, in)', () => {
    expect(pressureToPa(1, 'psi')).toBeCloseTo(6894.757293168, 6);
    expect(pressureFromPa(1e5, 'bar')).toBe(1);
    expect(pressureFromPa(2500, 'kPa')).toBe(2.5);
  });
});

describe('head and pressure through the density of water', () => {
  const psiPerFoot = (temperatureC: number) => pressureFromPa(headMToPressurePa(headToM(1, 'ft'), temperatureC), 'psi');

  it('1 ft of water = 0.433 psi (BC Factsheet 590.304-5 [R10]); published to 3 decimals', () => {
    expect(psiPerFoot(20)).toBeCloseTo(0.433, 3);
  });
  it('2.31 ft of water = 1 psi (BC Factsheet 590.304-5 [R10]); published to 3 figures', () => {
    expect(headFromM(pressurePaToHeadM(pressureToPa(1, 'psi'), 20), 'ft')).toBeCloseTo(2.31, 2);
  });
  it('10 ft = 4.33 psi, 100 ft = 43.31 psi, 135 ft = 58.48 psi (Manual of Plumbing Practice, Table I [R29])', () => {
    // Table worked at 60 °F water (assumed); 43.31 fixes the density to ±0.01 psi in 43.
    expect(10 * psiPerFoot(SIXTY_F_IN_C)).toBeCloseTo(4.33, 2);
    expect(Math.abs(100 * psiPerFoot(SIXTY_F_IN_C) - 43.31)).toBeLessThan(0.01);
    expect(Math.abs(135 * psiPerFoot(SIXTY_F_IN_C) - 58.48)).toBeLessThan(0.02);
  });
  it('46.2 m static head = 452.2 kPa at 20 °C (core.md §8.1 [C], regression)', () => {
    // printed to 0.1 kPa (truncated): 46.2 × 9.80665 × 998.2 = 452.25
    expect(Math.abs(headMToPressurePa(46.2, 20) / 1000 - 452.2)).toBeLessThan(0.1);
  });
  it('defaults to 20 °C and round-trips', () => {
    expect(pressurePaToHeadM(headMToPressurePa(12.34))).toBeCloseTo(12.34, 12);
    expect(headMToPressurePa(1)).toBeCloseTo(headMToPressurePa(1, 20), 12);
  });
  it('keeps negative (suction) heads negative', () => {
    expect(pressurePaToHeadM(-50_000, 10)).toBeLessThan(0);
  });
});

describe('bad input', () => {
  it('rejects NaN, Infinity and unknown units with the field named', () => {
    expect(() => lengthToM(Number.NaN, 'm')).toThrow(HydraulicsInputError);
    expect(() => flowToM3s(Number.POSITIVE_INFINITY, 'L/s')).toThrow(/flow/);
    expect(() => flowToM3s(1, 'cfs' as never)).toThrow(/flowUnit: unknown unit "cfs"/);
    expect(() => pressurePaToHeadM(1000, 45)).toThrow(/temperatureC: must be between 0 and 40/);
    expect(() => headMToPressurePa(Number.NaN)).toThrow(/headM/);
  });
});
