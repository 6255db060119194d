import {
  commissioningResult,
  type CommissioningResult,
  type FlowMeasurement,
  pressurePaToHeadM,
  type RamPlanResult,
} from '../../hydraulics/index';
import type { CommissioningReadingInput } from '../validations/ram-sites';
import { outcomeOf } from './outcome';
import type { Outcome } from './records';

export interface CommissioningView extends CommissioningResult {
  /** Delivery head the efficiency was computed with, m (entered, or read from the pump gauge). */
  deliveryHeadM: number;
  driveBasis: 'measured-drive' | 'measured-waste' | 'planned';
  /** Efficiency the reading is compared with, fraction (the table plan's). */
  plannedEfficiency: number | null;
}

function measurement(volumeM3: number | null, seconds: number | null, flowM3s: number | null): FlowMeasurement {
  if (flowM3s !== null) return { flowM3s };
  return { bucket: { volumeM3: volumeM3 ?? Number.NaN, seconds: seconds ?? Number.NaN } };
}

/** The form field a core input error is about (the core names its own nested fields). */
function formField(coreField: string | undefined): string | undefined {
  if (coreField === undefined) return undefined;
  if (coreField.startsWith('reading.delivered')) return 'deliveredFlowM3s';
  if (coreField.startsWith('reading.drive')) return 'driveFlowM3s';
  if (coreField.startsWith('reading.')) return coreField.slice('reading.'.length);
  return coreField;
}

/** Measured efficiency of one reading, compared with the plan (the table's efficiency, not an override). */
export function commissioningOutcome(
  reading: CommissioningReadingInput,
  plan: RamPlanResult | null,
): Outcome<CommissioningView> {
  if (reading.driveMeasure === 'plan' && !plan) {
    return {
      ok: false,
      error: 'The drive flow was not measured and the site has no plan to take it from; measure the waste flow.',
      field: 'driveMeasure',
    };
  }
  const deliveryHeadM = reading.deliveryHeadM ?? pressurePaToHeadM(reading.pressureAtPumpPa ?? Number.NaN);
  const drivePart = measurement(reading.driveBucketVolumeM3, reading.driveBucketSeconds, reading.driveFlowM3s);
  const drive =
    reading.driveMeasure === 'waste'
      ? { wasteFlow: drivePart }
      : { driveFlow: reading.driveMeasure === 'drive' ? drivePart : { flowM3s: plan?.driveFlowUsedM3s ?? Number.NaN } };
  const outcome = outcomeOf((): CommissioningView => {
    const result = commissioningResult({
      reading: {
        beatsPerMinute: reading.beatsPerMinute,
        delivered: measurement(
          reading.deliveredBucketVolumeM3,
          reading.deliveredBucketSeconds,
          reading.deliveredFlowM3s,
        ),
        drive,
        supplyHeadM: reading.supplyHeadM,
        deliveryHeadM,
      },
      ...(plan && plan.efficiency > 0
        ? { plannedEfficiency: plan.efficiency, plannedDeliveredFlowM3s: plan.deliveredFlowM3s }
        : {}),
    });
    const driveBasis: CommissioningView['driveBasis'] =
      reading.driveMeasure === 'drive'
        ? 'measured-drive'
        : reading.driveMeasure === 'waste'
          ? 'measured-waste'
          : 'planned';
    return {
      ...result,
      deliveryHeadM,
      driveBasis,
      plannedEfficiency: plan && plan.efficiency > 0 ? plan.efficiency : null,
    };
  });
  return outcome.ok ? outcome : { ...outcome, field: formField(outcome.field) };
}
