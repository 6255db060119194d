import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';
import { HydraulicsInputError } from '../errors';

export interface RamDeliveryOptions {
  /** Drive flow through the pump, m³/s. */
  driveFlowM3s: number;
  /** Fall from source water level to the pump, m. */
  fallM: number;
  /** Delivery head above the pump (lift plus delivery-pipe friction), m. */
  deliveryHeadM: number;
  /** D'Aubuisson efficiency q·h / (Q·H), fraction. */
  efficiency: number;
}

/**
 * Delivered flow q = e · Q · H / h, m³/s: the energy balance of the ram with D'Aubuisson's
 * efficiency. Water for the World RWS.4.D.5 writes the same as D = S · F · E / L.
 */
export function ramDeliveredFlowM3s({ driveFlowM3s, fallM, deliveryHeadM, efficiency }: RamDeliveryOptions): number {
  assertNonNegative(driveFlowM3s, 'driveFlowM3s');
  assertPositive(fallM, 'fallM');
  assertPositive(deliveryHeadM, 'deliveryHeadM');
  assertNonNegative(efficiency, 'efficiency');
  if (efficiency > 1)
    throw new HydraulicsInputError('efficiency', `must be a fraction no greater than 1, got ${efficiency}`);
  return (efficiency * driveFlowM3s * fallM) / deliveryHeadM;
}

export interface RamEfficiencyReadings {
  deliveredFlowM3s: number;
  /** Drive flow through the pump (delivered plus waste), m³/s. */
  driveFlowM3s: number;
  /** Supply head (fall), m. */
  fallM: number;
  /** Delivery head above the pump, m. */
  deliveryHeadM: number;
}

/** D'Aubuisson efficiency q·h / (Q·H): the form the published efficiency tables use. */
export function daubuissonEfficiency({
  deliveredFlowM3s,
  driveFlowM3s,
  fallM,
  deliveryHeadM,
}: RamEfficiencyReadings): number {
  assertNonNegative(deliveredFlowM3s, 'deliveredFlowM3s');
  assertPositive(driveFlowM3s, 'driveFlowM3s');
  assertPositive(fallM, 'fallM');
  assertPositive(deliveryHeadM, 'deliveryHeadM');
  return (deliveredFlowM3s * deliveryHeadM) / (driveFlowM3s * fallM);
}

/**
 * Rankine efficiency q·(h − H) / ((Q − q)·H): counts only the water lifted above the source against
 * the water spent. Lower than D'Aubuisson's; both are reported so readings compare with either table.
 */
export function rankineEfficiency({
  deliveredFlowM3s,
  driveFlowM3s,
  fallM,
  deliveryHeadM,
}: RamEfficiencyReadings): number {
  assertFiniteNumber(deliveredFlowM3s, 'deliveredFlowM3s');
  assertPositive(fallM, 'fallM');
  if (deliveredFlowM3s >= driveFlowM3s) {
    throw new HydraulicsInputError(
      'deliveredFlowM3s',
      'a ram cannot deliver all of its drive flow: the delivered flow must be less than the drive flow',
    );
  }
  if (deliveryHeadM <= fallM) throw new HydraulicsInputError('deliveryHeadM', 'must be above the fall');
  return (deliveredFlowM3s * (deliveryHeadM - fallM)) / ((driveFlowM3s - deliveredFlowM3s) * fallM);
}
