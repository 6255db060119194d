import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { deratedPressureRatingPa, findPipe, plasticDeratingFactor } from '../../../hydraulics/catalogue';

/** Table points are printed in °F from 73 °F, the rating temperature ASTM states as 23 °C. */
const tableF = (f: number) => 23 + (f - 73) / 1.8;

describe('plastic pipe temperature derating', () => {
  it('keeps the full rating at the ASTM rating temperature, 23 °C (73 °F)', () => {
    expect(plasticDeratingFactor({ temperatureC: 23 })).toBe(1);
    expect(plasticDeratingFactor({ temperatureC: 5 })).toBe(1);
  });
  it('140 °F → 0.22 (homesteady.com, ASTM D2241 PVC specifications [R13]: "200 × 0.22")', () => {
    expect(plasticDeratingFactor({ temperatureC: tableF(140) })).toBeCloseTo(0.22, 10);
  });
  it('about 43 °C → one-half (Utah State Univ., Sprinkle & Trickle Irrigation Lectures, Lecture 21 [R13]); "about" → ±0.03', () => {
    expect(Math.abs(plasticDeratingFactor({ temperatureC: 43 }) - 0.5)).toBeLessThan(0.03);
  });
  it('interpolates linearly between table points (100 °F 0.62, 110 °F 0.50: from memory, core.md §2.1)', () => {
    expect(plasticDeratingFactor({ temperatureC: tableF(105) })).toBeCloseTo(0.56, 10);
  });
  it('never increases with temperature', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 59.2, noNaN: true }), (t) => {
        expect(plasticDeratingFactor({ temperatureC: t + 1 })).toBeLessThanOrEqual(
          plasticDeratingFactor({ temperatureC: t }),
        );
      }),
    );
  });
});

describe('deratedPressureRatingPa', () => {
  it('derates PVC from 23 °C and ISO PE from 20 °C, and leaves steel alone', () => {
    const pvc = findPipe('pvc-d2241-sdr21-2in')!;
    const pe = findPipe('pe100-iso4427-sdr11-63mm')!;
    const steel = findPipe('steel-sch40-2in')!;
    expect(deratedPressureRatingPa(pvc, 23)).toBe(pvc.pressureRatingPa);
    expect(deratedPressureRatingPa(pe, 20)).toBe(pe.pressureRatingPa);
    expect(deratedPressureRatingPa(pe, 23)).toBeLessThan(pe.pressureRatingPa);
    expect(deratedPressureRatingPa(steel, 40)).toBe(steel.pressureRatingPa);
    expect(deratedPressureRatingPa(pvc, 35)).toBeCloseTo(
      pvc.pressureRatingPa * plasticDeratingFactor({ temperatureC: 35 }),
      6,
    );
  });
  it('rejects temperatures off the table and bad specs', () => {
    const pe = findPipe('pe100-iso4427-sdr11-63mm')!;
    const pvc = findPipe('pvc-d2241-sdr21-2in')!;
    expect(() => deratedPressureRatingPa(pvc, 61)).toThrow(/temperatureC: must be between 0 and 60\.\d* °C/);
    // EN 12201-1 / ISO 13761 give no PE factor above 40 °C.
    expect(() => deratedPressureRatingPa(pe, 41)).toThrow(/temperatureC: must be between 0 and 40 °C/);
    expect(() => deratedPressureRatingPa(pe, Number.NaN)).toThrow(/temperatureC/);
    expect(() => deratedPressureRatingPa({ ...pe, pressureRatingPa: -1 }, 20)).toThrow(/pipe.pressureRatingPa/);
  });
});

// EN 12201-1 Annex A / ISO 13761 pressure reduction factors for PE, rated at 20 °C (core.md §2.6,
// from memory): 20 °C 1.00, 30 °C 0.87, 40 °C 0.74, linear between.
describe('PE derating follows the PE standard, not the PVC table', () => {
  const pe = findPipe('pe100-iso4427-sdr11-63mm')!;
  it.each([
    [20, 1],
    [25, 0.935],
    [30, 0.87],
    [35, 0.805],
    [40, 0.74],
  ])('ISO 4427 PE100 at %d °C keeps %d of its PN (EN 12201-1 Annex A factors)', (temperatureC, factor) => {
    expect(deratedPressureRatingPa(pe, temperatureC) / pe.pressureRatingPa).toBeCloseTo(factor, 10);
  });

  it('is more cautious than the AS/NZS 4130 re-rating table (Enviro Pipes, PIPA POP013 basis [R31]: PN 10 holds 94 m at 30 °C, 84 m at 40 °C)', () => {
    expect(plasticDeratingFactor({ temperatureC: 30, table: 'pe' })).toBeLessThanOrEqual(94 / 100);
    expect(plasticDeratingFactor({ temperatureC: 40, table: 'pe' })).toBeLessThanOrEqual(84 / 100);
  });

  it('ASTM-rated PE (D2239, 23 °C) starts derating at its own rating temperature: 0.87 at 33 °C', () => {
    const sidr = findPipe('pe-d2239-sidr9-1in')!;
    expect(deratedPressureRatingPa(sidr, 23)).toBe(sidr.pressureRatingPa);
    expect(deratedPressureRatingPa(sidr, 33) / sidr.pressureRatingPa).toBeCloseTo(0.87, 10);
  });

  it('PVC at the same temperature keeps less than PE (the PVC table is the harsher one)', () => {
    const pvc = findPipe('pvc-d2241-sdr21-2in')!;
    expect(deratedPressureRatingPa(pvc, 40) / pvc.pressureRatingPa).toBeLessThan(
      deratedPressureRatingPa(pe, 40) / pe.pressureRatingPa,
    );
  });
});
