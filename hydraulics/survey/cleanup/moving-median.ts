import { assertFiniteNumber, assertOddWindow } from '../../input-guards';

function median(sorted: readonly number[]): number {
  const mid = sorted.length >> 1;
  return sorted.length % 2 === 1 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/**
 * Centred moving median over an odd window. Near the ends the window shrinks symmetrically
 * (so the first and last values are kept as they are: the route's end heights are anchors,
 * not noise). Returns a new array.
 */
export function movingMedian(values: readonly number[], windowSize: number): number[] {
  assertOddWindow(windowSize, 'windowSize');
  values.forEach((v, i) => assertFiniteNumber(v, 'values', i));
  const half = (windowSize - 1) / 2;
  return values.map((_, i) => {
    const h = Math.min(half, i, values.length - 1 - i);
    const window = values.slice(i - h, i + h + 1).sort((a, b) => a - b);
    return median(window);
  });
}
