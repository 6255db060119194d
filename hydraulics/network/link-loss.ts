import { GRAVITY_MS2 } from '../constants';
import { darcyFrictionFactorUnchecked } from '../friction/darcy-weisbach';
import { pipeAreaM2 } from '../friction/pipe-flow';

/**
 * Below this slope of the head-loss curve (m per m³/s) a link is treated as linear, so a link with
 * no flow still has a finite conductance in the gradient method. The same device as the small-flow
 * linearisation of Rossman, "EPANET 2 Users Manual" (EPA/600/R-00/057, 2000), Appendix D.
 */
export const MIN_LOSS_GRADIENT = 1e-7;
/** Resistance of a shut valve, m per m³/s: a closed link passes ~1e-12 m³/s per m of head. */
export const CLOSED_LINK_RESISTANCE = 1e12;

/** Friction law of one link with its constants folded in. */
export type LinkLaw =
  | { kind: 'hazen-williams'; resistance: number; exponent: number }
  | { kind: 'darcy-weisbach'; lengthM: number; diameterM: number; relativeRoughness: number; kinematicViscosityM2s: number };

/** Head loss of a link and its slope at one flow. */
export interface LossAndGradient {
  /** Head loss from -> to, m (sign of the flow). */
  lossM: number;
  /** d(loss)/dQ, m per m³/s, never below {@link MIN_LOSS_GRADIENT}. */
  gradient: number;
}

/** Coefficient m of the minor loss m·Q|Q| for a total K in a pipe of `diameterM`. */
export function minorLossCoefficient(kTotal: number, diameterM: number): number {
  const area = pipeAreaM2(diameterM);
  return kTotal / (2 * GRAVITY_MS2 * area * area);
}

/** Friction part of the loss at flow `q`, m. */
export function frictionLossM(law: LinkLaw, q: number): number {
  if (q === 0) return 0;
  const magnitude = Math.abs(q);
  if (law.kind === 'hazen-williams') return Math.sign(q) * law.resistance * magnitude ** law.exponent;
  const area = pipeAreaM2(law.diameterM);
  const velocity = magnitude / area;
  const reynolds = (velocity * law.diameterM) / law.kinematicViscosityM2s;
  const f = darcyFrictionFactorUnchecked(reynolds, law.relativeRoughness);
  return (Math.sign(q) * f * law.lengthM * velocity * velocity) / (law.diameterM * 2 * GRAVITY_MS2);
}

/**
 * Loss and slope of a link (friction plus minor loss `minor`·Q|Q|). Hazen-Williams has the exact
 * slope n·r·|Q|^(n-1); for Darcy-Weisbach the friction factor is held for the step (slope 2h/Q,
 * h/Q when laminar), as the gradient method allows (Todini & Pilati 1988).
 */
export function lossAndGradient(law: LinkLaw, minor: number, q: number): LossAndGradient {
  const magnitude = Math.abs(q);
  const friction = frictionLossM(law, q);
  let gradient: number;
  if (magnitude === 0) gradient = 0;
  else if (law.kind === 'hazen-williams') gradient = law.exponent * law.resistance * magnitude ** (law.exponent - 1);
  else gradient = (2 * Math.abs(friction)) / magnitude;
  gradient += 2 * minor * magnitude;
  const lossM = friction + minor * q * magnitude;
  if (gradient < MIN_LOSS_GRADIENT) return { lossM: MIN_LOSS_GRADIENT * q, gradient: MIN_LOSS_GRADIENT };
  return { lossM, gradient };
}
