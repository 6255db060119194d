import { assertFiniteNumber, assertInRange, assertPositive } from '../input-guards';

/** Options shared by the friction-factor functions. */
export interface FrictionFactorOptions {
  /** Reynolds number V·D/ν (> 0). */
  reynolds: number;
  /** Relative roughness ε/D (0 for a smooth pipe, at most 0.1). */
  relativeRoughness: number;
}

/** Largest relative roughness any friction chart covers. */
export const MAX_RELATIVE_ROUGHNESS = 0.1;

export function assertFrictionFactorOptions({ reynolds, relativeRoughness }: FrictionFactorOptions): void {
  assertPositive(reynolds, 'reynolds');
  assertFiniteNumber(relativeRoughness, 'relativeRoughness');
  assertInRange(relativeRoughness, 'relativeRoughness', 0, MAX_RELATIVE_ROUGHNESS, '');
}

/**
 * Swamee-Jain (1976, J. Hydraul. Div. 102(5):657-664) explicit Darcy friction factor:
 * f = 0.25 / [log10(ε/(3.7D) + 5.74/Re^0.9)]². Stated range 5e3 ≤ Re ≤ 1e8, 1e-6 ≤ ε/D ≤ 1e-2,
 * within about ±1 % of Colebrook there (core.md §1.3). Used as the Colebrook starting guess.
 */
export function swameeJainFrictionFactor(options: FrictionFactorOptions): number {
  assertFrictionFactorOptions(options);
  return swameeJainUnchecked(options.reynolds, options.relativeRoughness);
}

/** Hot-path kernel of {@link swameeJainFrictionFactor}. */
export function swameeJainUnchecked(reynolds: number, relativeRoughness: number): number {
  const logTerm = Math.log10(relativeRoughness / 3.7 + 5.74 / reynolds ** 0.9);
  return 0.25 / (logTerm * logTerm);
}
