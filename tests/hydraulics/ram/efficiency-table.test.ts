import { describe, expect, it } from 'vitest';
import {
  BLAKE_RAM_EFFICIENCY_TABLE,
  RAM_EFFICIENCY_TABLE,
  RAM_EFFICIENCY_TABLES,
  ramEfficiencyForRatio,
} from '../../../hydraulics/ram/efficiency-table';

// Building Trades Pocketbook (International Textbook Co., c.1905), "The Hydraulic Ram" (core.md §4.1).
describe('ram efficiency table', () => {
  it.each([
    [4, 0.72],
    [6, 0.61],
    [8, 0.52],
    [10, 0.44],
    [12, 0.37],
    [14, 0.31],
    [16, 0.25],
    [18, 0.19],
    [20, 0.14],
    [22, 0.09],
    [24, 0.04],
  ])('lift/fall %d -> %d (Building Trades Pocketbook table)', (ratio, efficiency) => {
    expect(ramEfficiencyForRatio(ratio)).toEqual({ efficiency, position: 'in-table' });
  });

  it('the table ends at 26 with nothing delivered; beyond it the position says so', () => {
    expect(ramEfficiencyForRatio(26)).toEqual({ efficiency: 0, position: 'in-table' });
    expect(ramEfficiencyForRatio(40)).toEqual({ efficiency: 0, position: 'beyond-table' });
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
    for (let index = 1; index < points.length; index += 1)
      expect(points[index].efficiency).toBeLessThan(points[index - 1].efficiency);
  });
});

// Water for the World RWS.4.D.5, Table 1, Blake rams at 1 m fall (core.md §4.1): D = 144, 77, 65, 33,
// 29, 19.5, 12.5 L/day per L/min at lifts 5 ... 40 m; efficiency D·L/(1440·F).
describe('tested-ram table (Blake rams, Water for the World Table 1)', () => {
  it('a ram works at 40:1: 12.5 L/day per L/min at 1 m fall and 40 m lift is 35 % efficient; the table holds the 34 % of 15:1 there', () => {
    expect((12.5 * 40) / 1440).toBeCloseTo(0.347, 3);
    expect(ramEfficiencyForRatio(40, BLAKE_RAM_EFFICIENCY_TABLE)).toEqual({
      efficiency: (33 * 15) / 1440,
      position: 'in-table',
    });
    expect(ramEfficiencyForRatio(41, BLAKE_RAM_EFFICIENCY_TABLE).position).toBe('beyond-table');
  });

  it('starts at the printed 1 m / 5 m point, 50 %, and holds the lowest efficiency so far (safe side)', () => {
    expect(ramEfficiencyForRatio(5, BLAKE_RAM_EFFICIENCY_TABLE).efficiency).toBeCloseTo(0.5, 12);
    // 10 m lift prints 65 (45 %) after 7.5 m at 77 (40 %): the lower 40 % is kept.
    expect(ramEfficiencyForRatio(10, BLAKE_RAM_EFFICIENCY_TABLE).efficiency).toBeCloseTo((77 * 7.5) / 1440, 12);
    const { points } = BLAKE_RAM_EFFICIENCY_TABLE;
    for (let index = 1; index < points.length; index += 1)
      expect(points[index].efficiency).toBeLessThanOrEqual(points[index - 1].efficiency);
  });

  it('both tables can be chosen by id, each naming its source', () => {
    expect(Object.keys(RAM_EFFICIENCY_TABLES)).toEqual(['trade-pocketbook', 'tested-blake-rams']);
    expect(RAM_EFFICIENCY_TABLES['trade-pocketbook'].source).toMatch(/Building Trades Pocketbook/);
    expect(RAM_EFFICIENCY_TABLES['tested-blake-rams'].source).toMatch(/Water for the World/);
  });
});
