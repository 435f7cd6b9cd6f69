import { distanceChange as distanceChangeIn } from '../pairGeometry';
import { orient as orientIn } from '../orient';
import { sortIndexByKey as sortIndexByKeyIn } from '../scratch';
import type { ArcSet } from './arcs';
import { CoherentOrder, SORT_FROM_LAST } from './coherentOrder';
import type { Curve } from './curve';
import { DiscSweep } from './discSweep';
import type { PairScene } from './pairScene';
import { TargetCone } from './targetCone';

// Lengths: Math.sqrt of the sum of squares, not Math.hypot (see tangents.ts).
// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call (as in src/core/pair).
const distanceChange = distanceChangeIn;
const orient = orientIn;
const sortIndexByKey = sortIndexByKeyIn;

// The visible runs of the target from the middle of one emitter piece, and their
// exact integral over the piece. Directions from p are angles b from the emitter's
// normal n (positive towards its tangent t), in [-pi/2, pi/2], kept and sorted as
// tan b = (u . t) / (u . n) (increasing with b; no trigonometry). Objects bounding a
// run: fixed points (ids 0 .. nP-1), lines touching circle k on side +1 / -1 (ids
// nP + 2x and nP + 2x + 1 for the x-th circle with a tangent), and the horizon
// (HORIZON_LO at b = -pi/2, HORIZON_HI at b = +pi/2). Sketch units.

const HORIZON_LO = -1;
const HORIZON_HI = -2;

export class PieceView {
  private tg!: Curve;
  private em!: Curve;
  private scene!: PairScene;
  /** Circles whose tangents are objects: the blockers, then the target's own if solid. */
  private tanCircles: number[] = [];
  // The bounding directions of this piece: tan b, object id, and their order by b
  // (typed and grown rarely, so a piece allocates nothing).
  private key = new Float64Array(64);
  private id = new Int32Array(64);
  private order = new Int32Array(64);
  private m = 0;
  private targetFront = true;
  /** Blocking circles whose cone from the piece's middle meets the target's, by the directions they cover. */
  private readonly near = new DiscSweep();
  /** The directions' order, started from the last piece's. */
  private readonly sorter = new CoherentOrder();
  /** The target's cone from the piece's middle. */
  private readonly cone = new TargetCone();

  constructor(private readonly A: ArcSet) {}

  begin(tg: Curve, scene: PairScene, em: Curve): void {
    this.tg = tg;
    this.em = em;
    this.scene = scene;
    this.tanCircles = scene.tangentCircles;
    this.sorter.reset();
  }

  /**
   * The piece being integrated, written by the caller before piece(): pa (0, 1),
   * pb (2, 3), middle pm (4, 5), unit normal n (6, 7) and tangent t (8, 9) at pm,
   * length ds (10). Sketch units. A typed array, not arguments: doubles passed to a
   * call the engine does not inline are boxed on the heap.
   */
  readonly query = new Float64Array(11);

