import { DEFAULT_WATER_TEMPERATURE_C, GRAVITY_MS2 } from '../constants';
import { HydraulicsInputError } from '../errors';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';
import { assertPipeSpec } from '../catalogue/guard';
import type { PipeSpec } from '../catalogue/pipe-spec';
import { waterKinematicViscosityM2s } from '../water';
import { LAMINAR_LIMIT_RE, TURBULENT_LIMIT_RE } from './darcy-weisbach';
import { hazenWilliamsFlowM3s } from './hazen-williams';
import { pipeHeadLossM, type FrictionMethod } from './head-loss';
import { minorLossHeadM } from './minor-losses';
import { pipeAreaM2 } from './pipe-flow';

/** Options for {@link flowForHeadLoss}. */
export interface FlowForHeadLossOptions {
  method: FrictionMethod;
  /** Available friction head over the length, m; negative gives a reverse flow. */
  headLossM: number;
  lengthM: number;
  pipe: PipeSpec;
  /** @default 20 */
  temperatureC?: number;
}

/**
 * Flow, m³/s, that a pipe carries when friction uses `headLossM` over `lengthM`.
 * Hazen-Williams: closed form. Darcy-Weisbach: with the loss known, V√f = √(2gDS) is known, so
 * Colebrook gives 1/√f explicitly (exact in the turbulent range); laminar likewise; a flow in the
 * 2000-4000 transition band is found by bisection on the (monotone) head-loss curve.
 */
export function flowForHeadLoss({
  method,
  headLossM,
  lengthM,
  pipe,
  temperatureC = DEFAULT_WATER_TEMPERATURE_C,
}: FlowForHeadLossOptions): number {
  assertFiniteNumber(headLossM, 'headLossM');
  assertPositive(lengthM, 'lengthM');
  assertPipeSpec(pipe, 'pipe');
  if (method === 'hazen-williams') {
    return hazenWilliamsFlowM3s({ headLossM, lengthM, diameterM: pipe.insideDiameterM, c: pipe.hazenWilliamsC });
  }
  if (method !== 'darcy-weisbach') {
    throw new HydraulicsInputError('method', `must be 'hazen-williams' or 'darcy-weisbach', got ${String(method)}`);
  }
  if (headLossM === 0) return 0;
  const flow = darcyFlowForPositiveLoss(Math.abs(headLossM), lengthM, pipe, temperatureC);
  return headLossM > 0 ? flow : -flow;
}

function darcyFlowForPositiveLoss(headLossM: number, lengthM: number, pipe: PipeSpec, temperatureC: number): number {
  const diameter = pipe.insideDiameterM;
  const viscosity = waterKinematicViscosityM2s(temperatureC);
  const area = pipeAreaM2(diameter);
  const slope = headLossM / lengthM;

  const velocityTimesRootF = Math.sqrt(2 * GRAVITY_MS2 * diameter * slope);
  const inverseRootF =
    -2 * Math.log10(pipe.roughnessM / diameter / 3.7 + (2.51 * viscosity) / (diameter * velocityTimesRootF));
  const turbulentVelocity = velocityTimesRootF * inverseRootF;
  if ((turbulentVelocity * diameter) / viscosity >= TURBULENT_LIMIT_RE) return turbulentVelocity * area;

  const laminarVelocity = (GRAVITY_MS2 * diameter * diameter * slope) / (32 * viscosity);
  if ((laminarVelocity * diameter) / viscosity < LAMINAR_LIMIT_RE) return laminarVelocity * area;

  let low = (LAMINAR_LIMIT_RE * viscosity * area) / diameter;
  let high = (TURBULENT_LIMIT_RE * viscosity * area) / diameter;
  for (let iteration = 0; iteration < 200 && high - low > 1e-15 * high; iteration += 1) {
    const middle = 0.5 * (low + high);
    const loss = pipeHeadLossM({ method: 'darcy-weisbach', flowM3s: middle, lengthM, pipe, temperatureC });
    if (loss < headLossM) low = middle;
    else high = middle;
  }
  return 0.5 * (low + high);
}

/** Options for {@link smallestPipeForFlow}. */
export interface SmallestPipeOptions {
  method: FrictionMethod;
  /** Design flow, m³/s (≥ 0). */
  flowM3s: number;
  lengthM: number;
  /** Head the stretch may lose to friction and fittings, m. */
  headBudgetM: number;
  /** Pipes to choose from (e.g. one catalogue series); any order. */
  candidates: readonly PipeSpec[];
  /** Sum of fitting loss coefficients on the stretch. @default 0 */
  kTotal?: number;
  /** @default 20 */
  temperatureC?: number;
}

/** The chosen pipe and what it does at the design flow. */
export interface SmallestPipeResult {
  pipe: PipeSpec;
  /** Friction plus fitting loss at the design flow, m. */
  headLossM: number;
  velocityMs: number;
}

/**
 * The candidate with the smallest inside diameter whose friction plus fitting loss at `flowM3s`
 * stays within `headBudgetM`; undefined when none does. Pressure class and velocity limits are
 * separate checks.
 */
export function smallestPipeForFlow({
  method,
  flowM3s,
  lengthM,
  headBudgetM,
  candidates,
  kTotal = 0,
  temperatureC = DEFAULT_WATER_TEMPERATURE_C,
}: SmallestPipeOptions): SmallestPipeResult | undefined {
  assertNonNegative(flowM3s, 'flowM3s');
  assertNonNegative(lengthM, 'lengthM');
  assertNonNegative(headBudgetM, 'headBudgetM');
  assertNonNegative(kTotal, 'kTotal');
  candidates.forEach((candidate, index) => assertPipeSpec(candidate, 'candidates', index));
  const bySize = [...candidates].sort((a, b) => a.insideDiameterM - b.insideDiameterM);
  for (const pipe of bySize) {
    const velocityMs = flowM3s / pipeAreaM2(pipe.insideDiameterM);
    const headLossM =
      pipeHeadLossM({ method, flowM3s, lengthM, pipe, temperatureC }) + minorLossHeadM({ kTotal, velocityMs });
    if (headLossM <= headBudgetM) return { pipe, headLossM, velocityMs };
  }
  return undefined;
}
