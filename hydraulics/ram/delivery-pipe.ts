import { assertPipeSpec } from '../catalogue/guard';
import { assertNonNegative, assertPositive } from '../input-guards';
import { hazenWilliamsHeadLoss } from '../friction/hazen-williams';
import { pressurePaToHeadM } from '../units';
import type { RamDeliveryPipe } from './plan-types';

export interface DeliveryPipeHydraulics {
  /** Friction head loss at a flow, m. */
  frictionM: (flowM3s: number) => number;
  /** Rating as head of water, m (null when not known). */
  ratingHeadM: number | null;
}

/** Normalises the two ways of giving a delivery pipe into a friction function and a rating. */
export function deliveryPipeHydraulics(deliveryPipe: RamDeliveryPipe): DeliveryPipeHydraulics {
  assertNonNegative(deliveryPipe.lengthM, 'deliveryPipe.lengthM');
  const { lengthM } = deliveryPipe;
  if ('pipe' in deliveryPipe) {
    assertPipeSpec(deliveryPipe.pipe, 'deliveryPipe.pipe');
    const { insideDiameterM, hazenWilliamsC, pressureRatingPa } = deliveryPipe.pipe;
    return {
      frictionM: (flowM3s) =>
        hazenWilliamsHeadLoss({ flowM3s, lengthM, diameterM: insideDiameterM, c: hazenWilliamsC }),
      ratingHeadM: pressurePaToHeadM(pressureRatingPa),
    };
  }
  assertPositive(deliveryPipe.insideDiameterM, 'deliveryPipe.insideDiameterM');
  assertPositive(deliveryPipe.hazenWilliamsC, 'deliveryPipe.hazenWilliamsC');
  if (deliveryPipe.pressureRatingPa !== undefined)
    assertPositive(deliveryPipe.pressureRatingPa, 'deliveryPipe.pressureRatingPa');
  const { insideDiameterM, hazenWilliamsC, pressureRatingPa } = deliveryPipe;
  return {
    frictionM: (flowM3s) => hazenWilliamsHeadLoss({ flowM3s, lengthM, diameterM: insideDiameterM, c: hazenWilliamsC }),
    ratingHeadM: pressureRatingPa === undefined ? null : pressurePaToHeadM(pressureRatingPa),
  };
}
