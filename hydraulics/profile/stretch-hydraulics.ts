import type { PipeSpec } from '../catalogue/pipe-spec';
import { pipeHeadLossM } from '../friction/head-loss';
import { minorLossHeadM } from '../friction/minor-losses';
import { meanVelocityMs } from '../friction/pipe-flow';
import type { FrictionMethod } from './types';

/**
 * Flows below this carry no measurable friction; treating them as zero keeps subnormal numbers
 * (where the laminar 64/Re overflows to infinity) out of the results. m3/s.
 */
export const NEGLIGIBLE_FLOW_M3S = 1e-200;

/** Per-stretch hydraulics at one flow; arrays are indexed by stretch. */
export interface StretchHydraulics {
  /** Mean velocity, m/s. */
  velocityMs: Float64Array;
  /** Velocity head v^2/2g, m (times a fitting's K gives its loss). */
  velocityHeadM: Float64Array;
  /** Friction loss per metre of slope length, m/m. */
  frictionGradient: Float64Array;
}

/**
 * Friction gradient, velocity and velocity head of every stretch at `flowM3s`. Both friction laws
 * are linear in length, so one call per stretch (at 1 m) serves every piece of the profile.
 */
export function stretchHydraulics(
  pipes: readonly PipeSpec[],
  flowM3s: number,
  method: FrictionMethod,
  temperatureC: number,
): StretchHydraulics {
  const count = pipes.length;
  const velocityMs = new Float64Array(count);
  const velocityHeadM = new Float64Array(count);
  const frictionGradient = new Float64Array(count);
  for (let s = 0; s < count; s++) {
    const pipe = pipes[s];
    velocityMs[s] = meanVelocityMs(flowM3s, pipe.insideDiameterM);
    velocityHeadM[s] = minorLossHeadM({ kTotal: 1, velocityMs: velocityMs[s] });
    frictionGradient[s] =
      Math.abs(flowM3s) < NEGLIGIBLE_FLOW_M3S ? 0 : pipeHeadLossM({ method, flowM3s, lengthM: 1, pipe, temperatureC });
  }
  return { velocityMs, velocityHeadM, frictionGradient };
}
