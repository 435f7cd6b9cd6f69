import { describe, expect, it } from 'vitest';
import { Matrix, inverse } from 'ml-matrix';
import { LinearSolveError } from '../../../src/core/exchange';
import { NewtonMatrix } from '../../../src/core/balance/newtonMatrix';
import { seeded } from '../seeded';

// The balance's Newton matrix Z - diag(W - d), by Cholesky when Z is symmetric
// and minus the matrix positive definite, else by LU. Oracle: ml-matrix's
// inverse (an independent package) of the matrix as given (not averaged).
// Bound: a backward stable solve has forward error within a small multiple of
// m u cond (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed.,
// ch. 7); averaging triangles that differ by r relative adds about cond r.
const U = 2 ** -53;

/** A coupling like a surface balance's: Z >= 0, rows summing to at most W, symmetric (exchange reciprocity). */
function coupling(m: number, seed: number, asymmetry = 0) {
  const r = seeded(seed);
  const Z = new Float64Array(m * m);
  for (let a = 0; a < m; a++)
    for (let b = 0; b <= a; b++) {
      const v = r() > 0.4 ? r() : 0;
      Z[a * m + b] = v;
      Z[b * m + a] = v * (1 + asymmetry * (r() - 0.5));
    }
  const W = new Float64Array(m);
  for (let a = 0; a < m; a++) for (let b = 0; b < m; b++) W[a] += Z[a * m + b] * (1 + 0.05 * r());
  const d = Float64Array.from({ length: m }, () => -0.5 * r());
  return { Z, W, d };
}

function check(m: number, Z: Float64Array, W: Float64Array, d: Float64Array, cholesky: boolean, averaged = 0) {
  const newton = new NewtonMatrix(Z, W);
  newton.factor(d);
  expect(newton.usedCholesky).toBe(cholesky);
  const rows = Array.from({ length: m }, (_, a) =>
    Array.from({ length: m }, (_, b) => Z[a * m + b] - (a === b ? W[a] - d[a] : 0)),
  );
  const inv = inverse(new Matrix(rows)).to2DArray();
  const norm = (q: number[][]) => Math.max(...q.map((_, j) => q.reduce((s, row) => s + Math.abs(row[j]), 0)));
  const cond = norm(rows) * norm(inv);
  const rhs = Float64Array.from({ length: m }, (_, a) => Math.cos(a + 0.5));
  const x = newton.solve(Float64Array.from(rhs));
  const ref = inv.map((row) => row.reduce((s, v, b) => s + v * rhs[b], 0));
  const big = Math.max(...ref.map(Math.abs));
  for (let a = 0; a < m; a++) expect(Math.abs(x[a] - ref[a])).toBeLessThanOrEqual((20 * m * U + averaged) * cond * big);
}

describe('the Newton matrix of the surface balance', () => {
  it('a symmetric coupling (to rounding) takes Cholesky and solves as the matrix given', () => {
    for (const m of [1, 3, 9, 40, 131]) {
      const { Z, W, d } = coupling(m, m, 1e-15);
      check(m, Z, W, d, true, 1e-15);
    }
  });

  it('a coupling off symmetry (factors not reciprocal) takes LU', () => {
    const { Z, W, d } = coupling(60, 2, 1e-4);
    check(60, Z, W, d, false);
  });

  it('a rising back slope that leaves minus the matrix indefinite takes LU', () => {
    const { Z, W, d } = coupling(30, 3);
    d[4] = 5 * W[4]; // heat supplied that grows with temperature
    check(30, Z, W, d, false);
  });

  it('a closed balance with nothing tied to a temperature is singular and refused', () => {
    const m = 12;
    const { Z } = coupling(m, 4);
    const W = new Float64Array(m);
    for (let a = 0; a < m; a++) for (let b = 0; b < m; b++) W[a] += Z[a * m + b];
    expect(() => new NewtonMatrix(Z, W).factor(new Float64Array(m))).toThrow(LinearSolveError);
  });
});
