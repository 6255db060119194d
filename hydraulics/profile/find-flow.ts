import type { PipeSpec } from '../catalogue/pipe-spec';
import { brentRoot } from './brent';
import { reachHeadLossM, type Reach } from './reaches';
import { pipeAreaM2 } from '../friction/pipe-flow';
import { stretchHydraulics } from './stretch-hydraulics';
import type { FrictionMethod } from './types';

/** The gravity flow of a line and how it was found. */
export interface GravityFlow {
  /** Flow the line carries between its fixed ends, m3/s (0 when some reach has no head to spare). */
  flowM3s: number;
  /** Capacity of each reach on its own head, m3/s (Infinity for a reach with no length). */
  reachCapacityM3s: number[];
  /** Index of the reach that limits the flow. */
  governingReach: number;
}

/** Head loss of one reach as a function of flow. */
function reachLossAt(reach: Reach, pipes: readonly PipeSpec[], method: FrictionMethod, temperatureC: number) {
  return (flowM3s: number): number => reachHeadLossM(reach, stretchHydraulics(pipes, flowM3s, method, temperatureC));
}

/**
 * Flow one reach carries on its available head: the root of loss(Q) = available head, found by
 * Brent's method after doubling an upper bound from 1 m/s in the widest pipe. The loss is
 * increasing in Q, so the root is unique.
 */
export function reachCapacityM3s(
  reach: Reach,
  pipes: readonly PipeSpec[],
  method: FrictionMethod,
  temperatureC: number,
): number {
  const availableHeadM = reach.startHeadM - reach.requiredEndHeadM;
  if (!(availableHeadM > 0)) return 0;
  const used = pipes.filter((_, s) => reach.lengthByStretchM[s] > 0 || reach.kByStretch[s] > 0);
  if (used.length === 0) return Infinity;
  const loss = reachLossAt(reach, pipes, method, temperatureC);
  const balance = (q: number): number => loss(q) - availableHeadM;
  let high = Math.max(...used.map((pipe) => pipeAreaM2(pipe.insideDiameterM)));
  for (let i = 0; i < 200 && balance(high) < 0; i++) high *= 2;
  return brentRoot(balance, 0, high, { xTolerance: high * 1e-15 });
}

/** The line's gravity flow: the smallest reach capacity (tanks' float valves throttle the rest). */
export function findGravityFlow(
  reaches: readonly Reach[],
  pipes: readonly PipeSpec[],
  method: FrictionMethod,
  temperatureC: number,
): GravityFlow {
  const reachCapacity = reaches.map((reach) => reachCapacityM3s(reach, pipes, method, temperatureC));
  let governingReach = 0;
  for (let r = 1; r < reachCapacity.length; r++) {
    if (reachCapacity[r] < reachCapacity[governingReach]) governingReach = r;
  }
  const flowM3s = reachCapacity[governingReach];
  return { flowM3s: Number.isFinite(flowM3s) ? flowM3s : 0, reachCapacityM3s: reachCapacity, governingReach };
}