  /**
   * The integral over the emitter piece pa -> pb (see `query`) of 1/2 (sin b_hi -
   * sin b_lo) summed over the visible runs: the piece's share of L_i F_ij, sketch units.
   */
  piece(): number {
    const Q = this.query;
    const pmx = Q[4],
      pmy = Q[5],
      nx = Q[6],
      ny = Q[7],
      tx = Q[8],
      ty = Q[9];
    const tg = this.tg,
      A = this.A;
    this.targetFront = tg.isArc || orient(tg.ax, tg.ay, tg.bx, tg.by, pmx, pmy) > 0;
    if (!this.targetFront) return 0;
    this.m = 0;
    const cone = this.cone;
    cone.from(tg, pmx, pmy);
    const P = this.scene.pts,
      nP = P.length >> 1;
    for (let k = 0; k < nP; k++) {
      const ux = P[2 * k] - pmx,
        uy = P[2 * k + 1] - pmy;
      const c = ux * nx + uy * ny;
      if (c > 0 && cone.toward(ux, uy)) this.push((ux * tx + uy * ty) / c, k);
    }
    const T = this.tanCircles,
      near = this.near;
    near.reset();
    for (let x = 0; x < T.length; x++) {
      const k = T[x];
      const fx = pmx - A.cx[k],
        fy = pmy - A.cy[k],
        r = A.r[k];
      const d = Math.sqrt(fx * fx + fy * fy);
      const blocker = k !== tg.circle;
      // A blocker whose cone misses the target's cone bounds no run and stops no ray
      // that reaches the target: skip its tangents, and leave it out of the ray casts.
      if (!(d > r)) {
        if (blocker) near.addEverywhere(k);
        continue;
      }
      if (blocker && !cone.meets(-fx, -fy, Math.asin(r / d))) continue;
      // The tangent from p touching at angle alpha +- beta (alpha: direction of p from the
      // centre, cos beta = r / d) runs along -h f +- r f_perp (h = sqrt(d^2 - r^2), length d^2):
      // no trigonometry, and (d - r)(d + r) keeps h accurate near the rim.
      const h = Math.sqrt((d - r) * (d + r));
      const u0x = -h * fx - r * fy,
        u0y = -h * fy + r * fx,
        u1x = -h * fx + r * fy,
        u1y = -h * fy - r * fx;
      const c0 = u0x * nx + u0y * ny,
        s0 = u0x * tx + u0y * ty,
        c1 = u1x * nx + u1y * ny,
        s1 = u1x * tx + u1y * ty;
      if (c0 > 0 && (!blocker || cone.toward(u0x, u0y))) this.push(s0 / c0, nP + 2 * x);
      if (c1 > 0 && (!blocker || cone.toward(u1x, u1y))) this.push(s1 / c1, nP + 2 * x + 1);
      if (blocker) near.add(k, r, d, c0, s0, c1, s1);
    }
    const m = this.m,
      key = this.key,
      id = this.id,
      order = this.order;
    // Equal keys keep the order they were found in. A few directions are sorted afresh;
    // many, from the last piece's order (coherentOrder.ts; the same order either way).
    if (m < SORT_FROM_LAST) sortIndexByKey(order, key, m);
    else this.sorter.sort(order, key, id, m, nP + 2 * T.length);
    near.begin();
    // Sweep the elementary intervals; one ray each decides what is seen first there.
    let total = 0;
    let runLo = 0,
      inRun = false;
    let prevB = -Infinity,
      prevId = HORIZON_LO;
    // Unit direction of the last bounding direction in (n, t) terms: the horizon at b = -pi/2 first.
    let prevC = 0,
      prevS = -1;
    for (let q = 0; q <= m; q++) {
      const b = q < m ? key[order[q]] : Infinity;
      const bid = q < m ? id[order[q]] : HORIZON_HI;
      if (b > prevB) {
        // cos b and sin b from tan b, without overflow for steep directions.
        let cb: number, sb: number;
        if (b === Infinity) {
          cb = 0;
          sb = 1;
        } else if (Math.abs(b) <= 1) {
          cb = 1 / Math.sqrt(1 + b * b);
          sb = b * cb;
        } else {
          const inv = 1 / b;
          sb = Math.sign(b) / Math.sqrt(1 + inv * inv);
          cb = Math.abs(inv * sb);
        }
        // The ray halfway in angle: the sum of the two unit directions (less than a half turn apart).
        let mc = prevC + cb,
          ms = prevS + sb;
        const len = Math.sqrt(mc * mc + ms * ms);
        if (len > 0) {
          mc /= len;
          ms /= len;
        } else {
          mc = 1; // horizon to horizon: the normal
          ms = 0;
        }
        near.advance(ms / mc); // mc > 0: the ray is in front
        const seen = this.seesTarget(pmx, pmy, mc * nx + ms * tx, mc * ny + ms * ty);
        if (seen && !inRun) {
          inRun = true;
          runLo = prevId;
        } else if (!seen && inRun) {
          inRun = false;
          total += this.delta(prevId, nP) - this.delta(runLo, nP);
        }
        prevB = b;
        prevC = cb;
        prevS = sb;
      }
      prevId = bid;
    }
    if (inRun) total += this.delta(HORIZON_HI, nP) - this.delta(runLo, nP);
    return 0.5 * total;
  }

  /** Adds a bounding direction: tan b of object `obj`. */
  private push(b: number, obj: number): void {
    if (this.m === this.key.length) {
      const size = 2 * this.m;
      const key = new Float64Array(size),
        id = new Int32Array(size);
      key.set(this.key);
      id.set(this.id);
      this.key = key;
      this.id = id;
      this.order = new Int32Array(size);
    }
    this.key[this.m] = b;
    this.id[this.m++] = obj;
  }

