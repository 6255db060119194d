import { describe, expect, it } from 'vitest';
import { analyzeLine, analyzeProfile, headMToPressurePa } from '../../../hydraulics/index';
import { simpleLine } from './fixtures';

function relative(actual: number, expected: number): number {
  return Math.abs(actual - expected) / Math.abs(expected);
}

const FLAT_KM: readonly (readonly [number, number])[] = [
  [0, 100],
  [500, 100],
  [1000, 100],
];

describe('line profile against published check values', () => {
  it('core.md §8.2 (Hazen-Williams): 1 km of 100 mm, C = 150, at 10 L/s loses 14.60 m', () => {
    const profile = analyzeProfile({
      ...simpleLine(FLAT_KM, 150, 0.01),
      settings: { frictionMethod: 'hazen-williams' },
    });
    // [C] 14.603 m with the 10.67 form, 14.629 m with the exact k = 0.849 form: ~1 % band.
    expect(relative(profile.totals.frictionLossM, 14.6)).toBeLessThan(0.01);
    // Independently of the core: the exact k = 0.849 form (constant 10.6742, exponents 1.85185 / 4.87037,
    // core.md §1.1 [C]) over the first 500 m gives the loss the profile reports at the middle station.
    const halfLossM = (10.6742 * 500 * 0.01 ** (1 / 0.54)) / (150 ** (1 / 0.54) * 0.1 ** (2.63 / 0.54));
    expect(relative(profile.points.frictionLossM[1], halfLossM)).toBeLessThan(1e-4);
  });

  it("core.md §8.2: the same line runs at 1.273 m/s, inside Jordan's 0.7-3.0 m/s band (no velocity warning)", () => {
    const analysis = analyzeLine(simpleLine(FLAT_KM, 150, 0.01));
    expect(analysis.points.velocityMs[0]).toBeCloseTo(1.273, 3);
    expect(analysis.warnings.filter((w) => w.code.startsWith('velocity'))).toEqual([]);
  });

  it('core.md §8.3 (Darcy-Weisbach, PVC e = 0.0015 mm, 20 C): the same line loses 14.235 m', () => {
    const input = { ...simpleLine(FLAT_KM, 150, 0.01), settings: { frictionMethod: 'darcy-weisbach' as const } };
    expect(relative(analyzeProfile(input).totals.frictionLossM, 14.235)).toBeLessThan(0.01);
  });

  it('core.md §8.1: 46.2 m of static head is 452.2 kPa at 20 C', () => {
    const profile = analyzeProfile(simpleLine(FLAT_KM, 146.2, 0));
    const headM = profile.points.staticPressureHeadM[1];
    expect(headM).toBeCloseTo(46.2, 10);
    // Printed to 0.1 kPa with rho = 998.2 kg/m3; the core's 20 C density gives 452.25 kPa.
    expect(Math.abs(headMToPressurePa(headM, 20) / 1000 - 452.2)).toBeLessThan(0.1);
  });

  it('core.md §1.6: atmospheric head of 20 °C water 10.351 m at sea level, 9.181 m at 1000 m, 8.638 m at 1500 m (ISA, ρ = 998.2 [C])', () => {
    const at = (siteAltitudeM: number, waterTemperatureC?: number) =>
      analyzeProfile({
        ...simpleLine(FLAT_KM, 150, 0),
        settings: { siteAltitudeM, ...(waterTemperatureC === undefined ? {} : { waterTemperatureC }) },
      }).limits;
    expect(at(0).atmosphericHeadM).toBeCloseTo(10.351, 3);
    expect(at(1000).atmosphericHeadM).toBeCloseTo(9.181, 3);
    expect(at(1500).atmosphericHeadM).toBeCloseTo(8.638, 3);
    // The published 10.34 / 9.17 / 8.62 m (siphon article [R7], printed 8.63 at 1500 m) are the same air
    // pressure over colder, denser water (ρ = 999.7, 10 °C): 10.335 / 9.167 / 8.625 m [C].
    expect(at(0, 10).atmosphericHeadM).toBeCloseTo(10.335, 2);
    expect(at(1000, 10).atmosphericHeadM).toBeCloseTo(9.167, 2);
    // Vapour head of water at 20 C: 0.239 m (core.md §1.6 [C], Buck/Tetens form).
    expect(at(0).vapourHeadM).toBeCloseTo(0.239, 3);
  });

  it('defaults the site altitude to the highest ground of the line (lowest air pressure: the cautious choice)', () => {
    const profile = analyzeProfile(
      simpleLine(
        [
          [0, 1000],
          [100, 1500],
          [200, 1200],
        ],
        1600,
        0,
      ),
    );
    expect(profile.limits.siteAltitudeM).toBe(1500);
    expect(profile.limits.atmosphericHeadM).toBeCloseTo(8.638, 3);
  });

  it('siphon limits [R7]: a summit at -7.6 m (course note "usually -7.6 m") passes the 7.5 m practical limit; -7.4 m does not', () => {
    const summit = (summitM: number) =>
      analyzeProfile({
        ...simpleLine(
          [
            [0, 100],
            [500, summitM],
            [1000, 80],
          ],
          105,
          0,
        ),
        settings: { siteAltitudeM: 0 },
      });
    const deep = summit(112.6);
    expect(deep.points.pressureHeadM[1]).toBeCloseTo(-7.6, 10);
    const deepZone = deep.zones.find((zone) => zone.kind === 'siphon-limit');
    expect(deepZone).toBeDefined();
    // Pressure = 105 - z(x) is linear on each piece: -7.5 m where z = 112.5.
    expect(deepZone!.fromM).toBeCloseTo((12.5 / 12.6) * 500, 4);
    expect(deepZone!.toM).toBeCloseTo(500 + (0.1 / 32.6) * 500, 4);
    expect(deep.zones.some((zone) => zone.kind === 'vapour-limit')).toBe(false);
    const shallow = summit(112.4);
    expect(shallow.zones.map((zone) => zone.kind)).toEqual(['negative-pressure']);
  });

  it('vapour limit at 3000 m: atmospheric 7.15 m (core.md §1.6) less 0.24 m vapour head is passed by a -7 m summit', () => {
    const profile = analyzeProfile({
      ...simpleLine(
        [
          [0, 3000],
          [500, 3012],
          [1000, 2980],
        ],
        3005,
        0,
      ),
      settings: { siteAltitudeM: 3000 },
    });
    expect(profile.limits.atmosphericHeadM).toBeCloseTo(7.162, 3); // core.md §1.6 [C], 20 °C water
    expect(profile.limits.vapourLimitHeadM).toBeLessThan(7);
    const zone = profile.zones.find((z) => z.kind === 'vapour-limit');
    expect(zone).toBeDefined();
    const limit = profile.limits.vapourLimitHeadM;
    // 3005 - z(x) = -limit on the rising piece z = 3000 + 12 x / 500.
    expect(zone!.fromM).toBeCloseTo(((5 + limit) / 12) * 500, 6);
  });

  it('Jordan p.52 via ITACA [R1] ("never negative"): the exact chainage where a flowing line goes below zero pressure', () => {
    const profile = analyzeProfile(
      simpleLine(
        [
          [0, 100],
          [1000, 100],
          [2000, 100],
        ],
        110,
        0.01,
      ),
    );
    const gradient = profile.totals.frictionLossM / 2000;
    const crossing = profile.crossings.find((c) => c.kind === 'negative-pressure');
    expect(crossing?.entering).toBe(true);
    // Between stations (not snapped to one): 110 - (1 + 0.5)·v²/2g at the entrance - gradient * x = 100
    // (velocity head and sharp entrance, profile-and-checks.md §5.2).
    const entranceM = profile.points.minorLossM[0];
    expect(entranceM).toBeCloseTo((1.5 * profile.points.velocityMs[0] ** 2) / (2 * 9.80665), 12);
    expect(crossing!.chainageM).toBeCloseTo((10 - entranceM) / gradient, 6);
    expect(crossing!.chainageM).toBeGreaterThan(0);
    expect(crossing!.chainageM).toBeLessThan(1000);
  });
});
