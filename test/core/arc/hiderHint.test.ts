// Each curve remembers the solid circle that last hid a pair of it, and tries it before
// a pair's blockers are gathered (arc/curvedPair.ts). Only a hint: the factors must be
// the same bits in any order of pairs, and each closed row must still sum to one.
import { describe, expect, it } from 'vitest';
import { buildEdges } from '../../../src/core/edges';
import { EdgePairs } from '../../../src/core/pairRows';
import type { CircleInput } from '../../../src/core/scene';
import { seeded } from '../seeded';

/** Staggered rows of 8 tubes, each split into `arcs` arcs, in a 3 x 2 box; `gap` between neighbours (of the diameter). */
function bank(rows: number, arcs: number, gap: number) {
  const r = 0.08,
    pitch = 2 * r * (1 + gap);
  const circles: CircleInput[] = [];
  for (let row = 0; row < rows; row++)
    for (let k = 0; k < 8; k++)
      circles.push({
        kind: 'solid',
        cx: 0.4 + pitch * k + (row % 2) * 0.5 * pitch,
        cy: 0.4 + row * pitch,
        radius: r,
        arcs,
      });
  return buildEdges([{ kind: 'enclosure', points: [0, 0, 3, 0, 3, 2, 0, 2] }], circles);
}

describe('a remembered hiding circle changes no factor', () => {
  it.each([
    ['one row, tubes in 5 arcs, 1e-6 apart', 1, 5, 1e-6],
    ['two staggered rows, tubes in 6 arcs', 2, 6, 0.05],
    ['three staggered rows of whole tubes', 3, 1, 0.2],
  ])('%s: pairs in row order, shuffled and reversed give the same bits; rows sum to one', (_name, rows, arcs, gap) => {
    const E = bank(rows, arcs, gap);
    const inOrder = new EdgePairs(E);
    const n = inOrder.count;
    const F = new Float64Array(n * n);
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) F[i * n + j] = inOrder.pairExchange(i, j);
    const pairs: [number, number][] = [];
    for (let i = 0; i < n; i++) for (let j = i + 1; j < n; j++) pairs.push([i, j]);
    const rand = seeded(rows * 10 + arcs);
    for (let k = pairs.length - 1; k > 0; k--) {
      const m = Math.floor(rand() * (k + 1));
      [pairs[k], pairs[m]] = [pairs[m], pairs[k]];
    }
    for (const order of [pairs, [...pairs].reverse()]) {
      const other = new EdgePairs(E);
      for (const [i, j] of order) {
        const g = other.pairExchange(i, j);
        if (!Object.is(g, F[i * n + j])) expect.fail(`pair ${i}-${j}: ${g} against ${F[i * n + j]} in row order`);
      }
    }
    // Closed enclosure: every row sums to one (Incropera et al., 6th ed., sec. 13.1).
    for (let i = 0; i < n; i++) {
      let sum = inOrder.selfExchange(i);
      for (let j = 0; j < n; j++) if (j !== i) sum += i < j ? F[i * n + j] : F[j * n + i];
      expect(Math.abs(sum / inOrder.length[i] - 1)).toBeLessThan(1e-9);
    }
  });
});
