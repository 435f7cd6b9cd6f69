import { extentWithCircles, totalEdgeCount, type EdgeSet } from '../edges';
import type { ObstacleIndex } from '../obstacles';
import { orient as orientIn } from '../orient';
import { ArcShapes, clearCrossing as clearCrossingIn, Curve, surelyBehind } from './curve';
import { DiscShadow } from './discShadow';
import { HiddenCircles } from './hiddenCircles';
import { LineSweepPair } from './lineSweepPair';
import { convexHull as convexHullIn, discMeetsHull as discMeetsHullIn, PairScene } from './pairScene';
import { PieceView } from './pieceView';
import { TargetCone } from './targetCone';
import {
  commonTangents as commonTangentsIn,
  CurveBreaks,
  touchAngles as touchAnglesIn,
  type EventFilter,
} from './tangents';

// Lengths: Math.sqrt of the sum of squares, not Math.hypot (see tangents.ts).
// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call (as in src/core/pair).
const orient = orientIn;
const clearCrossing = clearCrossingIn;
const convexHull = convexHullIn;
const discMeetsHull = discMeetsHullIn;
const commonTangents = commonTangentsIn;
const touchAngles = touchAnglesIn;

// Exact view factor between two curves (segments or arcs of exact circles), blocked
// by circles and polygons. Seen from a point p of the emitter, the target's visible
// directions are runs bounded by fixed objects: points (corners, ends), lines that
// touch a circle (on one side), and the emitter's own horizon. Where p lines up with
// two such objects the runs can change: those points (lines through two points,
// tangents from a point to a circle, common tangents of two circles, and for an arc
// the points whose horizon meets an object) cut the emitter into pieces. On a piece
// the runs found at its middle hold throughout, and 1/2 (sin b_hi - sin b_lo) ds
// integrates exactly: towards a point to a distance change, towards a tangent to the
// change of a taut string wrapped on the circle, at the horizon to +-1/2 ds
// (crossed strings generalised; Hottel; Modest, Radiative Heat Transfer, ch. 4).
// Before any of that, a pair that one solid circle hides wholly (discShadow.ts) is 0,
// and blocking circles hidden from the whole emitter behind nearer ones are left out
// (hiddenCircles.ts). A pair of straight edges and whole tubes past circles only is
// summed over the lines that cross both instead (lineSweep.ts, lineSweepPair.ts).

/**
 * The shadow test's margin over the largest coordinate of the sketch: about 450 ulps,
 * above the rounding of a tangent line computed from coordinates of that size.
 */
const SHADOW_MARGIN = 1e-13;

export class CurvedPairIntegrator implements EventFilter {
  private readonly em = new Curve();
  private readonly tg = new Curve();
  private readonly scene: PairScene;
  private readonly breaks = new CurveBreaks();
  private readonly view: PieceView;
  private readonly lines = new Float64Array(12);
  private readonly touch = new Float64Array(2);
  /** The target's cone from an event point. */
  private readonly cone = new TargetCone();
  private readonly shadow: DiscShadow;
  private readonly hidden = new HiddenCircles();
  private readonly lines2: LineSweepPair;
  /** Arcs' end points and outer polygons, computed once (curve.ts). */
  private readonly shapes: ArcShapes;
  /** Scratch for surelyBehind: a curve's outer polygon. */
  private readonly outline: number[] = [];
  /**
   * Per edge, the solid circle that last hid a pair of it (-1: none), tried before the
   * pair's blockers are gathered. Only a hint: a circle that hides the target from the
   * emitter lies across every sight line, so the gathered circles hold it and
   * hidingCircle finds the pair 0 too; no result depends on what came before.
   */
  private readonly hider: Int32Array;

  constructor(
    private readonly E: EdgeSet,
    obstacles: ObstacleIndex,
  ) {
    this.scene = new PairScene(E, obstacles);
    this.breaks.filter = this;
    this.view = new PieceView(E.arcs);
    const margin = SHADOW_MARGIN * extentWithCircles(E);
    this.shadow = new DiscShadow(margin);
    this.lines2 = new LineSweepPair(margin, this.shadow);
    this.hider = new Int32Array(totalEdgeCount(E)).fill(-1);
    this.shapes = new ArcShapes(E);
  }

