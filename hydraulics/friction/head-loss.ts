import { DEFAULT_WATER_TEMPERATURE_C } from '../constants';
import { HydraulicsInputError } from '../errors';
import { assertFiniteNumber, assertNonNegative, assertPositive } from '../input-guards';
import type { PipeSpec } from '../catalogue/pipe-spec';
import { waterKinematicViscosityM2s } from '../water';
import { darcyWeisbachHeadLossUnchecked } from './darcy-weisbach';
import { hazenWilliamsHeadLossUnchecked } from './hazen-williams';
import { MAX_RELATIVE_ROUGHNESS } from './swamee-jain';

export type FrictionMethod = 'hazen-williams' | 'darcy-weisbach';

/** Options for {@link pipeHeadLossM}. */
export interface PipeHeadLossOptions {
  method: FrictionMethod;
  /** Flow, m³/s, positive along increasing chainage. */
  flowM3s: number;
  lengthM: number;
  /** The pipe; only the fields the method needs are read (inside diameter, C or roughness). */
  pipe: Pick<PipeSpec, 'insideDiameterM' | 'hazenWilliamsC' | 'roughnessM'>;
  /**
   * Water temperature, °C (sets the viscosity for Darcy-Weisbach; Hazen-Williams has no temperature term). @default 20
   */
  temperatureC?: number;
}

/**
 * Friction head loss along one stretch of pipe, m: the one entry point the line profile uses.
 * Sign-aware (negative flow → negative loss), 0 at zero flow. Validates only what it reads so it
 * stays cheap on lines of 100,000 stations; a full `assertPipeSpec` belongs where the pipe enters.
 */
export function pipeHeadLossM({
  method,
  flowM3s,
  lengthM,
  pipe,
  temperatureC = DEFAULT_WATER_TEMPERATURE_C,
}: PipeHeadLossOptions): number {
  assertFiniteNumber(flowM3s, 'flowM3s');
  assertNonNegative(lengthM, 'lengthM');
  assertPositive(pipe.insideDiameterM, 'pipe.insideDiameterM');
  if (method === 'hazen-williams') {
    assertPositive(pipe.hazenWilliamsC, 'pipe.hazenWilliamsC');
    return hazenWilliamsHeadLossUnchecked(flowM3s, lengthM, pipe.insideDiameterM, pipe.hazenWilliamsC);
  }
  if (method === 'darcy-weisbach') {
    assertNonNegative(pipe.roughnessM, 'pipe.roughnessM');
    if (pipe.roughnessM > MAX_RELATIVE_ROUGHNESS * pipe.insideDiameterM) {
      throw new HydraulicsInputError('pipe.roughnessM', `must be at most ${MAX_RELATIVE_ROUGHNESS} × insideDiameterM`);
    }
    const viscosity = kinematicViscosityFor(temperatureC);
    return darcyWeisbachHeadLossUnchecked(flowM3s, lengthM, pipe.insideDiameterM, pipe.roughnessM, viscosity);
  }
  throw new HydraulicsInputError('method', `must be 'hazen-williams' or 'darcy-weisbach', got ${String(method)}`);
}

// One-entry cache: a profile run calls with the same temperature for every stretch.
let cachedTemperatureC = Number.NaN;
let cachedViscosityM2s = Number.NaN;

function kinematicViscosityFor(temperatureC: number): number {
  if (temperatureC !== cachedTemperatureC) {
    cachedViscosityM2s = waterKinematicViscosityM2s(temperatureC);
    cachedTemperatureC = temperatureC;
  }
  return cachedViscosityM2s;
}
