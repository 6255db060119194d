export {
  type PlanCheck,
  type PlanCheckCode,
  type PlanCheckSeverity,
  type PlanCheckValues,
  passesChecks,
} from './plan-check';
export {
  BLAKE_RAM_EFFICIENCY_TABLE,
  RAM_EFFICIENCY_TABLE,
  RAM_EFFICIENCY_TABLES,
  ramEfficiencyForRatio,
  type RamEfficiencyLookup,
  type RamEfficiencyTable,
  type RamEfficiencyTableId,
} from './efficiency-table';
export { RAM_SIZE_CLASSES, suggestRamSizeClass, type RamSizeClass } from './size-classes';
export {
  ramDeliveredFlowM3s,
  daubuissonEfficiency,
  rankineEfficiency,
  type RamDeliveryOptions,
  type RamEfficiencyReadings,
} from './delivery-formula';
export {
  driveColumnSurge,
  RAM_DRIVE_WAVE_SPEEDS_MS,
  RAM_DRIVE_WAVE_SPEED_SOURCE,
  type RamDriveMaterial,
  type DriveSurgeOptions,
  type DriveSurgeResult,
} from './drive-surge';
export {
  ramFeasibilityChecks,
  MIN_SUPPLY_TO_DELIVERY_RATIO,
  DRIVE_LENGTH_TO_FALL_RANGE,
  DRIVE_LENGTH_TO_DIAMETER_RANGE,
  MIN_FALL_M,
  type RamCheckContext,
} from './feasibility';
export { MIN_START_BACK_PRESSURE_HEAD_M } from './feasibility-heads';
export { deliveryPipeHydraulics, type DeliveryPipeHydraulics } from './delivery-pipe';
export { solveDeliveredFlow, type DeliverySolveOptions, type DeliverySolveResult } from './solve-delivery';
export type { RamDrivePipe, RamDeliveryPipe, RamPlanOptions, RamPlanResult } from './plan-types';
export { planRamPump, RAM_PLAN_CAUTION } from './plan-ram';
export {
  commissioningResult,
  TYPICAL_RAM_BEATS_PER_MINUTE,
  type CommissioningReading,
  type CommissioningOptions,
  type CommissioningResult,
} from './commissioning';
export { RAM_COMMISSIONING_CHECKLIST, RAM_TROUBLESHOOTING_NOTES, type RamFieldNote } from './commissioning-notes';
