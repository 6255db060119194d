import { HydraulicsInputError } from '../../errors';
import { assertNonNegative, assertPositive } from '../../input-guards';
import { compileNetwork, type CompiledNetwork } from '../compile-network';
import { networkTopology, type NetworkTopology } from '../topology';
import type { NetworkInput, NetworkPipe } from '../types';
import { resolveNetworkPipe } from '../validate-network';
import { ratingHolds, sizingRules, type SizingRules } from './design-check';
import { staticHeadsM } from './static-heads';
import type { SizingCandidate, SizingOptions } from './types';

/** Everything the sizing methods share about one network. */
export interface SizingContext {
  input: NetworkInput;
  net: CompiledNetwork;
  topology: NetworkTopology;
  rules: SizingRules;
  /** Candidates, cheapest per metre first. */
  candidates: SizingCandidate[];
  /** Compiled indices of the links the sizing chooses pipes for (not PRVs, not shut or cut-off links). */
  sized: number[];
  /** Static pressure head on each sized link, m (the worse end, or its route's highest). */
  staticByLink: Map<string, number>;
  /** Candidates (indices, cheapest first) whose rating holds on each sized link. */
  ratedByLink: number[][];
  /** Static head at each compiled node, m (NaN where no water reaches). */
  staticHeadM: Float64Array;
  deadline: number;
}

function assertCandidates(candidates: readonly SizingCandidate[], method: string): void {
  if (!Array.isArray(candidates) || candidates.length === 0)
    throw new HydraulicsInputError('candidates', 'needs at least one candidate pipe');
  const ids = new Set<string>();
  candidates.forEach((candidate, index) => {
    resolveNetworkPipe(candidate.pipe, method, index);
    assertNonNegative(candidate.costPerM, 'candidates.costPerM', index);
    if (ids.has(candidate.pipe.id))
      throw new HydraulicsInputError('candidates.pipe.id', `"${candidate.pipe.id}" is listed twice`, index);
    ids.add(candidate.pipe.id);
  });
}

/** Checks the options and gathers what every sizing method needs. */
export function sizingContext(input: NetworkInput, options: SizingOptions): SizingContext {
  const net = compileNetwork(input);
  assertCandidates(options.candidates, net.settings.frictionMethod);
  if (options.timeLimitS !== undefined) assertPositive(options.timeLimitS, 'timeLimitS');
  if (options.minPressureHeadM !== undefined) assertNonNegative(options.minPressureHeadM, 'minPressureHeadM');
  if (options.velocityMaxMs !== undefined) assertPositive(options.velocityMaxMs, 'velocityMaxMs');
  if (options.velocityMinMs !== undefined) assertNonNegative(options.velocityMinMs, 'velocityMinMs');
  const topology = networkTopology(net);
  const candidates = [...options.candidates].sort(
    (a, b) => a.costPerM - b.costPerM || a.pipe.insideDiameterM - b.pipe.insideDiameterM,
  );
  const statics = staticHeadsM(net);
  const sized: number[] = [];
  const staticByLink = new Map<string, number>();
  const ratedByLink: number[][] = [];
  for (let k = 0; k < net.visibleLinkCount; k++) {
    const status = net.status[k];
    if (status === 'prv' || status === 'closed' || topology.isolated[net.from[k]] || topology.isolated[net.to[k]])
      continue;
    const atEnds = [net.from[k], net.to[k]].map((v) => statics[v] - net.elevationM[v]).filter((h) => !Number.isNaN(h));
    const route = input.links[k].maxRouteStaticPressureHeadM ?? -Infinity;
    const staticHeadM = Math.max(route, ...atEnds);
    staticByLink.set(net.linkIds[k], staticHeadM);
    sized.push(k);
    ratedByLink.push(
      candidates
        .map((_, c) => c)
        .filter((c) => ratingHolds(candidates[c].pipe, staticHeadM, net.settings.waterTemperatureC)),
    );
  }
  return {
    input,
    net,
    topology,
    rules: sizingRules(options),
    candidates,
    sized,
    staticByLink,
    ratedByLink,
    staticHeadM: statics,
    deadline: Date.now() + 1000 * (options.timeLimitS ?? 10),
  };
}

/** Material cost of a design (one candidate per sized link, by position in `sized`). */
export function designCost(context: SizingContext, design: ArrayLike<number>): number {
  let cost = 0;
  context.sized.forEach((k, i) => {
    cost += context.candidates[design[i]].costPerM * context.net.lengthM[k];
  });
  return cost;
}

/** Link id -> pipe for a one-pipe-per-link design. */
export function designPipes(context: SizingContext, design: ArrayLike<number>): Map<string, NetworkPipe> {
  return new Map(context.sized.map((k, i) => [context.net.linkIds[k], context.candidates[design[i]].pipe]));
}
