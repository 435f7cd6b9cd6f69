import { sketchExtent, type EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { ORIENT_FILTER_BOUND, orient as orientIn } from '../orient';
import { edgeGroups, type EdgeGroups } from './edgeGroups';
import { Breakpoints, FixedPoints } from './fixedPoints';
import { ObstacleGatherer } from './obstacleGather';
import { ObstaclePieces } from './obstaclePieces';
import { crossedStrings as crossedStringsIn, pieceIntegral as pieceIntegralIn } from './pieceIntegral';
import { ViewRegion } from './viewRegion';
import { VisibleGaps } from './visibleGaps';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const orient = orientIn,
  FILTER_BOUND = ORIENT_FILTER_BOUND,
  crossedStrings = crossedStringsIn,
  pieceIntegral = pieceIntegralIn;

/** Flags of the ends that exchangeLength trimmed to the other edge's line. */
const TRIMMED_B0 = 1,
  TRIMMED_B1 = 2,
  TRIMMED_A0 = 4,
  TRIMMED_A1 = 8;
/** 2^-52: the first step of frontEnds, as a fraction of the trimmed part. */
const EPSILON = 2.220446049250313e-16;

// Exact diffuse view factor between two edges of a long (2D) geometry, with blocking
// by every other edge of the sketch. The steps, in order, each with its own module:
//   1. trim each edge to the part in front of the other, and set the view region H
//      (viewRegion.ts);
//   2. gather the obstructions inside H (obstacleGather.ts, convexWindows.ts,
//      obstaclePieces.ts);
//   3. collect the fixed points that bound the view and the breakpoints along i
//      (fixedPoints.ts);
//   4. on each piece between breakpoints, find the visible gaps of j (visibleGaps.ts)
//      and integrate them in closed form (pieceIntegral.ts).
// All scratch lives in the integrator and grows rarely; one call allocates nothing.

export class PairIntegrator {
  private readonly region: ViewRegion;
  private readonly pieces: ObstaclePieces;
  private readonly gatherer: ObstacleGatherer;
  private readonly points: FixedPoints;
  private readonly breakpoints: Breakpoints;
  private readonly gaps = new VisibleGaps();
  /** Groups of consecutive polygon edges (bodies, runs of enclosure edges); see edgeGroups.ts. */
  readonly groups: EdgeGroups;
  /** The pair's trimmed ends a0, a1 (of i') and b0, b1 (of j'), x then y, sketch units. */
  private readonly ends = new Float64Array(8);
  /** The current piece of i': its middle, i's unit direction, its ends pa and pb, and pb - pa (x, y each). */
  private readonly piece = new Float64Array(10);

  constructor(
    private readonly e: EdgeSet,
    obstacles: ObstacleIndex,
  ) {
    const extent = sketchExtent(e);
    this.region = new ViewRegion(extent);
    this.breakpoints = new Breakpoints(extent);
    this.pieces = new ObstaclePieces(e.count);
    this.groups = edgeGroups(e, obstacles);
    this.gatherer = new ObstacleGatherer(e, obstacles, this.region, this.pieces, this.groups);
    this.points = new FixedPoints(e, obstacles);
  }

  /**
   * L_i F_ij for oriented edges i and j: the view factor from i to j times the
   * length of i (sketch units). Equal to L_j F_ji by reciprocity; 0 when i cannot see j.
   */
  exchangeLength(i: number, j: number): number {
    if (i === j) return 0;
    const E = this.e;
    let a0x = E.ax[i],
      a0y = E.ay[i],
      a1x = E.bx[i],
      a1y = E.by[i];
    let b0x = E.ax[j],
      b0y = E.ay[j],
      b1x = E.bx[j],
      b1y = E.by[j];
    // Front tests: a point is in front of an edge when it lies strictly left of a -> b.
    // orient's float filter inline (see orient.ts); only a doubtful case calls out, by
    // edge numbers, so that no coordinate is boxed (and + types its result as a number,
    // else the filter's value is boxed to meet it).
    let l = (a0y - b0y) * (a1x - b0x),
      r = (a0x - b0x) * (a1y - b0y);
    const dB0 = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +this.orientAt(i, j, 0);
    l = (a0y - b1y) * (a1x - b1x);
    r = (a0x - b1x) * (a1y - b1y);
    const dB1 = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +this.orientAt(i, j, 1);
    if (dB0 <= 0 && dB1 <= 0) return 0;
    l = (b0y - a0y) * (b1x - a0x);
    r = (b0x - a0x) * (b1y - a0y);
    const dA0 = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +this.orientAt(j, i, 0);
    l = (b0y - a1y) * (b1x - a1x);
    r = (b0x - a1x) * (b1y - a1y);
    const dA1 = Math.abs(l - r) >= FILTER_BOUND * Math.abs(l + r) ? -(l - r) : +this.orientAt(j, i, 1);
    if (dA0 <= 0 && dA1 <= 0) return 0;
    // Keep only the part of each edge in front of the other: nothing else can exchange.
    // (A trimmed end is put back in front of or on the other's line where rounding left
    // it behind: see frontEnds.)
    let trimmed = 0;
    if (dB0 < 0) {
      const t = dB0 / (dB0 - dB1);
      b0x += t * (b1x - b0x);
      b0y += t * (b1y - b0y);
      trimmed = TRIMMED_B0;
    } else if (dB1 < 0) {
      const t = dB1 / (dB1 - dB0);
      b1x += t * (b0x - b1x);
      b1y += t * (b0y - b1y);
      trimmed = TRIMMED_B1;
    }
    if (dA0 < 0) {
      const t = dA0 / (dA0 - dA1);
      a0x += t * (a1x - a0x);
      a0y += t * (a1y - a0y);
      trimmed |= TRIMMED_A0;
    } else if (dA1 < 0) {
      const t = dA1 / (dA1 - dA0);
      a1x += t * (a0x - a1x);
      a1y += t * (a0y - a1y);
      trimmed |= TRIMMED_A1;
    }
    // The trimmed ends go to the steps below through `ends`: a call that is not inlined
    // boxes each number passed to it.
    const P = this.ends;
    P[0] = a0x;
    P[1] = a0y;
    P[2] = a1x;
    P[3] = a1y;
    P[4] = b0x;
    P[5] = b0y;
    P[6] = b1x;
    P[7] = b1y;
    if (trimmed !== 0) this.frontEnds(i, j, trimmed);
    const li = Math.sqrt((P[2] - P[0]) ** 2 + (P[3] - P[1]) ** 2);
    if (li === 0 || (P[4] === P[6] && P[5] === P[7])) return 0;

    // Lists that hold no possible obstacle for the row edge and the other's group: clear.
    if (this.gatherer.nothingBetween(i, j)) return crossedStrings(P);
    // Every sight line from i' to j' lies in H = hull(i', j') = a0 a1 b0 b1 (anticlockwise,
    // since j's front faces i). Only obstructions inside H can block.
    this.region.set(P);
    if (this.gatherer.gather(i, j)) return 0;
    if (this.pieces.count === 0 && this.pieces.wholeCount === 0) return crossedStrings(P);
    this.points.build(this.pieces, P);
    this.breakpoints.find(this.points, P);
    return this.integrate(li);
  }

  /**
   * Append to `out` (from `count` on) the polygon edges j > i that may exchange with
   * polygon edge i, ascending (the others surely give exchangeLength 0: behind i, not
   * facing it, or hidden from it by one body). Returns the new count.
   */
  liveColumns(i: number, out: Int32Array, count: number): number {
    return this.gatherer.liveColumns(i, out, count);
  }

  /**
   * Put each trimmed end of `ends` (flags TRIMMED_*) in front of or on the other edge's
   * line, exactly. The end computed where an edge crosses the other's line can round
   * to behind it; the view region a0 a1 b0 b1 is convex only when every corner is in
   * front of or on the other edge's line, and its sides are taken as half-planes, so a
   * corner left behind made it non-convex and cut bodies that hug the other edge (one
   * 1 ulp from it was read as crossing the view, and the pair as blocked). The end moves
   * toward the kept end by doubling fractions of the trimmed part: orient is affine
   * along the edge and the kept end lies strictly in front, so it ends in front.
   */
  private frontEnds(i: number, j: number, trimmed: number): void {
    const E = this.e,
      P = this.ends;
    for (let k = 0; k < 4; k++) {
      if ((trimmed & (1 << k)) === 0) continue;
      // k: 0 b0 (kept b1), 1 b1 (kept b0), 2 a0 (kept a1), 3 a1 (kept a0); the line is the other edge's.
      const at = k < 2 ? 4 + 2 * k : 2 * (k - 2);
      const keep = k < 2 ? 4 + 2 * (1 - k) : 2 * (3 - k);
      const o = k < 2 ? i : j;
      const ax = E.ax[o],
        ay = E.ay[o],
        bx = E.bx[o],
        by = E.by[o];
      const x = P[at],
        y = P[at + 1],
        dx = P[keep] - x,
        dy = P[keep + 1] - y;
      for (let s = EPSILON; s < 1 && orient(ax, ay, bx, by, P[at], P[at + 1]) < 0; s *= 2) {
        P[at] = x + s * dx;
        P[at + 1] = y + s * dy;
      }
    }
  }

  /** orient(a of edge e, b of edge e, corner `end` (0: a, 1: b) of edge f), from the edge arrays. */
  private orientAt(e: number, f: number, end: number): number {
    const E = this.e;
    return end === 0
      ? orient(E.ax[e], E.ay[e], E.bx[e], E.by[e], E.ax[f], E.ay[f])
      : orient(E.ax[e], E.ay[e], E.bx[e], E.by[e], E.bx[f], E.by[f]);
  }

  /** Sum of the piece integrals between consecutive breakpoints of i' = a0-a1 (length li). */
  private integrate(li: number): number {
    const P = this.ends;
    const a0x = P[0],
      a0y = P[1],
      a1x = P[2],
      a1y = P[3];
    const dxI = a1x - a0x,
      dyI = a1y - a0y;
    const tx = dxI / li,
      ty = dyI / li;
    const at = this.breakpoints.at,
      nBreaks = this.breakpoints.count;
    const gaps = this.gaps,
      points = this.points;
    gaps.prepare(points);
    // The piece goes to the gaps and the integral in `Q` (see `piece`), not as
    // numbers: a call that is not inlined boxes each number passed to it.
    const Q = this.piece;
    Q[2] = tx;
    Q[3] = ty;
    let total = 0;
    let sa = 0;
    for (let k = 0; k <= nBreaks; k++) {
      const sb = k < nBreaks ? at[k] : 1;
      if (sb <= sa) continue;
      const sm = 0.5 * (sa + sb);
      Q[0] = a0x + sm * dxI;
      Q[1] = a0y + sm * dyI;
      gaps.find(points, Q);
      if (gaps.count > 0) {
        Q[4] = a0x + sa * dxI;
        Q[5] = a0y + sa * dyI;
        Q[6] = a0x + sb * dxI;
        Q[7] = a0y + sb * dyI;
        Q[8] = (sb - sa) * dxI;
        Q[9] = (sb - sa) * dyI;
        total += pieceIntegral(points, gaps, Q);
      }
      sa = sb;
    }
    return total;
  }
}
