/** Options of `brentRoot`. */
export interface BrentOptions {
  /** Absolute tolerance on x. @default 1e-15 */
  xTolerance?: number;
  /** Iteration cap. @default 200 */
  maxIterations?: number;
}

/**
 * Brent's method (inverse quadratic interpolation, secant and bisection), after R.P. Brent,
 * *Algorithms for Minimization without Derivatives*, 1973, ch. 4 (the classic `zeroin`).
 * `f(a)` and `f(b)` must have opposite signs (or one be zero). Returns x with f(x) ~ 0.
 */
export function brentRoot(f: (x: number) => number, a0: number, b0: number, options: BrentOptions = {}): number {
  const xTolerance = options.xTolerance ?? 1e-15;
  const maxIterations = options.maxIterations ?? 200;
  let a = a0;
  let b = b0;
  let fa = f(a);
  let fb = f(b);
  if (fa === 0) return a;
  if (fb === 0) return b;
  if (fa * fb > 0) throw new RangeError('brentRoot: the root is not bracketed');
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let iteration = 0; iteration < maxIterations; iteration++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * xTolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * m * s;
        q = 1 - s;
      } else {
        const qa = fa / fc;
        const r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = m;
        e = d;
      }
    } else {
      d = m;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return b;
}
