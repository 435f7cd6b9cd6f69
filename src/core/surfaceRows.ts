// Surface view factors straight from edge pairs, without the edges x edges matrix
// (20,000 edges would need 3.2 GB of doubles; the surface sums need surfaces^2).
// Each row's pairs are first summed per surface (ascending j), then the rows are
// added in ascending row order, so the sums are the same bit for bit however the
// rows were shared out. They equal the edge-matrix path's sums to rounding.
import type { ViewFactorResult } from './scene';
import { surfaceLengths, surfaceResult } from './surfaces';
import type { EdgePairs } from './pairRows';

/** Per-row surface sums of some rows, as one thread hands them on. */
export interface SurfaceRowSums {
  /** The rows, ascending. */
  rows: Int32Array;
  /** L_i F_ii per row (sketch units): > 0 only for an arc that sees itself. */
  self: Float64Array;
  /** Row k's entries are start[k] .. start[k+1]-1. */
  start: Int32Array;
  /** Surface J of each entry. */
  surface: Int32Array;
  /** sum over j > i with edge j on surface J of g_ij (sketch units). */
  exchange: Float64Array;
}

/**
 * Sums rows' pairs per surface (see `SurfaceRowSums`); `edgeSurface[i]` is edge
 * i's surface, 0..surfaceCount-1. One per thread: it holds surfaceCount scratch.
 */
export class SurfaceRowSummer {
  private readonly acc: Float64Array;
  private readonly stamp: Int32Array;
  private readonly touched: Int32Array;

  constructor(
    private readonly pairs: EdgePairs,
    private readonly edgeSurface: ArrayLike<number>,
    surfaceCount: number,
  ) {
    this.acc = new Float64Array(surfaceCount);
    this.stamp = new Int32Array(surfaceCount).fill(-1);
    this.touched = new Int32Array(surfaceCount);
  }

  /** The per-surface sums of the given rows (ascending), exchange lengths in sketch units. */
  sum(rows: ArrayLike<number>): SurfaceRowSums {
    const { pairs, edgeSurface, acc, stamp, touched } = this;
    const self = new Float64Array(rows.length);
    const start = new Int32Array(rows.length + 1);
    let surface = new Int32Array(Math.max(16, rows.length));
    let exchange = new Float64Array(surface.length);
    let used = 0;
    for (let k = 0; k < rows.length; k++) {
      const i = rows[k];
      self[k] = pairs.selfExchange(i);
      let t = 0;
      // Pairs not listed are 0 (pairRows.ts, liveColumns).
      const live = pairs.liveColumns(i),
        columns = pairs.live;
      for (let q = 0; q < live; q++) {
        const j = columns[q];
        const g = pairs.pairExchange(i, j);
        if (!(g > 0)) continue;
        const J = edgeSurface[j];
        if (stamp[J] !== i) {
          stamp[J] = i;
          acc[J] = 0;
          touched[t++] = J;
        }
        acc[J] += g;
      }
      if (used + t > surface.length) {
        const grown = Math.max(2 * surface.length, used + t);
        surface = grow(surface, new Int32Array(grown));
        exchange = grow(exchange, new Float64Array(grown));
      }
      for (let q = 0; q < t; q++) {
        surface[used] = touched[q];
        exchange[used++] = acc[touched[q]];
      }
      start[k + 1] = used;
    }
    return {
      rows: Int32Array.from(rows),
      self,
      start,
      surface: surface.slice(0, used),
      exchange: exchange.slice(0, used),
    };
  }
}

function grow<T extends Int32Array | Float64Array>(old: T, bigger: T): T {
  bigger.set(old);
  return bigger;
}

/**
 * Adds rows' surface sums into the surface exchange matrix G_IJ = L_I F_IJ
 * (sketch units), strictly in ascending row order: `add` takes row sums in any
 * order and holds back the ones that come early.
 */
export class SurfaceAccumulator {
  /** G_IJ, row-major surfaceCount x surfaceCount, sketch units. */
  readonly exchange: Float64Array;
  /** Surface lengths (sum of their edges, ascending edge index), sketch units. */
  readonly surfaceLength: Float64Array;
  private next = 0;
  private readonly early = new Map<number, { sums: SurfaceRowSums; k: number }>();

  constructor(
    private readonly edgeLength: Float64Array,
    private readonly edgeSurface: ArrayLike<number>,
    readonly surfaceCount: number,
  ) {
    this.exchange = new Float64Array(surfaceCount * surfaceCount);
    this.surfaceLength = surfaceLengths(edgeLength, edgeSurface, surfaceCount);
  }

  /** True once every row has been added. */
  get complete(): boolean {
    return this.next === this.edgeLength.length;
  }

  /** Add row sums (any rows, ascending within the block). */
  add(sums: SurfaceRowSums): void {
    for (let k = 0; k < sums.rows.length; k++) this.early.set(sums.rows[k], { sums, k });
    for (let hit = this.early.get(this.next); hit; hit = this.early.get(this.next)) {
      this.early.delete(this.next);
      this.addRow(hit.sums, hit.k);
      this.next++;
    }
  }

  private addRow(sums: SurfaceRowSums, k: number): void {
    const m = this.surfaceCount;
    const G = this.exchange;
    const I = this.edgeSurface[sums.rows[k]];
    if (sums.self[k] > 0) G[I * m + I] += sums.self[k];
    // Each pair is both L_i F_ij (row I) and L_j F_ji (row J); within one surface,
    // both land on the diagonal.
    for (let e = sums.start[k]; e < sums.start[k + 1]; e++) {
      const J = sums.surface[e];
      const g = sums.exchange[e];
      G[I * m + J] += g;
      G[J * m + I] += g;
    }
  }

  /** Surface factors F_IJ = G_IJ / L_I with their residuals (see `surfaceResult`). */
  result(closed: boolean): ViewFactorResult {
    if (!this.complete) throw new Error(`surface sums hold ${this.next} of ${this.edgeLength.length} rows`);
    return surfaceResult(this.edgeLength.length, this.edgeLength, this.surfaceLength, this.exchange, closed);
  }
}

/**
 * Surface view factors of all rows in one thread, with no edge matrix: memory
 * grows with surfaces^2 plus one row's sums, not with edges^2. Dimensionless
 * factors; lengths in sketch units.
 */
export function surfaceFactorsFromPairs(
  pairs: EdgePairs,
  edgeSurface: ArrayLike<number>,
  surfaceCount: number,
  closed: boolean,
): ViewFactorResult {
  const acc = new SurfaceAccumulator(pairs.length, edgeSurface, surfaceCount);
  const summer = new SurfaceRowSummer(pairs, edgeSurface, surfaceCount);
  const row = new Int32Array(1);
  for (let i = 0; i < pairs.count; i++) {
    row[0] = i;
    acc.add(summer.sum(row));
  }
  return acc.result(closed);
}
