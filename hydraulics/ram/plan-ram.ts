import { HydraulicsInputError } from '../errors';
import { assertFraction, assertPositive, assertPositiveInteger } from '../input-guards';
import { tankFillTimeS } from '../storage/tank-fill';
import { deliveryPipeHydraulics } from './delivery-pipe';
import { ramDeliveredFlowM3s } from './delivery-formula';
import {
  driveColumnSurge,
  RAM_DRIVE_ROUGHNESS_M,
  RAM_DRIVE_WAVE_SPEED_SOURCE,
  RAM_DRIVE_WAVE_SPEEDS_MS,
} from './drive-surge';
import { RAM_EFFICIENCY_TABLE, ramEfficiencyForRatio } from './efficiency-table';
import { ramFeasibilityChecks } from './feasibility';
import { passesChecks } from './plan-check';
import type { RamPlanOptions, RamPlanResult } from './plan-types';
import { RAM_SIZE_CLASSES, suggestRamSizeClass } from './size-classes';
import { solveDeliveredFlow } from './solve-delivery';

/** Shown with every ram plan: the figures can hurt someone if trusted blindly. */
export const RAM_PLAN_CAUTION =
  "Planning figures only. A ram hammers its body and delivery pipe on every beat; pipe ratings, anchoring and relief must follow the makers' data, local codes and licensed practice. Check delivered flow by measurement at commissioning.";

function assertSiteInputs(options: RamPlanOptions): void {
  assertPositive(options.driveFlowM3s, 'driveFlowM3s');
  assertPositive(options.fallM, 'fallM');
  assertPositive(options.liftM, 'liftM');
  if (options.liftM <= options.fallM) {
    throw new HydraulicsInputError(
      'liftM',
      `must be above the fall (${options.fallM} m): water that only needs to go below the source can flow there by gravity`,
    );
  }
  if (!(options.drivePipe?.material in RAM_DRIVE_WAVE_SPEEDS_MS)) {
    throw new HydraulicsInputError(
      'drivePipe.material',
      `must be one of ${Object.keys(RAM_DRIVE_WAVE_SPEEDS_MS).join(', ')}`,
    );
  }
  assertPositive(options.drivePipe.lengthM, 'drivePipe.lengthM');
  assertPositive(options.drivePipe.insideDiameterM, 'drivePipe.insideDiameterM');
  if (options.measuredEfficiency !== undefined) assertFraction(options.measuredEfficiency, 'measuredEfficiency');
  if (options.tankVolumeM3 !== undefined) assertPositive(options.tankVolumeM3, 'tankVolumeM3');
}

/**
 * Plans a ram site: delivered and waste flow, efficiency from the lift-to-fall ratio with the
 * delivery-pipe friction included, surge at the pump, tank fill time and feasibility checks.
 */
