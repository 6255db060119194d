import { RAM_EFFICIENCY_TABLES, type RamEfficiencyTable } from './efficiency-table';
import { headRules } from './feasibility-heads';
import { CLEMSON, metres, NO_SOURCE, USDA_BULLETIN, WATER_FOR_THE_WORLD } from './rule-sources';
import type { PlanCheck } from './plan-check';
import type { RamSizeClass } from './size-classes';

/** Supply should be at least this many times the delivered water (Water for the World). */
export const MIN_SUPPLY_TO_DELIVERY_RATIO = 7;
/** Drive pipe length as a multiple of the fall: about 7, may vary 5-10 (USDA bulletin). */
export const DRIVE_LENGTH_TO_FALL_RANGE = { min: 5, max: 10 } as const;
/** Drive pipe length over bore: about 150-1000 (Calvert; from memory). */
export const DRIVE_LENGTH_TO_DIAMETER_RANGE = { min: 150, max: 1000 } as const;
/** The pump must sit at least this far below the source (Water for the World). */
export const MIN_FALL_M = 0.5;

/** The numbers the feasibility rules look at. */
export interface RamCheckContext {
  fallM: number;
  liftM: number;
  effectiveLiftToFallRatio: number;
  measuredEfficiency: boolean;
  efficiencyTable: RamEfficiencyTable;
  sizeClass: RamSizeClass | undefined;
  suggestedClass: RamSizeClass | undefined;
  driveFlowAvailablePerPumpM3s: number;
  driveFlowAvailableM3s: number;
  deliveredFlowM3s: number;
  drivePipe: { lengthM: number; insideDiameterM: number; rigid: boolean };
  deliveryHeadM: number;
  peakHeadAtPumpM: number;
  deliveryRatingHeadM: number | null;
}

const lPerMin = (flowM3s: number): string => (flowM3s * 60_000).toFixed(1);

function efficiencyRules(context: RamCheckContext): PlanCheck[] {
  const { points, source } = context.efficiencyTable;
  const first = points[0].liftToFallRatio;
  const last = points[points.length - 1].liftToFallRatio;
  const ratio = context.effectiveLiftToFallRatio;
  if (ratio > last) {
    const lastEfficiency = points[points.length - 1].efficiency;
    const held =
      lastEfficiency > 0
        ? `its last efficiency (${Math.round(lastEfficiency * 100)} %) is held, not extrapolated`
        : 'it delivers nothing there';
    const wider = Object.values(RAM_EFFICIENCY_TABLES).find(
      (table) => table.points[table.points.length - 1].liftToFallRatio >= ratio,
    );
    const offerWider = wider !== undefined && wider.id !== context.efficiencyTable.id && !context.measuredEfficiency;
    return [
      {
        code: 'lift-ratio-beyond-table',
        severity: 'warning',
        values: {
          ratio,
          tableLabel: context.efficiencyTable.label,
          tableEndRatio: last,
          tableEndEfficiency: lastEfficiency,
          ...(offerWider
            ? {
                widerTableLabel: wider.label,
                widerTableEndRatio: wider.points[wider.points.length - 1].liftToFallRatio,
              }
            : {}),
        },
        message: `Delivery head is ${ratio.toFixed(1)} times the fall, beyond the end of the table in use ("${context.efficiencyTable.label}", up to ${last}); ${held}.`,
        fix: offerWider
          ? `Choose the "${wider.label}" table, which reaches ${wider.points[wider.points.length - 1].liftToFallRatio}:1, or measure the efficiency at commissioning; gaining fall or lifting in two stages also helps.`
          : 'Gain fall (set the pump lower or take the drive water from higher up), lower the tank, lift in two stages, or measure the efficiency at commissioning.',
        source,
      },
    ];
  }
  if (ratio < first) {
    return [
      {
        code: 'lift-ratio-below-table',
        severity: 'info',
        values: { ratio, tableLabel: context.efficiencyTable.label, tableStartRatio: first },
        message: `Delivery head is only ${ratio.toFixed(1)} times the fall; the table starts at ${first}, so its first efficiency is used rather than extrapolated.`,
        source,
      },
    ];
  }
  return [];
}

