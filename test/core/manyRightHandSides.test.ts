import { describe, expect, it } from 'vitest';
import { Matrix, inverse } from 'ml-matrix';
import { DenseLuSolver } from '../../src/core/exchange';
import { DenseCholesky } from '../../src/core/exchange/cholesky';
import { CholeskyRows } from '../../src/core/exchange/manyRightHandSides';
import { RadiositySystem } from '../../src/core/exchange/radiositySystem';
import { seeded } from './seeded';
import { spd } from './spd';

// Many right-hand sides solved together against one Cholesky factor, and the
// radiosity system's columns of M^-1 built on it. Oracle: ml-matrix's general
// solve and inverse (an independent package). Bound: each solve is backward
// stable (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed.,
// thm. 10.4 with ch. 8 for the triangular solves), so the forward error is
// within a small multiple of m u cond(S) ||x||.
const U = 2 ** -53;

const rowsOf = (a: ArrayLike<number>, m: number) =>
  Array.from({ length: m }, (_, i) => Array.from({ length: m }, (_, j) => a[i * m + j]));

function condOne(rows: number[][]): number {
  const norm = (q: number[][]) => Math.max(...q.map((_, j) => q.reduce((s, row) => s + Math.abs(row[j]), 0)));
  return norm(rows) * norm(inverse(new Matrix(rows)).to2DArray());
}

describe('many right-hand sides of one Cholesky factor', () => {
  for (const accelerate of [true, false]) {
    // Sizes around the 16-wide base blocks and 4 x 4 tiles; counts across the 256-row passes.
    for (const [m, count] of [
      [1, 2],
      [5, 3],
      [8, 1],
      [17, 9],
      [67, 300],
      [130, 40],
      [261, 261],
    ]) {
      it(`${accelerate ? 'SIMD kernel' : 'plain JavaScript'}, m = ${m}, ${count} right-hand sides: each as a general solve`, () => {
        const s = spd(m, 10 + m);
        const host = new DenseLuSolver(m, { accelerate });
        const chol = new DenseCholesky(host, m);
        chol.matrix.set(s);
        expect(chol.factor()).toBe(true);
        const r = seeded(500 + m);
        // Dense right-hand sides, and ones that start with zeros (the forward solve skips those columns).
        const b = new Float64Array(count * m);
        for (let c = 0; c < count; c++) {
          const lead = c % 3 === 0 ? 0 : Math.floor(r() * m);
          for (let i = lead; i < m; i++) b[c * m + i] = c % 3 === 2 && i > lead ? 0 : r() - 0.3;
        }
        const x = new CholeskyRows(chol.matrix, m, accelerate).solve(Float64Array.from(b), count);
        const rows = rowsOf(s, m);
        const cond = condOne(rows);
        const inv = inverse(new Matrix(rows)).to2DArray();
        for (let c = 0; c < count; c++) {
          const bc = b.subarray(c * m, c * m + m);
          const ref = inv.map((row) => row.reduce((sum, v, j) => sum + v * bc[j], 0));
          const big = Math.max(...ref.map(Math.abs));
          for (let i = 0; i < m; i++)
            expect(Math.abs(x[c * m + i] - ref[i])).toBeLessThanOrEqual(20 * m * U * cond * big);
        }
      });
    }
  }

  it('refuses fewer doubles than the right-hand sides need', () => {
    expect(() => new CholeskyRows(new Float64Array(4), 2).solve(new Float64Array(3), 2)).toThrow(RangeError);
  });
});

/** Reciprocal factors of a closed enclosure (A_i F_ij symmetric), areas varying. */
function enclosure(n: number, seed: number) {
  const r = seeded(seed);
  const AF = new Float64Array(n * n);
  for (let i = 0; i < n; i++)
    for (let j = 0; j <= i; j++) AF[i * n + j] = AF[j * n + i] = j === i - 1 || r() > 0.3 ? 0.05 + r() : 0;
  const area = new Float64Array(n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) area[i] += AF[i * n + j];
  return { F: AF.map((v, k) => v / area[Math.floor(k / n)]), area };
}

describe('columns of the radiosity system solved together', () => {
  // w = 0 rows (black surfaces) are known radiosities; their columns reach every other row.
  for (const [label, breakReciprocity] of [
    ['Cholesky', false],
    ['LU (factors off reciprocity)', true],
  ] as const) {
    it(`${label}: x_c = M^-1 (scale_c e_k) for known and unknown surfaces, as ml-matrix's inverse`, () => {
      const n = 73;
      const { F, area } = enclosure(n, 21);
      if (breakReciprocity) F[5 * n + 4] *= 1.01;
      const w = Float64Array.from({ length: n }, (_, i) => (i % 7 === 0 ? 0 : 0.1 + (0.8 * ((i * 37) % 11)) / 11));
      const system = new RadiositySystem(F, w, area);
      expect(system.symmetric).toBe(!breakReciprocity);
      const cols = Int32Array.from([0, 1, 2, 7, 30, 31, 70, 72, 14, 3]);
      const scale = Float64Array.from(cols, (k) => 0.3 + k / 100);
      const X = system.solveColumns(cols, scale);
      const M = Array.from({ length: n }, (_, i) =>
        Array.from({ length: n }, (_, j) => (i === j ? 1 : 0) - w[i] * F[i * n + j]),
      );
      const inv = inverse(new Matrix(M)).to2DArray();
      const bound = 20 * n * U * condOne(M);
      cols.forEach((k, c) => {
        const big = Math.max(...inv.map((row) => Math.abs(row[k] * scale[c])));
        for (let i = 0; i < n; i++)
          expect(Math.abs(X[i * cols.length + c] - inv[i][k] * scale[c])).toBeLessThanOrEqual(bound * big);
      });
    });
  }
});

describe('those columns at their own rows only (the symmetry of S^-1 fills the rest)', () => {
  it('as ml-matrix’s inverse, for columns in any order, with and without a surface outside S', () => {
    const n = 61;
    const { F, area } = enclosure(n, 8);
    const w = Float64Array.from({ length: n }, (_, i) => (i % 9 === 0 ? 0 : 0.05 + 0.9 * (((i * 53) % 17) / 17)));
    const system = new RadiositySystem(F, w, area);
    expect(system.symmetric).toBe(true);
    const M = Array.from({ length: n }, (_, i) =>
      Array.from({ length: n }, (_, j) => (i === j ? 1 : 0) - w[i] * F[i * n + j]),
    );
    const inv = inverse(new Matrix(M)).to2DArray();
    const bound = 20 * n * U * condOne(M);
    // Every surface of S but a few, shuffled; then with a black one (w = 0: not a row of S, so every row is solved).
    const inS = Array.from({ length: n }, (_, i) => i).filter((i) => w[i] > 0 && i % 5 !== 2);
    const shuffled = inS
      .map((k, t) => [k, (t * 37) % inS.length] as const)
      .sort((a, b) => a[1] - b[1])
      .map(([k]) => k);
    for (const cols of [Int32Array.from(shuffled), Int32Array.from([...shuffled.slice(0, 20), 9, 18])]) {
      const u = cols.length;
      const scale = Float64Array.from(cols, (k) => 0.2 + k / 80);
      const X = system.solveColumnsAt(cols, scale);
      for (let c = 0; c < u; c++) {
        const big = Math.max(...inv.map((row) => Math.abs(row[cols[c]] * scale[c])));
        for (let r = 0; r < u; r++)
          expect(Math.abs(X[r * u + c] - inv[cols[r]][cols[c]] * scale[c])).toBeLessThanOrEqual(bound * big);
      }
    }
  });
});
