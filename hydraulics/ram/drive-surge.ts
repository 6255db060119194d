import { pipeAreaM2 } from '../friction/pipe-flow';
import { assertNonNegative, assertPositive } from '../input-guards';
import { GRAVITY_MS2 } from '../constants';
import { darcyFrictionFactorUnchecked, darcyWeisbachHeadLossUnchecked } from '../friction/darcy-weisbach';
import { joukowskyHeadRise } from '../surge/joukowsky';
import { waterKinematicViscosityM2s } from '../water';

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

/**
 * Roughness of each drive material for the drive-pipe friction, m: galvanised steel 0.15 mm (Idelchik,
 * ordinary galvanization, upper value, via fluids [R16]); PVC and PE smooth, 1.5 µm (Hydraulic
 * Institute as quoted [R19]); a custom pipe is taken as rough as steel (more friction, less fall: the
 * safe side for delivery). core.md §1.5.
 */
export const RAM_DRIVE_ROUGHNESS_M: Readonly<Record<RamDriveMaterial, number>> = {
  steel: 0.15e-3,
  pvc: 1.5e-6,
  pe: 1.5e-6,
  custom: 0.15e-3,
};

/** Closing velocity over the beat's mean (core.md §4.4: uniform acceleration from rest). */
export const PEAK_TO_MEAN_DRIVE_VELOCITY = 2;

export interface DriveSurgeOptions {
  /** Drive flow through one pump, mean over the beat, m³/s. */
  driveFlowM3s: number;
  drivePipeInsideDiameterM: number;
  drivePipeLengthM: number;
  /** Fall from the source water level to the pump, m. */
  fallM: number;
  waveSpeedMs: number;
  /** Absolute roughness of the drive pipe, m. @default RAM_DRIVE_ROUGHNESS_M.steel */
  roughnessM?: number;
  /** Water temperature, °C (viscosity). @default 10 */
  temperatureC?: number;
}

export interface DriveSurgeResult {
  /** Mean drive velocity over the beat, m/s. */
  meanDriveVelocityMs: number;
  /** Velocity of the column when the waste valve shuts, m/s (the one the surge uses). */
  driveVelocityMs: number;
  /** Velocity the column would reach with the waste valve held open, m/s: no beat can exceed it. */
  freeFlowVelocityMs: number;
  /** Drive-pipe friction at the mean drive flow, m. */
  driveFrictionM: number;
  /** Fall less the drive-pipe friction: the head that drives the ram, m. */
  netFallM: number;
  waveSpeedMs: number;
  /** Head rise when the waste valve stops the drive column, m (Joukowsky a·v/g at the closing velocity). */
  surgeHeadM: number;
}

/** Steady velocity with the valve open: fall = (1 + f·L/D)·V²/2g, solved by fixed point. */
function freeFlowVelocityMs(
  fallM: number,
  lengthM: number,
  diameterM: number,
  roughnessM: number,
  viscosityM2s: number,
): number {
  let velocity = Math.sqrt(2 * GRAVITY_MS2 * fallM);
  for (let i = 0; i < 50; i += 1) {
    const f = darcyFrictionFactorUnchecked((velocity * diameterM) / viscosityM2s, roughnessM / diameterM);
    const next = Math.sqrt((2 * GRAVITY_MS2 * fallM) / (1 + (f * lengthM) / diameterM));
    if (Math.abs(next - velocity) < 1e-12) return next;
    velocity = next;
  }
  return velocity;
}

/**
 * Head rise from stopping the drive column (Joukowsky ΔH = a·ΔV/g, core.md §5) at the velocity the
 * waste valve shuts at: twice the beat's mean (the column accelerates from rest), never above the
 * free-flow velocity (core.md §4.4). The valve slams shut in far less than 2L/a, so the full rise
 * applies: this is the head the ram can build against a shut delivery line. The drive-pipe friction
 * at the mean flow is taken off the fall (`netFallM`).
 */
export function driveColumnSurge(options: DriveSurgeOptions): DriveSurgeResult {
  const { driveFlowM3s, drivePipeInsideDiameterM: diameterM, drivePipeLengthM: lengthM, fallM, waveSpeedMs } = options;
  const roughnessM = options.roughnessM ?? RAM_DRIVE_ROUGHNESS_M.steel;
  assertNonNegative(driveFlowM3s, 'driveFlowM3s');
  assertPositive(diameterM, 'drivePipe.insideDiameterM');
  assertPositive(lengthM, 'drivePipe.lengthM');
  assertPositive(fallM, 'fallM');
  assertPositive(waveSpeedMs, 'drivePipe.waveSpeedMs');
  assertNonNegative(roughnessM, 'drivePipe.roughnessM');
  const viscosityM2s = waterKinematicViscosityM2s(options.temperatureC ?? 10);
  const meanDriveVelocityMs = driveFlowM3s / pipeAreaM2(diameterM);
  const driveFrictionM = darcyWeisbachHeadLossUnchecked(driveFlowM3s, lengthM, diameterM, roughnessM, viscosityM2s);
  const freeFlow = freeFlowVelocityMs(fallM, lengthM, diameterM, roughnessM, viscosityM2s);
  const driveVelocityMs = Math.max(
    meanDriveVelocityMs,
    Math.min(PEAK_TO_MEAN_DRIVE_VELOCITY * meanDriveVelocityMs, freeFlow),
  );
  return {
    meanDriveVelocityMs,
    driveVelocityMs,
    freeFlowVelocityMs: freeFlow,
    driveFrictionM,
    netFallM: fallM - driveFrictionM,
    waveSpeedMs,
    surgeHeadM: joukowskyHeadRise({ waveSpeedMs, velocityChangeMs: driveVelocityMs }),
  };
}
