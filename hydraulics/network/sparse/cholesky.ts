import { minimumDegreeOrder, type EliminationOrder } from './minimum-degree';

/** Raised when the matrix is not positive definite (a node with no path to a fixed head). */
export class NotPositiveDefiniteError extends Error {
  /** Original index of the row whose pivot failed. */
  readonly row: number;
  constructor(row: number) {
    super(`matrix is not positive definite at row ${row}`);
    this.row = row;
  }
}

/**
 * Sparse Cholesky factorisation A = L Lᵀ of a symmetric positive definite matrix whose
 * off-diagonal pattern is a fixed list of edges (a network's links). The ordering and symbolic
 * pattern are computed once (minimum degree); `factor` and `solve` then run in time proportional
 * to the factor's size, with no allocation. Left-looking column algorithm (Davis, "Direct Methods
 * for Sparse Linear Systems", SIAM 2006, §4.8).
 */
export class SparseCholesky {
  readonly size: number;
  private readonly pattern: EliminationOrder;
  private readonly values: Float64Array;
  private readonly diagonal: Float64Array;
  private readonly work: Float64Array;
  /** Per row j: the columns k < j with L[j,k] ≠ 0 and the position of that entry in `values`. */
  private readonly rowStart: Int32Array;
  private readonly rowColumn: Int32Array;
  private readonly rowPosition: Int32Array;
  /** Per column (elimination numbering): the edges whose value lands below its diagonal. */
  private readonly edgeStart: Int32Array;
  private readonly edgeList: Int32Array;
  private readonly edgeRow: Int32Array;

  constructor(size: number, edgeA: Int32Array, edgeB: Int32Array) {
    this.size = size;
    const pattern = minimumDegreeOrder(size, edgeA, edgeB);
    this.pattern = pattern;
    const { columnStart, rowIndex, position } = pattern;
    const nnz = columnStart[size];
    this.values = new Float64Array(nnz);
    this.diagonal = new Float64Array(size);
    this.work = new Float64Array(size);
    const rowCount = new Int32Array(size + 1);
    for (let q = 0; q < nnz; q++) rowCount[rowIndex[q] + 1]++;
    for (let j = 0; j < size; j++) rowCount[j + 1] += rowCount[j];
    this.rowStart = rowCount.slice();
    this.rowColumn = new Int32Array(nnz);
    this.rowPosition = new Int32Array(nnz);
    const fill = rowCount.slice(0, size);
    for (let k = 0; k < size; k++) {
      for (let q = columnStart[k]; q < columnStart[k + 1]; q++) {
        const j = rowIndex[q];
        this.rowColumn[fill[j]] = k;
        this.rowPosition[fill[j]] = q;
        fill[j]++;
      }
    }
    const edgeCount = new Int32Array(size + 1);
    const edges = edgeA.length;
    const column = new Int32Array(edges);
    this.edgeRow = new Int32Array(edges);
    for (let e = 0; e < edges; e++) {
      const a = position[edgeA[e]];
      const b = position[edgeB[e]];
      column[e] = Math.min(a, b);
      this.edgeRow[e] = Math.max(a, b);
      edgeCount[column[e] + 1]++;
    }
    for (let j = 0; j < size; j++) edgeCount[j + 1] += edgeCount[j];
    this.edgeStart = edgeCount.slice();
    this.edgeList = new Int32Array(edges);
    const edgeFill = edgeCount.slice(0, size);
    for (let e = 0; e < edges; e++) this.edgeList[edgeFill[column[e]]++] = e;
  }

  /** Entries of L below the diagonal (a measure of fill). */
  get factorNonZeros(): number {
    return this.values.length;
  }

  /**
   * Factorises the matrix with `diagonal[v]` on the diagonal (original numbering) and
   * `edgeValue[e]` at both (edgeA[e], edgeB[e]) and its mirror; edges on the same pair add up.
   * Throws {@link NotPositiveDefiniteError} when a pivot is not positive.
   */
  factor(diagonal: Float64Array, edgeValue: Float64Array): void {
    const { order, columnStart, rowIndex } = this.pattern;
    const { values, work, rowStart, rowColumn, rowPosition, edgeStart, edgeList, edgeRow } = this;
    for (let j = 0; j < this.size; j++) {
      work[j] = diagonal[order[j]];
      for (let t = edgeStart[j]; t < edgeStart[j + 1]; t++) {
        const e = edgeList[t];
        if (edgeRow[e] !== j) work[edgeRow[e]] += edgeValue[e];
      }
      for (let t = rowStart[j]; t < rowStart[j + 1]; t++) {
        const k = rowColumn[t];
        const pos = rowPosition[t];
        const ljk = values[pos];
        const end = columnStart[k + 1];
        for (let q = pos; q < end; q++) work[rowIndex[q]] -= values[q] * ljk;
      }
      const pivot = work[j];
      if (!(pivot > 0) || !Number.isFinite(pivot)) {
        for (let q = columnStart[j]; q < columnStart[j + 1]; q++) work[rowIndex[q]] = 0;
        work[j] = 0;
        throw new NotPositiveDefiniteError(order[j]);
      }
      const d = Math.sqrt(pivot);
      this.diagonal[j] = d;
      work[j] = 0;
      for (let q = columnStart[j]; q < columnStart[j + 1]; q++) {
        values[q] = work[rowIndex[q]] / d;
        work[rowIndex[q]] = 0;
      }
    }
  }

  /** Solves A x = b with the last factorisation; `b` and the result in original numbering. */
  solve(b: Float64Array, out: Float64Array = new Float64Array(this.size)): Float64Array {
    const { order, columnStart, rowIndex } = this.pattern;
    const { values, diagonal, work } = this;
    const n = this.size;
    for (let j = 0; j < n; j++) work[j] = b[order[j]];
    for (let j = 0; j < n; j++) {
      const y = work[j] / diagonal[j];
      work[j] = y;
      for (let q = columnStart[j]; q < columnStart[j + 1]; q++) work[rowIndex[q]] -= values[q] * y;
    }
    for (let j = n - 1; j >= 0; j--) {
      let sum = work[j];
      for (let q = columnStart[j]; q < columnStart[j + 1]; q++) sum -= values[q] * work[rowIndex[q]];
      work[j] = sum / diagonal[j];
    }
    for (let j = 0; j < n; j++) {
      out[order[j]] = work[j];
      work[j] = 0;
    }
    return out;
  }
}
