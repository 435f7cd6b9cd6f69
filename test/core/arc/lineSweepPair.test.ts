import { afterEach, describe, expect, it, vi } from 'vitest';
import type { ArcSet } from '../../../src/core/arc/arcs';
import { DiscShadow } from '../../../src/core/arc/discShadow';
import { LineSweep } from '../../../src/core/arc/lineSweep';
import { LineSweepPair } from '../../../src/core/arc/lineSweepPair';
import type { PairScene } from '../../../src/core/arc/pairScene';
import type { CircleInput } from '../../../src/core/scene';
import { boxCorners } from '../helpers';
import { oracleRow } from './circleOracle';
import { arc, segment } from './curves';
import { sectionFactors } from './section';

// Which pairs of straight edges take the line sweep (arc/lineSweepPair.ts), and the
// factors of a section that uses it against the ray-cast reference of circleOracle.ts
// (the 2D point kernel of Siegel and Howell; no code shared with src/core) at 1e-9,
// with the summation rule of a closed enclosure (Incropera et al., Fundamentals of
// Heat and Mass Transfer, 6th ed., sec. 13.1).

/** A tube (circle 0) or an arc of it from angle 0. */
const tube = (cx: number, cy: number, r: number, span = 2 * Math.PI) => arc(cx, cy, r, 0, span);

/** Circles as the ArcSet fields the pair reads, and a scene listing all of them as blockers plus `seg`, in the hull of the floor and roof below. */
function blockers(discs: number[][], seg: number[] = []): { A: ArcSet; scene: PairScene } {
  const A = {
    cx: Float64Array.from(discs, (d) => d[0]),
    cy: Float64Array.from(discs, (d) => d[1]),
    r: Float64Array.from(discs, (d) => d[2]),
  } as unknown as ArcSet;
  const scene = { circles: discs.map((_, k) => k), seg, hull: [0, 0, 4, 0, 4, 2, 0, 2] } as unknown as PairScene;
  return { A, scene };
}

const floor = segment(0, 0, 4, 0),
  roof = segment(4, 2, 0, 2);
/** A row of tubes between floor and roof. */
const row = Array.from({ length: 8 }, (_, k) => [0.3 + 0.45 * k, 1, 0.15]);

describe('which pairs take the line sweep', () => {
  const pair = new LineSweepPair(1e-12, new DiscShadow(1e-12));

  it('takes two walls past a row of tubes, side walls along the quadrilateral', () => {
    const { A, scene } = blockers(row, [4, 0, 4, 2, 0, 2, 0, 0]);
    expect(pair.exchange(floor, roof, scene, A)).toBeGreaterThan(0);
  });

  it('leaves to the integration a pair with a circle across a line, or an edge inside', () => {
    const across = blockers([...row, [3.9, 1.95, 0.1]]); // crosses the roof's line
    expect(pair.exchange(floor, roof, across.scene, across.A)).toBe(-1);
    const baffle = blockers(row, [2, 0.2, 2.5, 0.4]); // a plate between the walls
    expect(pair.exchange(floor, roof, baffle.scene, baffle.A)).toBe(-1);
  });

  it('takes a wall and a whole tube or an arc under half a turn; leaves a half tube, a tube across the wall or a tiny edge to the integration', () => {
    const { A, scene } = blockers(row.slice(0, 3));
    expect(pair.exchange(roof, tube(3, 0.5, 0.2), scene, A)).toBeGreaterThan(0);
    expect(pair.exchange(roof, tube(3, 0.5, 0.2, Math.PI / 3), scene, A)).toBeGreaterThan(0);
    expect(pair.exchange(roof, tube(3, 0.5, 0.2, Math.PI), scene, A)).toBe(-1);
    expect(pair.exchange(floor, tube(3.7, -0.1, 0.2), scene, A)).toBe(-1);
    expect(pair.exchange(segment(2, 2, 2 - 1e-5, 2), floor, scene, A)).toBe(-1);
  });

  it('leaves out a circle wholly behind one of the lines', () => {
    const without = blockers(row);
    const behind = blockers([...row, [2, -0.5, 0.2]]);
    expect(pair.exchange(floor, roof, behind.scene, behind.A)).toBe(
      pair.exchange(floor, roof, without.scene, without.A),
    );
  });
});

describe('a section whose wall pairs take the line sweep', () => {
  afterEach(() => vi.restoreAllMocks());

  it.each([
    ['a staggered bank in a box', 0],
    ['a staggered bank in a box, rows of the side wall', 1],
  ])('%s: rows match the reference and sum to one', { timeout: 300_000 }, (_name, row) => {
    const spy = vi.spyOn(LineSweep.prototype, 'exchange');
    const circles: CircleInput[] = [];
    for (let r = 0; r < 2; r++)
      for (let k = 0; k < 6; k++)
        circles.push({ kind: 'solid', cx: 0.35 + 0.45 * k + 0.22 * r, cy: 0.6 + 0.35 * r, radius: 0.1, arcs: 1 });
    const { scene, F, n } = sectionFactors([{ kind: 'enclosure', points: boxCorners(3, 1.6) }], circles);
    expect(spy).toHaveBeenCalled();
    const ref = oracleRow(scene, row, 1e-11);
    let sum = 0;
    for (let j = 0; j < n; j++) {
      sum += F[row * n + j];
      if (Math.abs(F[row * n + j] - ref[j]) > 1e-9)
        throw new Error(`F[${row}][${j}] = ${F[row * n + j]}, reference ${ref[j]}`);
    }
    expect(Math.abs(sum - 1)).toBeLessThan(1e-12);
  });
});
