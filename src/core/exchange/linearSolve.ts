// Dense LU factorization with partial pivoting (row interchanges), PA = LU,
// on a row-major Float64Array, in place, with every scratch array allocated
// once per solver. Dimensionless: units are whatever the caller's system has.
//
// Numeric choices:
// - Recursive (column-halving) LU, so nearly all work is one block product
//   C -= A * B (blockProduct.ts), done by a WebAssembly SIMD kernel
//   (linearSolveKernel.ts) on packed cache-sized blocks, or by a row-oriented
//   JavaScript loop as a fallback. The kernel also does the triangular solves'
//   dot products and row updates. Pivot rows are swapped over the full row at
//   once (cheap in row-major).
// - After factoring, the 1-norm condition number is estimated (Hager's method
//   as refined by Higham, conditionEstimate.ts): a few O(n^2) solves.
//   Relative error in the solution is about (condition number) x 1.1e-16.

import { estimateInverseNormOne } from './conditionEstimate';
import { LinearSolveError } from './linearSolveError';
import { PACKED_A_BYTES, packingBytes, subtractProduct, type ProductContext } from './blockProduct';
import { createSolverKernel, type SolverKernel } from './linearSolveKernel';

export { LinearSolveError, type LinearSolveProblem } from './linearSolveError';

/** Dimensionless. Below this reciprocal condition number a system is refused as ill-conditioned: fewer than ~4 of 16 digits could be trusted. */
export const DEFAULT_MIN_RECIPROCAL_CONDITION = 1e-12;

export interface FactorOptions {
  /** Refuse the system when the estimated reciprocal condition number is below this (default 1e-12; 0 accepts anything not exactly singular). */
  minReciprocalCondition?: number;
}

export interface SolverOptions {
  /** Use the WebAssembly SIMD kernel when the engine has it (default true). */
  accelerate?: boolean;
}

// Panels at most this wide are factored column by column in JavaScript.
const BASE_WIDTH = 8;

/**
 * A reusable n x n dense solver (units: those of the caller's system; the
 * solver adds none). Write the system matrix (row-major, row i =
 * equation i) into `matrix`, call factor(), then solve() any number of
 * right-hand sides. factor() overwrites `matrix` with L (unit lower, below the
 * diagonal) and U (on and above it).
 */
export class DenseLuSolver implements ProductContext {
  readonly n: number;
  /** Row-major n x n workspace: the system matrix before factor(), L and U after. */
  readonly matrix: Float64Array;
  /** pivot[k] = the row swapped with row k at elimination step k. */
  readonly pivot: Int32Array;
  /** True when the WebAssembly SIMD kernel is in use. */
  readonly accelerated: boolean;
  readonly kernel: SolverKernel | null;
  /** Byte offsets in the kernel's memory: a vector of n doubles, the two packing buffers. */
  readonly packedA: number;
  readonly packedB: number;
  /** Byte offset in the kernel's memory of a vector of n doubles (scratch of the solves). */
  readonly vectorAt: number;
  private readonly vector: Float64Array;
  private readonly workX: Float64Array;
  private readonly workY: Float64Array;
  private readonly workZ: Float64Array;
  private factored = false;
  private rcond = Number.NaN;

  constructor(n: number, options: SolverOptions = {}) {
    if (!Number.isInteger(n) || n < 0) throw new LinearSolveError('bad-size', { value: n });
    this.n = n;
    // Kernel memory: the matrix, one vector, the packing buffers, each from a 64-byte boundary.
    const at = (bytes: number) => Math.ceil(bytes / 64) * 64;
    this.vectorAt = at(n * n * 8);
    this.packedA = at(this.vectorAt + n * 8);
    this.packedB = this.packedA + PACKED_A_BYTES;
    const kernel = options.accelerate === false || n < 8 ? null : createSolverKernel(this.packedA + packingBytes(n));
    this.kernel = kernel;
    this.accelerated = kernel !== null;
    this.matrix = kernel ? new Float64Array(kernel.memory.buffer, 0, n * n) : new Float64Array(n * n);
    this.vector = kernel ? new Float64Array(kernel.memory.buffer, this.vectorAt, n) : new Float64Array(0);
    this.pivot = new Int32Array(n);
    this.workX = new Float64Array(n);
    this.workY = new Float64Array(n);
    this.workZ = new Float64Array(n);
  }

