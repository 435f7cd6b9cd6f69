// Edge pairs by rows, so the work of one edge matrix can be shared: row i holds
// the pairs (i, j > i) and, for an arc that sees itself, (i, i). Each pair is
// integrated once and its exchange length g = L_i F_ij = L_j F_ji (sketch units)
// fills both F_ij and F_ji. A pair's g is a pure function of the sketch and
// (i, j), so any split of the rows gives the same numbers, bit for bit.
import { CurvedPairIntegrator } from './arc/curvedPair';
import { allEdgeLengths, totalEdgeCount, type EdgeSet } from './edges';
import { buildObstacleIndex, type ObstacleIndex } from './obstacles';
import { PairIntegrator } from './pair/integrator';

/**
 * The pair integrators built last, kept referenced until the next are built. V8
 * holds the hidden classes (maps) of class instances through those instances only:
 * when every integrator of a sketch is garbage, a full collection frees their maps
 * and throws away all optimised code that checks them, so the next sketch (a drag
 * step, a study's next case, the bench's next run) runs unoptimised until the
 * engine compiles it again. Measured: a 500-edge hard scene took 210-250 ms instead
 * of 125 ms after each full collection, and 1.2-1.4 s instead of 0.9 s at 2000 edges
 * inside the full bench. Holds one sketch's edges and scratch, nothing more.
 */
export const lastBuilt: { pairs: EdgePairs | null } = { pairs: null };

/** The pair integrators of one sketch; one per thread (they hold scratch). */
export class EdgePairs {
  /** Edges in the matrix: polygon edges, then arcs. */
  readonly count: number;
  /** Lengths of every edge, sketch units. */
  readonly length: Float64Array;
  /** Where blockers are looked for (kept so that a later sketch can be compared, see reuse/movedShapes.ts). */
  readonly obstacles: ObstacleIndex;
  private readonly straightCount: number;
  private readonly straight: PairIntegrator;
  private readonly curved: CurvedPairIntegrator | null;

  constructor(readonly edges: EdgeSet) {
    this.count = totalEdgeCount(edges);
    this.straightCount = edges.count;
    this.length = edges.arcs.count > 0 ? allEdgeLengths(edges) : edges.length;
    const obstacles = buildObstacleIndex(edges);
    this.obstacles = obstacles;
    this.straight = new PairIntegrator(edges, obstacles);
    // Sketches with exact circles: pairs with an arc, or with a solid circle near their
    // view, go through the curved integrator; polygon pairs keep the polygon one.
    this.curved = edges.arcs.circleCount > 0 ? new CurvedPairIntegrator(edges, obstacles) : null;
    this.live = new Int32Array(this.count);
    lastBuilt.pairs = this;
  }

  /** Scratch of liveColumns: the listed edges, ascending. */
  readonly live: Int32Array;

  /**
   * The edges j > i worth asking pairExchange(i, j) about, ascending, in `live`;
   * returns their count. Every pair left out would give 0, bit for
   * bit: in sketches without exact circles, whole groups of edges behind edge i or
   * hidden from all of it by one body, edges that surely do not face it, and edges one
   * body hides from all of it, are left out (pair/groupCull.ts); with exact circles every j > i is listed (those pairs have
   * their own shortcuts, arc/discShadow.ts).
   */
  liveColumns(i: number): number {
    const n = this.count,
      out = this.live;
    let count = 0;
    if (this.curved === null && i < this.straightCount) count = this.straight.liveColumns(i, out, 0);
    else for (let j = i + 1; j < n; j++) out[count++] = j;
    return count;
  }

  /** L_i F_ij integrated along edge i (sketch units); for i = j only an arc can be > 0. */
  exchangeLength(i: number, j: number): number {
    const c = this.curved;
    return c && c.needed(i, j) ? c.exchangeLength(i, j) : this.straight.exchangeLength(i, j);
  }

  /** L_i F_ii (sketch units): only a concave arc sees itself; 0 otherwise. */
  selfExchange(i: number): number {
    if (!this.curved || i < this.straightCount || this.length[i] === 0) return 0;
    const g = this.curved.exchangeLength(i, i);
    return g > 0 ? g : 0;
  }

  /**
   * g = L_i F_ij = L_j F_ji for i != j (sketch units), or 0 when the edges do not
   * see each other (or one has no length).
   */
  pairExchange(i: number, j: number): number {
    const L = this.length;
    if (L[i] === 0 || L[j] === 0) return 0;
    // Integrating along the shorter edge keeps its rounding error relative to that
    // edge, so the factor from a tiny edge stays accurate.
    const g = L[i] <= L[j] ? this.exchangeLength(i, j) : this.exchangeLength(j, i);
    // Every visible gap adds a non-negative amount, so g < 0 is rounding of an exact
    // zero (a grazing view, e.g. -1e-32): report it as no view.
    return g > 0 ? g : 0;
  }
}

