import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { HydraulicsInputError } from '../../../hydraulics/errors';
import { JORDAN_MIDDAY_PATTERN, JORDAN_MORNING_EVENING_PATTERN } from '../../../hydraulics/storage/daily-patterns';
import { massCurveStorage } from '../../../hydraulics/storage/mass-curve';
import { simulateTank } from '../../../hydraulics/storage/simulate-tank';

const even = (dailyM3: number) => new Array<number>(24).fill(dailyM3 / 24);
const scaled = (fractions: readonly number[], dailyM3: number) => fractions.map((fraction) => fraction * dailyM3);

describe('massCurveStorage against the published Jordan patterns (DCOM Table C.1; results computed from them)', () => {
  it('village of 2,400 L/day (Water for the World) on the morning/evening pattern with a steady 24 h supply: half a day, 1,200 L', () => {
    // Cumulative surplus peaks at +25 % at 06:00 (6 quiet hours) and bottoms at −25 % at 18:00.
    const result = massCurveStorage({
      supplyHourlyM3: even(2.4),
      demandHourlyM3: scaled(JORDAN_MORNING_EVENING_PATTERN.hourlyFractions, 2.4),
    });
    expect(result.cycleStorageM3).toBeCloseTo(1.2, 12);
    expect(Math.max(...result.cumulativeSurplusM3)).toBeCloseTo(0.6, 12);
    expect(Math.min(...result.cumulativeSurplusM3)).toBeCloseTo(-0.6, 12);
    expect(result.lowestAtHour).toBe(18);
    expect(result.dailyBalanceM3).toBeCloseTo(0, 12);
  });

  it('mid-day pattern: 10/24 of the day (max +5/24 at 05:00, min −5/24 at 19:00)', () => {
    const result = massCurveStorage({
      supplyHourlyM3: even(1),
      demandHourlyM3: scaled(JORDAN_MIDDAY_PATTERN.hourlyFractions, 1),
    });
    expect(result.cycleStorageM3).toBeCloseTo(10 / 24, 12);
  });

  it('balanced day: storage is max cumulative surplus minus min', () => {
    const result = massCurveStorage({
      supplyHourlyM3: even(3),
      demandHourlyM3: scaled(JORDAN_MIDDAY_PATTERN.hourlyFractions, 3),
    });
    expect(result.cycleStorageM3).toBeCloseTo(
      Math.max(...result.cumulativeSurplusM3) - Math.min(...result.cumulativeSurplusM3),
      12,
    );
  });

  it('supply equal to demand every hour needs no storage', () => {
    expect(massCurveStorage({ supplyHourlyM3: even(5), demandHourlyM3: even(5) }).cycleStorageM3).toBe(0);
  });

  it('a deficit that runs past midnight is caught', () => {
    const supply = new Array<number>(24).fill(0).map((_, hour) => (hour >= 6 && hour < 18 ? 2 : 0));
    const demand = new Array<number>(24).fill(0).map((_, hour) => (hour >= 20 || hour < 4 ? 3 : 0));
    // 24 m³ in from 06:00 to 18:00, 24 m³ out from 20:00 to 04:00 across midnight.
    expect(massCurveStorage({ supplyHourlyM3: supply, demandHourlyM3: demand }).cycleStorageM3).toBeCloseTo(24, 12);
  });

  it('names the bad hour', () => {
    const demand = even(1);
    demand[7] = -1;
    try {
      massCurveStorage({ supplyHourlyM3: even(1), demandHourlyM3: demand });
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(HydraulicsInputError);
      expect((error as HydraulicsInputError).field).toBe('demandHourlyM3');
      expect((error as HydraulicsInputError).index).toBe(7);
    }
  });
});

describe('massCurveStorage: properties (fast-check)', () => {
  const hourly = fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { minLength: 24, maxLength: 24 });
  // Supply scaled so it at least meets demand over the day (the case a tank can serve).
  const servedDay = fc
    .tuple(hourly, hourly, fc.double({ min: 1, max: 2, noNaN: true }))
    .filter(([, demand]) => demand.some((v) => v > 0))
    .map(([supplyShape, demand, margin]) => {
      const supplyTotal = supplyShape.reduce((a, b) => a + b, 0);
      const demandTotal = demand.reduce((a, b) => a + b, 0);
      const supply =
        supplyTotal > 0 ? supplyShape.map((v) => (v / supplyTotal) * demandTotal * margin) : even(demandTotal * margin);
      return { supply, demand };
    });

  it('storage is never negative', () => {
    fc.assert(
      fc.property(
        hourly,
        hourly,
        (supply, demand) => massCurveStorage({ supplyHourlyM3: supply, demandHourlyM3: demand }).cycleStorageM3 >= 0,
      ),
    );
  });

  it('a tank of that size, starting full, never runs dry over repeated days', () => {
    fc.assert(
      fc.property(servedDay, ({ supply, demand }) => {
        const { cycleStorageM3 } = massCurveStorage({ supplyHourlyM3: supply, demandHourlyM3: demand });
        const run = simulateTank({
          capacityM3: cycleStorageM3 * (1 + 1e-9) + 1e-9,
          supplyHourlyM3: supply,
          demandHourlyM3: demand,
          days: 4,
        });
        return run.unmetDemandM3 < 1e-6 && run.lowestVolumeM3 > -1e-6;
      }),
      { numRuns: 200 },
    );
  });

  it('and it is the smallest: a tank 2 % smaller runs short', () => {
    fc.assert(
      fc.property(servedDay, ({ supply, demand }) => {
        const { cycleStorageM3 } = massCurveStorage({ supplyHourlyM3: supply, demandHourlyM3: demand });
        fc.pre(cycleStorageM3 > 1e-3);
        const run = simulateTank({
          capacityM3: cycleStorageM3 * 0.98,
          supplyHourlyM3: supply,
          demandHourlyM3: demand,
          days: 4,
          stepsPerHour: 1,
        });
        return run.unmetDemandM3 > 0;
      }),
      { numRuns: 200 },
    );
  });
});