  /** Estimated reciprocal 1-norm condition number of the last factored matrix (NaN before factor()). */
  get reciprocalCondition(): number {
    return this.rcond;
  }

  /**
   * Factors `matrix` in place and returns the estimated reciprocal condition
   * number (1 = perfectly conditioned, 0 = singular). Throws LinearSolveError
   * for non-finite entries, an exactly singular matrix, or one whose
   * reciprocal condition is below options.minReciprocalCondition.
   */
  factor(options: FactorOptions = {}): number {
    const minRcond = options.minReciprocalCondition ?? DEFAULT_MIN_RECIPROCAL_CONDITION;
    const n = this.n;
    this.factored = false;
    this.rcond = Number.NaN;
    if (n === 0) {
      this.factored = true;
      this.rcond = 1;
      return 1;
    }
    const norm = this.normOneAndCheck();
    this.factorColumns(0, n);
    this.factored = true;
    const inverseNorm = estimateInverseNormOne(this, this.workX, this.workY, this.workZ);
    const rcond = norm > 0 && Number.isFinite(inverseNorm) && inverseNorm > 0 ? 1 / (norm * inverseNorm) : 0;
    this.rcond = rcond;
    if (!(rcond >= minRcond)) {
      this.factored = rcond > 0;
      throw new LinearSolveError('ill-conditioned', { reciprocalCondition: rcond, limit: minRcond });
    }
    return rcond;
  }

  /** Solves A x = b after factor(): b (length n) is overwritten with x and returned. */
  solve(b: Float64Array): Float64Array {
    this.requireFactored(b);
    if (this.kernel) return this.solveKernel(this.kernel, b);
    const { n, matrix: a, pivot } = this;
    for (let k = 0; k < n; k++) {
      const p = pivot[k];
      if (p !== k) {
        const t = b[k];
        b[k] = b[p];
        b[p] = t;
      }
    }
    for (let i = 1; i < n; i++) {
      const ri = i * n;
      let s = b[i];
      for (let j = 0; j < i; j++) s -= a[ri + j] * b[j];
      b[i] = s;
    }
    for (let i = n - 1; i >= 0; i--) {
      const ri = i * n;
      let s = b[i];
      for (let j = i + 1; j < n; j++) s -= a[ri + j] * b[j];
      b[i] = s / a[ri + i];
    }
    return b;
  }

  /**
   * One step of iterative refinement after solve(): x += A^{-1} r, where
   * r = b - A x is the residual the caller computed with the original matrix
   * (factor() has overwritten it). Same units as x; r is overwritten with the
   * correction. Refining in the working precision brings each equation's
   * residual down to the rounding of its own terms (Skeel 1980; Higham, 2nd
   * ed., sec. 12.2) for a system that is not too ill-conditioned.
   */
  refine(x: Float64Array, residual: Float64Array): Float64Array {
    this.requireFactored(x);
    this.solve(residual);
    for (let i = 0; i < this.n; i++) x[i] += residual[i];
    return x;
  }

  /** Solves A^T x = b after factor(): b is overwritten with x and returned. */
  solveTransposed(b: Float64Array): Float64Array {
    this.requireFactored(b);
    if (this.kernel) return this.solveTransposedKernel(this.kernel, b);
    const { n, matrix: a, pivot } = this;
    // U^T w = b, forward, reading U by rows (contiguous).
    for (let k = 0; k < n; k++) {
      const rk = k * n;
      const w = b[k] / a[rk + k];
      b[k] = w;
      if (w !== 0) for (let j = k + 1; j < n; j++) b[j] -= a[rk + j] * w;
    }
    // L^T v = w, backward, reading L by rows.
    for (let k = n - 1; k > 0; k--) {
      const rk = k * n;
      const v = b[k];
      if (v !== 0) for (let j = 0; j < k; j++) b[j] -= a[rk + j] * v;
    }
    // x = P^T v: undo the interchanges in reverse order.
    for (let k = n - 1; k >= 0; k--) {
      const p = pivot[k];
      if (p !== k) {
        const t = b[k];
        b[k] = b[p];
        b[p] = t;
      }
    }
    return b;
  }

