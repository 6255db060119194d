import { HydraulicsInputError } from '../errors';
import type { CompiledNetwork } from './compile-network';

/** Union-find over node indices. */
function components(count: number, joined: (union: (a: number, b: number) => void) => void): Int32Array {
  const parent = Int32Array.from({ length: count }, (_, i) => i);
  const find = (a: number): number => {
    let root = a;
    while (parent[root] !== root) root = parent[root];
    while (parent[a] !== root) {
      const next = parent[a];
      parent[a] = root;
      a = next;
    }
    return root;
  };
  joined((a, b) => {
    const ra = find(a);
    const rb = find(b);
    if (ra !== rb) parent[ra] = rb;
  });
  for (let i = 0; i < count; i++) parent[i] = find(i);
  return parent;
}

/** Names a list of nodes, the first few in full. */
export function nameNodes(ids: readonly string[], limit = 8): string {
  const shown = ids
    .slice(0, limit)
    .map((id) => `"${id}"`)
    .join(', ');
  return ids.length > limit ? `${shown} and ${ids.length - limit} more` : shown;
}

/** Whether a link carries no flow whatever the heads: shut by hand, or a float valve on a full tank. */
export function isShut(net: CompiledNetwork, link: number): boolean {
  return net.status[link] === 'closed' || net.shutByFullTank[link] === 1;
}

/** How the network hangs together. */
export interface NetworkTopology {
  /** Nodes cut off from every source and tank by shut links. */
  isolated: Uint8Array;
  /** Number of separate systems (parts with no link at all between them). */
  partCount: number;
}

/**
 * Finds the parts of the network. A part with no source or tank at all cannot be solved and is an
 * input error naming its nodes; nodes cut off only by shut valves are reported as isolated.
 */
export function networkTopology(net: CompiledNetwork): NetworkTopology {
  const visible = net.nodes.length;
  const visibleId = (node: number): string => net.nodeIds[node].replace(/#inlet$/, '');
  const all = components(net.nodeCount, (union) => {
    for (let k = 0; k < net.linkCount; k++) union(net.from[k], net.to[k]);
  });
  const fixedRoots = new Set<number>();
  for (let v = 0; v < net.nodeCount; v++) if (!Number.isNaN(net.fixedHeadM[v])) fixedRoots.add(all[v]);
  const headless: string[] = [];
  for (let v = 0; v < visible; v++) if (!fixedRoots.has(all[v])) headless.push(visibleId(v));
  if (headless.length > 0) {
    throw new HydraulicsInputError(
      'nodes',
      `${nameNodes(headless)} ${headless.length === 1 ? 'is' : 'are'} not connected to any source or tank, so no head is fixed for ${headless.length === 1 ? 'it' : 'them'}: connect a source or tank, or remove ${headless.length === 1 ? 'it' : 'them'}`,
    );
  }
  const open = components(net.nodeCount, (union) => {
    for (let k = 0; k < net.linkCount; k++) if (!isShut(net, k)) union(net.from[k], net.to[k]);
  });
  const fedRoots = new Set<number>();
  for (let v = 0; v < net.nodeCount; v++) if (!Number.isNaN(net.fixedHeadM[v])) fedRoots.add(open[v]);
  const isolated = new Uint8Array(net.nodeCount);
  for (let v = 0; v < net.nodeCount; v++) if (!fedRoots.has(open[v])) isolated[v] = 1;
  return { isolated, partCount: new Set(all).size };
}
