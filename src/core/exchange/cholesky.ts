// Dense Cholesky factorization S = L L^T of a symmetric positive definite
// m x m matrix, row-major, in place, in the memory of a DenseLuSolver of size
// n >= m (its SIMD kernel and packing buffers; the matrix uses stride m).
// Dimensionless: units are whatever the caller's system has.
//
// Why: the radiosity system, each row scaled by A_i / w_i, is symmetric
// (reciprocity A_i F_ij = A_j F_ji) and diagonally dominant, so positive
// definite: Cholesky needs half the work of LU with pivoting (n^3/3 flops
// against 2n^3/3) and no pivoting at all (Golub & Van Loan, 4th ed., sec. 4.2).
//
// Numeric choices: the same recursive column halving as the LU
// (linearSolve.ts), so nearly all the work is the block product C -= A * B of
// blockProduct.ts. L^T is copied into the upper triangle as each panel is
// done, so the products read both factors by rows, as the kernel wants; the
// copy costs m^2/2 moves in all.

import { subtractProduct, type ProductContext } from './blockProduct';
import type { SolverKernel } from './linearSolveKernel';

// Panels at most this wide are factored column by column in JavaScript.
const BASE_WIDTH = 8;
// Diagonal squares at most this wide are updated whole (upper part included):
// halving further would cost more in packing than it saves in products.
const LOWER_BASE = 64;

/** The memory a Cholesky factorization borrows: a DenseLuSolver of size >= m. */
export interface CholeskyHost {
  readonly n: number;
  readonly matrix: Float64Array;
  readonly kernel: SolverKernel | null;
  readonly packedA: number;
  readonly packedB: number;
  /** Byte offset in the kernel's memory of a vector of n doubles (unused without a kernel). */
  readonly vectorAt: number;
}

/**
 * An m x m symmetric positive definite solver in a host's memory. Write the
 * lower triangle and diagonal of S into `matrix` (row i, column j at i m + j;
 * the upper triangle is ignored and overwritten), call factor(), then solve().
 */
export class DenseCholesky implements ProductContext {
  readonly n: number;
  readonly matrix: Float64Array;
  readonly kernel: SolverKernel | null;
  readonly packedA: number;
  readonly packedB: number;
  private readonly vectorAt: number;
  private readonly vector: Float64Array;
  private factored = false;

  constructor(host: CholeskyHost, m: number) {
    if (!(Number.isInteger(m) && m >= 0 && m <= host.n))
      throw new RangeError(`Cholesky size ${m} outside 0..${host.n}`);
    this.n = m;
    this.kernel = host.kernel;
    this.packedA = host.packedA;
    this.packedB = host.packedB;
    this.vectorAt = host.vectorAt;
    this.matrix = host.matrix.subarray(0, m * m);
    this.vector = host.kernel ? new Float64Array(host.kernel.memory.buffer, host.vectorAt, m) : new Float64Array(m);
  }

  /**
   * Factors `matrix` in place: L on and below the diagonal, L^T above it.
   * Returns false, leaving the matrix half factored, when a pivot is not
   * positive (S is not positive definite to working precision) or not finite.
   */
  factor(): boolean {
    this.factored = false;
    if (this.n === 0) return (this.factored = true);
    if (!this.factorColumns(0, this.n)) return false;
    this.factored = true;
    return true;
  }

  /** Solves S x = b after factor(): b (length m) is overwritten with x and returned. */
  solve(b: Float64Array): Float64Array {
    if (!this.factored) throw new Error('DenseCholesky.solve before a successful factor()');
    const { n: m, matrix: a, kernel } = this;
    const v = this.vector;
    v.set(b);
    // L y = b, then L^T x = y; both read rows (L below the diagonal, L^T above).
    for (let i = 0; i < m; i++) {
      const ri = i * m;
      v[i] = (v[i] - this.dot(kernel, ri, 0, i)) / a[ri + i];
    }
    for (let i = m - 1; i >= 0; i--) {
      const ri = i * m;
      v[i] = (v[i] - this.dot(kernel, ri + i + 1, i + 1, m - i - 1)) / a[ri + i];
    }
    b.set(v);
    return b;
  }

  /** Sum over `length` terms of matrix[from + t] * vector[at + t]. */
  private dot(kernel: SolverKernel | null, from: number, at: number, length: number): number {
    if (kernel) return kernel.dot(from * 8, this.vectorAt + at * 8, length);
    const { matrix: a, vector: v } = this;
    let s = 0;
    for (let t = 0; t < length; t++) s += a[from + t] * v[at + t];
    return s;
  }

  /** Factors columns c0..c0+width-1 (rows c0..m-1), earlier columns' updates already applied. */
  private factorColumns(c0: number, width: number): boolean {
    if (width <= BASE_WIDTH) return this.factorPanel(c0, c0 + width);
    const h = ((width >> 1) + 7) & ~7; // a multiple of 8 so products see whole SIMD blocks
    const c1 = c0 + h;
    if (!this.factorColumns(c0, h)) return false;
    // Columns c1.. of the block minus L(rows, left half) L^T(left half, columns):
    // the lower triangle of their diagonal square, then every row below it.
    const w = width - h;
    this.subtractLower(c1, w, c0, h);
    subtractProduct(this, c1 + w, c1, c0, this.n - c1 - w, h, w);
    return this.factorColumns(c1, w);
  }

  /**
   * The lower triangle (diagonal included) of the square at rows and columns
   * r0..r0+size-1, minus L(those rows, columns pa..pa+k-1) times L^T: halved
   * until small, so the part above the diagonal (not needed) costs little.
   */
  private subtractLower(r0: number, size: number, pa: number, k: number): void {
    if (size <= LOWER_BASE) {
      subtractProduct(this, r0, r0, pa, size, k, size);
      return;
    }
    const h = ((size >> 1) + 3) & ~3; // a multiple of 4: whole kernel tiles
    this.subtractLower(r0, h, pa, k);
    subtractProduct(this, r0 + h, r0, pa, size - h, k, h);
    this.subtractLower(r0 + h, size - h, pa, k);
  }

  /**
   * Unblocked Cholesky of columns c0..c1-1 over rows c0..m-1, row by row (each
   * row's part of the panel is one cache line, read once), with L^T copied
   * above the diagonal as each row is done.
   */
  private factorPanel(c0: number, c1: number): boolean {
    const { n: m, matrix: a } = this;
    for (let i = c0; i < m; i++) {
      const ri = i * m;
      const last = i < c1 ? i : c1 - 1;
      for (let k = c0; k <= last; k++) {
        const rk = k * m;
        let v = a[ri + k];
        for (let p = c0; p < k; p++) v -= a[ri + p] * a[rk + p];
        if (k < i) {
          v /= a[rk + k];
          a[ri + k] = v;
          a[rk + i] = v;
        } else if (v > 0 && v < Infinity) {
          a[ri + k] = Math.sqrt(v);
        } else {
          return false; // a pivot that is not positive: not positive definite (or not finite)
        }
      }
    }
    return true;
  }
}