  /**
   * Must pair (i, j) go through this integrator? Yes when either is an arc, or when a
   * solid circle's disc may enter the quadrilateral hull of two straight edges (float
   * test with a margin that only ever says yes in doubt).
   */
  needed(i: number, j: number): boolean {
    const E = this.E,
      A = E.arcs;
    if (i >= E.count || j >= E.count) return true;
    const x0 = Math.min(E.ax[i], E.bx[i], E.ax[j], E.bx[j]),
      x1 = Math.max(E.ax[i], E.bx[i], E.ax[j], E.bx[j]);
    const y0 = Math.min(E.ay[i], E.by[i], E.ay[j], E.by[j]),
      y1 = Math.max(E.ay[i], E.by[i], E.ay[j], E.by[j]);
    for (let c = 0; c < A.circleCount; c++) {
      if (A.circleIsEnclosure[c]) continue;
      const r = A.r[c] * (1 + 1e-9);
      if (A.cx[c] + r < x0 || A.cx[c] - r > x1 || A.cy[c] + r < y0 || A.cy[c] - r > y1) continue;
      if (this.discMeetsQuad(c, i, j, r)) return true;
    }
    return false;
  }

  /** False only when the disc lies surely outside the hull of edges i and j (four corner points). */
  private discMeetsQuad(c: number, i: number, j: number, r: number): boolean {
    const E = this.E,
      A = E.arcs;
    const pts = [E.ax[i], E.ay[i], E.bx[i], E.by[i], E.ax[j], E.ay[j], E.bx[j], E.by[j]];
    const H: number[] = [];
    convexHull(pts, H);
    return discMeetsHull(H, A.cx[c], A.cy[c], r);
  }

  /**
   * L_i F_ij for edges i and j (straight edges first, then arcs): the view factor from
   * i to j times the length of i, sketch units. 0 when i cannot see j.
   */
  exchangeLength(i: number, j: number): number {
    const em = this.em,
      tg = this.tg;
    em.load(this.E, i, this.shapes);
    tg.load(this.E, j, this.shapes);
    // A concave arc (of an enclosure circle) sees itself; nothing else does.
    if (i === j && !(em.isArc && !em.solid)) return 0;
    if (em.length === 0 || tg.length === 0) return 0;
    // Two arcs of one solid circle face away from each other.
    if (em.isArc && tg.isArc && em.circle === tg.circle && em.solid) return 0;
    if (this.surelyApart()) return 0;
    // Arcs that face away from each other (the far sides of two tubes, say).
    if (surelyBehind(em, tg, this.outline) || surelyBehind(tg, em, this.outline)) return 0;
    if (this.hintHides(this.hider[i]) || this.hintHides(this.hider[j])) return 0;
    this.scene.collect(em, i, tg, j);
    const h = this.hidingCircle();
    if (h >= 0) {
      this.hider[i] = h;
      this.hider[j] = h;
      return 0;
    }
    this.hidden.drop(this.scene, this.E.arcs, em, tg, this.shadow);
    // Straight edges and whole tubes past circles: summed over lines instead (lineSweepPair.ts).
    const swept = this.lines2.exchange(em, tg, this.scene, this.E.arcs);
    if (swept >= 0) return swept;
    this.findBreaks();
    return this.integrate();
  }

  /** A blocking circle that hides the whole target from the whole emitter (discShadow.ts), or -1. */
  private hidingCircle(): number {
    const A = this.E.arcs,
      circles = this.scene.circles;
    for (let k = 0; k < circles.length; k++) {
      const c = circles[k];
      if (this.shadow.hides(this.em, this.tg, A.cx[c], A.cy[c], A.r[c])) return c;
    }
    return -1;
  }

  /** Does solid circle c (a hint; -1: none) hide the target from the emitter, as hidingCircle would test it? */
  private hintHides(c: number): boolean {
    const A = this.E.arcs;
    if (c < 0 || c === this.em.circle || c === this.tg.circle || A.circleIsEnclosure[c]) return false;
    return this.shadow.hides(this.em, this.tg, A.cx[c], A.cy[c], A.r[c]);
  }

  /** Exact tests that the target lies wholly behind a straight emitter or the reverse. */
  private surelyApart(): boolean {
    const em = this.em,
      tg = this.tg;
    if (!em.isArc && !tg.isArc) {
      if (
        orient(em.ax, em.ay, em.bx, em.by, tg.ax, tg.ay) <= 0 &&
        orient(em.ax, em.ay, em.bx, em.by, tg.bx, tg.by) <= 0
      )
        return true;
      return (
        orient(tg.ax, tg.ay, tg.bx, tg.by, em.ax, em.ay) <= 0 && orient(tg.ax, tg.ay, tg.bx, tg.by, em.bx, em.by) <= 0
      );
    }
    return false;
  }

