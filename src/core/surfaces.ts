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
 * |L_I F_IJ - L_J F_JI| / max(L_I F_IJ, L_J F_JI). `into`, when it holds exactly
 * surfaces^2 doubles, is cleared and becomes the result's F (same numbers).
 */
export function aggregateToSurfaces(
  edgeCount: number,
  edgeLength: Float64Array,
  edgeF: Float64Array,
  edgeSurface: ArrayLike<number>,
  surfaceCount: number,
  closed: boolean,
  into?: Float64Array,
): ViewFactorResult {
  const n = edgeCount;
  const m = surfaceCount;
  const surfaceLength = surfaceLengths(edgeLength, edgeSurface, m);
  // G_IJ = L_I F_IJ, the exchange length; summed straight from the edge rows.
  const G = into && into.length === m * m ? into.fill(0) : new Float64Array(m * m);
  for (let i = 0; i < n; i++) addEdgeRow(i, n, edgeLength, edgeF, edgeSurface, m, G);
  return surfaceResult(n, edgeLength, surfaceLength, G, closed, true);
}

/**
 * Add edge i's row of the edge factors to its surface's row of G:
 * G[s(i), s(j)] += L_i F_ij for j = 0 .. n-1 in order (sketch units). Rows added in
 * ascending i give the same bits however the surfaces are shared out, as long as
 * each surface's edges are added by one caller (the threads of the command line).
 */
export function addEdgeRow(
  i: number,
  n: number,
  edgeLength: ArrayLike<number>,
  edgeF: Float64Array,
  edgeSurface: ArrayLike<number>,
  m: number,
  G: Float64Array,
): void {
  const row = edgeSurface[i] * m;
  const Li = edgeLength[i];
  const base = i * n;
  for (let j = 0; j < n; j++) {
    const f = edgeF[base + j];
    if (f !== 0) G[row + edgeSurface[j]] += Li * f;
  }
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
  const reciprocityResidual = reciprocityOfRows(G, m, 0, m);
  const F = overwrite ? G : new Float64Array(m * m);
  const rowSumResidual = new Float64Array(m);
  factorRows(G, surfaceLength, 0, m, F, rowSumResidual);
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

/**
 * The largest relative reciprocity residual over the pairs (I, J > I) with I in
 * [I0, I1) of the surface exchange matrix G (m x m, sketch units); dimensionless.
 * A maximum is the same whatever the order, so rows may be taken in any split.
 */
export function reciprocityOfRows(G: Float64Array, m: number, I0: number, I1: number): number {
  let worst = 0;
  for (let I = I0; I < I1; I++) {
    for (let J = I + 1; J < m; J++) worst = Math.max(worst, reciprocityResidualOf(G[I * m + J], G[J * m + I]));
  }
  return worst;
}

/**
 * Rows I0 .. I1-1 of F_IJ = G_IJ / L_I (0 for a surface of no length) into F, which
 * may be G itself, and each row's residual 1 - sum_J F_IJ into rowSumResidual.
 */
export function factorRows(
  G: Float64Array,
  surfaceLength: Float64Array,
  I0: number,
  I1: number,
  F: Float64Array,
  rowSumResidual: Float64Array,
): void {
  const m = surfaceLength.length;
  for (let I = I0; I < I1; I++) {
    const LI = surfaceLength[I];
    let sum = 0;
    for (let J = 0; J < m; J++) {
      const f = LI > 0 ? G[I * m + J] / LI : 0;
      F[I * m + J] = f;
      sum += f;
    }
    rowSumResidual[I] = 1 - sum;
  }
}
