/**
 * Typed arrays of one length carved from a single buffer. A long line's analysis needs a dozen
 * arrays of 100,000 numbers; each large buffer allocated on its own is fresh memory from the
 * system, faulted in page by page and counted apart by the collector, while one buffer per
 * group is one allocation the allocator reuses from run to run.
 */
export function float64Arrays(length: number, count: number): Float64Array[] {
  const buffer = new ArrayBuffer(8 * length * count);
  return Array.from({ length: count }, (_, k) => new Float64Array(buffer, 8 * length * k, length));
}

/** `float64Arrays` for whole numbers (indices). */
export function int32Arrays(length: number, count: number): Int32Array[] {
  const buffer = new ArrayBuffer(4 * length * count);
  return Array.from({ length: count }, (_, k) => new Int32Array(buffer, 4 * length * k, length));
}
