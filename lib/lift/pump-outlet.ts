import type { RamPlanResult } from '../../hydraulics/index';
import type { RamSiteRecord } from './records';

/** What the line designer reads of one ram site to start a delivery line at its pump outlet (SI). */
export interface PumpOutletHead {
  ramSiteId: string;
  name: string;
  tankId: string | null;
  tankName: string | null;
  /** Elevation of the pump on the survey datum, m; null when the ram site does not give it. */
  pumpElevationM: number | null;
  /** Pressure head at the pump outlet while the ram delivers, m: lift plus delivery-pipe friction. */
  workingHeadM: number;
  liftM: number;
  deliveryFrictionM: number;
  deliveredFlowM3s: number;
  deliveredM3PerDay: number;
  /** Time to fill the ram's tank from empty with its outlets shut, s (null without a tank). */
  tankFillTimeS: number | null;
  tankVolumeM3: number | null;
  efficiency: number;
  efficiencyBasis: 'table' | 'measured';
  efficiencySource: string;
  /**
   * Head the pump can build against a shut delivery line (fall + drive surge), m: rate the pipe near the pump for it.
   */
  peakHeadAtPumpM: number;
  /** The ram site's own delivery pipe rating as head, m (null when not known). */
  deliveryRatingHeadM: number | null;
  caution: string;
}

/** The line designer's view of a planned ram site. */
export function pumpOutletHeadOf(
  site: RamSiteRecord,
  tank: { name: string } | null,
  plan: RamPlanResult,
): PumpOutletHead {
  return {
    ramSiteId: site.id,
    name: site.name,
    tankId: site.tankId,
    tankName: tank?.name ?? null,
    pumpElevationM: site.pumpElevationM ?? null,
    workingHeadM: plan.deliveryHeadM,
    liftM: site.liftM,
    deliveryFrictionM: plan.deliveryFrictionM,
    deliveredFlowM3s: plan.deliveredFlowM3s,
    deliveredM3PerDay: plan.deliveredM3PerDay,
    tankFillTimeS: plan.tankFill?.fillTimeS ?? null,
    tankVolumeM3: plan.tankFill?.volumeM3 ?? null,
    efficiency: plan.efficiency,
    efficiencyBasis: plan.efficiencyBasis,
    efficiencySource: plan.efficiencySource,
    peakHeadAtPumpM: plan.surge.peakHeadAtPumpM,
    deliveryRatingHeadM: plan.surge.deliveryRatingHeadM,
    caution: plan.caution,
  };
}
