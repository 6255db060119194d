import { describe, expect, it } from 'vitest';
import { assertHourlyPattern } from '../../../hydraulics/demand/hourly-pattern';
import {
  DAILY_USE_PATTERN_PRESETS,
  JORDAN_MIDDAY_PATTERN,
  JORDAN_MORNING_EVENING_PATTERN,
  THREE_PEAKS_PATTERN_AS_PRINTED,
} from '../../../hydraulics/storage/daily-patterns';

// Tanzania DCOM Manual Vol. I, App. C, Table C.1, "data from Jordan" (core.md §3.4).
describe('published daily use patterns', () => {
  it('Jordan morning/evening peak sums to 100 % with 15 % at 6, 7, 16 and 17 h', () => {
    expect(JORDAN_MORNING_EVENING_PATTERN.sumPercent).toBe(100);
    expect(() => assertHourlyPattern(JORDAN_MORNING_EVENING_PATTERN.hourlyFractions)).not.toThrow();
    const fractions = JORDAN_MORNING_EVENING_PATTERN.hourlyFractions;
    expect([fractions[6], fractions[7], fractions[16], fractions[17]]).toEqual([0.15, 0.15, 0.15, 0.15]);
    expect(fractions[5]).toBe(0);
    expect(fractions[18]).toBe(0);
    expect(fractions[12]).toBe(0.05);
  });

  it('Jordan mid-day peak sums to 100 % with 20 % at 11 h', () => {
    expect(JORDAN_MIDDAY_PATTERN.sumPercent).toBe(100);
    expect(() => assertHourlyPattern(JORDAN_MIDDAY_PATTERN.hourlyFractions)).not.toThrow();
    expect(JORDAN_MIDDAY_PATTERN.hourlyFractions[11]).toBe(0.2);
  });

  it('the three-peaks column sums to 95 % as printed: flagged, and rejected as a pattern', () => {
    expect(THREE_PEAKS_PATTERN_AS_PRINTED.sumPercent).toBe(95);
    expect(THREE_PEAKS_PATTERN_AS_PRINTED.flag).toMatch(/95 %/);
    expect(() => assertHourlyPattern(THREE_PEAKS_PATTERN_AS_PRINTED.hourlyFractions)).toThrow(/5 % is missing/);
  });

  it('every preset names the DCOM manual and is used 5:00-18:00 only', () => {
    for (const preset of DAILY_USE_PATTERN_PRESETS) {
      expect(preset.source).toMatch(/DCOM/);
      expect(preset.hourlyFractions.slice(0, 5).every((value) => value === 0)).toBe(true);
      expect(preset.hourlyFractions.slice(19).every((value) => value === 0)).toBe(true);
    }
  });
});
