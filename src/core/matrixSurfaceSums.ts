import type { ViewFactorResult } from './scene';
import { reciprocityResidualOf, surfaceLengths, surfaceResult } from './surfaces';

/**
 * The sum from an edge matrix (n x n, row = from) to surfaces, taken edge row by edge
 * row as rows become complete, so that a thread can sum the rows the others have
 * finished while they compute the rest. The numbers do not depend on how the rows
 * come in: G_IJ = sum_{i in I, j in J} L_i F_ij adds over ascending i, then ascending
 * j, whatever the batches; the reciprocity residual of a pair of surfaces is taken
 * once both rows of G are final (a surface's row is final after its last edge's row),
 * and its largest value is a maximum, the same in any order. Lengths in sketch units.
 */
export class MatrixSurfaceSums {
  /** G_IJ (m x m), turned into F_IJ by `result`. */
  private readonly G: Float64Array;
  private readonly surfaceLength: Float64Array;
  /** Surfaces whose last edge is edge i: finalSurface[finalStart[i] .. finalStart[i+1]-1]. */
  private readonly finalStart: Int32Array;
  private readonly finalSurface: Int32Array;
  /** Surfaces whose row of G is final, in the order they became so. */
  private readonly final: Int32Array;
  private finalCount = 0;
  private next = 0;
  private worst = 0;

  constructor(
    private readonly n: number,
    private readonly edgeLength: Float64Array,
    private readonly edgeF: Float64Array,
    private readonly edgeSurface: ArrayLike<number>,
    private readonly m: number,
  ) {
    this.surfaceLength = surfaceLengths(edgeLength, edgeSurface, m); // also checks the indices
    this.G = new Float64Array(m * m);
    const last = new Int32Array(m).fill(-1);
    for (let i = 0; i < n; i++) last[edgeSurface[i]] = i;
    this.finalStart = new Int32Array(n + 1);
    for (let I = 0; I < m; I++) if (last[I] >= 0) this.finalStart[last[I] + 1]++;
    for (let i = 0; i < n; i++) this.finalStart[i + 1] += this.finalStart[i];
    const at = this.finalStart.slice(0, n);
    this.finalSurface = new Int32Array(m);
    this.final = new Int32Array(m);
    for (let I = 0; I < m; I++) {
      if (last[I] >= 0) this.finalSurface[at[last[I]]++] = I;
      else this.makeFinal(I); // no edges: its row of G stays 0
    }
  }

  /** Rows added so far (rows 0 .. added - 1). */
  get added(): number {
    return this.next;
  }

  /** Add edge rows up to `end` (exclusive), each complete in the matrix (both triangles). */
  addRows(end: number): void {
    const { n, m, G, edgeF, edgeLength, edgeSurface } = this;
    for (let i = this.next; i < end; i++) {
      const row = edgeSurface[i] * m;
      const Li = edgeLength[i];
      const base = i * n;
      for (let j = 0; j < n; j++) {
        const f = edgeF[base + j];
        if (f !== 0) G[row + edgeSurface[j]] += Li * f;
      }
      for (let k = this.finalStart[i]; k < this.finalStart[i + 1]; k++) this.makeFinal(this.finalSurface[k]);
    }
    this.next = Math.max(this.next, end);
  }

  /** Surface K's row of G is final: take its pairs with every surface already final. */
  private makeFinal(K: number): void {
    const { m, G, final } = this;
    let worst = this.worst;
    for (let q = 0; q < this.finalCount; q++) {
      const I = final[q];
      worst = Math.max(worst, reciprocityResidualOf(G[I * m + K], G[K * m + I]));
    }
    this.worst = worst;
    final[this.finalCount++] = K;
  }

  /** Surface factors F_IJ = G_IJ / L_I with their residuals (every row added; see surfaceResult). */
  result(closed: boolean): ViewFactorResult {
    if (this.next !== this.n) throw new Error(`surface sums: ${this.next} of ${this.n} edge rows added`);
    return surfaceResult(this.n, this.edgeLength, this.surfaceLength, this.G, closed, true, this.worst);
  }
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
  const sums = new MatrixSurfaceSums(edgeCount, edgeLength, edgeF, edgeSurface, surfaceCount);
  sums.addRows(edgeCount);
  return sums.result(closed);
}
