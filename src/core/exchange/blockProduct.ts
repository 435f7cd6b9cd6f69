// C -= A * B on blocks of one row-major n x n matrix: nearly all the work of
// the dense LU. Dimensionless. With the SIMD kernel (linearSolveKernel.ts) the
// blocks are packed and multiplied in cache-sized pieces; the thin fringes the
// kernel's 4 x 4 tiles leave (at most 3 rows and 3 columns), and
// everything when there is no kernel, go through the JavaScript loop below.

import type { SolverKernel } from './linearSolveKernel';

// Inner terms per packed block: one packed 4-column tile of B (KC x 4 doubles,
// 8 KiB) stays in the 32 KiB level-1 cache while the rows of A stream past.
export const INNER_BLOCK = 256;
// Rows per packed block of A: ROW_BLOCK x INNER_BLOCK doubles (256 KiB) stay in
// the level-2 cache while every column tile of B goes by.
export const ROW_BLOCK = 128;

/** The matrix, and with the kernel the byte offsets of its two packing buffers. */
export interface ProductContext {
  readonly n: number;
  readonly matrix: Float64Array;
  readonly kernel: SolverKernel | null;
  /** Byte offset of a buffer of ROW_BLOCK x INNER_BLOCK doubles. */
  readonly packedA: number;
  /** Byte offset of a buffer of INNER_BLOCK x (n rounded up to 4) doubles. */
  readonly packedB: number;
}

/** Bytes of the packing buffer of A. */
export const PACKED_A_BYTES = 8 * ROW_BLOCK * INNER_BLOCK;

/** Bytes of kernel memory the two packing buffers take for size n. */
export function packingBytes(n: number): number {
  return PACKED_A_BYTES + 8 * INNER_BLOCK * (4 * Math.ceil(n / 4));
}

/**
 * C -= A * B with C = rows rc..rc+m-1 x columns cc..cc+w-1, A = the same
 * rows x columns pa..pa+k-1, B = rows pa..pa+k-1 x the columns of C.
 */
export function subtractProduct(
  ctx: ProductContext,
  rc: number,
  cc: number,
  pa: number,
  m: number,
  k: number,
  w: number,
): void {
  if (m <= 0 || k <= 0 || w <= 0) return;
  const { n, kernel } = ctx;
  const mMain = m & ~3;
  const wMain = w & ~3;
  if (kernel === null || mMain === 0 || wMain === 0) {
    subtractProductJs(ctx.matrix, n, rc, rc + m, pa, pa + k, cc, cc + w);
    return;
  }
  const stride = n * 8;
  for (let p0 = 0; p0 < k; p0 += INNER_BLOCK) {
    const kb = Math.min(INNER_BLOCK, k - p0);
    kernel.packB(((pa + p0) * n + cc) * 8, ctx.packedB, wMain >> 2, kb, stride);
    for (let i0 = 0; i0 < mMain; i0 += ROW_BLOCK) {
      const mb = Math.min(ROW_BLOCK, mMain - i0);
      kernel.packA(((rc + i0) * n + pa + p0) * 8, ctx.packedA, mb >> 2, kb, stride);
      kernel.product(((rc + i0) * n + cc) * 8, ctx.packedA, ctx.packedB, mb >> 2, kb, wMain >> 2, stride);
    }
  }
  // Fringes: the last columns, the last rows.
  const a = ctx.matrix;
  subtractProductJs(a, n, rc, rc + mMain, pa, pa + k, cc + wMain, cc + w);
  subtractProductJs(a, n, rc + mMain, rc + m, pa, pa + k, cc, cc + w);
}

/** a[i][j] -= sum_p a[i][p] * a[p][j] for rows r0..r1-1, inner p0..p1-1, columns c0..c1-1 (row-oriented, 4 inner terms per pass). */
export function subtractProductJs(
  a: Float64Array,
  n: number,
  r0: number,
  r1: number,
  p0: number,
  p1: number,
  c0: number,
  c1: number,
): void {
  if (r1 <= r0 || p1 <= p0 || c1 <= c0) return;
  for (let i = r0; i < r1; i++) {
    const ri = i * n;
    let p = p0;
    for (; p + 3 < p1; p += 4) {
      const l0 = a[ri + p];
      const l1 = a[ri + p + 1];
      const l2 = a[ri + p + 2];
      const l3 = a[ri + p + 3];
      const b0 = p * n;
      const b1 = b0 + n;
      const b2 = b1 + n;
      const b3 = b2 + n;
      for (let j = c0; j < c1; j++) a[ri + j] -= l0 * a[b0 + j] + l1 * a[b1 + j] + l2 * a[b2 + j] + l3 * a[b3 + j];
    }
    for (; p < p1; p++) {
      const l = a[ri + p];
      if (l === 0) continue;
      const bp = p * n;
      for (let j = c0; j < c1; j++) a[ri + j] -= l * a[bp + j];
    }
  }
}
