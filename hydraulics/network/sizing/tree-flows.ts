import type { CompiledNetwork } from '../compile-network';
import { isShut, type NetworkTopology } from '../topology';

/** A branched network hung from its fixed heads: every node's parent link and the flows continuity fixes. */
export interface TreeFlows {
  /** Nodes in order from the fixed heads outwards (each after its parent). */
  order: number[];
  /** Link to the parent, -1 at a fixed head and at isolated nodes. */
  parentLink: Int32Array;
  /** Parent node, -1 where there is none. */
  parent: Int32Array;
  /** Flow per link, m³/s, positive from -> to (0 on shut links). */
  flowM3s: Float64Array;
}

/** Links left out of the tree (loop closers) and the flow they take from (+) or give to (-) each node. */
export interface TreeLeftOut {
  links: Uint8Array;
  extraDemandM3s: Float64Array;
}

/**
 * When every part of the network (over its open links) is a tree with exactly one source or tank,
 * the flows follow from continuity alone: returns them with the tree's shape. Returns undefined for
 * a network with a loop or a part fed from two fixed heads.
 */
export function treeFlows(net: CompiledNetwork, topology: NetworkTopology, left?: TreeLeftOut): TreeFlows | undefined {
  const adjacency: number[][] = Array.from({ length: net.nodeCount }, () => []);
  for (let k = 0; k < net.linkCount; k++) {
    if (isShut(net, k) || topology.isolated[net.from[k]] || topology.isolated[net.to[k]] || left?.links[k]) continue;
    adjacency[net.from[k]].push(k);
    adjacency[net.to[k]].push(k);
  }
  const parentLink = new Int32Array(net.nodeCount).fill(-1);
  const parent = new Int32Array(net.nodeCount).fill(-1);
  const seen = new Uint8Array(net.nodeCount);
  const order: number[] = [];
  for (let root = 0; root < net.nodeCount; root++) {
    if (Number.isNaN(net.fixedHeadM[root]) || seen[root]) continue;
    seen[root] = 1;
    order.push(root);
    for (let cursor = order.length - 1; cursor < order.length; cursor++) {
      const v = order[cursor];
      for (const k of adjacency[v]) {
        if (k === parentLink[v]) continue;
        const other = net.from[k] === v ? net.to[k] : net.from[k];
        // A second fixed head reached from this one: the part is fed from two, not a tree.
        if (seen[other] || !Number.isNaN(net.fixedHeadM[other])) return undefined;
        seen[other] = 1;
        parentLink[other] = k;
        parent[other] = v;
        order.push(other);
      }
    }
  }
  const below = Float64Array.from(net.netDemandM3s);
  if (left) for (let v = 0; v < net.nodeCount; v++) below[v] += left.extraDemandM3s[v];
  const flowM3s = new Float64Array(net.linkCount);
  for (let i = order.length - 1; i >= 0; i--) {
    const v = order[i];
    const k = parentLink[v];
    if (k < 0) continue;
    flowM3s[k] = net.to[k] === v ? below[v] : -below[v];
    below[parent[v]] += below[v];
  }
  return { order, parentLink, parent, flowM3s };
}