/** Pairs in row i of an n-edge matrix: (i, i) and (i, j > i). */
export function rowPairCount(n: number, i: number): number {
  return n - i;
}

/**
 * Split the rows 0..n-1 into `parts` sets of nearly equal pair counts (rows in
 * ascending order within a set). Rows are dealt from the costliest (row 0 has the
 * most pairs) to whichever set holds the fewest pairs so far, so the sets stay
 * within one row of each other. Deterministic; empty sets when parts > n.
 */
export function balancedRowSets(n: number, parts: number): Int32Array[] {
  const p = Math.max(1, Math.floor(parts));
  const load = new Float64Array(p);
  const owner = new Int32Array(n);
  const size = new Int32Array(p);
  for (let i = 0; i < n; i++) {
    let best = 0;
    for (let k = 1; k < p; k++) if (load[k] < load[best]) best = k;
    owner[i] = best;
    load[best] += rowPairCount(n, i);
    size[best]++;
  }
  const sets = Array.from(size, (s) => new Int32Array(s));
  const fill = new Int32Array(p);
  for (let i = 0; i < n; i++) sets[owner[i]][fill[owner[i]]++] = i;
  return sets;
}

/** Every row of an n-edge matrix as packed exchange lengths: row sets and one `packRows` array per set. */
export interface PackedRows {
  sets: Int32Array[];
  packed: Float64Array[];
}

/** Doubles needed by `packRows` for these rows: n - i per row i. */
export function packedLength(n: number, rows: ArrayLike<number>): number {
  let total = 0;
  for (let k = 0; k < rows.length; k++) total += rowPairCount(n, rows[k]);
  return total;
}

/**
 * The exchange lengths of the given rows (sketch units), packed row after row:
 * for row i, g_ii then g_ij for j = i+1 .. n-1 (0 where the edges do not see each
 * other). `out` needs `packedLength(n, rows)` entries; it is returned.
 */
export function packRows(pairs: EdgePairs, rows: ArrayLike<number>, out?: Float64Array): Float64Array {
  const n = pairs.count;
  const packed = out ?? new Float64Array(packedLength(n, rows));
  let at = 0;
  for (let k = 0; k < rows.length; k++) {
    const i = rows[k];
    packed[at++] = pairs.selfExchange(i);
    // Pairs not listed are 0: the row is cleared first, then the listed ones written.
    packed.fill(0, at, at + n - i - 1);
    const live = pairs.liveColumns(i),
      columns = pairs.live;
    for (let q = 0; q < live; q++) {
      const j = columns[q];
      packed[at + j - i - 1] = pairs.pairExchange(i, j);
    }
    at += n - i - 1;
  }
  return packed;
}

/**
 * Write packed rows (see `packRows`) into an n x n edge matrix (row-major, row =
 * from): F_ij = g / L_i and F_ji = g / L_j for every g > 0; other entries are left
 * as they are (a fresh matrix holds 0 there). Dimensionless.
 */
export function unpackRows(
  length: Float64Array,
  rows: ArrayLike<number>,
  packed: Float64Array,
  F: Float64Array,
  from = 0,
): void {
  const n = length.length;
  let at = from;
  for (let k = 0; k < rows.length; k++) {
    const i = rows[k];
    const Li = length[i];
    const self = packed[at++];
    if (self > 0) F[i * n + i] = self / Li;
    for (let j = i + 1; j < n; j++) {
      const g = packed[at++];
      if (g > 0) {
        F[i * n + j] = g / Li;
        F[j * n + i] = g / length[j];
      }
    }
  }
}

/**
 * Fill the given rows' pairs of an n x n edge matrix straight from the integrators
 * (the same numbers as `packRows` then `unpackRows`, without the packed buffer).
 */
export function fillRows(pairs: EdgePairs, rows: ArrayLike<number>, F: Float64Array): void {
  const n = pairs.count;
  const L = pairs.length;
  for (let k = 0; k < rows.length; k++) {
    const i = rows[k];
    const self = pairs.selfExchange(i);
    if (self > 0) F[i * n + i] = self / L[i];
    // Pairs not listed are 0, as the matrix holds there already.
    const live = pairs.liveColumns(i),
      columns = pairs.live;
    for (let q = 0; q < live; q++) {
      const j = columns[q];
      const g = pairs.pairExchange(i, j);
      if (g > 0) {
        F[i * n + j] = g / L[i];
        F[j * n + i] = g / L[j];
      }
    }
  }
}
