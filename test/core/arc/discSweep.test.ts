// The circles of a piece are swept by the directions they cover, and a ray is tested
// only against those whose range holds it (arc/discSweep.ts). That must never skip a
// circle the ray's own disc test (written here again in plain arithmetic) finds on
// the ray: rays are taken at random, on each circle's tangents and a hair (1e-15 and
// 1e-12 rad) inside and outside them, where only the ranges' margin keeps them (the
// test fails with no margin, or with ranges narrowed by it). Tangent directions are
// built here with trigonometry (touching points at alpha +- acos(r / d)), not with
// the core's formula.
import { describe, expect, it } from 'vitest';
import { DiscSweep } from '../../../src/core/arc/discSweep';
import { seeded } from '../seeded';

interface Disc {
  cx: number;
  cy: number;
  r: number;
}

/** Does the ray from the origin along angle b (from the normal +y, towards the tangent +x) meet the disc ahead? */
function rayMeets(c: Disc, b: number): boolean {
  const dx = Math.sin(b),
    dy = Math.cos(b);
  const along = c.cx * dx + c.cy * dy;
  if (along <= 0) return false;
  const across = c.cx * dy - c.cy * dx;
  return Math.abs(across) < c.r;
}

/** Angles b of the two tangents from the origin (b = atan2(u . t, u . n) with n = +y, t = +x). */
function tangentAngles(c: Disc): [number, number] {
  const d = Math.hypot(c.cx, c.cy);
  const alpha = Math.atan2(-c.cy, -c.cx); // direction of the origin from the centre
  const beta = Math.acos(c.r / d);
  return [alpha + beta, alpha - beta].map((th) => {
    const ux = c.cx + c.r * Math.cos(th),
      uy = c.cy + c.r * Math.sin(th);
    return Math.atan2(ux, uy);
  }) as [number, number];
}

function addAll(sweep: DiscSweep, discs: Disc[]): void {
  sweep.reset();
  discs.forEach((c, k) => {
    const d = Math.hypot(c.cx, c.cy);
    const [b0, b1] = tangentAngles(c);
    // Tangent directions as (u . n, u . t) of length d^2, as the caller gives them.
    const L = (d - c.r) * (d + c.r);
    sweep.add(k, c.r, d, L * Math.cos(b0), L * Math.sin(b0), L * Math.cos(b1), L * Math.sin(b1));
  });
  sweep.begin();
}

function activeCircles(sweep: DiscSweep): Set<number> {
  const out = new Set<number>();
  for (let q = 0; q < sweep.activeCount; q++) out.add(sweep.circle[sweep.active[q]]);
  return out;
}

describe('circles swept by direction', () => {
  it('no ray meets a circle that is not active for it; most rays skip most circles', () => {
    const rand = seeded(77);
    let rays = 0,
      skipped = 0,
      offered = 0,
      hairs = 0;
    for (let scene = 0; scene < 60; scene++) {
      const discs: Disc[] = [];
      for (let k = 0; k < 30; k++) {
        // Mostly in front, some across the horizon or behind, a few tiny or far.
        const r = rand() < 0.1 ? 1e-8 : 0.02 + 0.3 * rand();
        const a = (rand() * 2 - 0.4) * Math.PI,
          dist = r * (1.0000001 + 40 * rand());
        discs.push({ cx: dist * Math.cos(a), cy: dist * Math.sin(a), r });
      }
      const sweep = new DiscSweep();
      addAll(sweep, discs);
      // Rays: random, and a hair either side of every tangent in front, in increasing angle.
      const angles: number[] = [];
      const hair = new Set<number>();
      for (let q = 0; q < 200; q++) angles.push((rand() - 0.5) * Math.PI * 0.999);
      for (const c of discs)
        for (const b of tangentAngles(c))
          for (const e of [-1e-12, -1e-15, 0, 1e-15, 1e-12])
            if (Math.abs(b + e) < Math.PI / 2 - 1e-9) {
              angles.push(b + e);
              hair.add(b + e);
            }
      angles.sort((x, y) => x - y);
      for (const b of angles) {
        sweep.advance(Math.tan(b));
        const active = activeCircles(sweep);
        rays++;
        offered += discs.length;
        skipped += discs.length - active.size;
        discs.forEach((c, k) => {
          if (!rayMeets(c, b)) return;
          if (hair.has(b)) hairs++;
          expect(active.has(k), `scene ${scene}, ray at ${b}, circle ${k}`).toBe(true);
        });
      }
    }
    expect(rays).toBeGreaterThan(10000);
    expect(hairs).toBeGreaterThan(1000);
    // The sweep is worth having: many circles are left out of a ray (here 0.43 of them).
    expect(skipped / offered).toBeGreaterThan(0.3);
  });

  it('a circle across the horizon, or too small to place, is tested by every ray', () => {
    const sweep = new DiscSweep();
    addAll(sweep, [
      { cx: 1, cy: 0.05, r: 0.2 }, // across the horizon on the +t side
      { cx: 3, cy: 4, r: 1e-7 }, // radius under 1e-6 of its distance
    ]);
    for (const b of [-1.5, -0.5, 0, 0.5, 1.5]) {
      sweep.advance(Math.tan(b));
      expect(activeCircles(sweep)).toEqual(new Set([0, 1]));
    }
  });
});
