import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { ConvexWindows } from './convexWindows';
import type { ObstaclePieces } from './obstaclePieces';
import {
  SIDE_ORDER as SIDE_ORDER_IN,
  SURELY_INSIDE as SURELY_INSIDE_IN,
  SURELY_OUTSIDE as SURELY_OUTSIDE_IN,
  type SegmentClip,
  type ViewRegion,
} from './viewRegion';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const SIDE_ORDER = SIDE_ORDER_IN,
  SURELY_INSIDE = SURELY_INSIDE_IN,
  SURELY_OUTSIDE = SURELY_OUTSIDE_IN;

// Which edges can block the view of an edge pair: every edge that enters the interior
// of the view region H, clipped to H. Walls of re-entrant pockets come from the wall
// index; bodies are culled whole by their bounding circle, convex many-sided bodies are
// cut down by angular windows, and corners are classified in floats first so that only
// doubtful edges go through the exact clip.

/** Convex bodies with more edges than this are clipped through angular windows (measured by `npm run bench`). */
const WINDOW_MIN_EDGES = 8;

/** What to do with an edge after classifying both corners against every side of H. */
type EdgeVerdict = typeof DROP | typeof KEEP_WHOLE | typeof CLIP;
const DROP = 0;
const KEEP_WHOLE = 1;
const CLIP = 2;

