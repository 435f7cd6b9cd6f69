// Brent's method: a root of a continuous function of one variable in a
// bracket where it changes sign. Inverse quadratic interpolation and secant
// steps when they land well inside the bracket, bisection otherwise, so it
// never takes more steps than about the square of bisection's.
// (R. P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4.)

/** Machine epsilon (unit roundoff of doubles times two), dimensionless. */
const EPSILON = 2 ** -52;

export interface RootTolerance {
  /** The root is found to within this fraction of its own size (dimensionless). */
  relative: number;
  /** Floor for roots at or near zero, in the varied quantity's units. */
  absolute: number;
  /** Evaluations allowed after the two bracket ends. */
  maxEvaluations: number;
}

export type RootOutcome =
  /** `root` in the varied quantity's units; `residual` = f(root); `evaluations` of f used. */
  | { ok: true; root: number; residual: number; evaluations: number }
  /** 'not-bracketed': f(a), f(b) of one sign; 'not-finite': f gave a non-number at `at`; 'no-convergence': steps ran out. */
  | { ok: false; code: 'not-bracketed' | 'not-finite' | 'no-convergence'; at: number };

/**
 * A root of f between a and b (units of the varied quantity), given fa = f(a)
 * and fb = f(b) of opposite signs (or one of them zero). The answer lies within
 * relative |root| + absolute of a sign change of f (the final bracket's width).
 */
export function brentRoot(
  f: (x: number) => number,
  a0: number,
  b0: number,
  fa0: number,
  fb0: number,
  tolerance: RootTolerance,
): RootOutcome {
  let a = a0;
  let b = b0;
  let fa = fa0;
  let fb = fb0;
  if (!Number.isFinite(fa)) return { ok: false, code: 'not-finite', at: a };
  if (!Number.isFinite(fb)) return { ok: false, code: 'not-finite', at: b };
  if (fa === 0) return { ok: true, root: a, residual: 0, evaluations: 0 };
  if (fb === 0) return { ok: true, root: b, residual: 0, evaluations: 0 };
  if (Math.sign(fa) === Math.sign(fb)) return { ok: false, code: 'not-bracketed', at: a };
  let c = b;
  let fc = fb;
  let d = b - a;
  let e = d;
  for (let evaluations = 0; ; evaluations++) {
    if (Math.sign(fb) === Math.sign(fc)) {
      // Keep the root between b and c.
      c = a;
      fc = fa;
      d = b - a;
      e = d;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      // b is the best guess so far.
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    // Half the allowed final bracket width: |c - b| <= 2 tol1 ends the search.
    const tol1 = 2 * EPSILON * Math.abs(b) + 0.5 * (tolerance.relative * Math.abs(b) + tolerance.absolute);
    const xm = 0.5 * (c - b);
    if (Math.abs(xm) <= tol1 || fb === 0) return { ok: true, root: b, residual: fb, evaluations };
    if (evaluations >= tolerance.maxEvaluations) return { ok: false, code: 'no-convergence', at: b };
    if (Math.abs(e) >= tol1 && Math.abs(fa) > Math.abs(fb)) {
      const s = fb / fa;
      let p: number;
      let q: number;
      if (a === c) {
        p = 2 * xm * s; // secant
        q = 1 - s;
      } else {
        const qa = fa / fc; // inverse quadratic interpolation
        const r = fb / fc;
        p = s * (2 * xm * qa * (qa - r) - (b - a) * (r - 1));
        q = (qa - 1) * (r - 1) * (s - 1);
      }
      if (p > 0) q = -q;
      else p = -p;
      if (2 * p < Math.min(3 * xm * q - Math.abs(tol1 * q), Math.abs(e * q))) {
        e = d;
        d = p / q;
      } else {
        d = xm; // interpolation would leave the bracket or converge too slowly: bisect
        e = d;
      }
    } else {
      d = xm;
      e = d;
    }
    a = b;
    fa = fb;
    b += Math.abs(d) > tol1 ? d : xm > 0 ? tol1 : -tol1;
    fb = f(b);
    if (!Number.isFinite(fb)) return { ok: false, code: 'not-finite', at: b };
  }
}
