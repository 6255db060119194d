/** Seeded uniform numbers in [0, 1) (LCG): the looped search is repeatable run to run. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => (state = (Math.imul(state, 1664525) + 1013904223) >>> 0) / 2 ** 32;
}
