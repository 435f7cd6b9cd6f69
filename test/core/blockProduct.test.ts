import { expect, it } from 'vitest';
import { PACKED_A_BYTES, packingBytes, subtractProduct } from '../../src/core/exchange/blockProduct';
import { createSolverKernel } from '../../src/core/exchange/linearSolveKernel';

// The SIMD block product against a plain triple loop written here, on shapes
// the LU never makes (odd inner sizes, blocks not at the origin, every fringe),
// so each piece of the kernel (packing two columns at a time and the odd one,
// the 4 x 4 tiles, the fringes) is exercised. Same products in another order:
// differences of a few roundings of sum_p |a_ip| |b_pj| (Higham, 2nd ed., sec. 3.1).
const U = 2 ** -53;

it('C -= A * B agrees with a triple loop for every kind of block shape', () => {
  const n = 300;
  const kernel = createSolverKernel(n * n * 8 + packingBytes(n) + 64);
  expect(kernel).not.toBeNull();
  if (!kernel) return;
  const at = Math.ceil((n * n * 8) / 64) * 64;
  const matrix = new Float64Array(kernel.memory.buffer, 0, n * n);
  const ctx = { n, matrix, kernel, packedA: at, packedB: at + PACKED_A_BYTES };
  let s = 99;
  const rnd = () => {
    s = (Math.imul(s, 1103515245) + 12345) >>> 0;
    return s / 4294967296 - 0.5;
  };
  const shapes = [
    [1, 1, 1],
    [4, 1, 4],
    [4, 3, 4],
    [5, 7, 6],
    [17, 9, 23],
    [131, 257, 67],
    [130, 513, 129],
    [64, 100, 4],
  ];
  for (const [m, k, w] of shapes) {
    for (let i = 0; i < n * n; i++) matrix[i] = rnd();
    const before = Float64Array.from(matrix);
    // C at rows 150.., columns 160..; A at the same rows, columns 7..; B at rows 7.., the columns of C.
    const [rc, cc, pa] = [150, 160, 7]; // A (columns 7..149) never overlaps C, B (rows 7..149) never overlaps C
    subtractProduct(ctx, rc, cc, pa, Math.min(m, n - rc), Math.min(k, rc - pa), Math.min(w, n - cc));
    const mm = Math.min(m, n - rc);
    const kk = Math.min(k, rc - pa);
    const ww = Math.min(w, n - cc);
    for (let i = 0; i < n; i++) {
      for (let j = 0; j < n; j++) {
        const inC = i >= rc && i < rc + mm && j >= cc && j < cc + ww;
        let want = before[i * n + j];
        let size = 0;
        if (inC) {
          for (let p = pa; p < pa + kk; p++) {
            want -= before[i * n + p] * before[p * n + j];
            size += Math.abs(before[i * n + p] * before[p * n + j]);
          }
        }
        const got = matrix[i * n + j];
        if (inC) expect(Math.abs(got - want)).toBeLessThanOrEqual(2 * kk * U * (size + Math.abs(want)));
        else expect(got).toBe(want); // nothing outside C moves
      }
    }
  }
});
