import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { FLOW_UNITS_M3S } from '@/hydraulics/units';
import {
  displayUnits,
  formatDistance,
  formatDuration,
  formatHeadPressure,
  formatNumber,
  formatPercent,
  formatPlainNumber,
  formatPressureOfHead,
  formatQuantity,
  formatTemperature,
  fromDisplay,
  inputValue,
  toDisplay,
  unitOf,
  unitSystemName,
  UNIT_SYSTEMS,
  type Quantity,
} from '@/lib/units';

const QUANTITIES: Quantity[] = [
  'length',
  'chainage',
  'elevation',
  'head',
  'diameter',
  'velocity',
  'designFlow',
  'flow',
  'flowPerHour',
  'flowPerDay',
  'volume',
  'pressure',
  'area',
  'depthPerDay',
  'volumePerDay',
];

/** |a - b| relative to b, for factors that are exact by definition but pass through binary floating point. */
const relativeError = (a: number, b: number) => Math.abs(a - b) / Math.abs(b);

describe('unit sizes against their exact definitions', () => {
  // International yard and pound agreement, 1959: 1 yd = 0.9144 m, so 1 ft = 0.3048 m and 1 in = 0.0254 m exactly
  // (from memory; as restated in NIST Handbook 44, Appendix C, and NIST SP 811, 2008 ed., Appendix B).
  it('1 ft = 0.3048 m and 1 in = 0.0254 m', () => {
    expect(fromDisplay('length', 1, 'us')).toBe(0.3048);
    expect(fromDisplay('head', 1, 'us')).toBe(0.3048);
    expect(fromDisplay('chainage', 1, 'us')).toBe(0.3048);
    expect(fromDisplay('velocity', 1, 'us')).toBe(0.3048);
    expect(fromDisplay('diameter', 1, 'us')).toBe(0.0254);
    expect(relativeError(fromDisplay('area', 1, 'us'), 0.3048 ** 2)).toBeLessThan(1e-15);
    expect(fromDisplay('diameter', 1, 'metric')).toBe(0.001);
  });

  // US liquid gallon = 231 in³ = 3.785411784 L exactly (from memory; NIST Handbook 44, Appendix C).
  it('1 US gal = 3.785411784 L, and a US gallon per minute is that over 60 s', () => {
    expect(relativeError(fromDisplay('volume', 1, 'us'), 3.785411784e-3)).toBeLessThan(1e-15);
    expect(relativeError(fromDisplay('flow', 1, 'us'), 3.785411784e-3 / 60)).toBeLessThan(1e-15);
    expect(relativeError(fromDisplay('designFlow', 1, 'us'), 3.785411784e-3 / 60)).toBeLessThan(1e-15);
    expect(relativeError(fromDisplay('flowPerDay', 1, 'us'), 3.785411784e-3 / 86_400)).toBeLessThan(1e-15);
  });

  // Imperial gallon = 4.54609 L exactly (from memory; UK Weights and Measures Act 1985, Schedule 1). Runnel shows
  // no imperial unit, but the core's flow table the module is built on carries it.
  it('1 imp gal = 4.54609 L in the core table the module builds on', () => {
    expect(relativeError(FLOW_UNITS_M3S['imp gpm'] * 60, 4.54609e-3)).toBeLessThan(1e-15);
  });

  // psi = lbf/in² with lbf = 0.45359237 kg × 9.80665 m/s² (both exact): 6894.757293168… Pa
  // (from memory; NIST SP 811, 2008 ed., Appendix B.8).
  it('1 psi = 6894.757293168 Pa and 1 kPa = 1000 Pa', () => {
    expect(relativeError(fromDisplay('pressure', 1, 'us'), 6894.757293168)).toBeLessThan(1e-12);
    expect(fromDisplay('pressure', 1, 'metric')).toBe(1000);
  });

  it('litres per second, per minute, per hour and per day', () => {
    expect(fromDisplay('designFlow', 1, 'metric')).toBe(1e-3);
    expect(relativeError(fromDisplay('flow', 1, 'metric'), 1e-3 / 60)).toBeLessThan(1e-15);
    expect(relativeError(fromDisplay('flowPerHour', 1, 'metric'), 1e-3 / 3600)).toBeLessThan(1e-15);
    expect(relativeError(fromDisplay('flowPerDay', 1, 'metric'), 1e-3 / 86_400)).toBeLessThan(1e-15);
  });

  it('round-trips every quantity in both systems', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...QUANTITIES),
        fc.constantFrom(...UNIT_SYSTEMS),
        fc.double({ min: -1e6, max: 1e6, noNaN: true }),
        (quantity, system, valueSi) => {
          const back = fromDisplay(quantity, toDisplay(quantity, valueSi, system), system);
          expect(Math.abs(back - valueSi)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(valueSi)));
        },
      ),
    );
  });
});

