import { assertNonNegative, assertPositive } from '../input-guards';
import { HydraulicsInputError } from '../errors';
import { measuredFlowM3s, type FlowMeasurement } from '../yield/bucket-flow';
import { daubuissonEfficiency, rankineEfficiency } from './delivery-formula';
import type { PlanCheck } from './plan-check';
import { NO_SOURCE, USDA_BULLETIN } from './rule-sources';

/** Beats per minute of an ordinary small ram (USDA bulletin p.27). */
export const TYPICAL_RAM_BEATS_PER_MINUTE = 60;

/** Readings taken at a running ram. */
export interface CommissioningReading {
  beatsPerMinute: number;
  /** Delivered flow, usually a bucket timed at the top. */
  delivered: FlowMeasurement;
  /** Either the drive flow itself, or the waste flow (drive = waste + delivered). */
  drive: { driveFlow: FlowMeasurement } | { wasteFlow: FlowMeasurement };
  /** Supply head (fall) at the time, m. */
  supplyHeadM: number;
  /** Delivery head above the pump, m (gauge at the pump, or lift plus friction). */
  deliveryHeadM: number;
}

export interface CommissioningOptions {
  reading: CommissioningReading;
  /** Efficiency the plan assumed, fraction, for the comparison. */
  plannedEfficiency?: number;
  /** Delivered flow the plan expected, m³/s. */
  plannedDeliveredFlowM3s?: number;
}

export interface CommissioningResult {
  deliveredFlowM3s: number;
  driveFlowM3s: number;
  wasteFlowM3s: number;
  /** D'Aubuisson efficiency q·h / (Q·H): compare with the plan's table efficiency. */
  measuredEfficiency: number;
  rankineEfficiency: number;
  deliveredPerBeatM3: number;
  /** Measured over planned efficiency (null without a plan). */
  efficiencyRatioToPlan: number | null;
  /** Measured over planned delivered flow (null without a plan). */
  deliveredRatioToPlan: number | null;
  checks: PlanCheck[];
}

/** Below this share of the planned efficiency the ram is reported as under-performing. */
const UNDER_PERFORMING_SHARE = 0.8;

/** Measured efficiency from commissioning readings, compared with the plan. */
export function commissioningResult({
  reading,
  plannedEfficiency,
  plannedDeliveredFlowM3s,
}: CommissioningOptions): CommissioningResult {
  assertPositive(reading.beatsPerMinute, 'reading.beatsPerMinute');
  assertPositive(reading.supplyHeadM, 'reading.supplyHeadM');
  assertPositive(reading.deliveryHeadM, 'reading.deliveryHeadM');
  if (plannedEfficiency !== undefined) assertPositive(plannedEfficiency, 'plannedEfficiency');
  if (plannedDeliveredFlowM3s !== undefined) assertNonNegative(plannedDeliveredFlowM3s, 'plannedDeliveredFlowM3s');
  const deliveredFlowM3s = measuredFlowM3s(reading.delivered, 'reading.delivered');
  const driveFlowM3s =
    'driveFlow' in reading.drive
      ? measuredFlowM3s(reading.drive.driveFlow, 'reading.drive.driveFlow')
      : measuredFlowM3s(reading.drive.wasteFlow, 'reading.drive.wasteFlow') + deliveredFlowM3s;
  if (deliveredFlowM3s >= driveFlowM3s) {
    throw new HydraulicsInputError(
      'reading.delivered',
      'the delivered flow must be less than the drive flow; check the bucket readings',
    );
  }
  const heads = { deliveredFlowM3s, driveFlowM3s, fallM: reading.supplyHeadM, deliveryHeadM: reading.deliveryHeadM };
  const measuredEfficiency = daubuissonEfficiency(heads);
  const efficiencyRatioToPlan = plannedEfficiency === undefined ? null : measuredEfficiency / plannedEfficiency;
  const checks: PlanCheck[] = [];
  if (
    plannedEfficiency !== undefined &&
    efficiencyRatioToPlan !== null &&
    efficiencyRatioToPlan < UNDER_PERFORMING_SHARE
  ) {
    checks.push({
      code: 'below-planned-efficiency',
      severity: 'warning',
      values: { efficiency: measuredEfficiency, plannedEfficiency },
      message: `Measured efficiency ${(measuredEfficiency * 100).toFixed(0)} % is well below the planned ${(plannedEfficiency * 100).toFixed(0)} %.`,
      fix: 'Look for air in the drive pipe, silt in the valves, a leaking delivery line, or a waste-valve stroke set too long or short.',
      source: NO_SOURCE,
    });
  }
  if (Math.abs(reading.beatsPerMinute - TYPICAL_RAM_BEATS_PER_MINUTE) > TYPICAL_RAM_BEATS_PER_MINUTE / 2) {
    checks.push({
      code: 'unusual-beat-rate',
      severity: 'info',
      values: { beatsPerMinute: reading.beatsPerMinute, typicalBeatsPerMinute: TYPICAL_RAM_BEATS_PER_MINUTE },
      message: `${reading.beatsPerMinute} beats a minute; an ordinary small ram beats about ${TYPICAL_RAM_BEATS_PER_MINUTE}.`,
      fix: 'Adjust the waste-valve stroke or weight and measure again.',
      source: USDA_BULLETIN,
    });
  }
  return {
    deliveredFlowM3s,
    driveFlowM3s,
    wasteFlowM3s: driveFlowM3s - deliveredFlowM3s,
    measuredEfficiency,
    rankineEfficiency: reading.deliveryHeadM > reading.supplyHeadM ? rankineEfficiency(heads) : 0,
    deliveredPerBeatM3: (deliveredFlowM3s * 60) / reading.beatsPerMinute,
    efficiencyRatioToPlan,
    deliveredRatioToPlan:
      plannedDeliveredFlowM3s === undefined || plannedDeliveredFlowM3s === 0
        ? null
        : deliveredFlowM3s / plannedDeliveredFlowM3s,
    checks,
  };
}
