import { solveNetwork } from '../solve-network';
import type { NetworkInput, NetworkSolution } from '../types';

/** One outlet a tank serves and how much of its water comes from that tank. */
export interface ServedOutlet {
  outletId: string;
  /** Share of the outlet's draw that comes from the tank (0-1). */
  share: number;
  /** The outlet's draw (as given), m³/s. */
  demandM3s: number;
}

/** Below this flow a link is taken as still when tracing where water comes from, m³/s. */
const STILL_FLOW_M3S = 1e-12;

/**
 * Which outlets each tank serves, and what share of each outlet's water comes from it, traced along
 * the solved flows: water leaving a tank is that tank's; at every node the shares mix in proportion
 * to the inflows; water entering another tank is stored there and starts again as that tank's.
 * Nodes are visited from the highest grade down, which is the order water flows. Solves the
 * network as given when no solution is passed.
 */
export function servedOutletsByTank(
  input: NetworkInput,
  solution: NetworkSolution = solveNetwork(input),
): Record<string, ServedOutlet[]> {
  const tanks = input.nodes.filter((node) => node.kind === 'tank').map((node) => node.id);
  const tankIndex = new Map(tanks.map((id, i) => [id, i]));
  const kindOf = new Map(input.nodes.map((node) => [node.id, node.kind]));
  const inflows = new Map<string, { from: string; q: number }[]>();
  for (const link of input.links) {
    const q = solution.flowsM3s[link.id] ?? 0;
    if (Math.abs(q) <= STILL_FLOW_M3S) continue;
    const [from, to] = q > 0 ? [link.from, link.to] : [link.to, link.from];
    inflows.set(to, [...(inflows.get(to) ?? []), { from, q: Math.abs(q) }]);
  }
  const shares = new Map<string, Float64Array>();
  const order = input.nodes
    .filter((node) => solution.headsM[node.id] !== undefined)
    .sort((a, b) => solution.headsM[b.id] - solution.headsM[a.id]);
  for (const node of order) {
    const share = new Float64Array(tanks.length);
    const own = tankIndex.get(node.id);
    if (own !== undefined) share[own] = 1;
    else if (kindOf.get(node.id) !== 'source') {
      const incoming = inflows.get(node.id) ?? [];
      const total = incoming.reduce((sum, entry) => sum + entry.q, 0) + (node.inflowM3s ?? 0);
      for (const { from, q } of incoming) {
        const upstream = shares.get(from);
        if (!upstream || total <= 0) continue;
        for (let t = 0; t < tanks.length; t++) share[t] += (upstream[t] * q) / total;
      }
    }
    shares.set(node.id, share);
  }
  const served: Record<string, ServedOutlet[]> = Object.fromEntries(tanks.map((id) => [id, []]));
  for (const node of input.nodes) {
    if (node.kind !== 'outlet') continue;
    const share = shares.get(node.id);
    if (!share) continue;
    tanks.forEach((tankId, t) => {
      if (share[t] > 1e-9) served[tankId].push({ outletId: node.id, share: share[t], demandM3s: node.demandM3s ?? 0 });
    });
  }
  return served;
}
