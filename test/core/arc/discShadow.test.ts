import { describe, expect, it } from 'vitest';
import type { Curve } from '../../../src/core/arc/curve';
import { DiscShadow } from '../../../src/core/arc/discShadow';
import { seeded } from '../seeded';
import { arc, segment } from './curves';

// The one-circle shadow test (src/core/arc/discShadow.ts) against sight lines cast
// one by one: whenever it says a disc hides the target, every sampled line from the
// emitter to the target must meet the disc. Plain geometry (distance from a point to
// a segment), sharing no code with the core.

/** Point at fraction s of a curve (along the segment, or the arc's angle). */
function pointOn(c: Curve, s: number): [number, number] {
  if (!c.isArc) return [c.ax + s * (c.bx - c.ax), c.ay + s * (c.by - c.ay)];
  const t = c.start + s * c.span;
  return [c.cx + c.r * Math.cos(t), c.cy + c.r * Math.sin(t)];
}

/** Distance from (cx, cy) to the segment p-q. */
function distanceToSegment(cx: number, cy: number, px: number, py: number, qx: number, qy: number): number {
  const dx = qx - px,
    dy = qy - py;
  const t = Math.max(0, Math.min(1, ((cx - px) * dx + (cy - py) * dy) / (dx * dx + dy * dy)));
  return Math.hypot(cx - (px + t * dx), cy - (py + t * dy));
}

/** The clearest sampled sight line: the largest (distance from the disc's centre - r) / r, over n x n lines. */
function clearest(em: Curve, tg: Curve, disc: [number, number, number], n: number): number {
  const [cx, cy, r] = disc;
  let best = -Infinity;
  for (let a = 0; a <= n; a++) {
    const [px, py] = pointOn(em, a / n);
    for (let b = 0; b <= n; b++) {
      // A disc target is sampled all round: a line to its far side passes its near side.
      const [qx, qy] = tg.isArc ? pointOn(arc(tg.cx, tg.cy, tg.r, 0, 2 * Math.PI), b / n) : pointOn(tg, b / n);
      best = Math.max(best, (distanceToSegment(cx, cy, px, py, qx, qy) - r) / r);
    }
  }
  return best;
}

const shadow = new DiscShadow(1e-13 * 20);

describe('one circle hiding a target from an emitter (discShadow)', () => {
  it('a tube row: each tube hides the tubes beyond it from the one before it, grazing lines and all', () => {
    // Tubes of radius 0.06 at a pitch of 0.24 on y = 3.8 (as in the bench's furnace).
    const tube = (k: number) => arc(0.12 + 0.24 * k, 3.8, 0.06, 0, 2 * Math.PI);
    for (const m of [2, 3, 10, 40]) {
      expect(shadow.hides(tube(0), tube(m), 0.12 + 0.24, 3.8, 0.06)).toBe(true);
      expect(shadow.hides(tube(0), tube(m), 0.12 + 0.24 * (m - 1), 3.8, 0.06)).toBe(true);
    }
    // Lifted by a tenth of a radius, the blocker leaves a gap below it.
    expect(shadow.hides(tube(0), tube(2), 0.36, 3.806, 0.06)).toBe(false);
    // A wall segment under the row sees past the tubes: not hidden.
    expect(shadow.hides(segment(0, 0, 12, 0), tube(5), 0.12 + 0.24 * 4, 3.8, 0.06)).toBe(false);
  });

  it('a disc between a segment and a point-like segment target: hidden exactly when both ends are in its umbra', () => {
    const em = segment(-3, 0.5, -3, -0.5); // radiates to the left of a -> b: towards +x
    expect(shadow.hides(em, segment(3, -0.1, 3, 0.1), 0, 0, 1)).toBe(true);
    expect(clearest(em, segment(3, -0.1, 3, 0.1), [0, 0, 1], 60)).toBeLessThan(0);
    // Target end beyond the umbra's edge: some line passes above the disc.
    expect(shadow.hides(em, segment(3, -0.1, 3, 2), 0, 0, 1)).toBe(false);
    expect(clearest(em, segment(3, -0.1, 3, 2), [0, 0, 1], 60)).toBeGreaterThan(0);
  });

  it('never says hidden when a sampled sight line clears the disc (3000 seeded scenes)', () => {
    const rand = seeded(20261204);
    let hidden = 0;
    for (let trial = 0; trial < 3000; trial++) {
      const r = 0.2 + rand();
      const disc: [number, number, number] = [0, 0, r];
      // Mostly the emitter on the left and the target on the right; else anywhere
      // clear of the disc, the target too (between the disc and the target, say).
      const across = trial % 3 !== 0;
      const ex = across ? -(r + 0.2 + 3 * rand()) : 8 * rand() - 4,
        ey = across ? 2 * rand() - 1 : 4 * rand() - 2;
      const tx = across ? r + 0.2 + 3 * rand() : 8 * rand() - 4,
        ty = across ? 2 * rand() - 1 : 4 * rand() - 2;
      if (!across && (Math.hypot(ex, ey) < r + 1.8 || Math.hypot(tx, ty) < r + 1.8)) continue;
      let em: Curve;
      if (rand() < 0.5) {
        const h = 0.05 + 1.5 * rand();
        em = segment(ex, ey + h / 2, ex, ey - h / 2);
      } else {
        const rho = 0.05 + 0.8 * rand();
        em = arc(ex - (across ? rho : 0), ey, rho, 2 * Math.PI * rand(), 0.2 + (2 * Math.PI - 0.2) * rand());
      }
      let tg: Curve;
      if (rand() < 0.5) {
        const h = 0.05 + 1.5 * rand();
        tg = segment(tx, ty - h / 2, tx, ty + h / 2);
      } else {
        const rho = 0.05 + 0.8 * rand();
        tg = arc(tx + (across ? rho : 0), ty, rho, 2 * Math.PI * rand(), 0.5);
      }
      if (!shadow.hides(em, tg, ...disc)) continue;
      hidden++;
      // Lines may graze the disc (to rounding), never pass it by a clear margin.
      expect(clearest(em, tg, disc, 24)).toBeLessThan(1e-9);
    }
    // The check is not vacuous: many scenes are hidden.
    expect(hidden).toBeGreaterThan(150);
  });

  it('a target on a concave (enclosure) arc is never taken as hidden', () => {
    const em = segment(-3, 0.5, -3, -0.5);
    expect(shadow.hides(em, arc(3.5, 0, 0.2, 0, 1, false), 0, 0, 1)).toBe(false);
  });
});
