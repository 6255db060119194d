import { describe, expect, it } from 'vitest';
import { formatTypedNumber, localeDecimalMark, parseTypedNumber } from '@/lib/units/typed-number';

const value = (text: string, mark: '.' | ',') => {
  const read = parseTypedNumber(text, mark);
  return read.ok ? read.value : read.error;
};

describe('parseTypedNumber: one reading of typed numbers, by the project decimal mark', () => {
  it('with a point: 1.5, 1,500.25, -2, +3, .5, 1e3 and grouping spaces', () => {
    expect(value('1.5', '.')).toBe(1.5);
    expect(value('1,500.25', '.')).toBe(1500.25);
    expect(value('12,345,678', '.')).toBe(12345678);
    expect(value('-2', '.')).toBe(-2);
    expect(value('\u22122.5', '.')).toBe(-2.5);
    expect(value('+3', '.')).toBe(3);
    expect(value('.5', '.')).toBe(0.5);
    expect(value('1e3', '.')).toBe(1000);
    expect(value('1 500.5', '.')).toBe(1500.5);
    expect(value('1\u202f500', '.')).toBe(1500);
  });

  it('with a point, "1,5" is refused with the reading it probably meant (it used to become 15)', () => {
    expect(value('1,5', '.')).toMatch(/"1,5" is not a number.*1\.5/);
    expect(value('1,50', '.')).toMatch(/not a number/);
  });

  it('with a comma: 1,5 is 1.5, 1.500,25 is 1500.25, a lone point still reads as decimals (never 1000 times too large)', () => {
    expect(value('1,5', ',')).toBe(1.5);
    expect(value('1.500,25', ',')).toBe(1500.25);
    expect(value('1 500,25', ',')).toBe(1500.25);
    expect(value('2.75', ',')).toBe(2.75);
    expect(value('1.500', ',')).toBe(1.5);
    expect(value('1.234', ',')).toBe(1.234);
    expect(value('-0,3', ',')).toBe(-0.3);
  });

  it('blank is "not given"; words, two marks and half numbers are errors naming the text', () => {
    expect(value('  ', '.')).toBeNull();
    expect(value('abc', '.')).toBe('"abc" is not a number');
    expect(value('1.2.3', '.')).toMatch(/not a number/);
    expect(value('1,2,3', ',')).toMatch(/not a number/);
    expect(value('12ft', '.')).toMatch(/not a number/);
    expect(value('-', '.')).toMatch(/not a number/);
  });

  it('formats a value back for the box with the same mark, so a round trip keeps it', () => {
    expect(formatTypedNumber(1.5, ',')).toBe('1,5');
    expect(value(formatTypedNumber(1234.5, ','), ',')).toBe(1234.5);
    expect(value(formatTypedNumber(-0.25, '.'), '.')).toBe(-0.25);
  });

  it("reads a locale's decimal mark from Intl: de-DE comma, en-US point", () => {
    expect(localeDecimalMark('de-DE')).toBe(',');
    expect(localeDecimalMark('en-US')).toBe('.');
  });
});
