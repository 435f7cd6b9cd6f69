import type { EdgeSet } from '../edges';
import { sortRanges as sortRangesIn } from '../scratch';
import type { SegmentClip } from './viewRegion';

// Module-local copy of a hot import (see integrator.ts).
const sortRanges = sortRangesIn;

// The obstruction pieces of one edge pair: edges (or their parts) clipped to the view
// region H, and the convex bodies lying wholly inside H (which enter the view only by
// their silhouette corners). Filled by ObstacleGatherer, read by FixedPoints. Coordinates
// in sketch units. Buffers grow when full; no piece is ever dropped.

export class ObstaclePieces {
  /** Edge id of each piece, and the piece's start (px, py) and end (qx, qy). */
  edge = new Int32Array(64);
  px = new Float64Array(64);
  py = new Float64Array(64);
  qx = new Float64Array(64);
  qy = new Float64Array(64);
  /** 1 when the piece's start / end is a corner strictly inside H (the chain goes on there). */
  startInside = new Uint8Array(64);
  endInside = new Uint8Array(64);
  /** Side of H (1 or 3: the strings; 0, 2: i', j') the start / end lies on (SegmentClip.startSide); -1 if none known. */
  startSide = new Int8Array(64);
  endSide = new Int8Array(64);
  /** Piece indices sorted by edge id (after sortByEdge). */
  order = new Int32Array(64);
  /** orderRuns scratch: the first piece of each run and its lowest id (more runs: the insertion sort). */
  private readonly runStart = new Int32Array(32);
  private readonly runLow = new Int32Array(32);
  /** 1 once the piece has been walked into a chain. */
  walked = new Uint8Array(64);
  count = 0;
  /** Convex bodies wholly inside H. */
  wholeBody = new Int32Array(16);
  wholeCount = 0;
  // Per edge: which pair last kept a piece of it, and which piece.
  private readonly stamp: Int32Array;
  private readonly pieceOfEdge: Int32Array;
  private pair = 0;

  constructor(edgeCount: number) {
    this.stamp = new Int32Array(edgeCount).fill(-1);
    this.pieceOfEdge = new Int32Array(edgeCount);
  }

  /** Forget the previous pair's pieces (O(1): the per-edge stamps are compared with a counter). */
  begin(): void {
    this.pair++;
    this.count = 0;
    this.wholeCount = 0;
  }

  /** Is a piece of `edge` kept for this pair? */
  has(edge: number): boolean {
    return this.stamp[edge] === this.pair;
  }

  /** Index of the piece of `edge` (valid when has(edge)). */
  pieceOf(edge: number): number {
    return this.pieceOfEdge[edge];
  }

  /** Keep all of edge `edge` of E (both corners inside H). */
  keepWhole(edge: number, E: EdgeSet): void {
    const s = this.add(edge, true, true, -1, -1);
    this.px[s] = E.ax[edge];
    this.py[s] = E.ay[edge];
    this.qx[s] = E.bx[edge];
    this.qy[s] = E.by[edge];
  }

  /** Keep the piece of edge `edge` of E that clip `c` left (ViewRegion.clipEdge). */
  keepClipped(edge: number, E: EdgeSet, c: SegmentClip): void {
    const s = this.add(edge, c.startInside, c.endInside, c.startSide, c.endSide);
    const px = E.ax[edge],
      py = E.ay[edge],
      qx = E.bx[edge],
      qy = E.by[edge];
    this.px[s] = px + c.t0 * (qx - px);
    this.py[s] = py + c.t0 * (qy - py);
    this.qx[s] = px + c.t1 * (qx - px);
    this.qy[s] = py + c.t1 * (qy - py);
  }

  /** A new piece of `edge` with these flags; returns its index (the caller writes its ends). */
  private add(edge: number, startInside: boolean, endInside: boolean, startSide: number, endSide: number): number {
    const s = this.count;
    if (s === this.edge.length) this.grow();
    this.edge[s] = edge;
    this.startInside[s] = startInside ? 1 : 0;
    this.endInside[s] = endInside ? 1 : 0;
    this.startSide[s] = startSide;
    this.endSide[s] = endSide;
    this.walked[s] = 0;
    this.stamp[edge] = this.pair;
    this.pieceOfEdge[edge] = s;
    this.count = s + 1;
    return s;
  }

  /**
   * Sort the pieces by edge id into `order`, and the whole bodies by id: what the pair
   * integral reads then depends only on which obstacles were kept, never on the order
   * they were gathered in (hints change that order from pair to pair).
   */
  sortByEdge(): void {
    // A few pieces sort fastest by insertion; more come in runs (a body's walk).
    if (this.count <= 8 || !this.orderRuns()) this.insertionOrder();
    const whole = this.wholeBody;
    for (let k = 1; k < this.wholeCount; k++) {
      const b = whole[k];
      let m = k - 1;
      while (m >= 0 && whole[m] > b) {
        whole[m + 1] = whole[m];
        m--;
      }
      whole[m + 1] = b;
    }
  }