function driveFlowRules(context: RamCheckContext): PlanCheck[] {
  const checks: PlanCheck[] = [];
  const { sizeClass } = context;
  const perPump = context.driveFlowAvailablePerPumpM3s;
  if (sizeClass && perPump < sizeClass.minDriveFlowM3s) {
    checks.push({
      code: 'drive-flow-below-class',
      severity: 'error',
      values: {
        flowM3s: perPump,
        limitFlowM3s: sizeClass.minDriveFlowM3s,
        drivePipeNominalMm: sizeClass.drivePipeNominalMm,
      },
      message: `Each pump gets ${lPerMin(perPump)} L/min; a ${sizeClass.drivePipeNominalMm} mm ram needs at least ${sizeClass.published.minLPerMin} L/min.`,
      fix: 'Choose a smaller size class or fewer pumps in parallel.',
      source: sizeClass.source,
    });
  }
  if (sizeClass && perPump > sizeClass.maxDriveFlowM3s) {
    checks.push({
      code: 'drive-flow-above-class',
      severity: 'warning',
      values: {
        flowM3s: perPump,
        limitFlowM3s: sizeClass.maxDriveFlowM3s,
        drivePipeNominalMm: sizeClass.drivePipeNominalMm,
      },
      message: `Each pump could have ${lPerMin(perPump)} L/min but a ${sizeClass.drivePipeNominalMm} mm ram uses at most ${sizeClass.published.maxLPerMin} L/min; the rest is not used.`,
      fix: 'Add a pump in parallel or choose the next size class.',
      source: sizeClass.source,
    });
  }
  if (!sizeClass) {
    checks.push({
      code: 'no-size-class',
      severity: 'info',
      values: {
        flowM3s: perPump,
        ...(context.suggestedClass ? { drivePipeNominalMm: context.suggestedClass.drivePipeNominalMm } : {}),
      },
      message: context.suggestedClass
        ? `No size class chosen; ${lPerMin(perPump)} L/min per pump suits a ${context.suggestedClass.drivePipeNominalMm} mm ram.`
        : `No size class chosen, and ${lPerMin(perPump)} L/min per pump is outside every class in the table.`,
      source: context.suggestedClass?.source ?? WATER_FOR_THE_WORLD,
    });
  }
  if (
    context.deliveredFlowM3s > 0 &&
    context.driveFlowAvailableM3s < MIN_SUPPLY_TO_DELIVERY_RATIO * context.deliveredFlowM3s
  ) {
    checks.push({
      code: 'supply-below-7x-delivered',
      severity: 'warning',
      values: {
        ratio: context.driveFlowAvailableM3s / context.deliveredFlowM3s,
        minRatio: MIN_SUPPLY_TO_DELIVERY_RATIO,
        flowM3s: context.driveFlowAvailableM3s,
      },
      message: `The source gives ${(context.driveFlowAvailableM3s / context.deliveredFlowM3s).toFixed(1)} times the delivered flow; plan on at least ${MIN_SUPPLY_TO_DELIVERY_RATIO} times, so the delivered figure is optimistic.`,
      fix: 'Plan for less delivered water, or find more drive flow.',
      source: WATER_FOR_THE_WORLD,
    });
  }
  return checks;
}

function drivePipeRules(context: RamCheckContext): PlanCheck[] {
  const checks: PlanCheck[] = [];
  const { lengthM, insideDiameterM, rigid } = context.drivePipe;
  const lengthToFall = lengthM / context.fallM;
  const standpipeFix =
    'Put a standpipe or an open tank part-way down so the drive pipe below it has the right length (it ends the surge there).';
  if (lengthToFall < DRIVE_LENGTH_TO_FALL_RANGE.min || lengthToFall > DRIVE_LENGTH_TO_FALL_RANGE.max) {
    const tooLong = lengthToFall > DRIVE_LENGTH_TO_FALL_RANGE.max;
    checks.push({
      code: 'drive-length-vs-fall',
      severity: 'warning',
      values: {
        ratio: lengthToFall,
        minRatio: DRIVE_LENGTH_TO_FALL_RANGE.min,
        maxRatio: DRIVE_LENGTH_TO_FALL_RANGE.max,
        tooLong,
      },
      message: `Drive pipe is ${lengthToFall.toFixed(1)} times the fall; the usual range is ${DRIVE_LENGTH_TO_FALL_RANGE.min}-${DRIVE_LENGTH_TO_FALL_RANGE.max} (about 7).`,
      fix: tooLong
        ? `${standpipeFix} (${CLEMSON})`
        : 'Lengthen the drive pipe, or take the drive water from closer to the pump with less fall.',
      source: USDA_BULLETIN,
    });
  }
  const lengthToDiameter = lengthM / insideDiameterM;
  if (lengthToDiameter < DRIVE_LENGTH_TO_DIAMETER_RANGE.min || lengthToDiameter > DRIVE_LENGTH_TO_DIAMETER_RANGE.max) {
    const tooLong = lengthToDiameter > DRIVE_LENGTH_TO_DIAMETER_RANGE.max;
    checks.push({
      code: 'drive-length-vs-diameter',
      severity: 'warning',
      values: {
        ratio: lengthToDiameter,
        minRatio: DRIVE_LENGTH_TO_DIAMETER_RANGE.min,
        maxRatio: DRIVE_LENGTH_TO_DIAMETER_RANGE.max,
        tooLong,
      },
      message: `Drive pipe length is ${Math.round(lengthToDiameter)} bores; the usual range is ${DRIVE_LENGTH_TO_DIAMETER_RANGE.min}-${DRIVE_LENGTH_TO_DIAMETER_RANGE.max}.`,
      fix: tooLong ? standpipeFix : 'Lengthen the drive pipe or use a smaller bore.',
      source: 'from memory (Calvert; later work calls it a traditional rule of thumb)',
    });
  }
  if (!rigid) {
    checks.push({
      code: 'drive-pipe-not-rigid',
      severity: 'warning',
      values: {},
      message:
        'The drive pipe is not rigid: a flexible pipe swells with each beat, softens the surge and wastes the drive energy.',
      fix: 'Use rigid pipe (galvanised steel) for the drive pipe, firmly anchored and straight.',
      source: NO_SOURCE,
    });
  }
  if (context.fallM < MIN_FALL_M) {
    checks.push({
      code: 'fall-too-small',
      severity: 'error',
      values: { headM: context.fallM, limitHeadM: MIN_FALL_M },
      message: `The fall is ${metres(context.fallM)} m; the pump must sit at least ${MIN_FALL_M} m below the source.`,
      fix: 'Move the pump further downstream to gain fall.',
      source: WATER_FOR_THE_WORLD,
    });
  }
  return checks;
}

/** Every feasibility rule for a ram plan, with its reason, fix and source. */
export function ramFeasibilityChecks(context: RamCheckContext): PlanCheck[] {
  return [...efficiencyRules(context), ...driveFlowRules(context), ...drivePipeRules(context), ...headRules(context)];
}
