import { describe, expect, it } from 'vitest';
import { DenseLuSolver, solveLinearSystem } from '../../src/core/exchange';
import { seeded } from './seeded';

// One step of iterative refinement in the working precision makes the
// solution componentwise backward stable: each equation then holds to about
// one rounding of its own terms, omega = max_i |b - A x|_i / (|A| |x| + |b|)_i
// of order u (Skeel 1980; Higham, Accuracy and Stability of Numerical
// Algorithms, 2nd ed., sec. 12.2, Thm 12.3). Plain LU with partial pivoting
// only promises that normwise, so rows scaled far below the others can keep
// relative residuals of tens of u. The residuals here are computed exactly
// enough to see single roundings: Dekker's product and Knuth's sum, as in the
// Dot2 of Ogita, Rump and Oishi (2005), independent of the solver.
const U = 2 ** -53;
/** Left after one step: a few roundings of the residual's own sums (Higham, Thm 12.3, its constant ~1 here). */
const REFINED = 4 * U;

/** a x b as an unevaluated sum p + e, exactly (Dekker 1971). */
function twoProduct(a: number, b: number): [number, number] {
  const split = (x: number) => {
    const c = 134217729 * x; // 2^27 + 1
    const hi = c - (c - x);
    return [hi, x - hi];
  };
  const p = a * b;
  const [ah, al] = split(a);
  const [bh, bl] = split(b);
  return [p, al * bl - (p - ah * bh - al * bh - ah * bl)];
}

/** Componentwise backward error of x (Oettli-Prager), the residual in twice the working precision. */
function componentwiseBackwardError(a: Float64Array, b: Float64Array, x: Float64Array): number {
  const n = b.length;
  let worst = 0;
  for (let i = 0; i < n; i++) {
    let hi = b[i];
    let lo = 0;
    let scale = Math.abs(b[i]);
    for (let j = 0; j < n; j++) {
      const [p, e] = twoProduct(-a[i * n + j], x[j]);
      const t = hi + p;
      const z = t - hi;
      lo += hi - (t - z) + (p - z) + e;
      hi = t;
      scale += Math.abs(a[i * n + j] * x[j]);
    }
    worst = Math.max(worst, Math.abs(hi + lo) / scale);
  }
  return worst;
}

/** Random rows scaled by 10^-4 .. 10^4: cond ~ 1e9 .. 1e10, accepted (reciprocal condition above 1e-12). */
function badlyScaled(n: number, seed: number): { a: Float64Array; b: Float64Array } {
  const r = seeded(seed);
  const a = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    const d = 10 ** (8 * r() - 4);
    for (let j = 0; j < n; j++) a[i * n + j] = d * (2 * r() - 1);
  }
  return { a, b: new Float64Array(n).map(() => 2 * r() - 1) };
}

describe('one step of iterative refinement', () => {
  for (const accelerate of [true, false]) {
    it(`brings badly scaled, ill-conditioned systems to componentwise backward stability (${accelerate ? 'SIMD kernel' : 'JavaScript loop'})`, () => {
      const n = 100;
      for (let seed = 1; seed <= 4; seed++) {
        const { a, b } = badlyScaled(n, seed);
        const solver = new DenseLuSolver(n, { accelerate });
        solver.matrix.set(a);
        const rcond = solver.factor();
        expect(rcond).toBeLessThan(1e-8);
        const x = Float64Array.from(b);
        solver.solve(x);
        const before = componentwiseBackwardError(a, b, x);
        // The residual in plain double precision, from the original matrix.
        const r = new Float64Array(n);
        for (let i = 0; i < n; i++) {
          let s = b[i];
          for (let j = 0; j < n; j++) s -= a[i * n + j] * x[j];
          r[i] = s;
        }
        solver.refine(x, r);
        const after = componentwiseBackwardError(a, b, x);
        expect(before).toBeGreaterThan(REFINED); // so the step has something to do here
        expect(after).toBeLessThanOrEqual(REFINED);
      }
    });
  }

  it('solveLinearSystem refines: its answers are componentwise backward stable', () => {
    for (let seed = 5; seed <= 8; seed++) {
      const { a, b } = badlyScaled(80, seed);
      const { x } = solveLinearSystem(a, b, 80);
      expect(componentwiseBackwardError(a, b, x)).toBeLessThanOrEqual(REFINED);
    }
  });

  it('refine before factor is refused', () => {
    const solver = new DenseLuSolver(3);
    expect(() => solver.refine(new Float64Array(3), new Float64Array(3))).toThrow('not-factored');
  });
});
