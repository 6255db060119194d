import { describe, expect, it } from 'vitest';
import { findLimitRanges } from '../../../hydraulics/index';

const f64 = (values: number[]) => Float64Array.from(values);

describe('findLimitRanges', () => {
  it('finds exact interpolated ends inside pieces', () => {
    const ranges = findLimitRanges({
      chainageM: f64([0, 10, 20]),
      valueM: f64([5, -5, 5]),
      dropAtPointM: null,
      limitM: 0,
      side: 'below',
    });
    expect(ranges).toEqual([{ fromM: 5, toM: 15, worstExcessM: 5, worstChainageM: 10 }]);
  });

  it('starts or ends a range at a point where the limit steps (per-stretch limits)', () => {
    const ranges = findLimitRanges({
      chainageM: f64([0, 10, 20]),
      valueM: f64([50, 60, 70]),
      dropAtPointM: null,
      limitM: f64([100, 55]),
      pieceStretch: Int32Array.from([0, 1]),
      side: 'above',
    });
    expect(ranges).toEqual([{ fromM: 10, toM: 20, worstExcessM: 15, worstChainageM: 20 }]);
  });

  it('ends a range at a point where the value drops (a tank reset)', () => {
    const ranges = findLimitRanges({
      chainageM: f64([0, 10, 20]),
      valueM: f64([80, 0, 30]),
      // Upstream of point 1 the value is 0 + 120 = 120 (before the reset).
      dropAtPointM: f64([0, 120, 0]),
      limitM: 100,
      side: 'above',
    });
    expect(ranges).toHaveLength(1);
    expect(ranges[0].fromM).toBeCloseTo(5, 12);
    expect(ranges[0].toM).toBe(10);
    expect(ranges[0].worstExcessM).toBe(20);
  });

  it('ignores an excess within the tolerance (a value placed exactly on the limit)', () => {
    const ranges = findLimitRanges({
      chainageM: f64([0, 10]),
      valueM: f64([100 + 1e-12, 90]),
      dropAtPointM: null,
      limitM: 100,
      side: 'above',
    });
    expect(ranges).toEqual([]);
  });
});
