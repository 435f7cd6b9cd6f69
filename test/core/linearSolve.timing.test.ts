import { expect, it } from 'vitest';
import { DenseLuSolver } from '../../src/core/linearSolve';

// Size target: ~2000 surfaces (after subdivision) must solve in well under a
// second. Measured on the 2-core dev machine: ~0.45-0.6 s quiet (see the
// report/README). The bound here is looser because the suite runs test files
// in parallel; it still fails if the SIMD kernel is lost (the JavaScript loop
// takes 3-9 s at this size) or the blocking regresses badly.
const N = 2000;
const BOUND_MS = 2000;

it(`an n = ${N} dense system factors and solves in under ${BOUND_MS} ms, accurately`, () => {
  let s = 12345;
  const rnd = () => {
    s = (Math.imul(s, 1103515245) + 12345) >>> 0;
    return s / 4294967296 - 0.5;
  };
  // Diagonally dominant like a radiosity matrix (rows I - (1 - e) F), plus random coupling.
  const a = new Float64Array(N * N).map(() => rnd() / N);
  for (let i = 0; i < N; i++) a[i * N + i] += 1;
  const solver = new DenseLuSolver(N);
  expect(solver.accelerated).toBe(true);
  const b = new Float64Array(N);
  for (let i = 0; i < N; i++) {
    let v = 0;
    for (let j = 0; j < N; j++) v += a[i * N + j] * ((j % 7) - 3);
    b[i] = v;
  }
  let best = Number.POSITIVE_INFINITY;
  const x = new Float64Array(N);
  for (let rep = 0; rep < 3; rep++) {
    solver.matrix.set(a);
    x.set(b);
    const t0 = performance.now();
    solver.factor();
    solver.solve(x);
    best = Math.min(best, performance.now() - t0);
  }
  console.log(`n = ${N}: factor + condition estimate + solve, best of 3: ${best.toFixed(0)} ms`);
  // Exact answer x_j = (j mod 7) - 3; forward error ~ n u cond, cond ~ 1 here (Higham, 2nd ed., ch. 9).
  for (let j = 0; j < N; j++) expect(Math.abs(x[j] - ((j % 7) - 3))).toBeLessThan(1e-12);
  expect(best).toBeLessThan(BOUND_MS);
});
