import type { ArcSet } from './arcs';
import type { Curve } from './curve';
import type { DiscShadow } from './discShadow';
import type { PairScene } from './pairScene';

// Blocking circles that a circle nearer the emitter hides from all of it (discShadow.ts)
// are left out of a pair's scene: along any sight line that meets such a circle the
// nearer one is met first, so it never bounds what is seen, and its tangents would
// only cut the emitter where nothing changes (a piece split there integrates to the
// same sum, to rounding). Hiding is transitive, so a circle hidden by one that is left
// out itself is hidden by a kept one. In a tube row the neighbour hides every tube
// beyond it, so a wall's view of a tube past the row no longer carries them all.

/** How many of the circles nearest the emitter are tried as hiders of the others. */
const HIDERS = 3;

export class HiddenCircles {
  /** The circles nearest the emitter, nearest first, and their gaps from its centre (sketch units). */
  private readonly near = new Int32Array(HIDERS);
  private readonly gap = new Float64Array(HIDERS);

  /**
   * Remove from `scene.circles` (and its tangent circles) every circle that one of the
   * HIDERS circles nearest the emitter hides from the whole emitter `em`.
   */
  drop(scene: PairScene, A: ArcSet, em: Curve, tg: Curve, shadow: DiscShadow): void {
    const circles = scene.circles;
    const kept = this.keepSeen(circles, A, em, shadow);
    if (kept === circles.length) return;
    circles.length = kept;
    // The tangent circles are the blockers, then the target's own circle if it is a solid.
    scene.tangentCircles.length = 0;
    for (let k = 0; k < kept; k++) scene.tangentCircles.push(circles[k]);
    if (tg.isArc && tg.solid) scene.tangentCircles.push(tg.circle);
  }

  /**
   * Move to the front of `circles` those that none of the HIDERS circles nearest the
   * curve `from` hides from all of it, in their order; returns how many (the rest are
   * left behind them, to be cut off by the caller).
   */
  keepSeen(circles: number[], A: ArcSet, from: Curve, shadow: DiscShadow): number {
    const em = from,
      n = circles.length;
    if (n < 3) return n;
    const ex = em.isArc ? em.cx : 0.5 * (em.ax + em.bx),
      ey = em.isArc ? em.cy : 0.5 * (em.ay + em.by);
    const near = this.near,
      gaps = this.gap;
    // Keep the nearest few by insertion, by the gap between the emitter's centre and the circle.
    let m = 0;
    for (let k = 0; k < n; k++) {
      const c = circles[k];
      const gap = Math.sqrt((A.cx[c] - ex) ** 2 + (A.cy[c] - ey) ** 2) - A.r[c];
      if (m === HIDERS && gap >= gaps[HIDERS - 1]) continue;
      let at = Math.min(m, HIDERS - 1);
      while (at > 0 && gaps[at - 1] > gap) {
        near[at] = near[at - 1];
        gaps[at] = gaps[at - 1];
        at--;
      }
      near[at] = c;
      gaps[at] = gap;
      if (m < HIDERS) m++;
    }
    let kept = 0;
    for (let k = 0; k < n; k++) {
      const d = circles[k];
      let hidden = false;
      for (let h = 0; h < m && !hidden; h++) {
        const a = near[h];
        hidden = a !== d && shadow.hidesDisc(em, A.cx[d], A.cy[d], A.r[d], A.cx[a], A.cy[a], A.r[a]);
      }
      if (!hidden) circles[kept++] = d;
    }
    return kept;
  }
}
