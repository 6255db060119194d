import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';
import { pipeAreaM2 } from './pipe-flow';

/**
 * Hazen-Williams friction loss, SI, in the exact form implied by the velocity equation
 * V = k · C · R^0.63 · S^0.54 with k = 0.849 (m, s) and R = D/4 (core.md §1.1: "Water Transmission
 * and Distribution Systems" slides [R18]). Solved for head loss this is
 *   h = 10.6742 · L · Q^1.85185 / (C^1.85185 · D^4.87037),
 * i.e. exponents 1/0.54 and 2.63/0.54. The rounded textbook form 10.67/1.852/4.8704 differs by
 * < 0.2 % at ordinary sizes. The exact form keeps the inverse (flow for a head loss) a closed form
 * that round-trips to machine precision. Hazen-Williams is empirical: water only, ordinary
 * temperatures, turbulent flow near 1 m/s (Engineering ToolBox [R20]).
 */
export const HAZEN_WILLIAMS_K_SI = 0.849;
export const HAZEN_WILLIAMS_SLOPE_EXPONENT = 0.54;
export const HAZEN_WILLIAMS_RADIUS_EXPONENT = 0.63;
export const HAZEN_WILLIAMS_FLOW_EXPONENT = 1 / HAZEN_WILLIAMS_SLOPE_EXPONENT;
export const HAZEN_WILLIAMS_DIAMETER_EXPONENT = (2 + HAZEN_WILLIAMS_RADIUS_EXPONENT) / HAZEN_WILLIAMS_SLOPE_EXPONENT;

/** Flow (m³/s) a full pipe carries at unit hydraulic slope: k · C · A · R^0.63. */
function flowAtUnitSlopeM3s(diameterM: number, c: number): number {
  return HAZEN_WILLIAMS_K_SI * c * pipeAreaM2(diameterM) * (0.25 * diameterM) ** HAZEN_WILLIAMS_RADIUS_EXPONENT;
}

/** Options for {@link hazenWilliamsHeadLoss}. */
export interface HazenWilliamsOptions {
  /** Flow, m³/s; negative flow gives a negative loss (flow against the chainage). */
  flowM3s: number;
  lengthM: number;
  /** Inside diameter, m. */
  diameterM: number;
  /** Hazen-Williams coefficient C. */
  c: number;
}

/** Friction head loss, m, by Hazen-Williams; sign follows the flow, 0 at zero flow. */
export function hazenWilliamsHeadLoss({ flowM3s, lengthM, diameterM, c }: HazenWilliamsOptions): number {
  assertFiniteNumber(flowM3s, 'flowM3s');
  assertNonNegative(lengthM, 'lengthM');
  assertPositive(diameterM, 'diameterM');
  assertPositive(c, 'c');
  return hazenWilliamsHeadLossUnchecked(flowM3s, lengthM, diameterM, c);
}

/** Hot-path kernel of {@link hazenWilliamsHeadLoss}: inputs already validated, no allocation. */
export function hazenWilliamsHeadLossUnchecked(flowM3s: number, lengthM: number, diameterM: number, c: number): number {
  if (flowM3s === 0 || lengthM === 0) return 0;
  const slope = (Math.abs(flowM3s) / flowAtUnitSlopeM3s(diameterM, c)) ** HAZEN_WILLIAMS_FLOW_EXPONENT;
  return flowM3s > 0 ? slope * lengthM : -slope * lengthM;
}

/** Options for {@link hazenWilliamsFlowM3s}. */
export interface HazenWilliamsFlowOptions {
  /** Head loss over the length, m; negative gives a negative (reverse) flow. */
  headLossM: number;
  lengthM: number;
  diameterM: number;
  c: number;
}

/** Flow, m³/s, that loses `headLossM` over `lengthM` (closed form of the velocity equation). */
export function hazenWilliamsFlowM3s({ headLossM, lengthM, diameterM, c }: HazenWilliamsFlowOptions): number {
  assertFiniteNumber(headLossM, 'headLossM');
  assertPositive(lengthM, 'lengthM');
  assertPositive(diameterM, 'diameterM');
  assertPositive(c, 'c');
  if (headLossM === 0) return 0;
  const flow = flowAtUnitSlopeM3s(diameterM, c) * (Math.abs(headLossM) / lengthM) ** HAZEN_WILLIAMS_SLOPE_EXPONENT;
  return headLossM > 0 ? flow : -flow;
}
