import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Matrix, inverse, solve as mlSolve } from 'ml-matrix';
import { DenseLuSolver, LinearSolveError, solveLinearSystem } from '../../src/core/exchange';

// Oracle: ml-matrix (an independent, general-purpose package). Accuracy bounds
// are the standard ones for Gaussian elimination with partial pivoting
// (Higham, Accuracy and Stability of Numerical Algorithms, 2nd ed., ch. 9):
// backward error ~ n u ||A|| ||x|| (u = 2^-53, growth factor small for these
// matrices), forward error ~ n u cond(A).
const U = 2 ** -53;

function seeded(seed: number): () => number {
  let s = seed >>> 0 || 1;
  return () => {
    // xorshift32: cheap, reproducible, fine for test matrices
    s ^= s << 13;
    s >>>= 0;
    s ^= s >>> 17;
    s ^= s << 5;
    s >>>= 0;
    return s / 4294967296;
  };
}

function randomSystem(n: number, seed: number): { a: Float64Array; b: Float64Array } {
  const r = seeded(seed);
  const a = new Float64Array(n * n).map(() => 2 * r() - 1);
  const b = new Float64Array(n).map(() => 2 * r() - 1);
  return { a, b };
}

const toRows = (a: ArrayLike<number>, n: number) =>
  Array.from({ length: n }, (_, i) => Array.from({ length: n }, (_, j) => a[i * n + j]));

function normInf(v: ArrayLike<number>): number {
  let m = 0;
  for (let i = 0; i < v.length; i++) m = Math.max(m, Math.abs(v[i]));
  return m;
}

function matrixNormOne(rows: number[][]): number {
  const n = rows.length;
  let m = 0;
  for (let j = 0; j < n; j++) {
    let s = 0;
    for (let i = 0; i < n; i++) s += Math.abs(rows[i][j]);
    m = Math.max(m, s);
  }
  return m;
}

/** Exact-arithmetic-free checks of one solve against ml-matrix. */
function checkAgainstOracle(a: Float64Array, b: Float64Array, n: number, accelerate: boolean) {
  const { x, reciprocalCondition } = solveLinearSystem(a, b, n, { accelerate, minReciprocalCondition: 0 });
  const rows = toRows(a, n);
  const ref = mlSolve(new Matrix(rows), Matrix.columnVector(Array.from(b))).to1DArray();
  const cond = matrixNormOne(rows) * matrixNormOne(inverse(new Matrix(rows)).to2DArray());
  // Backward error (residual), independent of the conditioning.
  let rowNorm = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += Math.abs(a[i * n + j]);
    rowNorm = Math.max(rowNorm, s);
  }
  const residual = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let j = 0; j < n; j++) s -= a[i * n + j] * x[j];
    residual[i] = s;
  }
  expect(normInf(residual)).toBeLessThanOrEqual(10 * n * U * rowNorm * normInf(x));
  // Forward error against the oracle: both solvers are within ~n u cond of the truth.
  const diff = x.map((v, i) => v - ref[i]);
  expect(normInf(diff)).toBeLessThanOrEqual(20 * n * U * cond * normInf(ref));
  // The condition estimate is a lower bound of the true 1-norm condition number, and close to it.
  expect(1 / reciprocalCondition).toBeLessThanOrEqual(cond * (1 + 1e-9));
  return { cond, estimate: 1 / reciprocalCondition };
}