  private findBreaks(): void {
    const em = this.em,
      tg = this.tg,
      B = this.breaks,
      S = this.scene;
    B.reset();
    const P = S.pts,
      nP = P.length >> 1;
    const circles = S.tangentCircles;
    const A = this.E.arcs;
    for (let a = 0; a < nP; a++) {
      const ax = P[2 * a],
        ay = P[2 * a + 1];
      for (let b = a + 1; b < nP; b++) {
        const dx = P[2 * b] - ax,
          dy = P[2 * b + 1] - ay;
        if (dx !== 0 || dy !== 0) B.addEvent(em, ax, ay, dx, dy, P[2 * b], P[2 * b + 1]);
      }
      // The target arc's own ends lie on its circle: their tangent lines are added below.
      const ownEnd = tg.isArc && a >= nP - 2 && tg.span < 2 * Math.PI;
      for (const c of circles) {
        if (ownEnd && c === tg.circle) continue;
        if (!touchAngles(ax, ay, A.cx[c], A.cy[c], A.r[c], this.touch)) continue;
        for (let s = 0; s < 2; s++) {
          const tx = A.cx[c] + A.r[c] * Math.cos(this.touch[s]) - ax,
            ty = A.cy[c] + A.r[c] * Math.sin(this.touch[s]) - ay;
          if (tx !== 0 || ty !== 0) B.addEvent(em, ax, ay, tx, ty, ax + tx, ay + ty);
        }
      }
      // The horizon of an arc (its tangent at p) meets the point.
      if (em.isArc && touchAngles(ax, ay, em.cx, em.cy, em.r, this.touch)) {
        B.addHorizonEvent(em, this.touch[0], ax, ay);
        B.addHorizonEvent(em, this.touch[1], ax, ay);
      }
    }
    if (tg.isArc && tg.solid && tg.span < 2 * Math.PI) {
      // Where p lies on the tangent at an end of the target arc, the end takes over from the tangent.
      B.addEvent(em, tg.ax, tg.ay, -Math.sin(tg.start), Math.cos(tg.start), tg.ax, tg.ay);
      B.addEvent(em, tg.bx, tg.by, -Math.sin(tg.start + tg.span), Math.cos(tg.start + tg.span), tg.bx, tg.by);
    }
    const L = this.lines;
    for (let x = 0; x < circles.length; x++) {
      const c = circles[x];
      for (let y = x + 1; y < circles.length; y++) {
        const d = circles[y];
        const n = commonTangents(A.cx[c], A.cy[c], A.r[c], A.cx[d], A.cy[d], A.r[d], L);
        for (let k = 0; k < n; k++) {
          const nx = L[3 * k],
            ny = L[3 * k + 1],
            w = L[3 * k + 2];
          // Each circle touches the line at the foot of the perpendicular from its centre.
          const fc = nx * A.cx[c] + ny * A.cy[c] + w,
            fd = nx * A.cx[d] + ny * A.cy[d] + w;
          const tcx = A.cx[c] - fc * nx,
            tcy = A.cy[c] - fc * ny;
          B.addEvent(em, tcx, tcy, -ny, nx, A.cx[d] - fd * nx, A.cy[d] - fd * ny);
        }
      }
      if (em.isArc) {
        // Circles whose common tangent with the emitter's circle is the horizon at p.
        const n = commonTangents(em.cx, em.cy, em.r, A.cx[c], A.cy[c], A.r[c], L);
        for (let k = 0; k < n; k++) {
          const nx = L[3 * k],
            ny = L[3 * k + 1];
          const fc = nx * A.cx[c] + ny * A.cy[c] + L[3 * k + 2];
          B.addHorizonEvent(em, Math.atan2(-ny, -nx), A.cx[c] - fc * nx, A.cy[c] - fc * ny);
        }
      }
    }
    // Arc pieces span at most a quarter turn, so each chord is shorter than its arc's diameter
    // (a whole tube: four pieces; an arc of a tube split for a flux profile: often one).
    if (em.isArc) {
      const parts = Math.max(1, Math.ceil(em.span / (Math.PI / 2) - 1e-12));
      for (let k = 1; k < parts; k++) B.addAngle(em, em.start + (k * em.span) / parts);
    }
    B.sort();
  }

