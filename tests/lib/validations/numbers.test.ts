import { describe, expect, it } from 'vitest';
import type { z } from 'zod';
import {
  between,
  chainage,
  elevation,
  finite,
  fraction,
  hourOfDay,
  metres,
  nonNegative,
  positive,
  whole,
} from '@/lib/validations/numbers';
import { frostDepth } from '@/lib/validations/projects';
import { RoutePointInputSchema } from '@/lib/validations/routes';
import { TankSchema } from '@/lib/validations/tanks';

const words = (schema: z.ZodType, value: unknown) => {
  const r = schema.safeParse(value);
  return r.success ? null : r.error.issues.map((i) => i.message);
};

describe('the one set of number helpers', () => {
  it('refuses what is not a finite number in one wording', () => {
    for (const bad of ['12', NaN, Infinity, -Infinity, null, true]) {
      expect(words(finite('Flow'), bad)).toEqual(['Flow must be a number']);
      expect(words(between('Flow', 0, 10, 'm³/s'), bad)).toEqual(['Flow must be a number']);
    }
    expect(words(finite('Flow'), -3.5)).toBeNull();
  });

  it('words every bound as "at least" / "at most" with its unit, both ends included', () => {
    const c = between('Water temperature', 0, 40, '°C');
    expect(words(c, -0.1)).toEqual(['Water temperature must be at least 0 °C']);
    expect(words(c, 40.01)).toEqual(['Water temperature must be at most 40 °C']);
    expect(words(c, 0)).toBeNull();
    expect(words(c, 40)).toBeNull();
    expect(words(between('Safety factor', 1), 1e9)).toBeNull();
    expect(words(nonNegative('Reserve days', 365, 'days'), -1)).toEqual(['Reserve days must be at least 0 days']);
    expect(words(nonNegative('Reserve days', 365, 'days'), 366)).toEqual(['Reserve days must be at most 365 days']);
  });

  it('keeps zero out of a positive figure and says so', () => {
    expect(words(positive('Tank volume', undefined, 'm³'), 0)).toEqual(['Tank volume must be more than 0 m³']);
    expect(words(positive('SDR'), -1)).toEqual(['SDR must be more than 0']);
    expect(words(positive('Inside diameter', 5, 'm'), 6)).toEqual(['Inside diameter must be at most 5 m']);
    expect(words(fraction('Measured efficiency'), 1.2)).toEqual(['Measured efficiency must be at most 1']);
    expect(words(fraction('Measured efficiency'), 1)).toBeNull();
  });

  it('takes whole numbers only where it asks for them', () => {
    expect(words(whole('Pumps in parallel', 1, 20), 2.5)).toEqual(['Pumps in parallel must be a whole number']);
    expect(words(whole('Pumps in parallel', 1, 20), 0)).toEqual(['Pumps in parallel must be at least 1']);
    expect(words(hourOfDay('Start hour'), 24)).toEqual(['Start hour must be at most 23']);
    expect(words(hourOfDay('Start hour'), 23)).toBeNull();
  });

  it('names the ranges of lengths, chainages and heights once', () => {
    expect(words(metres('Start water level'), -1e6 - 1)).toEqual(['Start water level must be at least -1000000 m']);
    expect(words(chainage('Chainage'), -0.5)).toEqual(['Chainage must be at least 0 m']);
    expect(words(elevation('Elevation'), 9001)).toEqual(['Elevation must be at most 9000 m']);
    expect(words(elevation('Elevation'), -430)).toBeNull();
  });

  it('is the wording of the schemas that use it (route points, tanks, project frost depth)', () => {
    const point = {
      sourceSeq: null,
      latitude: 95,
      longitude: 0,
      chainageM: -1,
      elevationM: 0,
      label: null,
      heightSource: 'gps',
      confidenceM: null,
      excluded: false,
    };
    const r = RoutePointInputSchema.safeParse(point);
    expect(r.success).toBe(false);
    expect(r.error?.issues.map((i) => i.message)).toEqual([
      'Latitude must be at most 90 degrees',
      'Chainage must be at least 0 m',
    ]);
    expect(words(frostDepth, 11)).toEqual(['Frost depth must be at most 10 m']);
    const tank = TankSchema.safeParse({ name: 'Header tank', volumeM3: 0 });
    expect(tank.error?.issues.find((i) => i.path.join('.') === 'volumeM3')?.message).toBe(
      'Tank volume must be more than 0',
    );
  });
});
