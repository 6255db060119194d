import { describe, expect, it } from 'vitest';
import { driveColumnSurge, RAM_DRIVE_WAVE_SPEEDS_MS } from '../../../hydraulics/ram/drive-surge';

const areaOf = (diameterM: number) => (Math.PI * diameterM ** 2) / 4;

describe('driveColumnSurge (Joukowsky a·v/g)', () => {
  it('New Dawn Engineering: stopping the drive column gives about 153 m per 1 m/s (a ≈ 1500 m/s)', () => {
    const diameter = 0.05;
    const surge = driveColumnSurge({ driveFlowM3s: areaOf(diameter) * 1, drivePipeInsideDiameterM: diameter, waveSpeedMs: 1500 });
    expect(surge.driveVelocityMs).toBeCloseTo(1, 12);
    expect(surge.surgeHeadM).toBeCloseTo(153, 0);
  });

  it('core.md §5 regression: a = 300 m/s, ΔV = 1 m/s -> 30.6 m', () => {
    const surge = driveColumnSurge({ driveFlowM3s: areaOf(0.04), drivePipeInsideDiameterM: 0.04, waveSpeedMs: 300 });
    expect(surge.surgeHeadM).toBeCloseTo(30.6, 1);
  });

  it('documented default wave speeds: steel is stiffest, PE softest', () => {
    expect(RAM_DRIVE_WAVE_SPEEDS_MS.steel).toBe(1386);
    expect(RAM_DRIVE_WAVE_SPEEDS_MS.pvc).toBe(369);
    expect(RAM_DRIVE_WAVE_SPEEDS_MS.pe).toBe(293);
  });
});
