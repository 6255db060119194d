import { describe, expect, it } from 'vitest';
import {
  assertArray,
  assertFiniteNumber,
  assertFraction,
  assertInRange,
  assertLatitude,
  assertLongitude,
  assertNonNegative,
  assertNonNegativeInteger,
  assertOddWindow,
  assertPositive,
  assertPositiveInteger,
} from '../../hydraulics/input-guards';
import { inputErrorOf } from './profile/fixtures';

/** The core's one set of input guards: each refusal names the field and row, in one wording. */
const refusal = inputErrorOf;

describe('the core input guards', () => {
  it('refuse what is not a finite number, naming field and row', () => {
    for (const bad of [NaN, Infinity, -Infinity, '3', null, undefined]) {
      const error = refusal(() => assertFiniteNumber(bad, 'stations.chainageM', 4));
      expect(error.field).toBe('stations.chainageM');
      expect(error.index).toBe(4);
      expect(error.reason).toMatch(/^must be a finite number, got /);
    }
    expect(() => assertFiniteNumber(-2.5, 'x')).not.toThrow();
  });

  it('word signs and ranges alike', () => {
    expect(refusal(() => assertPositive(0, 'flowM3s')).message).toBe('flowM3s: must be greater than 0, got 0');
    expect(refusal(() => assertNonNegative(-1, 'lengthM')).message).toBe('lengthM: must not be negative, got -1');
    expect(refusal(() => assertInRange(41, 'waterTemperatureC', 0, 40, 'C')).message).toBe(
      'waterTemperatureC: must be between 0 and 40 C, got 41',
    );
    expect(refusal(() => assertLatitude(91, 'points.latitudeDeg', 1)).message).toBe(
      'points.latitudeDeg[1]: must be between -90 and 90 degrees, got 91',
    );
    expect(refusal(() => assertLongitude(-180.5, 'lon')).message).toBe(
      'lon: must be between -180 and 180 degrees, got -180.5',
    );
    expect(() => assertLatitude(-90, 'lat')).not.toThrow();
    expect(() => assertLongitude(180, 'lon')).not.toThrow();
  });

  it('take whole numbers, fractions, odd windows and lists only where asked', () => {
    expect(refusal(() => assertNonNegativeInteger(2.5, 'count', 0)).message).toBe(
      'count[0]: must be a whole number, got 2.5',
    );
    expect(() => assertNonNegativeInteger(0, 'count')).not.toThrow();
    expect(refusal(() => assertPositiveInteger(0, 'pumps')).message).toBe('pumps: must be greater than 0, got 0');
    expect(refusal(() => assertFraction(1.01, 'efficiency')).message).toBe(
      'efficiency: must be a fraction no greater than 1, got 1.01',
    );
    expect(() => assertFraction(1, 'efficiency')).not.toThrow();
    expect(refusal(() => assertOddWindow(4, 'windowSize')).message).toBe(
      'windowSize: must be an odd whole number of points, 3 or more, got 4',
    );
    expect(refusal(() => assertOddWindow('5', 'windowSize')).message).toBe(
      'windowSize: must be an odd whole number of points, 3 or more, got string',
    );
    expect(() => assertOddWindow(5, 'windowSize')).not.toThrow();
    expect(refusal(() => assertArray({}, 'readings')).message).toBe('readings: must be an array');
  });
});