describe('unit words', () => {
  it('names the unit of every quantity the way the screens show it', () => {
    const metric = Object.fromEntries(QUANTITIES.map((q) => [q, unitOf(q, 'metric')]));
    const us = Object.fromEntries(QUANTITIES.map((q) => [q, unitOf(q, 'us')]));
    expect(metric).toEqual({
      length: 'm',
      chainage: 'm',
      elevation: 'm',
      head: 'm',
      diameter: 'mm',
      velocity: 'm/s',
      designFlow: 'L/s',
      flow: 'L/min',
      flowPerHour: 'L/h',
      flowPerDay: 'L/day',
      volume: 'L',
      pressure: 'kPa',
      area: 'm²',
      depthPerDay: 'mm/day',
      volumePerDay: 'L/day',
    });
    expect(us).toEqual({
      length: 'ft',
      chainage: 'ft',
      elevation: 'ft',
      head: 'ft',
      diameter: 'in',
      velocity: 'ft/s',
      designFlow: 'US gpm',
      flow: 'US gpm',
      flowPerHour: 'US gal/h',
      flowPerDay: 'US gal/day',
      volume: 'US gal',
      pressure: 'psi',
      area: 'ft²',
      depthPerDay: 'in/week',
      volumePerDay: 'US gal/day',
    });
  });

  it('gives the line designer its labels from the same table', () => {
    expect(displayUnits('us')).toEqual({
      system: 'us',
      length: 'ft',
      head: 'ft',
      pressure: 'psi',
      flow: 'US gpm',
      diameter: 'in',
      velocity: 'ft/s',
    });
    expect(displayUnits('metric').flow).toBe(unitOf('designFlow', 'metric'));
    expect(unitSystemName('metric')).toBe('Metric (m, L/s, kPa)');
    expect(unitSystemName('us')).toBe('US customary (ft, US gpm, psi)');
  });
});

describe('the one number rule', () => {
  it('groups thousands with commas, keeps the decimals asked for, and never prints -0', () => {
    expect(formatNumber(1234567.891, 2)).toBe('1,234,567.89');
    expect(formatNumber(-1234.5, 0)).toBe('-1,235');
    expect(formatNumber(-0.04, 1)).toBe('0.0');
    expect(formatNumber(-0, 0)).toBe('0');
    expect(formatPlainNumber(1234.56, 1)).toBe('1234.6');
  });

  it('shows a value that is not a number as a dash', () => {
    expect(formatNumber(Number.NaN, 1)).toBe('—');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('—');
    expect(formatQuantity('head', Number.NaN, 'metric')).toBe('— m');
  });

  it('picks fewer decimals as the number grows when asked for auto', () => {
    expect([0.12345, 1.2345, 12.345, 123.45, 12_345.6].map((v) => formatNumber(v))).toEqual([
      '0.123',
      '1.23',
      '12.3',
      '123',
      '12,346',
    ]);
  });

  it('always prints text that reads back to the value within half the last place', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -1e9, max: 1e9, noNaN: true }),
        fc.integer({ min: 0, max: 4 }),
        (value, decimals) => {
          const text = formatNumber(value, decimals);
          expect(text).toMatch(
            decimals === 0 ? /^-?\d{1,3}(,\d{3})*$/ : new RegExp(`^-?\\d{1,3}(,\\d{3})*\\.\\d{${decimals}}$`),
          );
          expect(Math.abs(Number(text.replace(/,/g, '')) - value)).toBeLessThanOrEqual(
            0.5 * 10 ** -decimals * (1 + 1e-9) + Math.abs(value) * 1e-15,
          );
        },
      ),
    );
  });
});

