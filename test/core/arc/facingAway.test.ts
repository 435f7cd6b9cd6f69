// Curves that surely face away from each other exchange nothing (arc/curve.ts
// surelyBehind): every point of one lies behind the line of a segment, or behind the
// tangent at every point of a solid arc. Checked without src/core's geometry: for each
// pair it ends, no sampled point of one curve lies in front of any sampled point of
// the other (its outward normal there), with plain arithmetic. Scenes: rows of tubes
// split into arcs, some nearly touching, beside the walls of a box.
import { describe, expect, it } from 'vitest';
import { buildEdges, totalEdgeCount, type EdgeSet } from '../../../src/core/edges';
import { Curve, surelyBehind } from '../../../src/core/arc/curve';
import { EdgePairs } from '../../../src/core/pairRows';
import { seeded } from '../seeded';

/** Points of edge `id` with its front normal there: segments left of a -> b, solid arcs outwards. */
function samples(E: EdgeSet, id: number, count: number): { x: number; y: number; nx: number; ny: number }[] {
  const out = [];
  for (let k = 0; k <= count; k++) {
    const t = k / count;
    if (id < E.count) {
      const dx = E.bx[id] - E.ax[id],
        dy = E.by[id] - E.ay[id],
        len = Math.sqrt(dx * dx + dy * dy);
      out.push({ x: E.ax[id] + t * dx, y: E.ay[id] + t * dy, nx: -dy / len, ny: dx / len });
    } else {
      const A = E.arcs,
        a = id - E.count,
        c = A.circle[a];
      const th = A.start[a] + t * A.span[a];
      out.push({
        x: A.cx[c] + A.r[c] * Math.cos(th),
        y: A.cy[c] + A.r[c] * Math.sin(th),
        nx: Math.cos(th),
        ny: Math.sin(th),
      });
    }
  }
  return out;
}

/** A box with `rows` staggered rows of tubes split into `arcs` arcs; `gap` between neighbours (fraction of the radius). */
function bank(rand: () => number, rows: number, arcs: number, gap: number): EdgeSet {
  const r = 0.05 + 0.05 * rand(),
    pitch = 2 * r * (1 + gap);
  const circles = [];
  for (let row = 0; row < rows; row++)
    for (let k = 0; k < 6; k++)
      circles.push({
        kind: 'solid' as const,
        cx: 0.5 + pitch * k + (row % 2) * 0.5 * pitch,
        cy: 0.5 + row * pitch * (0.9 + 0.3 * rand()), // staggered: centres at least 1.03 pitches apart
        radius: r,
        arcs,
      });
  return buildEdges([{ kind: 'enclosure', points: [0, 0, 3, 0, 3, 2.5, 0, 2.5] }], circles);
}

describe('curves facing away from each other', () => {
  it('every pair said to face away has no sampled point of one in front of the other', () => {
    const rand = seeded(11);
    const a = new Curve(),
      b = new Curve(),
      scratch: number[] = [];
    let away = 0,
      pairs = 0;
    for (let trial = 0; trial < 12; trial++) {
      const E = bank(rand, 1 + (trial % 3), [1, 3, 5, 12][trial % 4], [1e-6, 1e-3, 0.3][trial % 3]);
      const n = totalEdgeCount(E);
      for (let i = 0; i < n; i++) {
        a.load(E, i);
        const si = samples(E, i, 24);
        for (let j = 0; j < n; j++) {
          if (i === j) continue;
          b.load(E, j);
          pairs++;
          if (!surelyBehind(a, b, scratch)) continue;
          away++;
          for (const p of si)
            for (const q of samples(E, j, 24)) {
              const ahead = (q.x - p.x) * p.nx + (q.y - p.y) * p.ny;
              if (ahead > 1e-12) expect.fail(`edge ${j} has a point ${ahead} in front of edge ${i} (trial ${trial})`);
            }
        }
      }
    }
    // Most pairs of arcs on the far sides of two tubes face away: the test must see many.
    expect(away).toBeGreaterThan(pairs / 10);
  });

  it('a whole tube and a segment: behind only when the whole disc is', () => {
    const E = buildEdges(
      [{ kind: 'enclosure', points: [0, 0, 4, 0, 4, 4, 0, 4] }],
      [
        { kind: 'solid', cx: 2, cy: 2, radius: 0.5, arcs: 1 },
        { kind: 'solid', cx: 2, cy: 2.5 + 1e-9, radius: 0.0001, arcs: 1 },
      ],
    );
    const floor = new Curve(),
      tube = new Curve(),
      scratch: number[] = [];
    floor.load(E, 0); // (0, 0) -> (4, 0): its front is y > 0, where the tubes are
    tube.load(E, E.count);
    expect(surelyBehind(floor, tube, scratch)).toBe(false);
    expect(surelyBehind(tube, floor, scratch)).toBe(false); // a whole circle faces every way
  });

  it('pairs it ends are 0 in the factors too, and the rows still sum to one', () => {
    const E = bank(seeded(3), 2, 12, 1e-3);
    const pairs = new EdgePairs(E);
    const n = pairs.count;
    const a = new Curve(),
      b = new Curve(),
      scratch: number[] = [];
    for (let i = 0; i < n; i++) {
      let sum = 0;
      for (let j = 0; j < n; j++) {
        const g = i === j ? pairs.selfExchange(i) : pairs.pairExchange(i, j);
        sum += g / pairs.length[i];
        a.load(E, i);
        b.load(E, j);
        if (i !== j && surelyBehind(a, b, scratch)) expect(g).toBe(0);
      }
      // Closed enclosure: each row sums to one (Incropera et al., 6th ed., sec. 13.1).
      expect(Math.abs(sum - 1)).toBeLessThan(1e-9);
    }
  });
});
