// S x = b for many right-hand sides at once, S = L L^T factored by cholesky.ts.
// Dimensionless: units are whatever the caller's system has.
//
// Why: the surface balance's Newton matrix needs S^-1 for every unknown
// surface. One triangular solve per right-hand side runs on dot products (a
// few 1e9 multiply-adds per second); taken together, nearly all the work is
// the block product C -= A * B of blockProduct.ts, as in the factorization.
//
// Layout: the right-hand sides are stored as rows below the factor, in one
// matrix of row length m (the factor's rows 0..m-1, then one row per
// right-hand side). L y = b is then y^T L^T = b^T, column block by column
// block, and L^T x = y is x^T L = y^T, backwards: both read their blocks of
// L^T (above the diagonal) and of L (below it) in place, with the same
// recursive halving as the factorization (Golub & Van Loan, 4th ed., sec.
// 3.1, block triangular solves).

import { PACKED_A_BYTES, packingBytes, subtractProduct, type ProductContext } from './blockProduct';
import { createSolverKernel, type SolverKernel } from './linearSolveKernel';

/** Right-hand sides per pass (rows below the factor): enough for long products, little memory. */
const ROWS_PER_PASS = 256;
/** Column blocks at most this wide are solved term by term. */
const BASE_WIDTH = 16;

/** Many right-hand sides of one Cholesky factor; holds a copy of the factor. */
export class CholeskyRows implements ProductContext {
  /** Row length of `matrix` (the factor's size m). */
  readonly n: number;
  /** The factor (m x m: L on and below the diagonal, L^T above), then ROWS_PER_PASS rows of right-hand sides. */
  readonly matrix: Float64Array;
  readonly kernel: SolverKernel | null;
  readonly packedA: number;
  readonly packedB: number;
  /** Right-hand sides in the current pass. */
  private count = 0;

  /**
   * `factor`: m x m row-major, as DenseCholesky leaves it after a successful
   * factor(). `accelerate: false` (tests) keeps to the JavaScript loops.
   */
  constructor(factor: Float64Array, m: number, accelerate = true) {
    this.n = m;
    const doubles = (m + ROWS_PER_PASS) * m;
    const matrixBytes = Math.ceil((doubles * 8) / 64) * 64;
    this.kernel = accelerate && m >= 8 ? createSolverKernel(matrixBytes + PACKED_A_BYTES + packingBytes(m)) : null;
    this.packedA = matrixBytes;
    this.packedB = matrixBytes + PACKED_A_BYTES;
    this.matrix = this.kernel ? new Float64Array(this.kernel.memory.buffer, 0, doubles) : new Float64Array(doubles);
    this.load(factor);
  }

  /** Take another m x m factor (copied in); returns this. */
  load(factor: Float64Array): this {
    this.matrix.set(factor.subarray(0, this.n * this.n));
    return this;
  }

  /**
   * Solves S x = b for each of the `count` rows b of `rows` (m doubles each,
   * row-major), in place: row r becomes S^-1 b_r. Rows whose leading entries
   * are 0 skip the part of the forward solve they cannot change. `trailing`:
   * only the entries from the pass's first nonzero column on are solved (the
   * backward solve of those needs no others); the ones before stay 0. For a
   * caller that gets them by the symmetry of S^-1 instead: a third of the work.
   */
  solve(rows: Float64Array, count: number, trailing = false): Float64Array {
    const m = this.n;
    if (rows.length < count * m) throw new RangeError(`right-hand sides: ${rows.length} doubles for ${count} x ${m}`);
    for (let r0 = 0; r0 < count; r0 += ROWS_PER_PASS) {
      const k = Math.min(ROWS_PER_PASS, count - r0);
      const block = rows.subarray(r0 * m, (r0 + k) * m);
      this.matrix.set(block, m * m);
      this.count = k;
      // y = 0 up to the first column where some b has an entry (L is lower triangular).
      let first = m;
      for (let r = 0; r < k && first > 0; r++) {
        const at = m * m + r * m;
        for (let c = 0; c < first; c++) {
          if (this.matrix[at + c] !== 0) {
            first = c;
            break;
          }
        }
      }
      if (first < m) {
        this.forward(first, m - first);
        if (trailing) this.backward(first, m - first);
        else this.backward(0, m);
      }
      block.set(this.matrix.subarray(m * m, (m + k) * m));
    }
    return rows;
  }

  /** y^T L^T = b^T over columns c0..c0+width-1 (earlier columns done and applied). */
  private forward(c0: number, width: number): void {
    const m = this.n;
    if (width <= BASE_WIDTH) {
      const a = this.matrix;
      for (let r = 0; r < this.count; r++) {
        const row = (m + r) * m;
        for (let c = c0; c < c0 + width; c++) {
          let v = a[row + c];
          for (let p = c0; p < c; p++) v -= a[row + p] * a[p * m + c];
          a[row + c] = v / a[c * m + c];
        }
      }
      return;
    }
    const h = ((width >> 1) + 3) & ~3; // a multiple of 4: whole kernel tiles
    this.forward(c0, h);
    subtractProduct(this, m, c0 + h, c0, this.count, h, width - h);
    this.forward(c0 + h, width - h);
  }

  /** x^T L = y^T over columns c0..c0+width-1 (later columns done and applied). */
  private backward(c0: number, width: number): void {
    const m = this.n;
    if (width <= BASE_WIDTH) {
      const a = this.matrix;
      for (let r = 0; r < this.count; r++) {
        const row = (m + r) * m;
        for (let c = c0 + width - 1; c >= c0; c--) {
          let v = a[row + c];
          for (let p = c + 1; p < c0 + width; p++) v -= a[row + p] * a[p * m + c];
          a[row + c] = v / a[c * m + c];
        }
      }
      return;
    }
    const h = ((width >> 1) + 3) & ~3;
    this.backward(c0 + h, width - h);
    subtractProduct(this, m, c0, c0 + h, this.count, width - h, h);
    this.backward(c0, h);
  }
}
