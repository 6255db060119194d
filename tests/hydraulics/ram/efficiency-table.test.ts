import { describe, expect, it } from 'vitest';
import { RAM_EFFICIENCY_TABLE, ramEfficiencyForRatio } from '../../../hydraulics/ram/efficiency-table';

// Building Trades Pocketbook (International Textbook Co., c.1905), "The Hydraulic Ram" (core.md §4.1).
describe('ram efficiency table', () => {
  it.each([
    [4, 0.72], [6, 0.61], [8, 0.52], [10, 0.44], [12, 0.37], [14, 0.31],
    [16, 0.25], [18, 0.19], [20, 0.14], [22, 0.09], [24, 0.04],
  ])('lift/fall %d -> %d (Building Trades Pocketbook table)', (ratio, efficiency) => {
    expect(ramEfficiencyForRatio(ratio)).toEqual({ efficiency, position: 'in-table' });
  });

  it('the table ends at 26 with nothing delivered, and stays 0 beyond', () => {
    expect(ramEfficiencyForRatio(26)).toEqual({ efficiency: 0, position: 'beyond-table' });
    expect(ramEfficiencyForRatio(40).efficiency).toBe(0);
  });

  it('interpolates linearly between the printed points', () => {
    expect(ramEfficiencyForRatio(5).efficiency).toBeCloseTo(0.665, 12);
    expect(ramEfficiencyForRatio(15).efficiency).toBeCloseTo(0.28, 12);
    expect(ramEfficiencyForRatio(25).efficiency).toBeCloseTo(0.02, 12);
  });

  it('does not extrapolate upward below the first point', () => {
    expect(ramEfficiencyForRatio(2)).toEqual({ efficiency: 0.72, position: 'below-table' });
  });

  it('same source: "about 1/7 of the supply to 5 times the fall" agrees with the table within 10 %', () => {
    const deliveredShare = ramEfficiencyForRatio(5).efficiency / 5;
    expect(Math.abs(deliveredShare - 1 / 7) / (1 / 7)).toBeLessThan(0.1);
  });

  it('efficiency never rises with the ratio (monotone table)', () => {
    const { points } = RAM_EFFICIENCY_TABLE;
    for (let index = 1; index < points.length; index += 1) expect(points[index].efficiency).toBeLessThan(points[index - 1].efficiency);
  });
});
