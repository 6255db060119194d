import { describe, expect, it } from 'vitest';
import { darcyWeisbachHeadLoss } from '../../../hydraulics/friction/darcy-weisbach';
import { driveColumnSurge, RAM_DRIVE_ROUGHNESS_M, RAM_DRIVE_WAVE_SPEEDS_MS } from '../../../hydraulics/ram/drive-surge';
import { waterKinematicViscosityM2s } from '../../../hydraulics/water';

const areaOf = (diameterM: number) => (Math.PI * diameterM ** 2) / 4;
const G = 9.80665;

describe('driveColumnSurge (Joukowsky a·v/g at the closing velocity)', () => {
  it('New Dawn Engineering: stopping the drive column gives about 153 m per 1 m/s (a ≈ 1500 m/s)', () => {
    const diameter = 0.05;
    // Mean 0.5 m/s over the beat: the valve shuts at 1 m/s (core.md §4.4), well under the free-flow speed of a 10 m
    // fall.
    const surge = driveColumnSurge({
      driveFlowM3s: areaOf(diameter) * 0.5,
      drivePipeInsideDiameterM: diameter,
      drivePipeLengthM: 20,
      fallM: 10,
      waveSpeedMs: 1500,
    });
    expect(surge.meanDriveVelocityMs).toBeCloseTo(0.5, 12);
    expect(surge.driveVelocityMs).toBeCloseTo(1, 12);
    expect(surge.surgeHeadM).toBeCloseTo(153, 0);
  });

  it('core.md §5 regression: a = 300 m/s, ΔV = 1 m/s -> 30.6 m (closing at twice a 0.5 m/s mean)', () => {
    const surge = driveColumnSurge({
      driveFlowM3s: areaOf(0.04) * 0.5,
      drivePipeInsideDiameterM: 0.04,
      drivePipeLengthM: 14,
      fallM: 2,
      waveSpeedMs: 300,
    });
    expect(surge.surgeHeadM).toBeCloseTo(30.6, 1);
  });

  it('the valve shuts at the peak, not the mean: the surge is twice what the mean velocity gives (uniform acceleration from rest)', () => {
    const meanMs = 0.6;
    const surge = driveColumnSurge({
      driveFlowM3s: areaOf(0.035) * meanMs,
      drivePipeInsideDiameterM: 0.035,
      drivePipeLengthM: 14,
      fallM: 2,
      waveSpeedMs: 1386,
    });
    expect(surge.surgeHeadM).toBeCloseTo((1386 * 2 * meanMs) / G, 9);
  });

  it('never closes faster than the column flows with the valve held open: fall = V²/2g + Darcy friction at V', () => {
    // A long thin drive pipe under a 1 m fall: the free-flow speed is below twice the mean.
    const d = 0.02;
    const surge = driveColumnSurge({
      driveFlowM3s: areaOf(d) * 0.3,
      drivePipeInsideDiameterM: d,
      drivePipeLengthM: 60,
      fallM: 1,
      waveSpeedMs: 1386,
      roughnessM: 0.15e-3,
      temperatureC: 10,
    });
    const v = surge.freeFlowVelocityMs;
    expect(v).toBeLessThan(1);
    expect(surge.driveVelocityMs).toBeCloseTo(v, 12);
    const friction = darcyWeisbachHeadLoss({
      flowM3s: areaOf(d) * v,
      lengthM: 60,
      diameterM: d,
      roughnessM: 0.15e-3,
      kinematicViscosityM2s: waterKinematicViscosityM2s(10),
    });
    expect(v ** 2 / (2 * G) + friction).toBeCloseTo(1, 6);
  });

  it('takes the drive-pipe friction off the fall: 10 L/s in 1 km of 100 mm smooth pipe loses 14.235 m (core.md §8.3 [C]; ±0.1 %)', () => {
    const surge = driveColumnSurge({
      driveFlowM3s: 0.01,
      drivePipeInsideDiameterM: 0.1,
      drivePipeLengthM: 1000,
      fallM: 20,
      waveSpeedMs: 1386,
      roughnessM: 1.5e-6,
      temperatureC: 20,
    });
    expect(Math.abs(surge.driveFrictionM - 14.235) / 14.235).toBeLessThan(1e-3);
    expect(surge.netFallM).toBeCloseTo(20 - surge.driveFrictionM, 12);
  });

  it('documented default wave speeds and roughness: steel is stiffest and roughest, PE softest', () => {
    expect(RAM_DRIVE_WAVE_SPEEDS_MS.steel).toBe(1386);
    expect(RAM_DRIVE_WAVE_SPEEDS_MS.pvc).toBe(369);
    expect(RAM_DRIVE_WAVE_SPEEDS_MS.pe).toBe(293);
    // Idelchik, ordinary galvanization 0.10-0.15 mm (via fluids [R16]); smooth plastic 1.5 µm [R19].
    expect(RAM_DRIVE_ROUGHNESS_M.steel).toBe(0.15e-3);
    expect(RAM_DRIVE_ROUGHNESS_M.pe).toBe(1.5e-6);
  });
});
