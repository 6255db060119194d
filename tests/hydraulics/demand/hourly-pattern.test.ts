import { describe, expect, it } from 'vitest';
import {
  assertHourlyPattern,
  deliveryWindowPattern,
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
    const pattern = patternFromPercentByHour({ startHour: 5, percents: [5, 5, 10, 10, 5, 10, 5, 5, 5, 5, 10, 10, 5, 5] });
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