  /** solve() with the kernel's dot products, on a copy of b in its memory. */
  private solveKernel(kernel: SolverKernel, b: Float64Array): Float64Array {
    const { n, matrix: a, pivot, vector: v, vectorAt } = this;
    v.set(b);
    for (let k = 0; k < n; k++) {
      const p = pivot[k];
      if (p !== k) {
        const t = v[k];
        v[k] = v[p];
        v[p] = t;
      }
    }
    for (let i = 1; i < n; i++) v[i] -= kernel.dot(i * n * 8, vectorAt, i);
    for (let i = n - 1; i >= 0; i--) {
      const ri = i * n;
      v[i] = (v[i] - kernel.dot((ri + i + 1) * 8, vectorAt + (i + 1) * 8, n - i - 1)) / a[ri + i];
    }
    b.set(v);
    return b;
  }

  /** solveTransposed() with the kernel's row updates, on a copy of b in its memory. */
  private solveTransposedKernel(kernel: SolverKernel, b: Float64Array): Float64Array {
    const { n, matrix: a, pivot, vector: v, vectorAt } = this;
    v.set(b);
    for (let k = 0; k < n; k++) {
      const rk = k * n;
      const w = v[k] / a[rk + k];
      v[k] = w;
      if (w !== 0) kernel.axpy(vectorAt + (k + 1) * 8, (rk + k + 1) * 8, n - k - 1, w);
    }
    for (let k = n - 1; k > 0; k--) {
      const t = v[k];
      if (t !== 0) kernel.axpy(vectorAt, k * n * 8, k, t);
    }
    for (let k = n - 1; k >= 0; k--) {
      const p = pivot[k];
      if (p !== k) {
        const t = v[k];
        v[k] = v[p];
        v[p] = t;
      }
    }
    b.set(v);
    return b;
  }

  private requireFactored(b: Float64Array): void {
    if (!this.factored) throw new LinearSolveError('not-factored');
    if (b.length !== this.n) throw new LinearSolveError('bad-size', { value: b.length, expected: this.n });
  }

  /** 1-norm (largest column sum of |a_ij|); throws for NaN or infinite entries. */
  private normOneAndCheck(): number {
    const { n, matrix: a } = this;
    const col = this.kernel ? this.vector : this.workX;
    col.fill(0);
    for (let i = 0; i < n; i++) {
      const ri = i * n;
      if (this.kernel) this.kernel.addAbs(this.vectorAt, ri * 8, n);
      else for (let j = 0; j < n; j++) col[j] += Math.abs(a[ri + j]);
    }
    let norm = 0;
    for (let j = 0; j < n; j++) {
      if (!Number.isFinite(col[j])) {
        for (let i = 0; i < n; i++) {
          if (!Number.isFinite(a[i * n + j])) {
            throw new LinearSolveError('not-finite', { row: i, column: j, value: a[i * n + j] });
          }
        }
        throw new LinearSolveError('not-finite', { column: j, value: col[j] });
      }
      if (col[j] > norm) norm = col[j];
    }
    return norm;
  }

  /** Factors columns c0..c0+width-1 (rows c0..n-1), earlier columns' updates already applied. */
  private factorColumns(c0: number, width: number): void {
    if (width <= BASE_WIDTH) {
      this.factorPanel(c0, c0 + width);
      return;
    }
    const h = ((width >> 1) + 7) & ~7; // left half, a multiple of 8 so products see whole SIMD blocks
    const c1 = c0 + h;
    this.factorColumns(c0, h);
    this.solveUnitLower(c0, h, c1, width - h);
    subtractProduct(this, c1, c1, c0, this.n - c1, h, width - h);
    this.factorColumns(c1, width - h);
  }

