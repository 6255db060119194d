import { describe, expect, it } from 'vitest';
import {
  assertHourlyPattern,
  deliveryWindowPattern,
  drawPatternWithPeak,
  patternFromPercentByHour,
  uniformPattern,
} from '../../../hydraulics/demand/hourly-pattern';
import { HydraulicsInputError } from '../../../hydraulics/errors';

const sum = (values: readonly number[]) => values.reduce((total, value) => total + value, 0);

describe('assertHourlyPattern', () => {
  it('accepts 24 fractions summing to 1', () => {
    expect(() => assertHourlyPattern(uniformPattern())).not.toThrow();
  });

  it('says how much is missing when the fractions sum to less than 100 %', () => {
    const pattern = patternFromPercentByHour({
      startHour: 5,
      percents: [5, 5, 10, 10, 5, 10, 5, 5, 5, 5, 10, 10, 5, 5],
    });
    expect(() => assertHourlyPattern(pattern)).toThrow(/sum to 95 %, not 100 % \(5 % is missing\)/);
  });

  it('says how much is extra when they sum to more', () => {
    const pattern = uniformPattern().map((value, hour) => (hour === 0 ? value + 0.1 : value));
    expect(() => assertHourlyPattern(pattern)).toThrow(/10 % too much/);
  });

  it('names the wrong length', () => {
    expect(() => assertHourlyPattern([0.5, 0.5])).toThrow(/needs 24 hourly fractions.*got 2/);
  });

  it('names the negative hour with its index', () => {
    const pattern = uniformPattern();
    pattern[3] = -0.01;
    pattern[4] += 0.01 + 1 / 24;
    try {
      assertHourlyPattern(pattern, 'pattern');
      expect.unreachable();
    } catch (error) {
      expect(error).toBeInstanceOf(HydraulicsInputError);
      expect((error as HydraulicsInputError).field).toBe('pattern');
      expect((error as HydraulicsInputError).index).toBe(3);
    }
  });
});

describe('deliveryWindowPattern', () => {
  it('spreads the day over the window, wrapping past midnight', () => {
    const pattern = deliveryWindowPattern({ hours: 4, startHour: 22 });
    expect(pattern[22]).toBeCloseTo(0.25, 12);
    expect(pattern[1]).toBeCloseTo(0.25, 12);
    expect(pattern[2]).toBe(0);
    expect(sum(pattern)).toBeCloseTo(1, 12);
  });

  it('handles part hours', () => {
    const pattern = deliveryWindowPattern({ hours: 2.5, startHour: 6 });
    expect(pattern.slice(6, 9)).toEqual([0.4, 0.4, 0.2]);
  });

  it('rejects a window longer than a day and a start that is not an hour', () => {
    expect(() => deliveryWindowPattern({ hours: 25 })).toThrow(HydraulicsInputError);
    expect(() => deliveryWindowPattern({ hours: 4, startHour: 6.5 })).toThrow(/startHour/);
  });
});

describe('drawPatternWithPeak', () => {
  it('draws the fixed peak in the busiest hour only, the other hours in proportion (worked by hand)', () => {
    // Invented: 0.4 m³ in 07:00, 0.2 m³ in 18:00, 0.1 m³ in 19:00 (0.7 m³ a day); a tap rated 0.3 L/s.
    const volumes = Array.from({ length: 24 }, (_, hour) => ({ 7: 0.4, 18: 0.2, 19: 0.1 })[hour] ?? 0);
    const draw = drawPatternWithPeak(0.0003, volumes);
    // By hand: busiest share 0.4 / 0.7; mean = 0.3 L/s / (24 × 4/7) = 0.021875 L/s.
    expect(draw.meanFlowM3s).toBeCloseTo(0.0003 / (24 * (0.4 / 0.7)), 15);
    const hourly = draw.hourlyFractions.map((fraction) => draw.meanFlowM3s * fraction * 24);
    expect(hourly[7]).toBeCloseTo(0.0003, 15);
    expect(hourly[18]).toBeCloseTo(0.00015, 15);
    expect(hourly[19]).toBeCloseTo(0.000075, 15);
    expect(hourly[3]).toBe(0);
  });

  it('draws the peak all day when the uses spread evenly, and refuses a negative peak', () => {
    const even = drawPatternWithPeak(0.001, new Array(24).fill(0.5));
    expect(even.meanFlowM3s).toBeCloseTo(0.001, 15);
    expect(() => drawPatternWithPeak(-1, new Array(24).fill(1))).toThrow(HydraulicsInputError);
  });
});
