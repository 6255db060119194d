import { describe, expect, it } from 'vitest';
import { HydraulicsInputError } from '../../../hydraulics/errors';
import { JORDAN_MORNING_EVENING_PATTERN } from '../../../hydraulics/storage/daily-patterns';
import { sizeStorage } from '../../../hydraulics/storage/size-storage';
import { supplyHourlyVolumeM3 } from '../../../hydraulics/storage/supply-profile';
import { tankFillTimeS } from '../../../hydraulics/storage/tank-fill';
import { requiredTankElevation } from '../../../hydraulics/storage/tank-elevation';

const village = { dailyVolumeM3: 2.4, hourlyFractions: JORDAN_MORNING_EVENING_PATTERN.hourlyFractions };
const steady = (dailyM3: number) => ({ flowM3s: dailyM3 / 86_400 });

describe('tankFillTimeS', () => {
  it('fill-time identity: volume / net inflow', () => {
    expect(tankFillTimeS({ volumeM3: 1.25, inflowM3s: 2.6 / 60_000 })).toBeCloseTo(1.25 / (2.6 / 60_000), 9);
    expect(tankFillTimeS({ volumeM3: 10, inflowM3s: 0.002, outflowM3s: 0.0005 })).toBeCloseTo(10 / 0.0015, 9);
  });

  it('1,250 L at 2.6 L/min takes about 8 h (common practice, no source)', () => {
    expect(tankFillTimeS({ volumeM3: 1.25, inflowM3s: 2.6 / 60_000 }) / 3600).toBeCloseTo(8.01, 2);
  });

  it('refuses a draw that keeps the tank from filling', () => {
    expect(() => tankFillTimeS({ volumeM3: 1, inflowM3s: 0.001, outflowM3s: 0.001 })).toThrow(/never fills/);
  });
});

describe('sizeStorage', () => {
  it('village on a steady supply: 1,200 L cycle + 2 days reserve; fill time and overflow follow', () => {
    const result = sizeStorage({ supply: steady(2.4), demand: village, reserveDays: 2 });
    expect(result.cycleStorageM3).toBeCloseTo(1.2, 12);
    expect(result.reserveStorageM3).toBeCloseTo(4.8, 12);
    expect(result.totalStorageM3).toBeCloseTo(6, 12);
    expect(result.fillTimeFromEmptyS).toBeCloseTo(6 / (2.4 / 86_400), 6);
    expect(result.fillTimeWithAverageDrawS).toBeNull();
    expect(result.overflowFlowM3s).toBeCloseTo(2.4 / 86_400, 15);
    expect(result.dailyOverflowM3).toBeCloseTo(0, 12);
    expect(result.checks).toEqual([]);
  });

  it('a supply larger than demand spills the difference each day and fills faster with the draw counted', () => {
    const result = sizeStorage({ supply: steady(3.6), demand: village, reserveDays: 1 });
    expect(result.dailyOverflowM3).toBeCloseTo(1.2, 12);
    expect(result.cycleStorageM3).toBeLessThan(1.2);
    expect(result.fillTimeWithAverageDrawS).toBeCloseTo(result.totalStorageM3 / ((3.6 - 2.4) / 86_400), 6);
  });

  it('a supply that runs part of the day needs more storage', () => {
    const partDay = sizeStorage({
      supply: { flowM3s: 2.4 / (8 * 3600), hoursPerDay: 8, startHour: 8 },
      demand: village,
    });
    expect(partDay.cycleStorageM3).toBeGreaterThan(1.2);
    expect(
      supplyHourlyVolumeM3({ flowM3s: 2.4 / (8 * 3600), hoursPerDay: 8, startHour: 8 }).reduce((a, b) => a + b, 0),
    ).toBeCloseTo(2.4, 12);
  });

  it('supply below demand is an error check; no reserve is noted (Alberta Agriculture, McNaughton)', () => {
    const short = sizeStorage({ supply: steady(2), demand: village });
    expect(short.checks.map((check) => check.code)).toEqual(['supply-below-demand', 'no-reserve']);
    expect(short.checks[1].source).toMatch(/McNaughton/);
  });

  it('takes hourly volumes directly and validates the pattern', () => {
    const direct = sizeStorage({
      supply: steady(2.4),
      demand: { hourlyVolumeM3: village.hourlyFractions.map((f) => f * 2.4) },
    });
    expect(direct.cycleStorageM3).toBeCloseTo(1.2, 12);
    expect(() => sizeStorage({ supply: steady(2.4), demand: { dailyVolumeM3: 2.4, hourlyFractions: [1] } })).toThrow(
      HydraulicsInputError,
    );
    expect(() => sizeStorage({ supply: { flowM3s: 0 }, demand: village })).toThrow(/supply.flowM3s/);
  });
});

describe('requiredTankElevation', () => {
  it('lowest tank water level = outlet elevation + residual + friction, governed by the worst outlet', () => {
    const result = requiredTankElevation({
      outlets: [
        { elevationM: 100, residualHeadM: 10, frictionLossM: 4 },
        { elevationM: 108, residualHeadM: 3, frictionLossM: 6 },
      ],
    });
    expect(result.levelPerOutletM).toEqual([114, 117]);
    expect(result.minimumWaterLevelM).toBe(117);
    expect(result.governingOutletIndex).toBe(1);
  });

  it('names the outlet with a negative residual', () => {
    try {
      requiredTankElevation({
        outlets: [
          { elevationM: 1, residualHeadM: 1, frictionLossM: 1 },
          { elevationM: 1, residualHeadM: -1, frictionLossM: 0 },
        ],
      });
      expect.unreachable();
    } catch (error) {
      expect((error as HydraulicsInputError).field).toBe('outlets.residualHeadM');
      expect((error as HydraulicsInputError).index).toBe(1);
    }
  });
});
