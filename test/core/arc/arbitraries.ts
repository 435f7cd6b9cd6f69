import fc from 'fast-check';
import type { CircleInput, PolygonInput } from '../../../src/core/scene';

export interface MixedScene {
  polygons: PolygonInput[];
  circles: CircleInput[];
}

/**
 * Random valid sketches mixing exact circles and polygons: a 10 x 10 duct with a
 * re-entrant pocket in its top wall, or a circular shell of radius 5, holding up to
 * five bodies kept apart by their bounding circles (gaps down to 1e-6): tubes split
 * into 1-4 arcs, regular polygons, and L-shaped (non-convex) bars.
 */
export const mixedSceneArb: fc.Arbitrary<MixedScene> = fc
  .record({
    shell: fc.boolean(),
    shellArcs: fc.integer({ min: 1, max: 4 }),
    bodies: fc.array(
      fc.record({
        x: fc.double({ min: 0.5, max: 9.5, noNaN: true }),
        y: fc.double({ min: 0.5, max: 9.5, noNaN: true }),
        r: fc.double({ min: 0.2, max: 1.5, noNaN: true }),
        kind: fc.constantFrom('tube', 'polygon', 'bar'),
        arcs: fc.integer({ min: 1, max: 4 }),
        sides: fc.integer({ min: 3, max: 8 }),
        turn: fc.double({ min: 0, max: 6.28, noNaN: true }),
        gap: fc.constantFrom(0.05, 1e-3, 1e-6),
      }),
      { minLength: 1, maxLength: 5 },
    ),
  })
  .map(({ shell, shellArcs, bodies }) => {
    const polygons: PolygonInput[] = [];
    const circles: CircleInput[] = [];
    if (shell) circles.push({ kind: 'enclosure', cx: 5, cy: 5, radius: 5, arcs: shellArcs });
    else polygons.push({ kind: 'enclosure', points: [0, 0, 10, 0, 10, 10, 6, 10, 6, 7, 4, 7, 4, 10, 0, 10] });
    const kept: { x: number; y: number; r: number }[] = [];
    for (const b of bodies) {
      const inside = shell
        ? Math.hypot(b.x - 5, b.y - 5) + b.r < 5 - b.gap
        : b.x - b.r > b.gap &&
          b.x + b.r < 10 - b.gap &&
          b.y - b.r > b.gap &&
          b.y + b.r < 10 - b.gap &&
          !(b.x + b.r > 4 - b.gap && b.x - b.r < 6 + b.gap && b.y + b.r > 7 - b.gap);
      if (!inside || kept.some((k) => Math.hypot(k.x - b.x, k.y - b.y) < k.r + b.r + b.gap)) continue;
      kept.push(b);
      if (b.kind === 'tube') circles.push({ kind: 'solid', cx: b.x, cy: b.y, radius: b.r, arcs: b.arcs });
      else if (b.kind === 'polygon') {
        const pts: number[] = [];
        for (let k = 0; k < b.sides; k++) {
          const a = b.turn + (2 * Math.PI * k) / b.sides;
          pts.push(b.x + b.r * Math.cos(a), b.y + b.r * Math.sin(a));
        }
        polygons.push({ kind: 'solid', points: pts });
      } else {
        const h = (0.99 * b.r) / Math.SQRT2; // corners inside the bounding circle
        const { x, y } = b;
        polygons.push({
          kind: 'solid',
          points: [
            x - h,
            y - h,
            x + h,
            y - h,
            x + h,
            y + h,
            x + 0.4 * h,
            y + h,
            x + 0.4 * h,
            y - 0.3 * h,
            x - h,
            y - 0.3 * h,
          ],
        });
      }
    }
    return { polygons, circles };
  });

/** Number of edges (polygon edges, then arcs). */
export function edgeCountOf(s: MixedScene): number {
  return s.polygons.reduce((n, p) => n + p.points.length / 2, 0) + s.circles.reduce((n, c) => n + c.arcs, 0);
}
