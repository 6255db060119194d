/**
 * Minimum-degree ordering of a symmetric sparsity pattern, simulated on the elimination graph.
 * Eliminating a node joins all its remaining neighbours; the neighbours it has at that moment are
 * exactly the below-diagonal pattern of its column in the Cholesky factor, so the ordering and the
 * symbolic factorisation come out of one pass (George & Liu, "Computer Solution of Large Sparse
 * Positive Definite Systems", 1981, ch. 5: the minimum-degree algorithm). Water networks are
 * nearly trees (mean degree under 3), so fill and cost stay close to linear in the size.
 */
export interface EliminationOrder {
  /** `order[k]` = original index of the k-th node eliminated. */
  order: Int32Array;
  /** `position[v]` = step at which original node v is eliminated. */
  position: Int32Array;
  /** Column pointers of L (strictly lower part), in elimination numbering. */
  columnStart: Int32Array;
  /** Row indices of L, in elimination numbering, ascending within each column. */
  rowIndex: Int32Array;
}

/** Binary min-heap of (degree, node) with lazy deletion: stale entries are skipped on pop. */
class DegreeHeap {
  private keys: number[] = [];
  private nodes: number[] = [];

  push(key: number, node: number): void {
    const keys = this.keys;
    const nodes = this.nodes;
    let i = keys.length;
    keys.push(key);
    nodes.push(node);
    while (i > 0) {
      const parent = (i - 1) >> 1;
      if (keys[parent] < key || (keys[parent] === key && nodes[parent] <= node)) break;
      keys[i] = keys[parent];
      nodes[i] = nodes[parent];
      i = parent;
    }
    keys[i] = key;
    nodes[i] = node;
  }

  pop(): [number, number] | undefined {
    const keys = this.keys;
    const nodes = this.nodes;
    if (keys.length === 0) return undefined;
    const top: [number, number] = [keys[0], nodes[0]];
    const lastKey = keys.pop() as number;
    const lastNode = nodes.pop() as number;
    const size = keys.length;
    if (size > 0) {
      let i = 0;
      for (;;) {
        const left = 2 * i + 1;
        if (left >= size) break;
        const right = left + 1;
        let child = left;
        if (right < size && (keys[right] < keys[left] || (keys[right] === keys[left] && nodes[right] < nodes[left])))
          child = right;
        if (keys[child] > lastKey || (keys[child] === lastKey && nodes[child] >= lastNode)) break;
        keys[i] = keys[child];
        nodes[i] = nodes[child];
        i = child;
      }
      keys[i] = lastKey;
      nodes[i] = lastNode;
    }
    return top;
  }
}

/** Orders `n` nodes joined by the edges (edgeA[e], edgeB[e]) and returns the factor's pattern. */
export function minimumDegreeOrder(n: number, edgeA: Int32Array, edgeB: Int32Array): EliminationOrder {
  // Plain arrays with a marker beat Sets here: almost every node has two or three neighbours.
  const adjacency: number[][] = Array.from({ length: n }, () => []);
  const mark = new Int32Array(n).fill(-1);
  for (let e = 0; e < edgeA.length; e++) {
    const a = edgeA[e];
    const b = edgeB[e];
    if (a === b || adjacency[a].includes(b)) continue;
    adjacency[a].push(b);
    adjacency[b].push(a);
  }
  const heap = new DegreeHeap();
  for (let v = 0; v < n; v++) heap.push(adjacency[v].length, v);
  const eliminated = new Uint8Array(n);
  const order = new Int32Array(n);
  const position = new Int32Array(n);
  const patterns: number[][] = new Array<number[]>(n);
  for (let step = 0; step < n; step++) {
    let v = -1;
    for (;;) {
      const entry = heap.pop() as [number, number];
      if (!eliminated[entry[1]] && adjacency[entry[1]].length === entry[0]) {
        v = entry[1];
        break;
      }
    }
    eliminated[v] = 1;
    order[step] = v;
    position[v] = step;
    const neighbours = adjacency[v];
    patterns[v] = neighbours;
    adjacency[v] = [];
    for (const a of neighbours) {
      const list = adjacency[a];
      const at = list.indexOf(v);
      list[at] = list[list.length - 1];
      list.pop();
    }
    if (neighbours.length > 1) {
      for (const a of neighbours) {
        const list = adjacency[a];
        for (const b of list) mark[b] = a;
        for (const b of neighbours) {
          if (b !== a && mark[b] !== a) {
            list.push(b);
            mark[b] = a;
          }
        }
      }
    }
    for (const a of neighbours) heap.push(adjacency[a].length, a);
  }
  const columnStart = new Int32Array(n + 1);
  for (let k = 0; k < n; k++) columnStart[k + 1] = columnStart[k] + patterns[order[k]].length;
  const rowIndex = new Int32Array(columnStart[n]);
  for (let k = 0; k < n; k++) {
    // Written in place and sorted as a typed array (numeric order, no comparator, no temporary list).
    const rows = patterns[order[k]];
    const start = columnStart[k];
    for (let i = 0; i < rows.length; i++) rowIndex[start + i] = position[rows[i]];
    if (rows.length > 1) rowIndex.subarray(start, start + rows.length).sort();
  }
  return { order, position, columnStart, rowIndex };
}