describe('dense LU solve against ml-matrix', () => {
  for (const accelerate of [true, false]) {
    it(`random systems agree (${accelerate ? 'SIMD kernel' : 'JavaScript loop'})`, () => {
      fc.assert(
        fc.property(fc.integer({ min: 1, max: 70 }), fc.integer({ min: 1, max: 2 ** 31 - 1 }), (n, seed) => {
          const { a, b } = randomSystem(n, seed);
          checkAgainstOracle(a, b, n, accelerate);
        }),
        { numRuns: 60 },
      );
    });
  }

  it('sizes that leave every kind of fringe around the SIMD blocks', () => {
    // 4 x 4 tiles in packed blocks of 128 rows x 256 inner terms; recursion splits at multiples of 8; the
    // triangular solves run two doubles at a time: odd sizes, 4k+1..4k+3, and sizes past one block.
    for (const n of [8, 9, 10, 11, 13, 17, 31, 33, 64, 65, 66, 67, 127, 130, 257, 263, 515]) {
      const { a, b } = randomSystem(n, 1000 + n);
      checkAgainstOracle(a, b, n, true);
    }
  });

  it('the SIMD kernel is in use on Node 20', () => {
    expect(new DenseLuSolver(64).accelerated).toBe(true);
  });

  it('kernel and JavaScript paths give the same factors to rounding', () => {
    const n = 203;
    const { a } = randomSystem(n, 77);
    const fast = new DenseLuSolver(n);
    const slow = new DenseLuSolver(n, { accelerate: false });
    fast.matrix.set(a);
    slow.matrix.set(a);
    fast.factor();
    slow.factor();
    expect(Array.from(fast.pivot)).toEqual(Array.from(slow.pivot));
    let d = 0;
    for (let i = 0; i < n * n; i++) d = Math.max(d, Math.abs(fast.matrix[i] - slow.matrix[i]));
    // Same operations in a different order: differences of order n u max|LU entries|.
    expect(d).toBeLessThan(n * U * 100 * normInf(slow.matrix));
  });

  it('the condition estimate is within a factor of 10 of the true value (Higham, ch. 15: usually within 3)', () => {
    const ratios: number[] = [];
    for (let seed = 1; seed <= 40; seed++) {
      const n = 5 + (seed % 30);
      const { a, b } = randomSystem(n, seed * 7919);
      const { cond, estimate } = checkAgainstOracle(a, b, n, true);
      ratios.push(cond / estimate);
    }
    expect(Math.max(...ratios)).toBeLessThan(10);
    expect(Math.min(...ratios)).toBeGreaterThanOrEqual(1 - 1e-9);
  });

  it('solves the transposed system', () => {
    const n = 41;
    const { a, b } = randomSystem(n, 5);
    const solver = new DenseLuSolver(n);
    solver.matrix.set(a);
    solver.factor();
    const x = solver.solveTransposed(Float64Array.from(b));
    const ref = mlSolve(new Matrix(toRows(a, n)).transpose(), Matrix.columnVector(Array.from(b))).to1DArray();
    for (let i = 0; i < n; i++) expect(Math.abs(x[i] - ref[i])).toBeLessThan(1e-9 * normInf(ref));
  });

  it('a solver can be refilled and reused', () => {
    const n = 30;
    const solver = new DenseLuSolver(n);
    for (const seed of [11, 12]) {
      const { a, b } = randomSystem(n, seed);
      solver.matrix.set(a);
      solver.factor();
      const x = solver.solve(Float64Array.from(b));
      const ref = mlSolve(new Matrix(toRows(a, n)), Matrix.columnVector(Array.from(b))).to1DArray();
      for (let i = 0; i < n; i++) expect(Math.abs(x[i] - ref[i])).toBeLessThan(1e-9 * normInf(ref));
    }
  });
});

describe('pivoting', () => {
  it('a zero on the diagonal needs a row interchange', () => {
    const { x } = solveLinearSystem([0, 1, 1, 0], [2, 3], 2);
    expect(Array.from(x)).toEqual([3, 2]);
  });

  it('a tiny leading pivot is not used (without pivoting x1 would come out 0)', () => {
    // [[1e-20, 1], [1, 1]] x = [1, 2]: x = [1/(1-1e-20), (1-2e-20)/(1-1e-20)] ~ [1, 1] (classic example, common practice).
    const { x } = solveLinearSystem([1e-20, 1, 1, 1], [1, 2], 2);
    expect(Math.abs(x[0] - 1)).toBeLessThan(4 * U);
    expect(Math.abs(x[1] - 1)).toBeLessThan(4 * U);
  });
});

