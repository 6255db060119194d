import { DEFAULT_WATER_TEMPERATURE_C, GRAVITY_MS2 } from '../constants';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';
import { waterKinematicViscosityM2s } from '../water';
import { colebrookUnchecked } from './colebrook';
import { pipeAreaM2 } from './pipe-flow';
import { assertFrictionFactorOptions, MAX_RELATIVE_ROUGHNESS, type FrictionFactorOptions } from './swamee-jain';
import { HydraulicsInputError } from '../errors';

/** Below this Reynolds number flow is laminar: f = 64/Re. */
export const LAMINAR_LIMIT_RE = 2000;
/** From this Reynolds number on, Colebrook-White applies. */
export const TURBULENT_LIMIT_RE = 4000;

/**
 * Darcy friction factor over the whole range of Reynolds numbers:
 * - Re < 2000: laminar, f = 64/Re (Hagen-Poiseuille; e.g. 64/128 = 0.5, fluids docs [R16]);
 * - Re ≥ 4000: Colebrook-White;
 * - 2000 ≤ Re < 4000 (transition, no physical law): linear interpolation in Re between laminar
 *   at 2000 (f = 0.032) and Colebrook at 4000. Common practice, no source: it is continuous at both
 *   ends and keeps head loss increasing with flow, which the line solvers rely on. Head loss in this
 *   band is uncertain by tens of percent whatever the formula.
 */
export function darcyFrictionFactor(options: FrictionFactorOptions): number {
  assertFrictionFactorOptions(options);
  return darcyFrictionFactorUnchecked(options.reynolds, options.relativeRoughness);
}

/** Hot-path kernel of {@link darcyFrictionFactor}. */
export function darcyFrictionFactorUnchecked(
  reynolds: number,
  relativeRoughness: number,
  startInverseSqrtF = 0,
): number {
  if (reynolds < LAMINAR_LIMIT_RE) return 64 / reynolds;
  if (reynolds >= TURBULENT_LIMIT_RE) return colebrookUnchecked(reynolds, relativeRoughness, startInverseSqrtF);
  const laminarEnd = 64 / LAMINAR_LIMIT_RE;
  const turbulentStart = colebrookUnchecked(TURBULENT_LIMIT_RE, relativeRoughness);
  const fraction = (reynolds - LAMINAR_LIMIT_RE) / (TURBULENT_LIMIT_RE - LAMINAR_LIMIT_RE);
  return laminarEnd + fraction * (turbulentStart - laminarEnd);
}

/**
 * d ln h / d ln Q of the Darcy-Weisbach friction loss at this Reynolds number, given its friction
 * factor `f` (h ∝ f(Re)·Q² with Re ∝ Q): 1 in laminar flow, 2 + d ln f / d ln Re otherwise. On
 * Colebrook, with x = 1/√f and c = (2/ln 10)·(2.51/Re) / (ε/(3.7D) + 2.51·x/Re), implicit
 * differentiation gives d ln f / d ln Re = −2c/(1 + c); in the transition band f is linear in Re.
 * The network solver's Newton step needs this slope: 2h/Q alone makes it converge only linearly.
 */
export function darcyLossExponentUnchecked(reynolds: number, relativeRoughness: number, f: number): number {
  if (reynolds < LAMINAR_LIMIT_RE) return 1;
  if (reynolds >= TURBULENT_LIMIT_RE) {
    const b = 2.51 / reynolds;
    const c = ((2 / Math.LN10) * b) / (relativeRoughness / 3.7 + b / Math.sqrt(f));
    return 2 - (2 * c) / (1 + c);
  }
  const laminarEnd = 64 / LAMINAR_LIMIT_RE;
  const turbulentStart = colebrookUnchecked(TURBULENT_LIMIT_RE, relativeRoughness);
  return 2 + (reynolds * (turbulentStart - laminarEnd)) / ((TURBULENT_LIMIT_RE - LAMINAR_LIMIT_RE) * f);
}

/** Kinematic viscosity of water at 20 °C, m²/s: the default when none is given. */
export const DEFAULT_KINEMATIC_VISCOSITY_M2S = waterKinematicViscosityM2s(DEFAULT_WATER_TEMPERATURE_C);

/** Options for {@link darcyWeisbachHeadLoss}. */
export interface DarcyWeisbachOptions {
  /** Flow, m³/s; negative flow gives a negative loss. */
  flowM3s: number;
  lengthM: number;
  /** Inside diameter, m. */
  diameterM: number;
  /** Absolute roughness ε, m. */
  roughnessM: number;
  /** @default kinematic viscosity of water at 20 °C (≈1.004e-6 m²/s) */
  kinematicViscosityM2s?: number;
}

/** Friction head loss, m: h = f (L/D) V²/(2g), sign following the flow, 0 at zero flow. */
export function darcyWeisbachHeadLoss({
  flowM3s,
  lengthM,
  diameterM,
  roughnessM,
  kinematicViscosityM2s = DEFAULT_KINEMATIC_VISCOSITY_M2S,
}: DarcyWeisbachOptions): number {
  assertFiniteNumber(flowM3s, 'flowM3s');
  assertNonNegative(lengthM, 'lengthM');
  assertPositive(diameterM, 'diameterM');
  assertNonNegative(roughnessM, 'roughnessM');
  assertPositive(kinematicViscosityM2s, 'kinematicViscosityM2s');
  if (roughnessM > MAX_RELATIVE_ROUGHNESS * diameterM) {
    throw new HydraulicsInputError('roughnessM', `must be at most ${MAX_RELATIVE_ROUGHNESS} × diameterM`);
  }
  return darcyWeisbachHeadLossUnchecked(flowM3s, lengthM, diameterM, roughnessM, kinematicViscosityM2s);
}

/** Hot-path kernel of {@link darcyWeisbachHeadLoss}: inputs already validated, no allocation. */
export function darcyWeisbachHeadLossUnchecked(
  flowM3s: number,
  lengthM: number,
  diameterM: number,
  roughnessM: number,
  kinematicViscosityM2s: number,
): number {
  if (flowM3s === 0 || lengthM === 0) return 0;
  const velocity = flowM3s / pipeAreaM2(diameterM);
  const reynolds = (Math.abs(velocity) * diameterM) / kinematicViscosityM2s;
  const f = darcyFrictionFactorUnchecked(reynolds, roughnessM / diameterM);
  return (f * lengthM * velocity * Math.abs(velocity)) / (diameterM * 2 * GRAVITY_MS2);
}
