import { pipeAreaM2 } from '../friction/pipe-flow';
import { assertNonNegative, assertPositive } from '../demand/guards';
import { joukowskyHeadRise } from '../surge/joukowsky';

/** Drive-pipe material as the ram planner sees it. */
export type RamDriveMaterial = 'steel' | 'pvc' | 'pe' | 'custom';

/**
 * Documented wave speeds used when the caller gives none (core.md §5, Korteweg thin-wall
 * formula, computed regression values [C]): galvanised steel Sch 40 2-in (E = 207 GPa) 1386 m/s,
 * PVC DR 21 (E = 2.76 GPa) 369 m/s, HDPE DR 11 (E = 0.8 GPa) 293 m/s. A custom pipe uses the steel
 * value, the highest and so the safe side for surge.
 */
export const RAM_DRIVE_WAVE_SPEEDS_MS: Readonly<Record<RamDriveMaterial, number>> = {
  steel: 1386,
  pvc: 369,
  pe: 293,
  custom: 1386,
};

export const RAM_DRIVE_WAVE_SPEED_SOURCE =
  'Korteweg thin-wall formula with pipe moduli from memory (computed): steel Sch 40 2-in 1386 m/s, PVC DR 21 369 m/s, HDPE DR 11 293 m/s';

export interface DriveSurgeOptions {
  /** Drive flow through one pump, m³/s. */
  driveFlowM3s: number;
  drivePipeInsideDiameterM: number;
  waveSpeedMs: number;
}

export interface DriveSurgeResult {
  driveVelocityMs: number;
  waveSpeedMs: number;
  /** Head rise when the waste valve stops the drive column, m (Joukowsky a·v/g). */
  surgeHeadM: number;
}

/**
 * Head rise from stopping the drive column at once (Joukowsky ΔH = a·ΔV/g, core.md §5).
 * The waste valve slams shut in far less than 2L/a, so the full rise applies: this is the head
 * the ram can build against a shut delivery line.
 */
export function driveColumnSurge({ driveFlowM3s, drivePipeInsideDiameterM, waveSpeedMs }: DriveSurgeOptions): DriveSurgeResult {
  assertNonNegative(driveFlowM3s, 'driveFlowM3s');
  assertPositive(drivePipeInsideDiameterM, 'drivePipe.insideDiameterM');
  assertPositive(waveSpeedMs, 'drivePipe.waveSpeedMs');
  const driveVelocityMs = driveFlowM3s / pipeAreaM2(drivePipeInsideDiameterM);
  return { driveVelocityMs, waveSpeedMs, surgeHeadM: joukowskyHeadRise({ waveSpeedMs, velocityChangeMs: driveVelocityMs }) };
}
