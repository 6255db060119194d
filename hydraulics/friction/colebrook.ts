import { assertFrictionFactorOptions, swameeJainUnchecked, type FrictionFactorOptions } from './swamee-jain';

const LN10 = Math.LN10;
/** Newton stops when the step in 1/√f is below this fraction of 1/√f. */
const RELATIVE_STEP_TOLERANCE = 1e-15;
const MAX_ITERATIONS = 50;

/**
 * Colebrook-White Darcy friction factor (Clamond 2009, Ind. Eng. Chem. Res. 48:3665, Eq. 1):
 * 1/√f = −2 log10(ε/(3.7D) + 2.51/(Re √f)).
 * Solved by Newton's method on x = 1/√f: F(x) = x + 2 log10(a + b x) is increasing and concave,
 * so Newton converges monotonically from any positive start (quadratically near the root; 3-5
 * steps from the Swamee-Jain guess). The residual |F(x)|/x ends below 1e-12.
 */
export function colebrookFrictionFactor(options: FrictionFactorOptions): number {
  assertFrictionFactorOptions(options);
  return colebrookUnchecked(options.reynolds, options.relativeRoughness);
}

/**
 * Hot-path kernel of {@link colebrookFrictionFactor}: no checks, no allocation. `startInverseSqrtF`
 * (1/√f of a nearby solve, e.g. the same pipe's last iteration) replaces the Swamee-Jain start: Newton
 * converges from any positive start, to the same tolerance, in one or two steps from a close one.
 */
export function colebrookUnchecked(reynolds: number, relativeRoughness: number, startInverseSqrtF = 0): number {
  const a = relativeRoughness / 3.7;
  const b = 2.51 / reynolds;
  const guess =
    startInverseSqrtF > 0 ? startInverseSqrtF : 1 / Math.sqrt(swameeJainUnchecked(reynolds, relativeRoughness));
  let x = Number.isFinite(guess) && guess > 0 ? guess : 1;
  for (let iteration = 0; iteration < MAX_ITERATIONS; iteration += 1) {
    const inner = a + b * x;
    const residual = x + (2 / LN10) * Math.log(inner);
    const slope = 1 + (2 / LN10) * (b / inner);
    const step = residual / slope;
    x -= step;
    if (Math.abs(step) <= RELATIVE_STEP_TOLERANCE * x) break;
  }
  // Monotone Newton cannot diverge; the cap only bounds round-off dithering at the last bit.
  return 1 / (x * x);
}

/** Residual of the Colebrook equation at friction factor `f`, relative to 1/√f (for checks). */
export function colebrookResidual({ reynolds, relativeRoughness }: FrictionFactorOptions, f: number): number {
  const x = 1 / Math.sqrt(f);
  return (x + 2 * Math.log10(relativeRoughness / 3.7 + (2.51 / reynolds) * x)) / x;
}
