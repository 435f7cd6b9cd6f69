import type { EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { ConvexWindows } from './convexWindows';
import {
  centreToSideSquared as centreToSideSquaredIn,
  cornerTestFlags,
  crossesBothStrings as crossesBothStringsIn,
} from './cornerCut';
import type { ObstaclePieces } from './obstaclePieces';
import {
  SIDE_ORDER as SIDE_ORDER_IN,
  SURELY_INSIDE as SURELY_INSIDE_IN,
  SURELY_OUTSIDE as SURELY_OUTSIDE_IN,
  UNSURE as UNSURE_IN,
  type SegmentClip,
  type ViewRegion,
} from './viewRegion';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const crossesBothStrings = crossesBothStringsIn,
  centreToSideSquared = centreToSideSquaredIn,
  SIDE_ORDER = SIDE_ORDER_IN,
  SURELY_INSIDE = SURELY_INSIDE_IN,
  SURELY_OUTSIDE = SURELY_OUTSIDE_IN,
  UNSURE = UNSURE_IN;

// Clipping obstacles to the view region H of one edge pair (for obstacleGather.ts).
// Bodies are placed whole by their bounding circle first: outside H, wholly inside, or
// straddling its boundary (then a disc inside the body may show that it blocks the
// pair). Straddling convex many-sided bodies are cut down by angular windows; the
// corners of the rest are classified in floats, so that only doubtful edges go
// through the exact clip, and only against the doubtful sides.

/** Convex bodies with more edges than this are clipped through angular windows (measured by `npm run bench`). */
const WINDOW_MIN_EDGES = 8;

/** Where a body's bounding circle lies against H (placeBody). */
export const OUTSIDE = 0;
const INSIDE = 1;
const STRADDLING = 2;

export class BodyClipper {
  private readonly clipOut: SegmentClip = {
    t0: NaN, // fractions: NaN, a double, until set (see Curve's fields)
    t1: NaN,
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
  // The pair: its edges and the bodies owning them (-1: a wall).
  private pairI = 0;
  private pairJ = 0;
  private bodyI = -1;
  private bodyJ = -1;
  /** True once one body blocks every sight line of the pair; `blocker` is that body. */
  blocked = false;
  blocker = -1;
  /** Bodies placed but not clipped yet (placeLater): id, then crossCount and crossing, and centreDist. */
  private deferred = new Int32Array(16);
  private deferredCross = new Int8Array(5 * 16);
  private deferredDist = new Float64Array(4 * 16);
  deferredCount = 0;

  /**
   * 1 for bodies worth polygonCutsView: a stand-in polygon, and a blocking disc short
   * of the bounding circle (a round body's disc test already finds nearly all it blocks).
   */
  private readonly cornerTest: Uint8Array;

  constructor(
    private readonly e: EdgeSet,
    private readonly ob: ObstacleIndex,
    private readonly region: ViewRegion,
    private readonly pieces: ObstaclePieces,
  ) {
    this.cornerTest = cornerTestFlags(ob);
  }

  /** Start the pair of edges i and j (the region is set for it). */
  begin(i: number, j: number): void {
    this.pairI = i;
    this.pairJ = j;
    this.bodyI = this.ob.bodyOfPolygon[this.e.polygon[i]];
    this.bodyJ = this.ob.bodyOfPolygon[this.e.polygon[j]];
    this.blocked = false;
    this.deferredCount = 0;
  }

  /** Does body b surely stay out of H's interior (placeCircle: OUTSIDE)? Leaves only scratch behind. */
  surelyOutside(b: number): boolean {
    return this.placeCircle(b) === OUTSIDE;
  }

  /** Clip body b now: place it, then clip it unless it lies outside H or blocks the pair. */
  clipBody(b: number): void {
    if (this.placeBody(b) !== OUTSIDE && !this.blocked) this.clipPlaced(b);
  }

  /** Place body b; unless it lies outside H or blocks the pair, save its place to clip it later (clipDeferred). */
  placeLater(b: number): void {
    if (this.placeBody(b) === OUTSIDE || this.blocked) return;
    const d = this.deferredCount++;
    if (d === this.deferred.length) this.growDeferred();
    this.deferred[d] = b;
    this.deferredCross[5 * d] = this.crossCount;
    for (let c = 0; c < 4; c++) {
      this.deferredCross[5 * d + 1 + c] = this.crossing[c];
      this.deferredDist[4 * d + c] = this.centreDist[c];
    }
  }

  /** Clip the d-th body placed by placeLater, from its saved place. */
  clipDeferred(d: number): void {
    this.crossCount = this.deferredCross[5 * d];
    for (let c = 0; c < 4; c++) {
      this.crossing[c] = this.deferredCross[5 * d + 1 + c];
      this.centreDist[c] = this.deferredDist[4 * d + c];
    }
    this.clipPlaced(this.deferred[d]);
  }

  /** Clip edge `edge` to H exactly; keep the piece if it passes through H's interior. */
  clipEdge(edge: number): void {
    if (edge === this.pairI || edge === this.pairJ || this.region.facesAwayFromEmitter(this.e, edge)) return;
    if (this.region.clipEdge(this.e, edge, this.clipOut)) this.pieces.keepClipped(edge, this.e, this.clipOut);
  }

  /**
   * Does body b block every sight line? It does when a disc inside it (bodyRIn about
   * its centre) meets both side strings (sides 1 and 3): the body then holds a chord
   * from one string to the other, which cuts H between i and j. When neither i nor j
   * is the body's own, a disc inside its hull does (bodyRHull: no other edge enters the
   * hull, so every sight line through the hull meets the body). Float test with a
   * margin that only ever says no in doubt.
   */
  cutsView(b: number): boolean {
    const ob = this.ob,
      R = this.region;
    // A convex body cannot block a view from or to its own edges (see placeBody).
    if (ob.bodyConvex[b] && (b === this.bodyI || b === this.bodyJ)) return false;
    const rIn = (b === this.bodyI || b === this.bodyJ ? ob.bodyRIn[b] : ob.bodyRHull[b]) * (1 - 1e-9);
    if (!(rIn > 0) || !R.on[1] || !R.on[3]) return false;
    return this.discMeetsSide(1, b) && this.discMeetsSide(3, b);
  }

  /**
   * Does body b (not one of the pair's own) surely cross both side strings, by the
   * convex polygon that stands in for it (bodyHullXY: its own corners, or its clean
   * hull)? That polygon then holds a chord from one string to the other, which cuts H
   * between i and j, and every sight line across it meets the body: the block the
   * clip would find as a chain from side 1 to side 3, found from the corners alone.
   * For long, thin bodies whose inner disc falls short of the strings. Float tests
   * with margins that only ever say no in doubt.
   */
  polygonCutsView(b: number): boolean {
    const R = this.region;
    if (!this.cornerTest[b] || b === this.bodyI || b === this.bodyJ || !R.on[1] || !R.on[3]) return false;
    return crossesBothStrings(this.ob, R, b);
  }

  /**
   * Does body b's blocking disc (as cutsView takes it) meet side k of H? Float test
   * on the nearest point of the side. Read by body index: numbers passed to a call the
   * engine does not inline are boxed.
   */
  private discMeetsSide(k: number, b: number): boolean {
    const ob = this.ob;
    const r = (b === this.bodyI || b === this.bodyJ ? ob.bodyRIn[b] : ob.bodyRHull[b]) * (1 - 1e-9);
    return centreToSideSquared(ob, this.region, k, b) < r * r;
  }

  /**
   * Place body b against H by its bounding circle: OUTSIDE when the circle lies wholly
   * outside a side (or the body cannot block: see below), else the sides that cut the
   * circle go to `crossing` (none: the body lies wholly inside H). A straddling body
   * whose inner disc, or whose corners (polygonCutsView), cut the view blocks the pair
   * (blocked, blocker). Remembered bodies (probed) and listed ones alike come here, so
   * a pair ends the same way whichever obstacles were remembered.
   */
  private placeBody(b: number): number {
    const place = this.placeCircle(b);
    if (place === STRADDLING && (this.cutsView(b) || this.polygonCutsView(b))) {
      this.blocked = true;
      this.blocker = b;
    }
    return place;
  }

  /**
   * Place body b against H by its bounding circle alone (placeBody without the disc
   * test): OUTSIDE, INSIDE, or STRADDLING with the cutting sides in `crossing`.
   */
  private placeCircle(b: number): number {
    const ob = this.ob,
      R = this.region;
    // A convex body lies wholly behind each of its own edges, so it cannot block a
    // view from or to one of them.
    if (ob.bodyConvex[b] && (b === this.bodyI || b === this.bodyJ)) return OUTSIDE;
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
      // Signed distance of the centre from side k, positive inside H (written out here:
      // a call's numbers, arguments and result, would be boxed).
      const dist = ((R.ex[k] - R.sx[k]) * (cy - R.sy[k]) - (R.ey[k] - R.sy[k]) * (cx - R.sx[k])) * R.invLen[k];
      this.centreDist[k] = dist;
      if (dist < -r - margin) return OUTSIDE;
      if (dist < r + margin) this.crossing[crossCount++] = k;
    }
    this.crossCount = crossCount;
    return crossCount === 0 ? INSIDE : STRADDLING;
  }

  /** Clip body b, placed by placeBody (and not blocking); a body wholly inside H keeps every edge whole. */
  private clipPlaced(b: number): void {
    const ob = this.ob;
    const first = ob.bodyFirstEdge[b],
      end = ob.bodyEdgeEnd[b];
    if (this.crossCount > 0) {
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
    for (let e = first; e < end; e++) this.pieces.keepWhole(e, E);
  }

  /**
   * Clip the edges [first, end) of a body that straddles H's boundary. Each corner is
   * classified once against the crossing sides in floats, with a margin well above the
   * rounding of a cross product (side length x sketch extent x 1e-14): edges with
   * both corners surely outside one side are dropped, edges with both surely inside
   * are kept whole, and only the rest go through the exact clip.
   */
  private clipBodyEdges(first: number, end: number): void {
    const E = this.e,
      R = this.region;
    const n = end - first;
    if (this.places.length < 4 * n) this.places = new Int8Array(8 * n);
    const P = this.places,
      X = E.ax,
      Y = E.ay;
    // Side by side, every corner (corner a of each edge): as R.place, with the side's numbers held.
    for (let c = 0; c < this.crossCount; c++) {
      const k = this.crossing[c];
      const x0 = R.sx[k],
        y0 = R.sy[k],
        dx = R.ex[k] - x0,
        dy = R.ey[k] - y0,
        tol = R.tol[k];
      for (let e = first, at = c; e < end; e++, at += 4) {
        const d = dx * (Y[e] - y0) - dy * (X[e] - x0);
        P[at] = d > tol ? SURELY_INSIDE : d < -tol ? SURELY_OUTSIDE : UNSURE;
      }
    }
    for (let e = first; e < end; e++) this.settleEdge(e, 4 * (e - first), 4 * (E.nextEdge[e] - first), false);
  }

  /** Clip a convex body that straddles H's boundary, looking only at edges its angular windows admit. */
  private clipConvexBody(b: number): void {
    const ob = this.ob,
      E = this.e;
    if (!this.windows.find(ob, b, this.region, this.centreDist)) return;
    const ranges = this.windows.ranges;
    const first = ob.bodyFirstEdge[b];
    // Consecutive edges of the walk share a corner: each corner is classified once per
    // window, its places kept in the slot (0 or 4) the next edge reads as its start.
    // An edge facing away from i' is left out before its corners are classified.
    for (let q = 0; q < ranges.count; q++) {
      let a = 0,
        startKnown = false;
      for (let m = ranges.lo[q]; m <= ranges.hi[q]; m++) {
        const e = ob.walkEdge[first + m];
        if (this.region.facesAwayFromEmitter(this.e, e)) {
          startKnown = false;
          continue;
        }
        if (!startKnown) this.classifyCorner(E.ax[e], E.ay[e], a);
        const b = 4 - a;
        this.classifyCorner(E.bx[e], E.by[e], b);
        this.settleEdge(e, a, b, true); // its facing was tested above
        a = b;
        startKnown = true;
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

  /**
   * Drop, keep whole, or clip edge e, from its corners' places at offsets a and b.
   * Sides that miss the body's circle hold it wholly inside: only crossing sides can
   * drop or cut an edge, and only those not holding both corners surely inside are
   * tested exactly. An edge facing away from i' is dropped too, unless the caller has
   * tested that already (`facingKnown`).
   */
  private settleEdge(e: number, a: number, b: number, facingKnown: boolean): void {
    const doubtful = this.doubtfulSides(a, b);
    if (doubtful < 0 || e === this.pairI || e === this.pairJ) return;
    if (!facingKnown && this.region.facesAwayFromEmitter(this.e, e)) return;
    this.keepEdge(e, doubtful);
  }

  /**
   * From an edge's corner places at offsets a and b: -1 when both lie surely outside one
   * crossing side (drop the edge), else the bit mask of the crossing sides that do not
   * hold both surely inside (to test exactly; 0: keep the edge whole).
   */
  private doubtfulSides(a: number, b: number): number {
    const P = this.places,
      count = this.crossCount,
      crossing = this.crossing;
    let doubtful = 0;
    for (let c = 0; c < count; c++) {
      const pa = P[a + c],
        pb = P[b + c];
      if (pa === SURELY_OUTSIDE && pb === SURELY_OUTSIDE) return -1;
      if (pa !== SURELY_INSIDE || pb !== SURELY_INSIDE) doubtful |= 1 << crossing[c];
    }
    return doubtful;
  }

  /** Keep edge e whole (no doubtful side), or its exact clip against the doubtful sides. */
  private keepEdge(e: number, doubtful: number): void {
    const E = this.e;
    if (doubtful === 0) this.pieces.keepWhole(e, E);
    else if (this.region.clipExact(E, e, doubtful, this.clipOut)) this.pieces.keepClipped(e, E, this.clipOut);
  }

  private growDeferred(): void {
    const n = 2 * this.deferred.length;
    const deferred = new Int32Array(n),
      cross = new Int8Array(5 * n),
      dist = new Float64Array(4 * n);
    deferred.set(this.deferred);
    cross.set(this.deferredCross);
    dist.set(this.deferredDist);
    this.deferred = deferred;
    this.deferredCross = cross;
    this.deferredDist = dist;
  }
}
