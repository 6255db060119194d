import type { NetworkInput, NetworkLink, NetworkNode } from '../hydraulics/index';

/** Seeded uniform numbers in [0, 1) (LCG), so every run builds the same network. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 2 ** 32;
}

/**
 * An invented looped network on a jittered square lattice: a random spanning tree of the lattice
 * (so every node is reached), plus extra lattice links that close loops, a source at one corner and
 * a tank at the far corner. Demands 0.02-0.1 L/s per node; each pipe sized for about 1 m/s at the
 * flow its branch of the tree carries.
 */
export function latticeNetwork(nodeCount: number, linkCount: number, seed = 7, withTank = true): NetworkInput {
  const random = seededRandom(seed);
  const side = Math.ceil(Math.sqrt(nodeCount));
  const nodes: NetworkNode[] = [];
  for (let v = 0; v < nodeCount; v++) {
    const x = v % side;
    const y = Math.floor(v / side);
    const elevationM = 100 - 0.5 * (x + y) * (100 / side) + 3 * random();
    if (v === 0) nodes.push({ id: 'n0', kind: 'source', elevationM: 160, waterLevelM: 160 });
    else if (withTank && v === nodeCount - 1)
      nodes.push({
        id: `n${v}`,
        kind: 'tank',
        elevationM: 60,
        waterLevelM: 62,
        tank: { overflowLevelM: 63, areaM2: 50 },
      });
    else
      nodes.push({
        id: `n${v}`,
        kind: 'junction',
        elevationM,
        demandM3s: 0.00002 + 0.00008 * random(),
        minPressureHeadM: 10,
      });
  }
  const candidates: [number, number, number][] = [];
  for (let v = 0; v < nodeCount; v++) {
    if ((v % side) + 1 < side && v + 1 < nodeCount) candidates.push([v, v + 1, random()]);
    if (v + side < nodeCount) candidates.push([v, v + side, random()]);
  }
  candidates.sort((a, b) => a[2] - b[2]);
  const parent = Int32Array.from({ length: nodeCount }, (_, i) => i);
  const find = (a: number): number => (parent[a] === a ? a : (parent[a] = find(parent[a])));
  const tree: [number, number][] = [];
  const extra: [number, number][] = [];
  for (const [a, b] of candidates) {
    const ra = find(a);
    const rb = find(b);
    if (ra !== rb) {
      parent[ra] = rb;
      tree.push([a, b]);
    } else if (extra.length < linkCount - (nodeCount - 1)) extra.push([a, b]);
  }
  const flowOf = branchFlows(nodeCount, tree, nodes);
  const links: NetworkLink[] = [...tree, ...extra].map(([a, b], index) => {
    const flow = index < tree.length ? flowOf[index] : 0.0005;
    const diameterM = Math.max(0.025, Math.sqrt((4 * flow) / Math.PI));
    return {
      id: `l${index}`,
      from: `n${a}`,
      to: `n${b}`,
      lengthM: 50 + 150 * random(),
      pipe: { id: 'p', insideDiameterM: diameterM, hazenWilliamsC: 140, roughnessM: 1.5e-6 },
    };
  });
  return { nodes, links };
}

/** Flow each tree link carries when node 0 feeds every demand through the tree, m³/s. */
function branchFlows(
  nodeCount: number,
  tree: readonly [number, number][],
  nodes: readonly NetworkNode[],
): Float64Array {
  const adjacency: [number, number][][] = Array.from({ length: nodeCount }, () => []);
  tree.forEach(([a, b], index) => {
    adjacency[a].push([b, index]);
    adjacency[b].push([a, index]);
  });
  const order: number[] = [0];
  const up = new Int32Array(nodeCount).fill(-1);
  const seen = new Uint8Array(nodeCount);
  seen[0] = 1;
  for (let i = 0; i < order.length; i++) {
    for (const [next, link] of adjacency[order[i]]) {
      if (seen[next]) continue;
      seen[next] = 1;
      up[next] = link;
      order.push(next);
    }
  }
  const below = Float64Array.from(nodes, (node) => node.demandM3s ?? 0);
  const flows = new Float64Array(tree.length);
  for (let i = order.length - 1; i > 0; i--) {
    const v = order[i];
    flows[up[v]] = below[v];
    const [a, b] = tree[up[v]];
    below[a === v ? b : a] += below[v];
  }
  return flows;
}
