import type { PipeSpec } from '../catalogue/pipe-spec';
import type { RamDriveMaterial } from './drive-surge';
import type { RamEfficiencyTable } from './efficiency-table';
import type { PlanCheck } from './plan-check';

/** The drive pipe from the source (or standpipe) down to the pump. */
export interface RamDrivePipe {
  lengthM: number;
  insideDiameterM: number;
  material: RamDriveMaterial;
  /** Whether the pipe is rigid. @default true for steel, false otherwise */
  rigid?: boolean;
  /** Pressure-wave speed, m/s. @default RAM_DRIVE_WAVE_SPEEDS_MS[material] */
  waveSpeedMs?: number;
}

/** The delivery pipe from the pump up to the outlet: a catalogue pipe, or bore and C directly. */
export type RamDeliveryPipe =
  | { lengthM: number; pipe: PipeSpec }
  | { lengthM: number; insideDiameterM: number; hazenWilliamsC: number; pressureRatingPa?: number };

export interface RamPlanOptions {
  /** Drive flow the source can give, m³/s (all pumps together). */
  driveFlowM3s: number;
  /** Fall from source water level to the pump, m. */
  fallM: number;
  drivePipe: RamDrivePipe;
  /** Static lift from the pump to the delivery outlet, m. */
  liftM: number;
  deliveryPipe: RamDeliveryPipe;
  /** Id of a RAM_SIZE_CLASSES entry; omitted, a class is suggested. */
  sizeClassId?: string;
  /** Pumps in parallel sharing the drive flow and one delivery pipe. @default 1 */
  pumpCount?: number;
  /** A measured D'Aubuisson efficiency that overrides the table, fraction. */
  measuredEfficiency?: number;
  /** @default RAM_EFFICIENCY_TABLE */
  efficiencyTable?: RamEfficiencyTable;
  /** Tank to report a fill time for, m³. */
  tankVolumeM3?: number;
}

export interface RamPlanResult {
  pumpCount: number;
  sizeClassId: string | null;
  /** Drive flow each pump runs on, m³/s (capped at its size class). */
  driveFlowPerPumpM3s: number;
  /** Drive flow all pumps use, m³/s. */
  driveFlowUsedM3s: number;
  /** Source flow the pumps cannot use, m³/s. */
  unusedSourceFlowM3s: number;
  deliveredFlowM3s: number;
  deliveredLPerMin: number;
  deliveredM3PerHour: number;
  deliveredM3PerDay: number;
  /** Drive water that leaves by the waste valves, m³/s. */
  wasteFlowM3s: number;
  efficiency: number;
  efficiencyBasis: 'table' | 'measured';
  efficiencySource: string;
  /** Static lift over fall. */
  liftToFallRatio: number;
  /** (Lift + delivery friction) over the fall less drive friction: the ratio the efficiency is read at. */
  effectiveLiftToFallRatio: number;
  deliveryFrictionM: number;
  /** Lift plus delivery-pipe friction at the delivered flow, m. */
  deliveryHeadM: number;
  tankFill: { volumeM3: number; fillTimeS: number } | null;
  surge: {
    /** Mean drive velocity over the beat, m/s. */
    meanDriveVelocityMs: number;
    /** Drive velocity when the waste valve shuts, m/s: the surge is worked out from it. */
    driveVelocityMs: number;
    /** Velocity with the waste valve held open, m/s (the cap on the closing velocity). */
    freeFlowVelocityMs: number;
    /** Drive-pipe friction at the mean drive flow, m. */
    driveFrictionM: number;
    /** Fall less the drive-pipe friction, m: the head that drives the ram. */
    netFallM: number;
    waveSpeedMs: number;
    waveSpeedSource: string;
    surgeHeadM: number;
    /** Head the pump can build against a shut delivery line: fall plus the surge, m. */
    peakHeadAtPumpM: number;
    /** Delivery pipe rating as head, m (null when not known). */
    deliveryRatingHeadM: number | null;
  };
  checks: PlanCheck[];
  /** True when no check is an error. */
  feasible: boolean;
  caution: string;
}