export function planRamPump(options: RamPlanOptions): RamPlanResult {
  assertSiteInputs(options);
  const { driveFlowM3s, fallM, liftM, drivePipe, tankVolumeM3, measuredEfficiency } = options;
  const pumpCount = options.pumpCount ?? 1;
  assertPositiveInteger(pumpCount, 'pumpCount');
  const efficiencyTable = options.efficiencyTable ?? RAM_EFFICIENCY_TABLE;
  const sizeClass =
    options.sizeClassId === undefined ? undefined : RAM_SIZE_CLASSES.find((entry) => entry.id === options.sizeClassId);
  if (options.sizeClassId !== undefined && !sizeClass) {
    throw new HydraulicsInputError(
      'sizeClassId',
      `unknown size class "${options.sizeClassId}"; known: ${RAM_SIZE_CLASSES.map((entry) => entry.id).join(', ')}`,
    );
  }
  const availablePerPump = driveFlowM3s / pumpCount;
  const driveFlowPerPumpM3s = sizeClass ? Math.min(availablePerPump, sizeClass.maxDriveFlowM3s) : availablePerPump;
  const driveFlowUsedM3s = driveFlowPerPumpM3s * pumpCount;
  const waveSpeedMs = drivePipe.waveSpeedMs ?? RAM_DRIVE_WAVE_SPEEDS_MS[drivePipe.material];
  const surge = driveColumnSurge({
    driveFlowM3s: driveFlowPerPumpM3s,
    drivePipeInsideDiameterM: drivePipe.insideDiameterM,
    drivePipeLengthM: drivePipe.lengthM,
    fallM,
    waveSpeedMs,
    roughnessM: RAM_DRIVE_ROUGHNESS_M[drivePipe.material],
  });
  if (surge.netFallM <= 0) {
    throw new HydraulicsInputError(
      'drivePipe.insideDiameterM',
      `the drive pipe loses the whole fall (${fallM} m) to friction at this drive flow (${surge.driveFrictionM.toFixed(1)} m): use a wider drive pipe or less drive flow`,
    );
  }
  // The ram is driven by the fall less what the drive pipe loses on the way down.
  const drivingFallM = surge.netFallM;
  const efficiencyAt = (deliveryHeadM: number): number =>
    measuredEfficiency ?? ramEfficiencyForRatio(deliveryHeadM / drivingFallM, efficiencyTable).efficiency;
  const pipe = deliveryPipeHydraulics(options.deliveryPipe);
  const solved = solveDeliveredFlow({
    liftM,
    frictionM: pipe.frictionM,
    deliveredAtHeadM3s: (deliveryHeadM) =>
      ramDeliveredFlowM3s({
        driveFlowM3s: driveFlowUsedM3s,
        fallM: drivingFallM,
        deliveryHeadM,
        efficiency: efficiencyAt(deliveryHeadM),
      }),
  });
  const deliveredFlowM3s = solved.deliveredFlowM3s;
  const deliveryHeadM = liftM + solved.deliveryFrictionM;
  const peakHeadAtPumpM = fallM + surge.surgeHeadM;
  const checks = ramFeasibilityChecks({
    fallM,
    liftM,
    effectiveLiftToFallRatio: deliveryHeadM / drivingFallM,
    measuredEfficiency: measuredEfficiency !== undefined,
    efficiencyTable,
    sizeClass,
    suggestedClass: suggestRamSizeClass(availablePerPump),
    driveFlowAvailablePerPumpM3s: availablePerPump,
    driveFlowAvailableM3s: driveFlowM3s,
    deliveredFlowM3s,
    drivePipe: {
      lengthM: drivePipe.lengthM,
      insideDiameterM: drivePipe.insideDiameterM,
      rigid: drivePipe.rigid ?? drivePipe.material === 'steel',
    },
    deliveryHeadM,
    peakHeadAtPumpM,
    deliveryRatingHeadM: pipe.ratingHeadM,
  });
  return {
    pumpCount,
    sizeClassId: sizeClass?.id ?? null,
    driveFlowPerPumpM3s,
    driveFlowUsedM3s,
    unusedSourceFlowM3s: driveFlowM3s - driveFlowUsedM3s,
    deliveredFlowM3s,
    deliveredLPerMin: deliveredFlowM3s * 60_000,
    deliveredM3PerHour: deliveredFlowM3s * 3600,
    deliveredM3PerDay: deliveredFlowM3s * 86_400,
    wasteFlowM3s: driveFlowUsedM3s - deliveredFlowM3s,
    efficiency: efficiencyAt(deliveryHeadM),
    efficiencyBasis: measuredEfficiency === undefined ? 'table' : 'measured',
    efficiencySource: measuredEfficiency === undefined ? efficiencyTable.source : 'measured at commissioning',
    liftToFallRatio: liftM / fallM,
    effectiveLiftToFallRatio: deliveryHeadM / drivingFallM,
    deliveryFrictionM: solved.deliveryFrictionM,
    deliveryHeadM,
    tankFill:
      tankVolumeM3 !== undefined && deliveredFlowM3s > 0
        ? { volumeM3: tankVolumeM3, fillTimeS: tankFillTimeS({ volumeM3: tankVolumeM3, inflowM3s: deliveredFlowM3s }) }
        : null,
    surge: {
      ...surge,
      waveSpeedSource: drivePipe.waveSpeedMs === undefined ? RAM_DRIVE_WAVE_SPEED_SOURCE : 'entered',
      peakHeadAtPumpM,
      deliveryRatingHeadM: pipe.ratingHeadM,
    },
    checks,
    feasible: passesChecks(checks),
    caution: RAM_PLAN_CAUTION,
  };
}
