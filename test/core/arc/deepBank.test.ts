import { describe, expect, it } from 'vitest';
import type { CircleInput } from '../../../src/core/scene';
import { boxCorners } from '../helpers';
import { oracleRow } from './circleOracle';
import { sectionFactors } from './section';

// A staggered bank three rows deep, the case where a tube sees another between rows
// past several more. There the integrator leaves out alignments whose line a circle
// crosses before reaching the target (arc/curvedPair.ts, `keeps`), and splits an arc
// into pieces only where it spans more than a quarter turn. Rows on the floor, on a
// whole tube and on arcs of split tubes are checked against the ray-cast reference of
// circleOracle.ts (the 2D point kernel of Siegel and Howell, Thermal Radiation Heat
// Transfer; no code shared with src/core), and by the summation rule of a closed
// enclosure (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
// sec. 13.1). In this bank the rule drops about 170 alignments that the older rules
// kept. The test fails if circles behind the point count as crossing the line, or if
// a circle that only comes within 1e-3 of its radius of the line counts. (A circle
// crossing the line beyond the target cannot be told apart here: in a valid sketch
// nothing lies beyond a target inside the region the pair's blockers come from.)
const TOL = 1e-9;

function bank(arcs: number): CircleInput[] {
  const circles: CircleInput[] = [];
  for (let row = 0; row < 3; row++)
    for (let k = 0; k < 5; k++)
      circles.push({
        kind: 'solid',
        cx: 0.35 + 0.5 * k + 0.25 * (row % 2),
        cy: 0.5 + 0.3 * row,
        radius: 0.09,
        arcs: k === 2 ? arcs : 1,
      });
  return circles;
}

describe('a staggered bank three rows deep against the ray-cast reference', () => {
  it.each([
    ['floor', 1, () => 0],
    ['a whole tube of the back row', 1, (n: number) => n - 1],
    ['an arc of a front-row tube split in 3', 3, () => 4 + 2],
    ['an arc of a middle-row tube split in 5', 5, () => 4 + 9 + 2 + 2],
  ])('rows on the %s match and sum to one', { timeout: 300_000 }, (_name, arcs, pick) => {
    const { scene, F, n } = sectionFactors([{ kind: 'enclosure', points: boxCorners(3, 1.6) }], bank(arcs));
    const i = pick(n);
    const ref = oracleRow(scene, i, 1e-11);
    let sum = 0,
      seen = 0;
    for (let j = 0; j < n; j++) {
      const got = F[i * n + j];
      sum += got;
      if (got > 1e-6) seen++;
      if (Math.abs(got - ref[j]) > TOL) throw new Error(`F[${i}][${j}] = ${got}, reference ${ref[j]}`);
    }
    expect(Math.abs(sum - 1)).toBeLessThan(1e-12);
    // The row sees past the rows in front: several tubes, not only its neighbours.
    expect(seen).toBeGreaterThan(6);
  });
});