  /**
   * Can the alignment of objects at (x1, y1) and (x2, y2) seen from p change the
   * visible runs? Not when an object lies clearly behind the emitter, when the two
   * lie in opposite directions from p, when their direction misses the target, or
   * when one of them is hidden strictly behind a solid circle (then, near p and near
   * that direction, it bounds no run). Float tests with margins that keep the event
   * in doubt.
   */
  keeps(event: Float64Array): boolean {
    const px = event[0],
      py = event[1],
      nx = event[2],
      ny = event[3],
      x1 = event[4],
      y1 = event[5],
      x2 = event[6],
      y2 = event[7];
    const u1x = x1 - px,
      u1y = y1 - py,
      u2x = x2 - px,
      u2y = y2 - py;
    const d1 = Math.sqrt(u1x * u1x + u1y * u1y),
      d2 = Math.sqrt(u2x * u2x + u2y * u2y);
    const slack = 1e-9;
    if (u1x * nx + u1y * ny < -slack * d1 || u2x * nx + u2y * ny < -slack * d2) return false;
    if (u1x * u2x + u1y * u2y < -slack * d1 * d2) return false;
    // Only objects that can bound a run matter, and a swap with one that cannot (hidden
    // strictly behind a circle) leaves the runs as they were. What hides the nearer
    // object hides the farther too, so the farther one is tested.
    const far = d1 >= d2;
    const t = far ? d1 : d2;
    if (!(Math.min(d1, d2) > 0)) return true;
    const ux = (far ? u1x : u2x) / t,
      uy = (far ? u1y : u2y) / t;
    this.cone.from(this.tg, px, py);
    if (!this.cone.toward(ux, uy)) return false;
    // Nor does it when a circle strictly crosses that line before the target: near p and
    // near that direction the target is then hidden, so neither object bounds a run.
    const circles = this.scene.circles;
    const reach = circles.length > 0 ? Math.max(t, clearCrossing(this.tg, px, py, ux, uy)) : t;
    for (let q = 0; q < circles.length; q++) if (this.hides(circles[q], px, py, ux, uy, reach)) return false;
    if (this.tg.isArc && this.tg.solid && this.hides(this.tg.circle, px, py, ux, uy, t)) return false;
    return true;
  }

  /** Does solid circle k strictly cross the line at less than distance t along the unit direction (ux, uy) from p? */
  private hides(k: number, px: number, py: number, ux: number, uy: number, t: number): boolean {
    const A = this.E.arcs,
      slack = 1e-9;
    const fx = A.cx[k] - px,
      fy = A.cy[k] - py;
    const along = fx * ux + fy * uy;
    if (along <= 0) return false;
    const h = Math.abs(fx * uy - fy * ux),
      r = A.r[k] * (1 - slack);
    return h < r && along - Math.sqrt((r - h) * (r + h)) < t * (1 - slack);
  }

  /** Sum of the exact piece integrals between consecutive breakpoints. */
  private integrate(): number {
    const em = this.em,
      B = this.breaks,
      V = this.view;
    V.begin(this.tg, this.scene, em);
    const end = em.isArc ? em.span : 1;
    let total = 0,
      ua = 0;
    for (let k = 0; k <= B.count; k++) {
      const ub = k < B.count ? B.at[k] : end;
      if (ub <= ua) continue;
      const q = V.query;
      if (em.isArc) {
        const ta = em.start + ua,
          tb = em.start + ub,
          tm = 0.5 * (ta + tb);
        // Solids are walked clockwise (outside on the left), enclosures anticlockwise.
        const t0 = em.solid ? tb : ta,
          t1 = em.solid ? ta : tb;
        const side = em.solid ? 1 : -1; // normal = side x (cos t, sin t)
        const cm = Math.cos(tm),
          sm = Math.sin(tm);
        q[0] = em.cx + em.r * Math.cos(t0);
        q[1] = em.cy + em.r * Math.sin(t0);
        q[2] = em.cx + em.r * Math.cos(t1);
        q[3] = em.cy + em.r * Math.sin(t1);
        q[4] = em.cx + em.r * cm;
        q[5] = em.cy + em.r * sm;
        q[6] = side * cm;
        q[7] = side * sm;
        q[8] = side * sm;
        q[9] = -side * cm;
        q[10] = em.r * (ub - ua);
      } else {
        const dx = em.bx - em.ax,
          dy = em.by - em.ay;
        const tx = dx / em.length,
          ty = dy / em.length;
        const um = 0.5 * (ua + ub);
        q[0] = em.ax + ua * dx;
        q[1] = em.ay + ua * dy;
        q[2] = em.ax + ub * dx;
        q[3] = em.ay + ub * dy;
        q[4] = em.ax + um * dx;
        q[5] = em.ay + um * dy;
        q[6] = -ty;
        q[7] = tx;
        q[8] = tx;
        q[9] = ty;
        q[10] = (ub - ua) * em.length;
      }
      total += V.piece();
      ua = ub;
    }
    return total;
  }
}
