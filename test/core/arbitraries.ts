import fc from 'fast-check';
import type { Poly } from './helpers';

/**
 * Random valid sketches: a star-shaped (often non-convex) enclosure around the
 * origin whose edges stay farther than 1.8 from it, holding up to three bodies in
 * the disc of radius 1.5: regular polygons (tubes, bars) and five-pointed stars
 * (non-convex), kept apart by their bounding circles.
 */
export const sketchArb: fc.Arbitrary<Poly[]> = fc
  .record({
    gaps: fc.array(fc.double({ min: 1, max: 2, noNaN: true }), { minLength: 6, maxLength: 11 }),
    radii: fc.array(fc.double({ min: 3, max: 5, noNaN: true }), { minLength: 11, maxLength: 11 }),
    phase: fc.double({ min: 0, max: 6.28, noNaN: true }),
    bodies: fc.array(
      fc.record({
        cx: fc.double({ min: -1, max: 1, noNaN: true }),
        cy: fc.double({ min: -1, max: 1, noNaN: true }),
        r: fc.double({ min: 0.08, max: 0.45, noNaN: true }),
        sides: fc.integer({ min: 3, max: 9 }),
        star: fc.boolean(),
        turn: fc.double({ min: 0, max: 6.28, noNaN: true }),
      }),
      { maxLength: 3 },
    ),
  })
  .map(({ gaps, radii, phase, bodies }) => {
    const total = gaps.reduce((a, b) => a + b, 0);
    let angle = phase;
    // Gaps of at most 2/7 of a turn keep every chord at least 3 cos(0.9) > 1.8 from the origin.
    const wall = gaps.map((g, k) => {
      const p = [radii[k] * Math.cos(angle), radii[k] * Math.sin(angle)];
      angle += (2 * Math.PI * g) / total;
      return p;
    });
    const polys: Poly[] = [{ kind: 'enclosure', points: wall }];
    const kept: { cx: number; cy: number; r: number }[] = [];
    for (const b of bodies) {
      if (Math.hypot(b.cx, b.cy) + b.r > 1.5) continue;
      if (kept.some((k) => Math.hypot(k.cx - b.cx, k.cy - b.cy) < k.r + b.r + 0.02)) continue;
      kept.push(b);
      const n = b.star ? 10 : b.sides;
      polys.push({
        kind: 'solid',
        points: Array.from({ length: n }, (_, k) => {
          const rad = b.star && k % 2 === 1 ? 0.45 * b.r : b.r;
          const a = b.turn + (2 * Math.PI * k) / n;
          return [b.cx + rad * Math.cos(a), b.cy + rad * Math.sin(a)];
        }),
      });
    }
    return polys;
  });

/**
 * Sketches on an integer grid: a 10 x 6 duct whose walls are split at every unit,
 * holding non-touching rectangular bars. Grid points make exact degeneracies common:
 * collinear edges, corners in line with corners, bars level with wall corners.
 */
export const gridSketchArb: fc.Arbitrary<Poly[]> = fc
  .array(
    fc.record({
      x: fc.integer({ min: 1, max: 8 }),
      y: fc.integer({ min: 1, max: 4 }),
      w: fc.integer({ min: 1, max: 2 }),
      h: fc.integer({ min: 1, max: 2 }),
    }),
    { maxLength: 5 },
  )
  .map((bars) => {
    const wall: number[][] = [];
    for (let x = 0; x < 10; x++) wall.push([x, 0]);
    for (let y = 0; y < 6; y++) wall.push([10, y]);
    for (let x = 10; x > 0; x--) wall.push([x, 6]);
    for (let y = 6; y > 0; y--) wall.push([0, y]);
    const polys: Poly[] = [{ kind: 'enclosure', points: wall }];
    const kept: typeof bars = [];
    for (const b of bars) {
      if (b.x + b.w > 9 || b.y + b.h > 5) continue;
      if (kept.some((k) => b.x <= k.x + k.w && k.x <= b.x + b.w && b.y <= k.y + k.h && k.y <= b.y + b.h)) continue;
      kept.push(b);
      polys.push({
        kind: 'solid',
        points: [
          [b.x, b.y],
          [b.x + b.w, b.y],
          [b.x + b.w, b.y + b.h],
          [b.x, b.y + b.h],
        ],
      });
    }
    return polys;
  });
