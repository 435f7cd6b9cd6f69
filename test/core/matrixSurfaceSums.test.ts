// The sum from an edge matrix to surfaces may take the edge rows in batches as threads
// finish them (src/core/matrixSurfaceSums.ts; the command line's threads do). Any
// batching must give the numbers of one plain pass, bit for bit: here a pass written
// again in the test (G_IJ over ascending i, then j; reciprocity over every pair of
// surfaces; F_IJ = G_IJ / L_I), over random matrices with surfaces in any edge order,
// some with no edges at all.
import { describe, expect, it } from 'vitest';
import { MatrixSurfaceSums } from '../../src/core/matrixSurfaceSums';
import { seeded } from './seeded';

const bytes = (a: Float64Array) => new Uint8Array(a.buffer, a.byteOffset, a.byteLength);

function plainPass(n: number, L: Float64Array, F: Float64Array, es: number[], m: number) {
  const G = new Float64Array(m * m);
  const SL = new Float64Array(m);
  for (let i = 0; i < n; i++) SL[es[i]] += L[i];
  for (let i = 0; i < n; i++)
    for (let j = 0; j < n; j++) if (F[i * n + j] !== 0) G[es[i] * m + es[j]] += L[i] * F[i * n + j];
  let worst = 0;
  for (let I = 0; I < m; I++)
    for (let J = I + 1; J < m; J++) {
      const a = G[I * m + J],
        b = G[J * m + I];
      const big = Math.max(Math.abs(a), Math.abs(b));
      worst = Math.max(worst, big > 0 ? Math.abs(a - b) / big : 0);
    }
  const out = new Float64Array(m * m);
  const rowSum = new Float64Array(m);
  for (let I = 0; I < m; I++) {
    let s = 0;
    for (let J = 0; J < m; J++) {
      out[I * m + J] = SL[I] > 0 ? G[I * m + J] / SL[I] : 0;
      s += out[I * m + J];
    }
    rowSum[I] = 1 - s;
  }
  return { F: out, rowSum, worst };
}

describe('surface sums taken from edge rows in batches', () => {
  it('any batching gives one plain pass, bit for bit', () => {
    const rand = seeded(4242);
    for (let trial = 0; trial < 40; trial++) {
      const n = 2 + Math.floor(rand() * 60),
        m = 1 + Math.floor(rand() * 12);
      const L = Float64Array.from({ length: n }, () => 0.1 + rand());
      // Sparse, not reciprocal: the residual is then well above 0 and its maximum tells.
      const F = Float64Array.from({ length: n * n }, () => (rand() < 0.4 ? 0 : rand() / n));
      const es = Array.from({ length: n }, () => Math.floor(rand() * m)); // some surfaces get no edge
      const want = plainPass(n, L, F, es, m);
      const sums = new MatrixSurfaceSums(n, L, F, es, m);
      let at = 0;
      while (at < n) {
        at = Math.min(n, at + Math.floor(rand() * 7));
        sums.addRows(at);
        expect(sums.added).toBe(at);
      }
      const got = sums.result(true);
      expect(bytes(got.F)).toEqual(bytes(want.F));
      expect(bytes(got.rowSumResidual)).toEqual(bytes(want.rowSum));
      expect(got.reciprocityResidual).toBe(want.worst);
      if (new Set(es).size > 1) expect(want.worst).toBeGreaterThan(0);
    }
  });

  it('refuses to answer before every row is in', () => {
    const sums = new MatrixSurfaceSums(3, new Float64Array([1, 1, 1]), new Float64Array(9), [0, 1, 0], 2);
    sums.addRows(2);
    expect(() => sums.result(true)).toThrow(/2 of 3 edge rows/);
  });
});
