import { GRAVITY_MS2 } from '../constants';
import { darcyFrictionFactorUnchecked, darcyLossExponentUnchecked } from '../friction/darcy-weisbach';
import { pipeAreaM2 } from '../friction/pipe-flow';

/**
 * Slope floor of any link's loss, m per m³/s: a link with no friction and no fittings (a bare valve)
 * still loses 1 mm of head at 1 m³/s, so the system stays well conditioned. Common practice, no
 * source (the gradient method needs some floor: Todini and Pilati 1988 [NET-TP88]).
 */
export const MIN_LOSS_GRADIENT = 1e-3;
/**
 * Below this mean velocity a link's loss is taken as linear in the flow (the chord of the real law
 * at this velocity), so a link with next to no flow keeps a finite, well-scaled conductance and
 * the iteration does not chase rounding noise. The loss there is below 1e-9 m on any real pipe.
 */
export const LINEAR_BELOW_VELOCITY_MS = 1e-6;
/** Resistance of a shut valve, m per m³/s: a closed link passes ~1e-12 m³/s per m of head. */
export const CLOSED_LINK_RESISTANCE = 1e12;

/** Friction law of one link with its constants folded in. */
export type LinkLaw =
  | { kind: 'hazen-williams'; resistance: number; exponent: number }
  | {
      kind: 'darcy-weisbach';
      lengthM: number;
      diameterM: number;
      relativeRoughness: number;
      kinematicViscosityM2s: number;
      /**
       * 1/√f of this link's last turbulent friction factor: the next Colebrook solve starts there
       * (a cache for speed only; the factor converges to the same tolerance from any start).
       */
      lastInverseSqrtF?: number;
    };

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
  const f = darcyFrictionFactorUnchecked(reynolds, law.relativeRoughness, law.lastInverseSqrtF);
  law.lastInverseSqrtF = 1 / Math.sqrt(f);
  return (Math.sign(q) * f * law.lengthM * velocity * velocity) / (law.diameterM * 2 * GRAVITY_MS2);
}

/** Writes the raw loss and slope of a link at flow `q` into `out` (no allocation on the solver's hot path). */
function rawLossAndGradientInto(out: LossAndGradient, law: LinkLaw, minor: number, q: number): void {
  const magnitude = Math.abs(q);
  if (magnitude === 0) {
    out.lossM = 0;
    out.gradient = 0;
    return;
  }
  const minorGradient = 2 * minor * magnitude;
  if (law.kind === 'hazen-williams') {
    // One power per call: r·|Q|^(n-1) gives both the loss (× Q) and the slope (× n).
    const perFlow = law.resistance * magnitude ** (law.exponent - 1);
    out.lossM = (perFlow + minor * magnitude) * q;
    out.gradient = law.exponent * perFlow + minorGradient;
    return;
  }
  const velocity = magnitude / pipeAreaM2(law.diameterM);
  const reynolds = (velocity * law.diameterM) / law.kinematicViscosityM2s;
  const f = darcyFrictionFactorUnchecked(reynolds, law.relativeRoughness, law.lastInverseSqrtF);
  law.lastInverseSqrtF = 1 / Math.sqrt(f);
  const friction = (f * law.lengthM * velocity * velocity) / (law.diameterM * 2 * GRAVITY_MS2);
  out.lossM = Math.sign(q) * friction + minor * q * magnitude;
  // The exact slope, friction factor's change with the flow included: a full Newton step.
  out.gradient =
    (darcyLossExponentUnchecked(reynolds, law.relativeRoughness, f) * friction) / magnitude + minorGradient;
}

/**
 * Loss and slope of a link (friction plus minor loss `minor`·Q|Q|) written into `out`. Hazen-Williams
 * has the exact slope n·r·|Q|^(n-1); Darcy-Weisbach the exact slope with the friction factor's own
 * change (`darcyLossExponentUnchecked`), so the gradient method keeps Newton's quadratic
 * convergence (Todini & Pilati 1988). Below `linearBelowM3s` the loss
 * is linear (see {@link LINEAR_BELOW_VELOCITY_MS}); the slope never falls below {@link MIN_LOSS_GRADIENT}.
 */
export function lossAndGradientInto(
  out: LossAndGradient,
  law: LinkLaw,
  minor: number,
  q: number,
  linearBelowM3s = 0,
): LossAndGradient {
  if (Math.abs(q) < linearBelowM3s) {
    rawLossAndGradientInto(out, law, minor, linearBelowM3s);
    const chord = Math.max(out.lossM / linearBelowM3s, MIN_LOSS_GRADIENT);
    out.lossM = chord * q;
    out.gradient = chord;
    return out;
  }
  rawLossAndGradientInto(out, law, minor, q);
  if (out.gradient < MIN_LOSS_GRADIENT) {
    out.lossM = MIN_LOSS_GRADIENT * q;
    out.gradient = MIN_LOSS_GRADIENT;
  }
  return out;
}

/** {@link lossAndGradientInto} returning a fresh object (outside the solver's loops). */
export function lossAndGradient(law: LinkLaw, minor: number, q: number, linearBelowM3s = 0): LossAndGradient {
  return lossAndGradientInto({ lossM: 0, gradient: 0 }, law, minor, q, linearBelowM3s);
}
