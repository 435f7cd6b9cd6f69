import { sortOrderByKey as sortOrderByKeyIn } from '../scratch';
import type { FixedPoints } from './fixedPoints';

// Module-local copies of hot imports: under the CommonJS transform that tsx (bench, CLI)
// applies, every read of an imported binding is a getter call, measured at ~10% of hard scenes.
const sortOrderByKey = sortOrderByKeyIn;

// Which part of the target j' a piece of the emitting edge sees. Directions from a
// point p are keyed by a pseudo-angle that rises with b (b from i's normal, increasing
// towards a1; see directionKey). From p in the middle of a piece, j' covers the key
// range [key(b1), key(b0)] and each chain covers [min, max] of its points' keys; the
// gaps of j's range left uncovered by the chains are what p sees. Inside one piece the
// same fixed points bound the same gaps, so the gaps found at the middle hold all along.

export class VisibleGaps {
  /** Gap g is the direction range from fixed point lo[g] (low end) to hi[g] (high end). */
  lo = new Int32Array(32);
  hi = new Int32Array(32);
  count = 0;
  // Blocked intervals, one per chain that overlaps j's range.
  private loKey = new Float64Array(32);
  private hiKey = new Float64Array(32);
  private loPt = new Int32Array(32);
  private hiPt = new Int32Array(32);
  private order = new Int32Array(32);
  /** The chain that spanned j's whole range at the last piece of this pair (-1: none). */
  private coverHint = -1;

  /**
   * Find the gaps seen from point p = (Q[0], Q[1]) (sketch units) on i, whose unit
   * direction is (Q[2], Q[3]), after prepare(points) for this pair. Fixed points 0 and
   * 1 are j's ends b0 (high end) and b1 (low end).
   */
  find(points: FixedPoints, Q: Float64Array): void {
    const px = Q[0],
      py = Q[1],
      tx = Q[2],
      ty = Q[3];
    const X = points.x,
      Y = points.y;
    const nChains = points.chainCount,
      start = points.chainStart;
    this.count = 0;
    const jHi = directionKey(X[0] - px, Y[0] - py, tx, ty),
      jLo = directionKey(X[1] - px, Y[1] - py, tx, ty);
    if (!(jHi > jLo)) return;
    // Most pieces see nothing, most often because one chain spans j's whole range:
    // try the chain that did so on the previous piece first. Leaving early when a
    // chain spans it gives the same (empty) answer as the sweep below, so the hint
    // changes no result.
    const hint = this.coverHint;
    // The hint chain's extremes, kept for the sweep when it does not cover j.
    let hintLo = Infinity,
      hintHi = -Infinity,
      hintLoP = -1,
      hintHiP = -1;
    if (hint >= 0 && hint < nChains) {
      for (let k = start[hint]; k < start[hint + 1]; k++) {
        const kk = directionKey(X[k] - px, Y[k] - py, tx, ty);
        if (kk < hintLo) {
          hintLo = kk;
          hintLoP = k;
        }
        if (kk > hintHi) {
          hintHi = kk;
          hintHiP = k;
        }
      }
      if (hintLo <= jLo && hintHi >= jHi) return;
    }
    const loKey = this.loKey,
      hiKey = this.hiKey,
      loPt = this.loPt,
      hiPt = this.hiPt,
      order = this.order;
    let nIv = 0;
    for (let g = 0; g < nChains; g++) {
      const from = start[g],
        to = start[g + 1];
      let lo = Infinity,
        hi = -Infinity,
        loP = -1,
        hiP = -1;
      if (g === hint) {
        lo = hintLo;
        hi = hintHi;
        loP = hintLoP;
        hiP = hintHiP;
      } else {
        for (let k = from; k < to; k++) {
          const kk = directionKey(X[k] - px, Y[k] - py, tx, ty);
          if (kk < lo) {
            lo = kk;
            loP = k;
          }
          if (kk > hi) {
            hi = kk;
            hiP = k;
          }
        }
      }
      if (hi <= jLo || lo >= jHi) continue;
      if (lo <= jLo && hi >= jHi) {
        this.coverHint = g; // this chain alone blocks all of j
        return;
      }
      if (lo < jLo) {
        lo = jLo;
        loP = 1;
      }
      if (hi > jHi) {
        hi = jHi;
        hiP = 0;
      }
      loKey[nIv] = lo;
      hiKey[nIv] = hi;
      loPt[nIv] = loP;
      hiPt[nIv] = hiP;
      order[nIv] = nIv;
      nIv++;
    }
    sortOrderByKey(order, loKey, nIv);
    // Sweep the blocked intervals from j's low end; what they leave uncovered is seen.
    let cur = jLo,
      curP = 1;
    for (let n = 0; n < nIv; n++) {
      const o = order[n];
      if (loKey[o] > cur) this.push(curP, loPt[o]);
      if (hiKey[o] > cur) {
        cur = hiKey[o];
        curP = hiPt[o];
      }
    }
    if (cur < jHi) this.push(curP, 0);
  }

  /** Make room for the fixed points and chains of the current pair (call once per pair, before find). */
  prepare(points: FixedPoints): void {
    this.coverHint = -1;
    if (this.loKey.length < points.chainCount) this.growChains(points.chainCount);
  }

  private push(lo: number, hi: number): void {
    const g = this.count;
    if (g === this.lo.length) {
      const lo2 = new Int32Array(2 * g),
        hi2 = new Int32Array(2 * g);
      lo2.set(this.lo);
      hi2.set(this.hi);
      this.lo = lo2;
      this.hi = hi2;
    }
    this.lo[g] = lo;
    this.hi[g] = hi;
    this.count = g + 1;
  }

  private growChains(n: number): void {
    const size = Math.max(n, 2 * this.loKey.length);
    this.loKey = new Float64Array(size);
    this.hiKey = new Float64Array(size);
    this.loPt = new Int32Array(size);
    this.hiPt = new Int32Array(size);
    this.order = new Int32Array(size);
  }
}

/**
 * The gap sweep's key of direction (vx, vy) (sketch units) against i's unit direction
 * (tx, ty): u / (|u| + |w|), u and w its components along i and along i's front
 * normal. It rises with b from -1 (along -t) to 1 (along t) like sin b, with no square
 * root, and it keeps its resolution near grazing, where sin b flattens out. Directions
 * behind i's line (only rounding puts a fixed point there) mirror to the front.
 */
function directionKey(vx: number, vy: number, tx: number, ty: number): number {
  const u = vx * tx + vy * ty,
    w = vy * tx - vx * ty;
  return u / (Math.abs(u) + Math.abs(w));
}
