import { describe, expect, it } from 'vitest';
import { formatDuration, formatQuantity, fromDisplay, toDisplay, unitOf } from '@/lib/units/quantities';

describe('project units at the edge', () => {
  // Exact by definition (international yard and pound agreement, 1959; US gallon = 231 in³; lbf = lb × g_n), as hydraulics/constants.ts.
  it('uses the exact unit definitions: 1 US gal = 3.785411784 L, 1 ft = 0.3048 m, 1 psi = 6.894757 kPa', () => {
    expect(toDisplay('volume', 3.785411784e-3, 'us')).toBeCloseTo(1, 12);
    expect(toDisplay('pressure', 6894.757293168, 'us')).toBeCloseTo(1, 9);
    expect(toDisplay('length', 0.3048, 'us')).toBeCloseTo(1, 12);
    expect(toDisplay('flow', 3.785411784e-3 / 60, 'us')).toBeCloseTo(1, 12);
  });

  it('round-trips every quantity in both systems', () => {
    for (const system of ['metric', 'us'] as const) {
      for (const quantity of ['length', 'elevation', 'head', 'bore', 'flow', 'flowPerHour', 'flowPerDay', 'volume', 'pressure', 'area', 'depthPerDay', 'volumePerDay'] as const) {
        expect(fromDisplay(quantity, toDisplay(quantity, 1.2345, system), system)).toBeCloseTo(1.2345, 12);
      }
    }
  });

  it('shows each value with its unit', () => {
    expect(formatQuantity('flowPerDay', 3.7 / 86_400, 'metric')).toBe('3,700 L/day');
    expect(formatQuantity('flow', 2.6e-3 / 60, 'metric')).toBe('2.60 L/min');
    expect(formatQuantity('volume', 1.25, 'us')).toBe(`${Math.round(1.25 / 3.785411784e-3)} US gal`);
    expect(unitOf('depthPerDay', 'us')).toBe('in/week');
  });

  it('writes durations in minutes, hours, then hours and days', () => {
    expect(formatDuration(90 * 60)).toBe('90 min');
    expect(formatDuration(8 * 3600)).toBe('8.0 h');
    expect(formatDuration(100 * 3600)).toBe('100 h (about 4.2 days)');
  });
});
