import { describe, expect, it } from 'vitest';
import { PSI_PA, US_GALLON_M3 } from '../../../hydraulics/constants';
import { planRamPump } from '../../../hydraulics/ram/plan-ram';
import type { PlanCheck } from '../../../hydraulics/ram/plan-check';
import type { RamPlanOptions } from '../../../hydraulics/ram/plan-types';
import { sizeStorage } from '../../../hydraulics/storage/size-storage';
import { yieldDrawChecks } from '../../../hydraulics/yield/design-yield';
import { planCheckText } from '../../../lib/lift/check-words';

const L_PER_MIN = 1e-3 / 60;

/** A ram site that breaks many rules at once: a short fall, a soft drive pipe, a weak low delivery pipe. */
const troubledSite: RamPlanOptions = {
  driveFlowM3s: 30 * L_PER_MIN,
  fallM: 0.4,
  liftM: 5,
  sizeClassId: 'drive-30mm',
  drivePipe: { lengthM: 20, insideDiameterM: 0.05, material: 'pe' },
  deliveryPipe: { lengthM: 300, insideDiameterM: 0.0161, hazenWilliamsC: 150, pressureRatingPa: 2 * PSI_PA },
};

const allText = (checks: readonly PlanCheck[], system: 'metric' | 'us') =>
  checks
    .map((check) => {
      const t = planCheckText(check, system);
      return `${t.message} ${t.fix ?? ''}`;
    })
    .join('\n');

describe('lift checks worded from their figures (warnings as data, lib/lift/check-words.ts)', () => {
  it('a troubled ram site reports several checks, each carrying the figures its sentence needs', () => {
    const checks = planRamPump(troubledSite).checks;
    expect(checks.length).toBeGreaterThanOrEqual(4);
    const fall = checks.find((c) => c.code === 'fall-too-small')!;
    expect(fall.values).toEqual({ headM: 0.4, limitHeadM: 0.5 });
  });

  it('a US project reads feet, psi and US gpm in every ram check: no metre, litre or L/min figure', () => {
    const us = allText(planRamPump(troubledSite).checks, 'us');
    expect(us).toMatch(/ft/);
    expect(us).not.toMatch(/\d m\b|L\/min|L\/s|m³|kPa/);
    // 0.4 m = 1.3 ft and 0.5 m = 1.6 ft (1 ft = 0.3048 m exactly, docs/references/core.md §7).
    expect(us).toMatch(/The fall is 1\.3 ft; the pump must sit at least 1\.6 ft below the source/);
  });

  it('the same checks in a metric project keep metres and litres', () => {
    const metric = allText(planRamPump(troubledSite).checks, 'metric');
    expect(metric).toMatch(/The fall is 0\.4 m; the pump must sit at least 0\.5 m below the source/);
    expect(metric).not.toMatch(/ ft\b|gpm|psi/);
  });

  it('storage volumes read as US gallons with thousands separators', () => {
    // Supply 1 m³/day against 2.4 m³/day of use: the tank loses 1.4 m³ a day.
    const result = sizeStorage({
      supply: { flowM3s: 1 / 86_400 },
      demand: { dailyVolumeM3: 2.4, hourlyFractions: Array(24).fill(1 / 24) },
    });
    const short = result.checks.find((c) => c.code === 'supply-below-demand')!;
    const text = planCheckText(short, 'us').message;
    // 2.4 m³ = 634.0 US gal; 1 US gal = 3.785411784 L (docs/references/core.md §7).
    expect(text).toContain(`${Math.round(2.4 / US_GALLON_M3)} US gal`);
    expect(text).toContain(`${Math.round(1 / US_GALLON_M3)} US gal a day`);
    expect(text).not.toMatch(/m³/);
    const big = sizeStorage({
      supply: { flowM3s: 10 / 86_400 },
      demand: { dailyVolumeM3: 24, hourlyFractions: Array(24).fill(1 / 24) },
    });
    expect(
      planCheckText(
        big.checks.find((c) => c.code === 'supply-below-demand')!,
        'us',
      ).message,
    ).toMatch(/2,642 US gal a day/);
  });

  it('a draw above the yield reads in US gpm for a US project and L/min for a metric one', () => {
    const [check] = yieldDrawChecks({ designYieldM3s: 10 * L_PER_MIN, designDrawM3s: 20 * L_PER_MIN });
    expect(planCheckText(check, 'metric').message).toMatch(
      /design draw \(20\.0 L\/min\) exceeds the design yield \(10\.0 L\/min\)/,
    );
    // 20 L/min = 5.28 US gpm.
    expect(planCheckText(check, 'us').message).toMatch(
      /design draw \(5\.28 US gpm\) exceeds the design yield \(2\.64 US gpm\)/,
    );
  });
});
