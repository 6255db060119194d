import { pressurePaToHeadM } from '../../units';
import { pipeAreaM2 } from '../../friction/pipe-flow';
import type { CompiledNetwork } from '../compile-network';
import { solveNetwork } from '../solve-network';
import type { NetworkInput, NetworkLink, NetworkPipe, NetworkSolution } from '../types';
import type { SizingCandidate, SizingOptions } from './types';

/** Default velocity ceiling, m/s: the line checks' maximum (Jordan p.53 via ITACA). */
export const DEFAULT_SIZING_VELOCITY_MAX_MS = 3;

/** Sizing options with defaults filled in. */
export interface SizingRules {
  candidates: readonly SizingCandidate[];
  minPressureHeadM: number;
  velocityMaxMs: number;
  velocityMinMs: number;
}

export function sizingRules(options: SizingOptions): SizingRules {
  return {
    candidates: options.candidates,
    minPressureHeadM: options.minPressureHeadM ?? 0,
    velocityMaxMs: options.velocityMaxMs ?? DEFAULT_SIZING_VELOCITY_MAX_MS,
    velocityMinMs: options.velocityMinMs ?? 0,
  };
}

/** Pressure head a node needs, m, or undefined when it needs none (sources, tanks, ram outlets). */
export function requiredPressureHeadM(net: CompiledNetwork, node: number, rules: SizingRules): number | undefined {
  if (node >= net.nodes.length) return undefined;
  const spec = net.nodes[node];
  if (spec.kind !== 'junction' && spec.kind !== 'outlet') return undefined;
  return spec.minPressureHeadM ?? rules.minPressureHeadM;
}

/** Whether the link's static pressure is within the pipe's rating (a pipe without a rating passes). */
export function ratingHolds(pipe: NetworkPipe, staticPressureHeadM: number, temperatureC: number): boolean {
  if (pipe.pressureRatingPa === undefined || !(staticPressureHeadM > 0)) return true;
  return pressurePaToHeadM(pipe.pressureRatingPa, temperatureC) >= staticPressureHeadM;
}

/** Whether a flow's velocity in the pipe is within the band. */
export function velocityHolds(pipe: NetworkPipe, flowM3s: number, rules: SizingRules): boolean {
  const velocity = Math.abs(flowM3s) / pipeAreaM2(pipe.insideDiameterM);
  if (velocity > rules.velocityMaxMs * (1 + 1e-9)) return false;
  return !(rules.velocityMinMs > 0 && velocity > 0 && velocity < rules.velocityMinMs * (1 - 1e-9));
}

/** The input with the sized links given new pipes (index into `candidates`, or -1 to keep). */
export function withPipes(input: NetworkInput, choice: ReadonlyMap<string, NetworkPipe>): NetworkInput {
  const links: NetworkLink[] = input.links.map((link) => {
    const pipe = choice.get(link.id);
    return pipe ? { ...link, pipe } : link;
  });
  return { ...input, links };
}

/** The verdict on one design. */
export interface DesignCheck {
  feasible: boolean;
  solution: NetworkSolution;
  /** Largest pressure shortfall at any node, m (0 when none). */
  worstShortfallM: number;
}

/**
 * Solves the network with a design and checks it: converged, every junction and outlet of the
 * original network at its residual, velocities in band and static pressure within the rating of
 * each sized piece (`sized`: link id -> pipe, the id of a split link's pieces included).
 */
export function checkDesign(
  designInput: NetworkInput,
  net: CompiledNetwork,
  staticPressureHeadByLink: ReadonlyMap<string, number>,
  sized: ReadonlyMap<string, NetworkPipe>,
  rules: SizingRules,
): DesignCheck {
  const solution = solveNetwork(designInput);
  let feasible = solution.converged;
  let worstShortfallM = 0;
  net.nodes.forEach((node, v) => {
    const need = requiredPressureHeadM(net, v, rules);
    const pressure = solution.pressureHeadsM[node.id];
    if (need === undefined || pressure === undefined) return;
    const shortfall = need - pressure;
    if (shortfall > 1e-6) {
      feasible = false;
      worstShortfallM = Math.max(worstShortfallM, shortfall);
    }
  });
  for (const [linkId, pipe] of sized) {
    const flow = solution.flowsM3s[linkId];
    if (flow !== undefined && !velocityHolds(pipe, flow, rules)) feasible = false;
    // Pieces of a split link (`<id>~2`, …) share the link's static head.
    const staticHeadM = staticPressureHeadByLink.get(linkId.replace(/~\d+$/, '')) ?? 0;
    if (!ratingHolds(pipe, staticHeadM, net.settings.waterTemperatureC)) feasible = false;
  }
  return { feasible, solution, worstShortfallM };
}
