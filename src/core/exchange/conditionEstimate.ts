// 1-norm condition estimate from an LU factorization: Hager's method as
// refined by Higham (the estimator LAPACK uses), a few O(n^2) solves instead
// of the O(n^3) inverse. Dimensionless.

/** What the estimate needs of a factored solver: solves with A and with A^T, in place. */
export interface FactoredSystem {
  readonly n: number;
  solve(b: Float64Array): Float64Array;
  solveTransposed(b: Float64Array): Float64Array;
}

/**
 * Estimate of ||A^{-1}||_1 (a lower bound, usually within a factor of 3) from
 * a factored system; x, y, z are scratch arrays of length n. Returns +Infinity
 * when a solve overflows.
 */
export function estimateInverseNormOne(
  system: FactoredSystem,
  x: Float64Array,
  y: Float64Array,
  z: Float64Array,
): number {
  const n = system.n;
  x.fill(1 / n);
  let est = 0;
  for (let iter = 0; iter < 5; iter++) {
    y.set(x);
    system.solve(y);
    let norm = 0;
    for (let i = 0; i < n; i++) norm += Math.abs(y[i]);
    if (!Number.isFinite(norm)) return Number.POSITIVE_INFINITY;
    if (iter > 0 && norm <= est) break;
    est = norm;
    for (let i = 0; i < n; i++) z[i] = y[i] >= 0 ? 1 : -1;
    system.solveTransposed(z);
    let jBest = 0;
    let zBest = -1;
    let zx = 0;
    for (let i = 0; i < n; i++) {
      const v = Math.abs(z[i]);
      if (v > zBest) {
        zBest = v;
        jBest = i;
      }
      zx += z[i] * x[i];
    }
    if (iter > 0 && zBest <= zx) break;
    x.fill(0);
    x[jBest] = 1;
  }
  // Higham's extra test vector catches matrices that fool the iteration.
  for (let i = 0; i < n; i++) y[i] = (i % 2 === 0 ? 1 : -1) * (1 + (n > 1 ? i / (n - 1) : 0));
  system.solve(y);
  let alt = 0;
  for (let i = 0; i < n; i++) alt += Math.abs(y[i]);
  alt = (2 * alt) / (3 * n);
  return Math.max(est, alt);
}
