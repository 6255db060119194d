import type { PipeSpec } from './pipe-spec';

/** One catalogue series: a material, standard and dimension ratio, with its sizes ascending. */
export interface PipeSeries {
  /** e.g. `pvc-d2241-sdr21`; every pipe id in the series starts with it. */
  id: string;
  label: string;
  pipes: readonly PipeSpec[];
}

/** `1-1/4` → `1.25in`, `2` → `2in`: size part of a pipe id. */
export function inchSizeSlug(size: string): string {
  return `${inchSizeValue(size)}in`;
}

/** Numeric value of a printed inch size: `1-1/4` → 1.25, `3/4` → 0.75. */
export function inchSizeValue(size: string): number {
  const [whole, fraction] = size.includes('-') ? size.split('-') : size.includes('/') ? ['0', size] : [size, undefined];
  const [numerator, denominator] = fraction ? fraction.split('/').map(Number) : [0, 1];
  return Number(whole) + numerator / denominator;
}

/** Minimum wall from a dimension ratio with the ASTM 0.060 in floor, rounded to 0.001 in. */
export function astmMinimumWallIn(diameterIn: number, ratio: number): number {
  return Math.round(Math.max(diameterIn / ratio, 0.06) * 1000) / 1000;
}