describe('values with their units, the same on every screen', () => {
  it('chainage, lengths and heads (what the line designer and survey routes show)', () => {
    expect(formatQuantity('chainage', 1234.5, 'metric')).toBe('1,234.5 m');
    expect(formatQuantity('chainage', 4050 * 0.3048, 'us')).toBe('4,050 ft');
    expect(formatQuantity('length', 1402.6, 'metric')).toBe('1,402.6 m');
    expect(formatQuantity('length', 304.8, 'us', 0)).toBe('1,000 ft');
    expect(formatQuantity('elevation', 316.524, 'metric')).toBe('316.52 m'); // elevations to the hundredth, as a level book writes them
    expect(formatQuantity('headLoss', 3.456, 'metric')).toBe('3.46 m');
    expect(formatQuantity('depth', 0.762, 'us')).toBe('2.50 ft');
    expect(formatQuantity('head', 42.13, 'metric')).toBe('42.1 m');
  });

  it('head with its pressure: 10 m of water at 20 °C is 97.9 kPa (ρ 998.2 kg/m³, g 9.80665 m/s²)', () => {
    // Density of water at 20 °C, 998.2 kg/m³: from memory (CRC Handbook of Chemistry and Physics table, rounded).
    expect(formatHeadPressure(10, 'metric', 20)).toBe('10.0 m (98 kPa)');
    expect(formatHeadPressure(10, 'us', 20)).toBe('32.8 ft (14.2 psi)');
    expect(formatPressureOfHead(10, 'metric', 20)).toBe('98 kPa');
  });

  it('flows, velocities, pressures and temperatures', () => {
    expect(formatQuantity('designFlow', 1e-3, 'metric')).toBe('1.00 L/s');
    expect(formatQuantity('designFlow', 1e-3, 'us')).toBe(`${(1e-3 / (3.785411784e-3 / 60)).toFixed(1)} US gpm`);
    expect(formatQuantity('flow', 2.6e-3 / 60, 'metric')).toBe('2.60 L/min');
    expect(formatQuantity('flowPerDay', 3.7 / 86_400, 'metric')).toBe('3,700 L/day');
    expect(formatQuantity('velocity', 0.7654, 'metric')).toBe('0.77 m/s');
    expect(formatQuantity('pressure', 800_000, 'metric')).toBe('800 kPa');
    expect(formatQuantity('pressure', 800_000, 'us')).toBe(`${(800_000 / 6894.757293168).toFixed(1)} psi`);
    expect(formatTemperature(20, 'metric')).toBe('20 °C');
    expect(formatTemperature(20, 'us')).toBe('68 °F (20 °C)');
    expect(formatTemperature(4, 'us')).toBe('39 °F (4 °C)'); // 4 × 9/5 + 32 = 39.2
    expect(fromDisplay('temperature', 68, 'us')).toBeCloseTo(20, 12);
    expect(toDisplay('temperature', 40, 'us')).toBeCloseTo(104, 12);
  });

  it('volumes, durations and shares (what lift & storage shows)', () => {
    expect(formatQuantity('volume', 1.25, 'us')).toBe(`${Math.round(1.25 / 3.785411784e-3)} US gal`);
    expect(formatQuantity('diameter', 0.0508, 'us', 2)).toBe('2.00 in');
    expect(formatDuration(90 * 60)).toBe('90 min');
    expect(formatDuration(8 * 3600)).toBe('8.0 h');
    expect(formatDuration(100 * 3600)).toBe('100 h (about 4.2 days)');
    expect(formatPercent(0.384)).toBe('38 %');
  });

  it('long distances in km or international miles (1 mi = 5,280 ft = 1,609.344 m, from memory)', () => {
    expect(formatDistance(1400, 'metric')).toBe('1.40 km');
    expect(formatDistance(999.6, 'metric')).toBe('1,000 m');
    expect(formatDistance(1609.344 * 2, 'us')).toBe('2.00 mi');
    expect(formatDistance(1609, 'us')).toBe('5,279 ft');
  });

  it('fills form inputs in the project unit, rounded to six figures, and leaves them empty for no value', () => {
    expect(inputValue('length', 0.3048 * 70, 'us')).toBe('70');
    expect(inputValue('flow', 20e-3 / 60, 'metric')).toBe('20');
    expect(inputValue('head', null, 'metric')).toBe('');
  });
});
