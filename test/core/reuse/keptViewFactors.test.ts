// A study's cases one after another (core reuse/keptViewFactors.ts): each case keeps
// the pairs its moved shapes cannot change since the case before, and its surface
// factors must be the very bits computeViewFactors gives that case on its own.
import { describe, expect, it } from 'vitest';
import { KeptViewFactors } from '../../../src/core/reuse/keptViewFactors';
import type { SceneInput, ViewFactorResult } from '../../../src/core/scene';
import { computeViewFactors } from '../../../src/core/viewFactors';
import { furnaceScene, tubeScene } from '../../bench/scenes';

/** The first entry whose bits differ (so -0 and 0 count as different), or -1; a loop, as a deep equality of 20 000 numbers takes seconds. */
function firstDifference(a: Float64Array, b: Float64Array): number {
  if (a.length !== b.length) return 0;
  for (let k = 0; k < a.length; k++) if (!Object.is(a[k], b[k])) return k;
  return -1;
}

function expectSameBits(got: ViewFactorResult, want: ViewFactorResult): void {
  expect(firstDifference(got.F, want.F)).toBe(-1);
  expect(firstDifference(got.rowSumResidual, want.rowSumResidual)).toBe(-1);
  expect(firstDifference(got.surfaceLength, want.surfaceLength)).toBe(-1);
  expect(got.reciprocityResidual).toBe(want.reciprocityResidual);
  expect(got.closed).toBe(want.closed);
}

/** `scene` with polygon `p` moved by (dx, dy). */
function movedPolygon(scene: SceneInput, p: number, dx: number, dy: number): SceneInput {
  const polygons = scene.polygons.map((poly, k) =>
    k !== p ? poly : { ...poly, points: Array.from(poly.points, (v, q) => v + (q % 2 === 0 ? dx : dy)) },
  );
  return { ...scene, polygons };
}

/** `scene` with circle `c` moved by dx. */
function movedCircle(scene: SceneInput, c: number, dx: number): SceneInput {
  return {
    ...scene,
    circles: scene.circles!.map((circle, k) => (k !== c ? circle : { ...circle, cx: circle.cx + dx })),
  };
}

const pairCount = (scene: SceneInput) => {
  const n = computeViewFactors(scene).edgeCount;
  return (n * (n + 1)) / 2;
};

describe('KeptViewFactors', () => {
  it('gives every case of a moved polygon body the bits of computing it alone, computing fewer pairs after the first', () => {
    // Six bodies of 22 sides in a box of 18 wall edges (the bench's drag-size sketch);
    // body 3 moves back and forth along x, as the cases of a sweep and a solve-for do.
    const base = tubeScene(42, 6, 22, 18);
    const kept = new KeptViewFactors();
    const all = pairCount(base);
    const steps = [0, 0.02, -0.03, 0.01];
    steps.forEach((dx, k) => {
      const scene = movedPolygon(base, 3, dx, 0);
      expectSameBits(kept.compute(scene), computeViewFactors(scene));
      if (k === 0) expect(kept.computed).toBe(all);
      else expect(kept.computed).toBeLessThan(0.5 * all);
    });
  });

  it('does the same for an exact tube moved along a row of tubes', () => {
    const base = furnaceScene(0);
    const kept = new KeptViewFactors();
    for (const dx of [0, 0.01, 0.03, -0.02]) {
      const scene = movedCircle(base, 25, dx);
      expectSameBits(kept.compute(scene), computeViewFactors(scene));
    }
    expect(kept.computed).toBeLessThan(pairCount(base));
  });

  it('computes every pair for other shapes, a moved enclosure, or a new surface of an edge, with the same bits', () => {
    const base = tubeScene(7, 4, 8, 12);
    const kept = new KeptViewFactors();
    const all = pairCount(base);
    const cases: SceneInput[] = [
      base,
      tubeScene(7, 4, 9, 12), // other shapes (9 sides)
      base,
      movedPolygon(base, 0, 0.5, 0), // the enclosure moved: every view lies inside it
      { ...movedPolygon(base, 0, 0.5, 0), edgeSurface: Array.from(base.edgeSurface, () => 0), surfaceCount: 1 },
    ];
    const counts: number[] = [];
    for (const scene of cases) {
      expectSameBits(kept.compute(scene), computeViewFactors(scene));
      counts.push(kept.computed);
    }
    expect(counts.slice(0, 4)).toEqual([all, pairCount(cases[1]), all, all]);
    // Grouping edges into surfaces changes no pair: the rows are kept, only the sums differ.
    expect(counts[4]).toBe(0);
  });

  it('forgets its rows when a case throws, and the next case is still right', () => {
    const base = tubeScene(42, 6, 22, 18);
    const kept = new KeptViewFactors();
    kept.compute(base);
    const broken = { ...base, edgeSurface: [0, 1, 2] };
    expect(() => kept.compute(broken)).toThrow(/edgeSurface has 3 entries/);
    const next = movedPolygon(base, 3, 0.02, 0);
    expectSameBits(kept.compute(next), computeViewFactors(next));
    expect(kept.computed).toBe(pairCount(base));
  });
});
