import { describe, expect, it } from 'vitest';
import { CholeskyDecomposition, Matrix } from 'ml-matrix';
import { DenseLuSolver } from '../../src/core/exchange';
import { DenseCholesky } from '../../src/core/exchange/cholesky';
import { spd } from './spd';

// Oracle: ml-matrix's CholeskyDecomposition (an independent, general-purpose
// package). Bounds: Cholesky is backward stable without pivoting for any
// symmetric positive definite matrix (Higham, Accuracy and Stability of
// Numerical Algorithms, 2nd ed., thm. 10.4): (S + dS) x = b with
// |dS| <= ~n u |L| |L^T|, so the residual is within a small multiple of
// n u ||S|| ||x||; the factor agrees with the oracle's to about
// cond(S) u relative.
const U = 2 ** -53;

function factorAndSolve(s: Float64Array, m: number, b: Float64Array, accelerate: boolean) {
  const host = new DenseLuSolver(m + 3, { accelerate }); // a larger host: the factor uses stride m inside it
  const chol = new DenseCholesky(host, m);
  chol.matrix.set(s);
  expect(chol.factor()).toBe(true);
  return { chol, x: chol.solve(Float64Array.from(b)) };
}

describe('dense Cholesky in a solver host', () => {
  for (const accelerate of [true, false]) {
    const label = accelerate ? 'SIMD kernel' : 'plain JavaScript';
    // Sizes around the 8-wide panels, the 4 x 4 tiles and the 256-deep packed blocks.
    for (const m of [1, 2, 7, 8, 9, 17, 33, 67, 130, 261]) {
      it(`${label}, m = ${m}: L matches ml-matrix and the residual is backward stable`, () => {
        const s = spd(m, 100 + m);
        const b = Float64Array.from({ length: m }, (_, i) => Math.sin(i + 1));
        const { chol, x } = factorAndSolve(s, m, b, accelerate);
        const oracle = new CholeskyDecomposition(
          new Matrix(Array.from({ length: m }, (_, i) => Array.from(s.subarray(i * m, i * m + m)))),
        );
        const L = oracle.lowerTriangularMatrix.to2DArray();
        let worst = 0;
        let scale = 0;
        for (let i = 0; i < m; i++) {
          for (let j = 0; j <= i; j++) {
            worst = Math.max(worst, Math.abs(chol.matrix[i * m + j] - L[i][j]));
            scale = Math.max(scale, Math.abs(L[i][j]));
            // L^T is mirrored above the diagonal, bit for bit.
            if (j < i) expect(chol.matrix[j * m + i]).toBe(chol.matrix[i * m + j]);
          }
        }
        expect(worst).toBeLessThanOrEqual(1e3 * m * U * scale);
        let normS = 0;
        let residual = 0;
        let normX = 0;
        for (let i = 0; i < m; i++) {
          let t = b[i];
          let row = 0;
          for (let j = 0; j < m; j++) {
            t -= s[i * m + j] * x[j];
            row += Math.abs(s[i * m + j]);
          }
          residual = Math.max(residual, Math.abs(t));
          normS = Math.max(normS, row);
          normX = Math.max(normX, Math.abs(x[i]));
        }
        expect(residual).toBeLessThanOrEqual(4 * m * U * normS * normX);
      });
    }
  }

  it('reports a matrix that is not positive definite, and a NaN entry, instead of factoring it', () => {
    const host = new DenseLuSolver(40);
    const indefinite = spd(40, 7);
    indefinite[39 * 40 + 39] = -1; // the last pivot goes negative
    const chol = new DenseCholesky(host, 40);
    chol.matrix.set(indefinite);
    expect(chol.factor()).toBe(false);
    expect(() => chol.solve(new Float64Array(40))).toThrow(/before a successful factor/);
    const withNaN = spd(40, 8);
    withNaN[30 * 40 + 2] = Number.NaN; // below the diagonal: it reaches pivot 30
    chol.matrix.set(withNaN);
    expect(chol.factor()).toBe(false);
  });

  it('refuses a size larger than its host', () => {
    expect(() => new DenseCholesky(new DenseLuSolver(5), 6)).toThrow(RangeError);
  });
});
