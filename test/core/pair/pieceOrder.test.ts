// The pieces of a pair are read in edge order (ObstaclePieces.sortByEdge), so that no
// result depends on the order obstacles were gathered in. Pieces arrive as runs (a
// body's walk, rising or falling through its edge ids), interleaved, or scattered; the
// order must be the plain sort by id in every case. Reference: Array.prototype.sort.
import { describe, expect, it } from 'vitest';
import { buildEdges } from '../../../src/core/edges';
import { ObstaclePieces } from '../../../src/core/pair/obstaclePieces';
import { seeded } from '../seeded';

// Enough edges for any id below: one enclosure of 400 corners (only the ids matter).
const ring = Array.from({ length: 400 }, (_, k) => [
  Math.cos((2 * Math.PI * k) / 400),
  Math.sin((2 * Math.PI * k) / 400),
]).flat();
const E = buildEdges([{ kind: 'enclosure', points: ring }]);

function orderOf(ids: number[]): number[] {
  const P = new ObstaclePieces(E.count);
  P.begin();
  for (const id of ids) P.keepWhole(id, E);
  P.sortByEdge();
  return Array.from(P.order.subarray(0, P.count), (s) => P.edge[s]);
}

/** Runs of consecutive ids, each rising or falling, at random starts (ranges may overlap when `overlap`). */
function runs(rand: () => number, count: number, overlap: boolean): number[] {
  const out: number[] = [];
  const used = new Set<number>();
  for (let r = 0; r < count; r++) {
    const len = 1 + Math.floor(rand() * 20);
    const start = overlap ? Math.floor(rand() * 360) : 20 * r + Math.floor(rand() * 5);
    const run = Array.from({ length: len }, (_, k) => start + k).filter((id) => id < 400 && !used.has(id));
    if (!overlap) run.splice(20 - (start % 20));
    if (rand() < 0.5) run.reverse();
    for (const id of run) {
      used.add(id);
      out.push(id);
    }
  }
  return out;
}

describe('pieces read in edge order', () => {
  it('runs rising or falling, shuffled, in any number, overlapping or not, come out sorted by id', () => {
    const rand = seeded(31);
    for (let trial = 0; trial < 300; trial++) {
      const overlap = trial % 3 === 0;
      const ids = runs(rand, 1 + Math.floor(rand() * (trial % 5 === 0 ? 40 : 8)), overlap);
      // Shuffle whole runs' order by rotating the list at a random cut.
      const cut = Math.floor(rand() * ids.length);
      const input = [...ids.slice(cut), ...ids.slice(0, cut)];
      expect(orderOf(input)).toEqual([...input].sort((a, b) => a - b));
    }
  });

  it('scattered ids and a single piece come out sorted too', () => {
    const rand = seeded(7);
    for (let trial = 0; trial < 100; trial++) {
      const ids = [...new Set(Array.from({ length: 1 + Math.floor(rand() * 50) }, () => Math.floor(rand() * 400)))];
      expect(orderOf(ids)).toEqual([...ids].sort((a, b) => a - b));
    }
    expect(orderOf([123])).toEqual([123]);
  });
});
