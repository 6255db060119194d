import { PSI_PA } from '../constants';
import { pressurePaToHeadM } from '../units';
import type { RamCheckContext } from './feasibility';
import { CLEMSON, metres, NO_SOURCE } from './rule-sources';
import type { PlanCheck } from './plan-check';

/** Back-pressure a ram needs to start: 10 psi (Clemson), as head of water at 20 °C. */
export const MIN_START_BACK_PRESSURE_HEAD_M = pressurePaToHeadM(10 * PSI_PA);

/** Back-pressure to start, and the delivery pipe's rating against working head and surge. */
export function headRules(context: RamCheckContext): PlanCheck[] {
  const checks: PlanCheck[] = [];
  if (context.liftM < MIN_START_BACK_PRESSURE_HEAD_M) {
    checks.push({
      code: 'too-little-back-pressure',
      severity: 'error',
      values: { headM: context.liftM, limitHeadM: MIN_START_BACK_PRESSURE_HEAD_M },
      message: `The delivery line holds only ${metres(context.liftM)} m of head above the pump; a ram needs about 10 psi (${metres(MIN_START_BACK_PRESSURE_HEAD_M)} m) of back-pressure to start and keep beating.`,
      fix: 'Raise the delivery outlet (a riser or a higher tank) so the full delivery line stands at least 7 m above the pump.',
      source: CLEMSON,
    });
  }
  const rating = context.deliveryRatingHeadM;
  if (rating === null) {
    checks.push({
      code: 'delivery-rating-unknown',
      severity: 'info',
      values: { headM: context.peakHeadAtPumpM },
      message: `The delivery pipe rating is not known; the pump can build about ${metres(context.peakHeadAtPumpM)} m against a shut delivery line.`,
      fix: 'Choose a catalogue pipe or enter its pressure rating.',
      source: NO_SOURCE,
    });
    return checks;
  }
  if (context.deliveryHeadM > rating) {
    checks.push({
      code: 'delivery-rating-below-working-head',
      severity: 'error',
      values: { headM: context.deliveryHeadM, limitHeadM: rating },
      message: `Working head at the pump is ${metres(context.deliveryHeadM)} m but the delivery pipe is rated for ${metres(rating)} m.`,
      fix: 'Use a higher pressure class for the delivery pipe, at least near the pump.',
      source: NO_SOURCE,
    });
  } else if (context.peakHeadAtPumpM > rating) {
    checks.push({
      code: 'surge-over-delivery-rating',
      severity: 'warning',
      values: { headM: context.peakHeadAtPumpM, limitHeadM: rating },
      message: `If the delivery line is shut while the ram runs, the pump can build about ${metres(context.peakHeadAtPumpM)} m (fall plus a·v/g of the drive column), above the delivery pipe's ${metres(rating)} m rating.`,
      fix: 'Never shut the delivery line while the ram runs (stop the ram first), fit a relief valve at the pump, or use a higher class near the pump.',
      source: 'Joukowsky ΔH = a·ΔV/g (J. Evans, "Water Hammer: What & Why", Pumps & Systems, Sept 2017)',
    });
  }
  return checks;
}
