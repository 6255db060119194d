import type { CompiledNetwork } from '../compile-network';

/**
 * Static head at every node (no flow): the highest free water level that can reach it through open
 * links, capped by each PRV's setting and break-pressure tank's level on the way, and only in the
 * direction a check or float valve lets water pass. Shut links pass nothing. NaN where no water
 * reaches. Label-correcting search: each node is revisited only when its head rises.
 */
export function staticHeadsM(net: CompiledNetwork): Float64Array {
  const heads = new Float64Array(net.nodeCount).fill(Number.NaN);
  const outgoing: number[][] = Array.from({ length: net.nodeCount }, () => []);
  for (let k = 0; k < net.linkCount; k++) {
    if (net.status[k] === 'closed') continue;
    outgoing[net.from[k]].push(k);
    if (net.status[k] === 'open') outgoing[net.to[k]].push(k);
  }
  const queue: number[] = [];
  for (let v = 0; v < net.nodeCount; v++) {
    if (!Number.isNaN(net.fixedHeadM[v])) {
      heads[v] = net.fixedHeadM[v];
      queue.push(v);
    }
  }
  for (let cursor = 0; cursor < queue.length; cursor++) {
    const v = queue[cursor];
    for (const k of outgoing[v]) {
      const other = net.from[k] === v ? net.to[k] : net.from[k];
      const cap = net.status[k] === 'prv' ? net.setHeadM[k] : Infinity;
      const reached = Math.min(heads[v], cap);
      if (Number.isNaN(net.fixedHeadM[other]) && !(reached <= heads[other])) {
        heads[other] = reached;
        queue.push(other);
      }
    }
  }
  return heads;
}
