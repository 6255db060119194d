import { meanVelocityMs } from '../friction/pipe-flow';
import { compileNetwork, type CompiledNetwork } from './compile-network';
import { GradientSolver, LinkState, type GradientResult } from './gradient-method';
import { lossAndGradient } from './link-loss';
import { networkWarnings } from './network-warnings';
import { networkTopology, type NetworkTopology } from './topology';
import type { NetworkInput, NetworkSolution, ValveState } from './types';

const STATE_NAMES: Record<LinkState, ValveState> = {
  [LinkState.Open]: 'open',
  [LinkState.Closed]: 'closed',
  [LinkState.Active]: 'active',
  [LinkState.Shut]: 'closed',
};

/** Turns the solver's arrays into the public record shape. */
export function solutionOf(net: CompiledNetwork, topology: NetworkTopology, result: GradientResult): NetworkSolution {
  const flowsM3s: Record<string, number> = {};
  const velocitiesMs: Record<string, number> = {};
  const headLossesM: Record<string, number> = {};
  const valveStates: Record<string, ValveState> = {};
  for (let k = 0; k < net.visibleLinkCount; k++) {
    const id = net.linkIds[k];
    const q = result.flowM3s[k];
    flowsM3s[id] = q;
    velocitiesMs[id] = meanVelocityMs(q, net.diameterM[k]);
    headLossesM[id] =
      result.states[k] === LinkState.Open
        ? lossAndGradient(net.laws[k], net.minor[k], q, net.linearBelowM3s[k]).lossM
        : 0;
    if (net.status[k] !== 'open' && net.status[k] !== 'closed')
      valveStates[id] = STATE_NAMES[result.states[k] as LinkState];
  }
  const headsM: Record<string, number> = {};
  const pressureHeadsM: Record<string, number> = {};
  const isolatedNodeIds: string[] = [];
  net.nodes.forEach((node, v) => {
    if (topology.isolated[v]) {
      isolatedNodeIds.push(node.id);
      return;
    }
    headsM[node.id] = result.headM[v];
    pressureHeadsM[node.id] = result.headM[v] - node.elevationM;
  });
  return {
    converged: result.converged,
    frictionMethod: net.settings.frictionMethod,
    freeSurfaceLosses: net.settings.freeSurfaceLosses,
    iterations: result.iterations,
    flowsM3s,
    headsM,
    pressureHeadsM,
    velocitiesMs,
    headLossesM,
    valveStates,
    isolatedNodeIds,
    maxContinuityErrorM3s: result.maxContinuityErrorM3s,
    maxHeadBalanceErrorM: result.maxHeadBalanceErrorM,
    warnings: networkWarnings(net, topology, result),
  };
}

/**
 * Steady flows and heads in a network of sources, tanks, junctions, outlets, ram outlets and
 * break-pressure tanks joined by pipes and valves, by the global gradient method (Todini & Pilati
 * 1988) with a sparse Cholesky solve, so the cost grows about linearly with the size. Friction by
 * Darcy-Weisbach with Colebrook (the default, as the line analysis) or Hazen-Williams (constant and
 * exponents in `settings`), plus minor losses and the entrance losses at free surfaces.
 * Check valves, float valves and PRVs take the state the heads call for. A part of the network with
 * no source or tank throws `HydraulicsInputError` naming its nodes; a part cut off by shut valves
 * is reported in `isolatedNodeIds` and the warnings.
 */
export function solveNetwork(input: NetworkInput): NetworkSolution {
  const net = compileNetwork(input);
  const topology = networkTopology(net);
  const result = new GradientSolver(net, topology).solve();
  return solutionOf(net, topology, result);
}