describe('singular, ill-conditioned and bad input', () => {
  const problemOf = (f: () => unknown): LinearSolveError => {
    try {
      f();
    } catch (e) {
      if (e instanceof LinearSolveError) return e;
      throw e;
    }
    throw new Error('expected a LinearSolveError');
  };

  it('a zero matrix is singular, naming the column', () => {
    const e = problemOf(() => solveLinearSystem(new Float64Array(9), [1, 2, 3], 3));
    expect(e.problem).toBe('singular');
    expect(e.detail.column).toBe(0);
    expect(e.reciprocalCondition).toBe(0);
  });

  it('two equal rows: exactly singular', () => {
    const e = problemOf(() => solveLinearSystem([1, 2, 3, 1, 2, 3, 0, 1, 5], [1, 1, 1], 3));
    expect(e.problem).toBe('singular');
  });

  for (const accelerate of [true, false]) {
    it(`a rank-deficient 60 x 60 matrix is refused (${accelerate ? 'kernel' : 'JavaScript'})`, () => {
      const n = 60;
      const { a, b } = randomSystem(n, 99);
      for (let j = 0; j < n; j++) a[17 * n + j] = 0.5 * a[3 * n + j] - 2 * a[40 * n + j]; // row 17 = combination of rows 3 and 40
      const e = problemOf(() => solveLinearSystem(a, b, n, { accelerate }));
      expect(['singular', 'ill-conditioned']).toContain(e.problem);
      expect(e.reciprocalCondition).toBeLessThan(1e-12);
    });
  }

  it('the Hilbert matrix of order 13 is ill-conditioned (cond ~ 1e18: Higham, ch. 28)', () => {
    const n = 13;
    const h = new Float64Array(n * n).map((_, k) => 1 / (Math.floor(k / n) + (k % n) + 1));
    const e = problemOf(() => solveLinearSystem(h, new Float64Array(n).fill(1), n));
    expect(e.problem).toBe('ill-conditioned');
    expect(e.reciprocalCondition).toBeLessThan(1e-12);
    expect(e.detail.limit).toBe(1e-12);
  });

  it('the Hilbert matrix of order 6 (cond_1 = 2.9e7, Higham, ch. 28) is accepted, with its condition estimated', () => {
    const n = 6;
    const h = new Float64Array(n * n).map((_, k) => 1 / (Math.floor(k / n) + (k % n) + 1));
    const rows = toRows(h, n);
    const cond = matrixNormOne(rows) * matrixNormOne(inverse(new Matrix(rows)).to2DArray());
    const { reciprocalCondition } = solveLinearSystem(h, new Float64Array(n).fill(1), n);
    expect(cond).toBeGreaterThan(2.8e7);
    expect(cond).toBeLessThan(3.0e7);
    expect(1 / reciprocalCondition).toBeGreaterThan(cond / 3);
    expect(1 / reciprocalCondition).toBeLessThanOrEqual(cond * (1 + 1e-9));
  });

  it('NaN and infinite entries are named', () => {
    const e = problemOf(() => solveLinearSystem([1, 0, Number.NaN, 1], [1, 1], 2));
    expect(e.problem).toBe('not-finite');
    expect([e.detail.row, e.detail.column, e.detail.value]).toEqual([1, 0, Number.NaN]);
    const f = problemOf(() => solveLinearSystem([1, 0, 0, 1], [1, Number.POSITIVE_INFINITY], 2));
    expect(f.problem).toBe('not-finite');
    expect([f.detail.row, f.detail.column, f.detail.value]).toEqual([1, undefined, Number.POSITIVE_INFINITY]);
  });

  it('solve before factor is refused', () => {
    const e = problemOf(() => new DenseLuSolver(3).solve(new Float64Array(3)));
    expect(e.problem).toBe('not-factored');
  });

  it('mismatched sizes are refused', () => {
    const a = problemOf(() => solveLinearSystem([1, 2, 3], [1], 1));
    expect([a.problem, a.detail.value, a.detail.expected]).toEqual(['bad-size', 3, 1]);
    const b = problemOf(() => solveLinearSystem([1], [1, 2], 1));
    expect([b.problem, b.detail.value, b.detail.expected]).toEqual(['bad-size', 2, 1]);
    expect(problemOf(() => new DenseLuSolver(2.5)).problem).toBe('bad-size');
  });
});
