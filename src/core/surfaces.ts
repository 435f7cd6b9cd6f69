import type { ViewFactorResult } from './scene';

/**
 * Relative reciprocity residual of one pair, |a - b| / max(|a|, |b|), where
 * a = L_I F_IJ and b = L_J F_JI are exchange lengths (any one length unit);
 * 0 when neither surface sees the other. Dimensionless.
 */
export function reciprocityResidualOf(a: number, b: number): number {
  const big = Math.max(Math.abs(a), Math.abs(b));
  return big > 0 ? Math.abs(a - b) / big : 0;
}

/**
 * Length of every surface (sketch units): the sum of its edges' lengths in
 * ascending edge order. Throws when an edge's surface index is not 0..surfaceCount-1.
 */
export function surfaceLengths(
  edgeLength: ArrayLike<number>,
  edgeSurface: ArrayLike<number>,
  surfaceCount: number,
): Float64Array {
  const m = surfaceCount;
  const out = new Float64Array(m);
  for (let i = 0; i < edgeLength.length; i++) {
    const s = edgeSurface[i];
    if (!(s >= 0 && s < m && Number.isInteger(s)))
      throw new Error(`edge ${i} has surface index ${s} outside 0..${m - 1}`);
    out[s] += edgeLength[i];
  }
  return out;
}

/**
 * Aggregate edge view factors (edges x edges, row-major, row = from) to surfaces:
 * F_IJ = sum_{i in I, j in J} L_i F_ij / L_I (lengths in sketch units), and report
 * the row-sum residual 1 - sum_J F_IJ and the largest relative reciprocity residual
 * |L_I F_IJ - L_J F_JI| / max(L_I F_IJ, L_J F_JI).
 */
export function aggregateToSurfaces(
  edgeCount: number,
  edgeLength: Float64Array,
  edgeF: Float64Array,
  edgeSurface: ArrayLike<number>,
  surfaceCount: number,
  closed: boolean,
): ViewFactorResult {
  const n = edgeCount;
  const m = surfaceCount;
  const surfaceLength = surfaceLengths(edgeLength, edgeSurface, m);
  // G_IJ = L_I F_IJ, the exchange length; summed straight from the edge rows.
  const G = new Float64Array(m * m);
  for (let i = 0; i < n; i++) {
    const row = edgeSurface[i] * m;
    const Li = edgeLength[i];
    const base = i * n;
    for (let j = 0; j < n; j++) {
      const f = edgeF[base + j];
      if (f !== 0) G[row + edgeSurface[j]] += Li * f;
    }
  }
  return surfaceResult(n, edgeLength, surfaceLength, G, closed, true);
}

/**
 * Surface factors from the surface exchange matrix G_IJ = L_I F_IJ (row-major,
 * sketch units) and the surface lengths: F_IJ = G_IJ / L_I, the row-sum residual
 * 1 - sum_J F_IJ and the largest relative reciprocity residual over pairs.
 * `overwrite`: G is the caller's scratch and becomes F (one m x m array fewer;
 * at 1000 surfaces fresh memory costs a browser tens of ms). Same numbers either way.
 */
export function surfaceResult(
  edgeCount: number,
  edgeLength: Float64Array,
  surfaceLength: Float64Array,
  G: Float64Array,
  closed: boolean,
  overwrite = false,
): ViewFactorResult {
  const m = surfaceLength.length;
  // Reciprocity first: it reads G, which `overwrite` turns into F below.
  let reciprocityResidual = 0;
  for (let I = 0; I < m; I++) {
    for (let J = I + 1; J < m; J++) {
      reciprocityResidual = Math.max(reciprocityResidual, reciprocityResidualOf(G[I * m + J], G[J * m + I]));
    }
  }
  const F = overwrite ? G : new Float64Array(m * m);
  const rowSumResidual = new Float64Array(m);
  for (let I = 0; I < m; I++) {
    const LI = surfaceLength[I];
    let sum = 0;
    for (let J = 0; J < m; J++) {
      const f = LI > 0 ? G[I * m + J] / LI : 0;
      F[I * m + J] = f;
      sum += f;
    }
    rowSumResidual[I] = 1 - sum;
  }
  return {
    edgeCount,
    surfaceCount: m,
    edgeLength,
    surfaceLength,
    F,
    rowSumResidual,
    reciprocityResidual,
    closed,
  };
}