  /**
   * Change over the piece of F, the antiderivative of sin b along the emitter towards
   * object `obj`: -|v - p| for a point, minus the taut-string length for a tangent,
   * +-s at the horizon. Sketch units.
   */
  private delta(obj: number, nP: number): number {
    const Q = this.query;
    const pax = Q[0],
      pay = Q[1],
      pbx = Q[2],
      pby = Q[3],
      ds = Q[10];
    if (obj === HORIZON_HI) return ds;
    if (obj === HORIZON_LO) return -ds;
    const dx = pbx - pax,
      dy = pby - pay;
    if (obj < nP) {
      const P = this.scene.pts;
      return -distanceChange(P[2 * obj], P[2 * obj + 1], pax, pay, pbx, pby, dx, dy);
    }
    const x = (obj - nP) >> 1;
    const sigma = (obj - nP) & 1 ? -1 : 1;
    const A = this.A,
      k = this.tanCircles[x];
    const cx = A.cx[k],
      cy = A.cy[k],
      r = A.r[k];
    const fax = pax - cx,
      fay = pay - cy,
      fbx = pbx - cx,
      fby = pby - cy;
    const da = Math.sqrt(fax * fax + fay * fay),
      db = Math.sqrt(fbx * fbx + fby * fby);
    const ta = Math.sqrt((da - r) * (da + r)),
      tb = Math.sqrt((db - r) * (db + r));
    // Turn of p about the centre along the piece; an arc piece that passes on the far
    // side of the centre (centre between its chord and the arc) turns the other way round.
    let dAlpha = Math.atan2(fax * fby - fay * fbx, fax * fbx + fay * fby);
    if (this.em.isArc && this.centreInsideSegment(cx, cy, pax, pay, pbx, pby))
      dAlpha -= 2 * Math.PI * Math.sign(dAlpha);
    const dBeta = Math.atan2(tb, r) - Math.atan2(ta, r);
    // Taut string from p touching at alpha + sigma beta, then wrapped anticlockwise
    // (sigma = +1) or clockwise (sigma = -1) to a fixed point: dS = dt - sigma r d(alpha + sigma beta).
    const dS = tb - ta - sigma * r * dAlpha - r * dBeta;
    return -dS;
  }

  /** Is (cx, cy) strictly between the chord pa-pb of the emitter arc and the arc itself? */
  private centreInsideSegment(cx: number, cy: number, pax: number, pay: number, pbx: number, pby: number): boolean {
    const em = this.em;
    if ((cx - em.cx) ** 2 + (cy - em.cy) ** 2 >= em.r * em.r) return false;
    // The arc lies on the side of the chord away from the emitter's centre (pieces span < pi).
    const side = (pbx - pax) * (cy - pay) - (pby - pay) * (cx - pax);
    const centreSide = (pbx - pax) * (em.cy - pay) - (pby - pay) * (em.cx - pax);
    return side * centreSide < 0;
  }

  /** Does the ray from (px, py) along the unit direction (dx, dy) reach the target before any blocker? */
  private seesTarget(px: number, py: number, dx: number, dy: number): boolean {
    const tg = this.tg,
      A = this.A;
    let tT: number;
    if (!tg.isArc) {
      tT = raySegment(px, py, dx, dy, tg.ax, tg.ay, tg.bx, tg.by);
    } else {
      const k = tg.circle;
      const fx = px - A.cx[k],
        fy = py - A.cy[k];
      const b = fx * dx + fy * dy;
      const disc = b * b - (fx * fx + fy * fy - A.r[k] * A.r[k]);
      if (!(disc > 0)) return false;
      const h = Math.sqrt(disc);
      tT = tg.solid ? -b - h : -b + h;
      if (!(tT > 0)) return false;
      if (!tg.holdsAngle(Math.atan2(fy + tT * dy, fx + tT * dx))) return false;
    }
    if (!(tT < Infinity)) return false;
    const S = this.scene.seg;
    for (let k = 0; k < S.length; k += 4) {
      if (raySegment(px, py, dx, dy, S[k], S[k + 1], S[k + 2], S[k + 3]) < tT) return false;
    }
    const near = this.near,
      active = near.active,
      circle = near.circle;
    for (let q = 0; q < near.activeCount; q++) {
      const k = circle[active[q]];
      const fx = px - A.cx[k],
        fy = py - A.cy[k];
      const b = fx * dx + fy * dy;
      if (b >= 0) continue;
      const disc = b * b - (fx * fx + fy * fy - A.r[k] * A.r[k]);
      if (disc > 0 && -b - Math.sqrt(disc) < tT) return false;
    }
    return true;
  }
}

/** Distance along the ray p + t d (t > 0) to segment a-b, or Infinity. */
function raySegment(
  px: number,
  py: number,
  dx: number,
  dy: number,
  ax: number,
  ay: number,
  bx: number,
  by: number,
): number {
  const ex = bx - ax,
    ey = by - ay;
  const den = dx * ey - dy * ex;
  if (den === 0) return Infinity;
  const wx = ax - px,
    wy = ay - py;
  const t = (wx * ey - wy * ex) / den;
  const u = (wx * dy - wy * dx) / den;
  return t > 0 && u >= 0 && u <= 1 ? t : Infinity;
}
