import { expect, it } from 'vitest';
import { DenseLuSolver } from '../../src/core/exchange';

// The largest size we promise (~2000 surfaces after subdivision) solves
// accurately on the accelerated path. Its time is measured by `npm run bench`.
const N = 2000;

it(`an n = ${N} dense system factors and solves accurately with the SIMD kernel`, () => {
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
  const x = new Float64Array(N);
  solver.matrix.set(a);
  x.set(b);
  solver.factor();
  solver.solve(x);
  // Exact answer x_j = (j mod 7) - 3; forward error ~ n u cond, cond ~ 1 here (Higham, 2nd ed., ch. 9).
  for (let j = 0; j < N; j++) expect(Math.abs(x[j] - ((j % 7) - 3))).toBeLessThan(1e-12);
});
