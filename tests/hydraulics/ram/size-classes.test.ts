import { describe, expect, it } from 'vitest';
import { RAM_SIZE_CLASSES, suggestRamSizeClass } from '../../../hydraulics/ram/size-classes';

const L_PER_MIN = 1e-3 / 60;

describe('ram size classes (Water for the World RWS.4.D.5 pipe sizing table, core.md §4.2)', () => {
  it.each([
    [30, 6, 36],
    [40, 37, 60],
    [50, 61, 90],
    [80, 91, 234],
    [100, 235, 360],
  ])('%d mm: %d-%d L/min', (mm, min, max) => {
    const sizeClass = RAM_SIZE_CLASSES.find((entry) => entry.drivePipeNominalMm === mm)!;
    expect(sizeClass.published).toEqual({ minLPerMin: min, maxLPerMin: max });
    expect(sizeClass.minDriveFlowM3s).toBeCloseTo(min * L_PER_MIN, 15);
    expect(sizeClass.maxDriveFlowM3s).toBeCloseTo(max * L_PER_MIN, 15);
    expect(sizeClass.note).toMatch(/uncertain/);
  });

  it('suggests the class holding a drive flow; a gap goes to the larger class; none outside the table', () => {
    expect(suggestRamSizeClass(20 * L_PER_MIN)?.id).toBe('drive-30mm');
    expect(suggestRamSizeClass(36.5 * L_PER_MIN)?.id).toBe('drive-40mm');
    expect(suggestRamSizeClass(400 * L_PER_MIN)).toBeUndefined();
    expect(suggestRamSizeClass(3 * L_PER_MIN)).toBeUndefined();
  });
});