export class ObstacleGatherer {
  private readonly clipOut: SegmentClip = {
    t0: 0,
    t1: 1,
    startInside: false,
    endInside: false,
    startSide: -1,
    endSide: -1,
  };
  private readonly windows = new ConvexWindows();
  /** Signed distance of the current body's centre from each side, positive inside H. */
  private readonly centreDist = new Float64Array(4);
  /** The sides that cut the current body's circle (crossCount of them); the body is surely inside the others. */
  private readonly crossing = new Int32Array(4);
  private crossCount = 0;
  /** SidePlace of corners against the crossing sides, 4 entries per corner (slot c for crossing[c]). */
  private places = new Int8Array(256);
  private readonly visitWall: (id: number) => boolean;
  private readonly visitBody: (id: number) => boolean;
  // The pair being gathered: its edges, the bodies owning them (-1: a wall), and whether one body blocks it all.
  private pairI = 0;
  private pairJ = 0;
  private bodyI = -1;
  private bodyJ = -1;
  private blocked = false;
  /** The body that blocked the pair (when blocked). */
  private blocker = -1;
  /**
   * Per edge, the obstacle that last blocked a pair of it (a body b as b, a wall edge e
   * as -2 - e, none as -1): tried first, so that a pair it blocks ends before any
   * search. Only a hint: a blocked pair returns 0 whichever obstacle shows it; for any
   * other pair a probed obstacle keeps the very pieces the search would have made, and
   * the pieces are read in edge order, so no result depends on what came before.
   */
  private readonly hint: Int32Array;
  /** The one before (a pair is often blocked by one of two neighbours). */
  private readonly hint2: Int32Array;
  /** Bodies probed for the current pair (-1: none), one slot per hint tried. */
  private readonly probed = new Int32Array(4);

  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
    private readonly region: ViewRegion,
    private readonly pieces: ObstaclePieces,
  ) {
    this.hint = new Int32Array(e.count).fill(-1);
    this.hint2 = new Int32Array(e.count).fill(-1);
    this.visitWall = (id: number) => {
      const edge = this.ob.wallEdges[id];
      if (!this.pieces.has(edge)) this.clipEdge(edge); // kept already by a probe
      return false;
    };
    this.visitBody = (id: number) => {
      if (!this.wasProbed(id)) this.clipBody(id);
      return this.blocked; // one body blocks it all: stop the search
    };
  }

  /**
   * Fill `pieces` with the obstructions of edges i and j inside the region (set for
   * this pair). Returns true when one body, or one chain of edges from one side string
   * to the other, blocks every sight line: the pair then exchanges nothing, and the
   * pieces are incomplete.
   */
  gather(i: number, j: number): boolean {
    const ob = this.ob,
      R = this.region;
    this.pairI = i;
    this.pairJ = j;
    this.bodyI = ob.bodyOfPolygon[this.e.polygon[i]];
    this.bodyJ = ob.bodyOfPolygon[this.e.polygon[j]];
    const hi = this.hint[i],
      hj = this.hint[j],
      hi2 = this.hint2[i],
      hj2 = this.hint2[j];
    this.pieces.begin();
    this.blocked = false;
    this.probed.fill(-1);
    // Probed obstacles keep their pieces; the searches below skip them.
    if (this.probe(hi, 0) || (hj !== hi && this.probe(hj, 1))) return true;
    if (hi2 !== hi && hi2 !== hj && this.probe(hi2, 2)) return true;
    if (hj2 !== hi && hj2 !== hj && hj2 !== hi2 && this.probe(hj2, 3)) return true;
    if (ob.bodyTree) ob.bodyTree.search(R, this.visitBody);
    else for (let b = 0; b < ob.bodyCount && !this.blocked; b++) if (!this.wasProbed(b)) this.clipBody(b);
    if (this.blocked) {
      this.remember(i, j, this.blocker);
      return true;
    }
    ob.wallTree.search(R, this.visitWall);
    const chain = this.pieces.blockingChain(this.e.nextEdge);
    if (chain < 0) {
      this.pieces.sortByEdge();
      return false;
    }
    const edge = this.pieces.edge[chain];
    const body = ob.bodyOfPolygon[this.e.polygon[edge]];
    this.remember(i, j, body >= 0 ? body : -2 - edge);
    return true;
  }

  /** Make obstacle h the first hint of edges i and j, the previous first hint the second. */
  private remember(i: number, j: number, h: number): void {
    if (this.hint[i] !== h) {
      this.hint2[i] = this.hint[i];
      this.hint[i] = h;
    }
    if (this.hint[j] !== h) {
      this.hint2[j] = this.hint[j];
      this.hint[j] = h;
    }
  }

  /**
   * Does obstacle h (a hint: body, wall edge or none, as in `hint`) block every sight
   * line of the pair by itself? A body is clipped whole; a wall edge with the run of
   * wall edges joined to it inside H. The pieces stay: they are part of the gather.
   */
  private probe(h: number, slot: number): boolean {
    if (h === -1) return false;
    if (h >= 0) {
      this.probed[slot] = h;
      this.clipBody(h);
    } else {
      this.clipWallRun(-2 - h);
    }
    return this.blocked || this.pieces.blockingChain(this.e.nextEdge) >= 0;
  }

  /** Was body b probed for this pair (its pieces kept already)? */
  private wasProbed(b: number): boolean {
    const p = this.probed;
    return p[0] === b || p[1] === b || p[2] === b || p[3] === b;
  }

  /** Clip wall edge `edge` and the wall edges joined to it by corners inside H, both ways. */
  private clipWallRun(edge: number): void {
    const E = this.e,
      P = this.pieces;
    this.clipEdge(edge);
    if (!P.has(edge)) return;
    const limit = E.polygonStart[E.polygon[edge] + 1] - E.polygonStart[E.polygon[edge]];
    let cur = edge;
    for (let steps = 0; steps < limit && P.endInside[P.pieceOf(cur)]; steps++) {
      const next = E.nextEdge[cur];
      if (P.has(next)) break;
      this.clipEdge(next);
      if (!P.has(next)) break;
      cur = next;
    }
    cur = edge;
    for (let steps = 0; steps < limit && P.startInside[P.pieceOf(cur)]; steps++) {
      const prev = E.prevEdge[cur];
      if (P.has(prev)) break;
      this.clipEdge(prev);
      if (!P.has(prev)) break;
      cur = prev;
    }
  }

  /**
   * Does body b block every sight line? It does when a disc inside it (bodyRIn about
   * its centre) meets both side strings (sides 1 and 3): the body then holds a chord
   * from one string to the other, which cuts H between i and j. Float test with a
   * margin that only ever says no in doubt.
   */
  private cutsView(b: number): boolean {
    const ob = this.ob,
      R = this.region;
    const rIn = ob.bodyRIn[b] * (1 - 1e-9);
    if (!(rIn > 0) || !R.on[1] || !R.on[3]) return false;
    return R.discMeetsSide(1, ob.bodyCx[b], ob.bodyCy[b], rIn) && R.discMeetsSide(3, ob.bodyCx[b], ob.bodyCy[b], rIn);
  }

  /**
   * Clip the edges of body b unless its bounding circle lies wholly outside a side of H;
   * when the circle lies wholly inside H, keep every edge whole without testing it.
   */
  private clipBody(b: number): void {
    const ob = this.ob,
      R = this.region;
    // A convex body lies wholly behind each of its own edges, so it cannot block a
    // view from or to one of them.
    if (ob.bodyConvex[b] && (b === this.bodyI || b === this.bodyJ)) return;
    const cx = ob.bodyCx[b],
      cy = ob.bodyCy[b],
      r = ob.bodyR[b];
    // A relative margin of 1e-9 keeps these float tests on the safe side: a body kept
    // in vain costs only time, and "wholly inside" must be certain.
    const margin = r * 1e-9 + 1e-12 * (Math.abs(cx) + Math.abs(cy));
    let crossCount = 0;
    for (let step = 0; step < 4; step++) {
      const k = SIDE_ORDER[step]; // the side strings reject most bodies, so they go first
      if (!R.on[k]) continue;
      const dist = R.signedDistance(k, cx, cy);
      this.centreDist[k] = dist;
      if (dist < -r - margin) return;
      if (dist < r + margin) this.crossing[crossCount++] = k;
    }
    this.crossCount = crossCount;
    const inside = crossCount === 0;
    const first = ob.bodyFirstEdge[b],
      end = ob.bodyEdgeEnd[b];
    if (!inside) {
      if (this.cutsView(b)) {
        this.blocked = true;
        this.blocker = b;
        return;
      }
      // Angular windows pay off for many-sided bodies; a few corners are cheaper to test all.
      if (ob.bodyConvex[b] && end - first > WINDOW_MIN_EDGES) this.clipConvexBody(b);
      else this.clipBodyEdges(first, end);
      return;
    }
    if (ob.bodyConvex[b]) {
      this.pieces.addWholeBody(b);
      return;
    }
    const E = this.e;
    for (let e = first; e < end; e++) this.pieces.keep(e, E.ax[e], E.ay[e], E.bx[e], E.by[e], true, true);
  }

  /**
   * Clip the edges [first, end) of a body that straddles H's boundary. Each corner is
   * classified once against the four sides in floats, with a margin well above the
   * rounding of a cross product (side length x sketch extent x 1e-14): edges with
   * both corners surely outside one side are dropped, edges with both surely inside
   * are kept whole, and only the rest go through the exact clip.
   */
  private clipBodyEdges(first: number, end: number): void {
    const E = this.e;
    const n = end - first;
    if (this.places.length < 4 * n) this.places = new Int8Array(8 * n);
    for (let e = first; e < end; e++) this.classifyCorner(E.ax[e], E.ay[e], 4 * (e - first));
    for (let e = first; e < end; e++) this.settleEdge(e, 4 * (e - first), 4 * (E.nextEdge[e] - first));
  }

  /** Clip a convex body that straddles H's boundary, looking only at edges its angular windows admit. */
  private clipConvexBody(b: number): void {
    const ob = this.ob,
      E = this.e;
    if (!this.windows.find(ob, b, this.region, this.centreDist)) return;
    const ranges = this.windows.ranges;
    const first = ob.bodyFirstEdge[b];
    for (let q = 0; q < ranges.count; q++) {
      for (let m = ranges.lo[q]; m <= ranges.hi[q]; m++) {
        const e = ob.walkEdge[first + m];
        this.classifyCorner(E.ax[e], E.ay[e], 0);
        this.classifyCorner(E.bx[e], E.by[e], 4);
        this.settleEdge(e, 0, 4);
      }
    }
  }

  /** Write the SidePlace of (x, y) against each crossing side to places[at + c]. */
  private classifyCorner(x: number, y: number, at: number): void {
    const R = this.region,
      P = this.places,
      crossing = this.crossing,
      count = this.crossCount;
    for (let c = 0; c < count; c++) P[at + c] = R.place(crossing[c], x, y);
  }

  /** Drop, keep whole, or clip edge e, from its corners' places at offsets a and b. */
  private settleEdge(e: number, a: number, b: number): void {
    const verdict = this.verdict(a, b);
    if (verdict === DROP) return;
    if (verdict === CLIP) {
      this.clipEdge(e);
      return;
    }
    const E = this.e;
    if (e !== this.pairI && e !== this.pairJ) this.pieces.keep(e, E.ax[e], E.ay[e], E.bx[e], E.by[e], true, true);
  }

  /** Sides that miss the body's circle hold it wholly inside: only crossing sides can drop or cut an edge. */
  private verdict(a: number, b: number): EdgeVerdict {
    const P = this.places,
      count = this.crossCount;
    let whole = true;
    for (let c = 0; c < count; c++) {
      const pa = P[a + c],
        pb = P[b + c];
      if (pa === SURELY_OUTSIDE && pb === SURELY_OUTSIDE) return DROP;
      if (pa !== SURELY_INSIDE || pb !== SURELY_INSIDE) whole = false;
    }
    return whole ? KEEP_WHOLE : CLIP;
  }

  /** Clip edge `edge` to H exactly; keep the piece if it passes through H's interior. */
  private clipEdge(edge: number): void {
    if (edge === this.pairI || edge === this.pairJ) return;
    const E = this.e,
      c = this.clipOut;
    const px = E.ax[edge],
      py = E.ay[edge],
      qx = E.bx[edge],
      qy = E.by[edge];
    if (!this.region.clipSegment(px, py, qx, qy, c)) return;
    this.pieces.keep(
      edge,
      px + c.t0 * (qx - px),
      py + c.t0 * (qy - py),
      px + c.t1 * (qx - px),
      py + c.t1 * (qy - py),
      c.startInside,
      c.endInside,
      c.startSide,
      c.endSide,
    );
  }
}
