import { describe, expect, it } from 'vitest';
import { findPipe, kortewegWaveSpeedMs } from '../../../hydraulics/catalogue';

const FT = 0.3048;

describe('Korteweg wave speed', () => {
  it('tends to the speed of sound in water, ≈4,860 ft/s (1480 m/s), in a rigid pipe (J. Evans, Pumps & Systems, Sept 2017 [R14]); ±1 %', () => {
    const a = kortewegWaveSpeedMs({ insideDiameterM: 0.1, wallM: 0.01, elasticModulusPa: 1e15 });
    expect(Math.abs(a / FT - 4860) / 4860).toBeLessThan(0.01);
  });
  it('equals the AWWA/Uni-Bell form 4660/√(1 + K(DR−2)/E) ft/s with K = 300,000 psi (core.md §5, formula identity)', () => {
    const dr = 21;
    const kPsi = 300_000;
    const ePsi = 400_000;
    const expectedFts = 4660 / Math.sqrt(1 + (kPsi * (dr - 2)) / ePsi);
    const psi = 6894.757293168361;
    const a = kortewegWaveSpeedMs({
      insideDiameterM: dr - 2,
      wallM: 1,
      elasticModulusPa: ePsi * psi,
      bulkModulusPa: kPsi * psi,
      densityKgM3: (kPsi * psi) / (4660 * FT) ** 2,
    });
    expect(a / FT).toBeCloseTo(expectedFts, 6);
    expect(a / FT).toBeCloseTo(1193, 0); // core.md §5 table, PVC DR 21 [C]
  });
  it('matches the SI regression values of core.md §5 [C] for catalogue pipes (±1 %: catalogue uses average-wall IDs)', () => {
    expect(findPipe('steel-sch40-2in')!.waveSpeedMs).toBeCloseTo(1386, 0);
    expect(findPipe('steel-sch40-4in')!.waveSpeedMs).toBeCloseTo(1364, 0);
    // 325 m/s is for D/e = DR − 2 = 9; the catalogue's mean bore and mean wall give D/e = 89.25/10.55 = 8.46,
    // a stiffer ring, so a few percent faster.
    const pe = findPipe('pe100-iso4427-sdr11-110mm')!.waveSpeedMs;
    expect(pe).toBeGreaterThan(325);
    expect((pe - 325) / 325).toBeLessThan(0.04);
    expect(Math.abs(findPipe('pvc-d2241-sdr21-4in')!.waveSpeedMs - 369) / 369).toBeLessThan(0.01);
  });
  it('rejects a non-positive wall', () => {
    expect(() => kortewegWaveSpeedMs({ insideDiameterM: 0.1, wallM: 0, elasticModulusPa: 1e9 })).toThrow(
      /wallM: must be greater than 0/,
    );
  });
});
