import { describe, expect, it } from 'vitest';
import { US_GALLON_M3 } from '../../../hydraulics/constants';
import { dailyDemand } from '../../../hydraulics/demand/daily-demand';
import { DEFAULT_DEMAND_FIGURES } from '../../../hydraulics/demand/default-figures';
import { deliveryWindowPattern } from '../../../hydraulics/demand/hourly-pattern';
import { useDemand } from '../../../hydraulics/demand/use-demand';
import { HydraulicsInputError } from '../../../hydraulics/errors';
import { JORDAN_MORNING_EVENING_PATTERN } from '../../../hydraulics/storage/daily-patterns';

const SQUARE_FOOT_M2 = 0.09290304;
const INCH_M = 0.0254;
const jordan = { kind: 'pattern', hourlyFractions: JORDAN_MORNING_EVENING_PATTERN.hourlyFractions } as const;

describe('useDemand', () => {
  it('village example: 60 people x 40 L = 2,400 L/day (Water for the World RWS.4.D.5)', () => {
    const result = useDemand({ use: { kind: 'people', count: 60, figureId: 'village-ram-supply', delivery: jordan } });
    expect(result.dailyVolumeM3).toBeCloseTo(2.4, 12);
    expect(result.figureSource).toMatch(/Water for the World/);
    // Peak hour of the Jordan pattern is 15 % of the day.
    expect(result.peakFlowM3s).toBeCloseTo((2.4 * 0.15) / 3600, 12);
  });

  it("livestock: 50 lactating cows in summer drink 50 x 95 L (AAFC Stockman's Guide)", () => {
    const result = useDemand({
      use: {
        kind: 'livestock',
        figureId: 'lactating-cow',
        count: 50,
        season: 'summer',
        delivery: { kind: 'delivery-hours', hours: 4 },
      },
    });
    expect(result.dailyVolumeM3).toBeCloseTo(4.75, 12);
    // Trough line sized to deliver the daily need in 4 h (Ohio State Ext. ANR-12).
    expect(result.peakFlowM3s).toBeCloseTo(4.75 / (4 * 3600), 12);
    expect(result.label).toMatch(/summer/);
  });

  it('winter need is used in winter', () => {
    const result = useDemand({
      use: {
        kind: 'livestock',
        figureId: 'sheep',
        count: 100,
        season: 'winter',
        delivery: { kind: 'peak-factor', peakFactor: 2 },
      },
    });
    expect(result.dailyVolumeM3).toBeCloseTo(0.36, 12);
    expect(result.hourlyShapeNominal).toBe(true);
  });

  it('garden: 1 inch over 1 ft² is 0.6234 US gal (core.md §3.7, bchill guide prints 0.62)', () => {
    const result = useDemand({
      use: {
        kind: 'garden',
        areaM2: SQUARE_FOOT_M2,
        depthMPerDay: INCH_M,
        delivery: { kind: 'delivery-hours', hours: 1 },
      },
    });
    expect(result.dailyVolumeM3 / US_GALLON_M3).toBeCloseTo(0.6234, 4);
  });

  it('garden: 15 x 25 ft plot at 1 in/week needs about 225 US gal a week (grovida; 233.8 computed)', () => {
    const result = useDemand({
      use: {
        kind: 'garden',
        areaM2: 15 * 25 * SQUARE_FOOT_M2,
        figureId: 'vegetables-inch-per-week',
        delivery: { kind: 'delivery-hours', hours: 2 },
      },
    });
    const weeklyGallons = (result.dailyVolumeM3 * 7) / US_GALLON_M3;
    expect(weeklyGallons).toBeCloseTo(233.8, 1);
    expect(Math.abs(weeklyGallons - 225) / 225).toBeLessThan(0.05);
  });

  it('an entered figure wins over the default table, and the table can be replaced', () => {
    const own = useDemand({
      use: { kind: 'people', count: 4, perPersonM3PerDay: 0.2, delivery: { kind: 'peak-factor', peakFactor: 3 } },
    });
    expect(own.dailyVolumeM3).toBeCloseTo(0.8, 12);
    expect(own.peakFlowM3s).toBeCloseTo((0.8 / 86400) * 3, 15);
    expect(own.figureSource).toBe('entered');
    const figures = {
      ...DEFAULT_DEMAND_FIGURES,
      perPerson: [{ ...DEFAULT_DEMAND_FIGURES.perPerson[0], id: 'camp', perPersonM3PerDay: 0.03 }],
    };
    const edited = useDemand({ use: { kind: 'people', count: 10, figureId: 'camp', delivery: jordan }, figures });
    expect(edited.dailyVolumeM3).toBeCloseTo(0.3, 12);
  });
});