  /**
   * Order the pieces when they arrive as runs of edge ids, each rising or falling by
   * one (a body's pieces in walk order, which runs backwards through the ids of a
   * polygon given anticlockwise), whose id ranges do not overlap: the runs sorted by
   * their lowest id, each laid out rising. False (nothing written that counts) when
   * there are too many runs or their ranges overlap: the insertion sort then orders.
   */
  private orderRuns(): boolean {
    const n = this.count,
      edge = this.edge,
      runs = this.runStart,
      runLow = this.runLow;
    let r = 0;
    for (let k = 0; k < n; k = this.runEnd(k)) {
      if (r === runs.length) return false;
      runs[r] = k;
      runLow[r++] = Math.min(edge[k], edge[this.runEnd(k) - 1]);
    }
    sortRanges(runLow, runs, r); // by lowest id
    const order = this.order;
    let at = 0,
      last = -1;
    for (let q = 0; q < r; q++) {
      const k = runs[q],
        end = this.runEnd(k);
      if (runLow[q] <= last) return false; // ranges overlap
      if (edge[k] <= edge[end - 1]) for (let s = k; s < end; s++) order[at++] = s;
      else for (let s = end - 1; s >= k; s--) order[at++] = s;
      last = Math.max(edge[k], edge[end - 1]);
    }
    return true;
  }

  /** The end (exclusive) of the run of pieces from k whose ids rise, or fall, by one. */
  private runEnd(k: number): number {
    const n = this.count,
      edge = this.edge;
    let end = k + 1;
    if (end < n && edge[end] === edge[k] + 1) while (end < n && edge[end] === edge[end - 1] + 1) end++;
    else if (end < n && edge[end] === edge[k] - 1) while (end < n && edge[end] === edge[end - 1] - 1) end++;
    return end;
  }

  /** Insertion sort of the pieces by edge id into `order`. */
  private insertionOrder(): void {
    const n = this.count,
      order = this.order,
      edge = this.edge;
    for (let k = 0; k < n; k++) {
      const key = edge[k];
      let m = k - 1;
      while (m >= 0 && edge[order[m]] > key) {
        order[m + 1] = order[m];
        m--;
      }
      order[m + 1] = k;
    }
  }

  /**
   * A chain of pieces that runs from one side string to the other (their open
   * interiors, or an end where the piece cannot cross i' or j': see STRING_PAST in
   * viewRegion.ts): it cuts H in two, i' on one side and j' on the other, so every
   * sight line crosses it and the pair exchanges nothing. Exact: the sides come from exact
   * signs, and chains join at corners strictly inside H. Returns the chain's first
   * piece, or -1 when there is none. `nextEdge`: EdgeSet.nextEdge; only chains that
   * start at piece `from` or later are tried.
   */
  blockingChain(nextEdge: Int32Array, from = 0): number {
    for (let s = from; s < this.count; s++) {
      const from = this.startSide[s];
      if (from !== 1 && from !== 3) continue;
      let cur = s;
      // An open chain never returns to its start; the step bound only guards the walk.
      for (let steps = 0; steps < this.count; steps++) {
        const to = this.endSide[cur];
        if (to >= 0) {
          if (to === 4 - from) return s;
          break;
        }
        const next = nextEdge[this.edge[cur]];
        if (!this.endInside[cur] || !this.has(next)) break;
        cur = this.pieceOfEdge[next];
      }
    }
    return -1;
  }

  addWholeBody(b: number): void {
    if (this.wholeCount === this.wholeBody.length) {
      const grown = new Int32Array(2 * this.wholeCount);
      grown.set(this.wholeBody);
      this.wholeBody = grown;
    }
    this.wholeBody[this.wholeCount++] = b;
  }

  private grow(): void {
    const n = 2 * this.edge.length;
    const i32 = (a: Int32Array) => {
      const b = new Int32Array(n);
      b.set(a);
      return b;
    };
    const f64 = (a: Float64Array) => {
      const b = new Float64Array(n);
      b.set(a);
      return b;
    };
    const u8 = (a: Uint8Array) => {
      const b = new Uint8Array(n);
      b.set(a);
      return b;
    };
    this.edge = i32(this.edge);
    this.px = f64(this.px);
    this.py = f64(this.py);
    this.qx = f64(this.qx);
    this.qy = f64(this.qy);
    this.startInside = u8(this.startInside);
    this.endInside = u8(this.endInside);
    const i8 = (a: Int8Array) => {
      const b = new Int8Array(n);
      b.set(a);
      return b;
    };
    this.order = i32(this.order);
    this.startSide = i8(this.startSide);
    this.endSide = i8(this.endSide);
    this.walked = u8(this.walked);
  }
}
