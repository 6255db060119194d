import { HydraulicsInputError, type LineFlow, type LineStart } from '../../hydraulics/index';
import type { PumpOutletHead } from '../lift/pump-outlet';
import type { LineNetworkFlows } from '../network/line-flows';

/**
 * What a line reads from the rest of its project at each analysis: the ram sites that can feed it,
 * the site's frost depth, and what the network says feeds it (its start and flow per piece).
 */
export interface LineSiteContext {
  ramOutlets: PumpOutletHead[];
  /** Depth frost reaches at the site, m; null when the project does not say. */
  frostDepthM: number | null;
  /** The project's unit system, for words about the design (metric when not known). */
  unitSystem?: 'metric' | 'us';
  /** Due date of the earliest open drain-down task that is past due, ISO date; null when none. */
  overdueDrainDownOn?: string | null;
  /** The network's word on this line, when it was asked (the line page, its analysis and report). */
  network?: LineNetworkFlows | null;
}

export const EMPTY_SITE_CONTEXT: LineSiteContext = { ramOutlets: [], frostDepthM: null, overdueDrainDownOn: null };

/** A ram plan turned into the core's pump start. */
export interface RamLineStart {
  outlet: PumpOutletHead;
  start: Extract<LineStart, { kind: 'pump' }>;
  /** Elevation the heads are measured from, m. */
  pumpElevationM: number;
  /** Where that elevation came from: the ram site, or the ground at the line's first station when the site has none. */
  pumpElevationFrom: 'ram-site' | 'line-start';
}

/**
 * The start of a delivery line at a ram pump outlet. While delivering, the grade at the outlet is
 * the pump elevation plus the working head (lift plus delivery friction); with the line shut the
 * ram keeps beating until the pressure reaches its peak head (fall plus drive surge), so that is
 * the static grade the pipe near the pump must be rated for.
 */
export function lineStartFromRam(outlet: PumpOutletHead, lineStartGroundM: number): RamLineStart {
  const known = outlet.pumpElevationM !== null;
  const pumpElevationM = known ? outlet.pumpElevationM! : lineStartGroundM;
  return {
    outlet,
    pumpElevationM,
    pumpElevationFrom: known ? 'ram-site' : 'line-start',
    start: {
      kind: 'pump',
      outletHeadM: pumpElevationM + outlet.workingHeadM,
      shutoffHeadM: pumpElevationM + Math.max(outlet.peakHeadAtPumpM, outlet.workingHeadM),
    },
  };
}

/**
 * The ram feeding a design, or null when the line is not fed by one. Throws when the ram site is gone or cannot be
 * planned.
 */
export function ramStartOf(
  start: LineStart | { kind: 'ram-site'; ramSiteId: string },
  context: LineSiteContext,
  lineStartGroundM: number,
): RamLineStart | null {
  if (start.kind !== 'ram-site') return null;
  const outlet = context.ramOutlets.find((o) => o.ramSiteId === start.ramSiteId);
  if (!outlet) {
    throw new HydraulicsInputError(
      'start.ramSiteId',
      'the ram site feeding this line is gone or has no workable plan; fix it on the Lift & storage page or pick another start',
    );
  }
  return lineStartFromRam(outlet, lineStartGroundM);
}

/** The core's flow for a design: the ram's delivered flow when the design asks for it. */
export function flowFromRam(flow: LineFlow | { kind: 'pump-delivery' }, ram: RamLineStart | null): LineFlow {
  if (flow.kind !== 'pump-delivery') return flow;
  if (!ram)
    throw new HydraulicsInputError(
      'flow.kind',
      'the flow can come from the ram only when the line starts at a ram pump outlet',
    );
  return { kind: 'design', flowM3s: ram.outlet.deliveredFlowM3s };
}