  /** Unblocked right-looking elimination of columns c0..c1-1, updating only those columns. */
  private factorPanel(c0: number, c1: number): void {
    const { n, matrix: a, pivot } = this;
    // Largest |entry| on or below the diagonal of column c0 (first one on ties).
    let p = c0;
    let big = Math.abs(a[c0 * n + c0]);
    for (let i = c0 + 1; i < n; i++) {
      const v = Math.abs(a[i * n + c0]);
      if (v > big) {
        big = v;
        p = i;
      }
    }
    for (let k = c0; k < c1; k++) {
      if (!(big > 0)) {
        throw new LinearSolveError('singular', { column: k, reciprocalCondition: 0 });
      }
      pivot[k] = p;
      const rk = k * n;
      if (p !== k && this.kernel) {
        this.kernel.swap(p * n * 8, rk * 8, n);
      } else if (p !== k) {
        const rp = p * n;
        for (let j = 0; j < n; j++) {
          const t = a[rp + j];
          a[rp + j] = a[rk + j];
          a[rk + j] = t;
        }
      }
      // Eliminate below the pivot and, in the same pass down the rows (each a
      // cache line away), find the next column's pivot among the updated rows.
      const inv = 1 / a[rk + k];
      const next = k + 1 < c1 ? k + 1 : -1;
      p = k + 1;
      big = -1;
      for (let i = k + 1; i < n; i++) {
        const ri = i * n;
        const l = a[ri + k] * inv;
        a[ri + k] = l;
        if (l !== 0) for (let j = k + 1; j < c1; j++) a[ri + j] -= l * a[rk + j];
        if (next >= 0) {
          const v = Math.abs(a[ri + next]);
          if (v > big) {
            big = v;
            p = i;
          }
        }
      }
    }
  }

  /** B := L^{-1} B, L = unit lower block at (r0, r0) of size k, B = rows r0..r0+k-1, columns c0..c0+w-1. */
  private solveUnitLower(r0: number, k: number, c0: number, w: number): void {
    if (w <= 0) return;
    if (k <= BASE_WIDTH) {
      const { n, matrix: a } = this;
      const c1 = c0 + w;
      for (let p = r0; p < r0 + k; p++) {
        const rp = p * n;
        for (let i = p + 1; i < r0 + k; i++) {
          const ri = i * n;
          const l = a[ri + p];
          if (l !== 0 && this.kernel) this.kernel.axpy((ri + c0) * 8, (rp + c0) * 8, w, l);
          else if (l !== 0) for (let j = c0; j < c1; j++) a[ri + j] -= l * a[rp + j];
        }
      }
      return;
    }
    const h = ((k >> 1) + 3) & ~3;
    this.solveUnitLower(r0, h, c0, w);
    subtractProduct(this, r0 + h, c0, r0, k - h, h, w);
    this.solveUnitLower(r0 + h, k - h, c0, w);
  }
}

export interface LinearSolution {
  /** Solution vector x of A x = b. */
  x: Float64Array;
  /** Estimated reciprocal 1-norm condition number of A. */
  reciprocalCondition: number;
}

/**
 * One-shot solve of A x = b (A n x n row-major, copied, not modified), with
 * one step of iterative refinement.
 * Throws LinearSolveError when A is singular, ill-conditioned or not finite
 * (`row` set and `column` unset: the right-hand side entry), or sizes differ.
 */
export function solveLinearSystem(
  a: ArrayLike<number>,
  b: ArrayLike<number>,
  n: number,
  options: FactorOptions & SolverOptions = {},
): LinearSolution {
  if (a.length !== n * n) throw new LinearSolveError('bad-size', { value: a.length, expected: n * n });
  if (b.length !== n) throw new LinearSolveError('bad-size', { value: b.length, expected: n });
  const solver = new DenseLuSolver(n, options);
  solver.matrix.set(a);
  const reciprocalCondition = solver.factor(options);
  const x = Float64Array.from(b);
  for (let i = 0; i < n; i++) {
    if (!Number.isFinite(x[i])) throw new LinearSolveError('not-finite', { row: i, value: x[i] });
  }
  solver.solve(x);
  // One step of iterative refinement with the residual from the original a.
  const r = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = b[i];
    for (let j = 0; j < n; j++) s -= a[i * n + j] * x[j];
    r[i] = s;
  }
  solver.refine(x, r);
  return { x, reciprocalCondition };
}