describe('dailyDemand', () => {
  const uses = [
    { kind: 'people', count: 6, figureId: 'most-needs', delivery: jordan },
    {
      kind: 'livestock',
      count: 20,
      figureId: 'cow-calf-pair',
      season: 'summer',
      delivery: { kind: 'delivery-hours', hours: 4, startHour: 6 },
    },
    {
      kind: 'garden',
      areaM2: 100,
      figureId: 'vegetables-inch-per-week',
      delivery: { kind: 'delivery-hours', hours: 2, startHour: 18 },
    },
  ] as const;

  it('totals the daily volume and takes the coincident hourly peak when every use has a shape', () => {
    const result = dailyDemand({ uses });
    const people = 0.3;
    const cattle = 20 * 0.068;
    const garden = 100 * (0.0254 / 7);
    expect(result.dailyVolumeM3).toBeCloseTo(people + cattle + garden, 12);
    expect(result.peakMethod).toBe('coincident-hourly');
    // 06:00-07:00: people 15 % plus cattle a quarter of their need.
    expect(result.peakFlowM3s).toBeCloseTo((people * 0.15 + cattle / 4) / 3600, 12);
    expect(result.hourlyVolumeM3.reduce((a, b) => a + b, 0)).toBeCloseTo(result.dailyVolumeM3, 12);
  });

  it('falls back to the sum of peaks when a use has only a peak factor (safe side)', () => {
    const result = dailyDemand({
      uses: [...uses, { kind: 'fixed', volumeM3PerDay: 1, delivery: { kind: 'peak-factor', peakFactor: 2 } }],
    });
    expect(result.peakMethod).toBe('sum-of-peaks');
    expect(result.peakFlowM3s).toBeCloseTo(
      result.uses.reduce((total, use) => total + use.peakFlowM3s, 0),
      15,
    );
  });

  it("the total peak is never below any single use's peak", () => {
    const result = dailyDemand({ uses });
    for (const use of result.uses) expect(result.peakFlowM3s).toBeGreaterThanOrEqual(use.peakFlowM3s - 1e-15);
  });

  it('a window under an hour keeps its own rate in the total: 0.5 m³ in 30 min is 0.5/1800 m³/s, not 0.5/3600 (mean flow = volume / time, exact)', () => {
    const trough = {
      kind: 'fixed',
      volumeM3PerDay: 0.5,
      delivery: { kind: 'delivery-hours', hours: 0.5, startHour: 7 },
    } as const;
    const alone = dailyDemand({ uses: [trough] });
    expect(alone.peakFlowM3s).toBeCloseTo(0.5 / 1800, 15);
    // With a house on the Jordan pattern (7:00-8:00 is 15 % of the day, Tanzania DCOM Table C.1, core.md §3.4)
    // the two rates add for the half hour they overlap.
    const withHouse = dailyDemand({ uses: [trough, { kind: 'fixed', volumeM3PerDay: 1, delivery: jordan }] });
    expect(withHouse.peakFlowM3s).toBeCloseTo(0.5 / 1800 + (1 * 0.15) / 3600, 15);
  });

  it('a window past midnight adds to an early window it overlaps; windows apart do not add', () => {
    const half = (startHour: number, hours = 0.5) =>
      ({ kind: 'fixed', volumeM3PerDay: 0.9, delivery: { kind: 'delivery-hours', hours, startHour } }) as const;
    // 23:00 + 1.5 h wraps past midnight to 00:30.
    const wrapped = dailyDemand({ uses: [half(23, 1.5), half(0)] });
    expect(wrapped.peakFlowM3s).toBeCloseTo(0.9 / 5400 + 0.9 / 1800, 15);
    const apart = dailyDemand({ uses: [half(3), half(9)] });
    expect(apart.peakFlowM3s).toBeCloseTo(0.9 / 1800, 15);
  });

  it('a delivery window pattern and delivery hours give the same peak', () => {
    const byHours = useDemand({
      use: { kind: 'fixed', volumeM3PerDay: 2, delivery: { kind: 'delivery-hours', hours: 4 } },
    });
    const byPattern = useDemand({
      use: {
        kind: 'fixed',
        volumeM3PerDay: 2,
        delivery: { kind: 'pattern', hourlyFractions: deliveryWindowPattern({ hours: 4 }) },
      },
    });
    expect(byHours.peakFlowM3s).toBeCloseTo(byPattern.peakFlowM3s, 15);
  });
});

describe('bad demand input -> HydraulicsInputError naming field and index', () => {
  const catchError = (fn: () => unknown): HydraulicsInputError => {
    try {
      fn();
    } catch (error) {
      if (error instanceof HydraulicsInputError) return error;
      throw error;
    }
    throw new Error('expected an error');
  };

  it('negative head count', () => {
    const error = catchError(() =>
      dailyDemand({
        uses: [
          { kind: 'people', count: 2, figureId: 'most-needs', delivery: jordan },
          { kind: 'livestock', count: -3, figureId: 'horse', season: 'summer', delivery: jordan },
        ],
      }),
    );
    expect(error.field).toBe('uses.count');
    expect(error.index).toBe(1);
  });

  it('fractional head count, unknown figure, bad pattern, peak factor below 1', () => {
    expect(
      catchError(() => useDemand({ use: { kind: 'people', count: 2.5, figureId: 'most-needs', delivery: jordan } }))
        .message,
    ).toMatch(/whole number/);
    expect(
      catchError(() => useDemand({ use: { kind: 'people', count: 2, figureId: 'nope', delivery: jordan } })).message,
    ).toMatch(/unknown figure "nope"/);
    expect(
      catchError(() =>
        useDemand({
          use: {
            kind: 'people',
            count: 2,
            figureId: 'most-needs',
            delivery: { kind: 'pattern', hourlyFractions: [1] },
          },
        }),
      ).field,
    ).toBe('uses[0].delivery.hourlyFractions');
    expect(
      catchError(() =>
        useDemand({
          use: { kind: 'people', count: 2, figureId: 'most-needs', delivery: { kind: 'peak-factor', peakFactor: 0.5 } },
        }),
      ).field,
    ).toBe('uses.delivery.peakFactor');
  });

  it('a use with neither a figure nor a figure id', () => {
    expect(catchError(() => useDemand({ use: { kind: 'garden', areaM2: 10, delivery: jordan }, index: 4 })).index).toBe(
      4,
    );
  });
});
