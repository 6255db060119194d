import {
  findPipe,
  planRamPump,
  RAM_EFFICIENCY_TABLES,
  type RamDeliveryPipe,
  type RamPlanOptions,
  type RamPlanResult,
} from '../../hydraulics/index';
import type { RamSiteInput } from '../validations/ram-sites';
import { outcomeOf } from './outcome';
import type { Outcome, RouteOption } from './records';

export interface RamPlanContext {
  /** Surveyed routes; the delivery length is read from the chosen one. */
  routes: readonly RouteOption[];
  /** Volume of the tank the site delivers to, m³ (for the fill time). */
  tankVolumeM3: number | null;
}

/** Delivery pipe length, m: the chosen route's surveyed length, else the length entered. */
export function deliveryLengthM(site: RamSiteInput, routes: readonly RouteOption[]): number {
  const route = site.deliveryPipe.routeId
    ? routes.find((candidate) => candidate.id === site.deliveryPipe.routeId)
    : undefined;
  return route?.lengthM ?? site.deliveryPipe.lengthM ?? 0;
}

function deliveryPipeOf(site: RamSiteInput, lengthM: number): RamDeliveryPipe {
  const { pipeId, insideDiameterM, hazenWilliamsC, pressureRatingPa } = site.deliveryPipe;
  const pipe = pipeId ? findPipe(pipeId) : undefined;
  if (pipe) return { lengthM, pipe };
  return {
    lengthM,
    insideDiameterM: insideDiameterM ?? Number.NaN,
    hazenWilliamsC: hazenWilliamsC ?? Number.NaN,
    ...(pressureRatingPa !== null ? { pressureRatingPa } : {}),
  };
}

/** A stored or typed ram site as the planner's options (SI). */
export function ramPlanOptions(
  site: RamSiteInput,
  context: RamPlanContext,
  overrides: { ignoreMeasuredEfficiency?: boolean } = {},
): RamPlanOptions {
  const { drivePipe } = site;
  return {
    driveFlowM3s: site.driveFlowM3s,
    fallM: site.fallM,
    liftM: site.liftM,
    drivePipe: {
      lengthM: drivePipe.lengthM,
      insideDiameterM: drivePipe.insideDiameterM,
      material: drivePipe.material,
      ...(drivePipe.rigid !== null ? { rigid: drivePipe.rigid } : {}),
    },
    deliveryPipe: deliveryPipeOf(site, deliveryLengthM(site, context.routes)),
    ...(site.sizeClassId ? { sizeClassId: site.sizeClassId } : {}),
    pumpCount: site.pumpCount,
    efficiencyTable: RAM_EFFICIENCY_TABLES[site.efficiencyTableId],
    ...(site.measuredEfficiency !== null && !overrides.ignoreMeasuredEfficiency
      ? { measuredEfficiency: site.measuredEfficiency }
      : {}),
    ...(context.tankVolumeM3 !== null ? { tankVolumeM3: context.tankVolumeM3 } : {}),
  };
}

/** The ram plan of a site, or why it cannot be planned. */
export function planRamSite(site: RamSiteInput, context: RamPlanContext): Outcome<RamPlanResult> {
  return outcomeOf(() => planRamPump(ramPlanOptions(site, context)));
}

/** The plan with the published efficiency table, for comparing measured readings with (null without an override). */
export function tablePlanOf(site: RamSiteInput, context: RamPlanContext): RamPlanResult | null {
  if (site.measuredEfficiency === null) return null;
  const outcome = outcomeOf(() => planRamPump(ramPlanOptions(site, context, { ignoreMeasuredEfficiency: true })));
  return outcome.ok ? outcome.value : null;
}
