// Bounded one-dimensional root finding for the calculators that aim at a target (thresholds,
// make-up): Brent's method on a bracket, never more than a fixed number of evaluations.

/** A root and how it was reached. */
export interface Root {
  x: number;
  fx: number;
  evaluations: number;
  converged: boolean;
}

/** Stopping rules: |step| below xTolerance (absolute, in x), or |f| below fTolerance, or maxEvaluations. */
export interface RootOptions {
  xTolerance: number;
  fTolerance: number;
  maxEvaluations: number;
}

/**
 * Brent's method (Brent 1973, "zeroin") on [a, b] with f(a), f(b) of opposite signs (or one 0).
 * NOTE: numerical kernel kept whole (about 40 lines) so the algorithm reads as published.
 */
export function brent(f: (x: number) => number, a0: number, b0: number, fa0: number, fb0: number, opts: RootOptions): Root {
  let a = a0, b = b0, fa = fa0, fb = fb0;
  let c = a, fc = fa, d = b - a, e = d;
  for (let n = 0; n < opts.maxEvaluations; n++) {
    if ((fb > 0 && fc > 0) || (fb < 0 && fc < 0)) {
      c = a; fc = fa; d = b - a; e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b; b = c; c = a; fa = fb; fb = fc; fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 0.5 * opts.xTolerance;
    const m = 0.5 * (c - b);
    if (Math.abs(m) <= tol || Math.abs(fb) <= opts.fTolerance) return { x: b, fx: fb, evaluations: n, converged: true };
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number, q: number;
      if (a === c) {
        p = 2 * m * s; q = 1 - s;
      } else {
        const qa = fa / fc, r = fb / fc;
        p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q; else p = -p;
      if (2 * p < Math.min(3 * m * q - Math.abs(tol * q), Math.abs(e * q))) {
        e = d; d = p / q;
      } else {
        d = m; e = m;
      }
    } else {
      d = m; e = m;
    }
    a = b; fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
  }
  return { x: b, fx: fb, evaluations: opts.maxEvaluations, converged: false };
}
