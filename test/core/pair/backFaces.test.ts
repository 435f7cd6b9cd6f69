// Edges that face away from the whole emitting edge i' are left out of a pair's
// obstacles (ViewRegion.facesAwayFromEmitter): a blocked sight line from p on i' first
// meets an edge whose front faces p, and such an edge faces a0 or a1. Checked against
// an independent exact test (robust-predicates' orient2d, no code of src/core):
// - every kept piece faces a0 or a1 (up to a doubt margin), so the rule is applied;
// - every edge that passes through the view region H and faces a0 or a1 is kept, so
//   nothing that can block is lost (the oracle and property tests check the factors).
// Fixtures named after what they caught: a chain ending past a corner of H (its piece
// leaves through a string: STRING_PAST in viewRegion.ts), and a bar lying on the
// floor, where only the corner test of a remembered body had ended a pair.
import { orient2d } from 'robust-predicates';
import { describe, expect, it } from 'vitest';
import { buildEdges, type EdgeSet } from '../../../src/core/edges';
import { buildObstacleIndex } from '../../../src/core/obstacles';
import { PairIntegrator } from '../../../src/core/pair/integrator';
import { ViewRegion, type SegmentClip } from '../../../src/core/pair/viewRegion';
import { EdgePairs } from '../../../src/core/pairRows';
import type { SceneInput } from '../../../src/core/scene';
import { hardScene } from '../../bench/hardScenes';
import { tubeScene } from '../../bench/scenes';
import { seeded } from '../seeded';

type Pt = [number, number];

/** The integrator's scratch, read after a pair (test only). */
interface Inside {
  ends: Float64Array;
  pieces: { count: number; edge: Int32Array; wholeCount: number; wholeBody: Int32Array };
}

/** orient2d's sign for "q left of a -> b" (robust-predicates is negative there). */
const left = (a: Pt, b: Pt, q: Pt) => -orient2d(a[0], a[1], b[0], b[1], q[0], q[1]);

/** Is point q left of edge e's line by more than `rel` of |e| x |q - a| (exact sign, relative margin)? */
function frontBy(E: EdgeSet, e: number, q: Pt, rel: number): number {
  const a: Pt = [E.ax[e], E.ay[e]],
    b: Pt = [E.bx[e], E.by[e]];
  const d = left(a, b, q);
  const scale = Math.hypot(b[0] - a[0], b[1] - a[1]) * Math.hypot(q[0] - a[0], q[1] - a[1]);
  return d > rel * scale ? 1 : d < -rel * scale ? -1 : 0;
}

/** Does edge e pass through the open region a0 a1 b0 b1 (anticlockwise)? Sampled at 31 points, exact signs. */
function throughRegion(E: EdgeSet, e: number, H: Pt[]): boolean {
  for (let k = 1; k < 32; k++) {
    const t = k / 32;
    const q: Pt = [E.ax[e] + t * (E.bx[e] - E.ax[e]), E.ay[e] + t * (E.by[e] - E.ay[e])];
    if (H.every((a, s) => left(a, H[(s + 1) % 4], q) > 0)) return true;
  }
  return false;
}

function checkPairs(scene: SceneInput, pairs: number, seed: number): { kept: number; checked: number } {
  const E = buildEdges(scene.polygons, scene.circles);
  const ob = buildObstacleIndex(E);
  const rand = seeded(seed);
  let kept = 0,
    checked = 0;
  for (let trial = 0; trial < pairs; trial++) {
    const i = Math.floor(rand() * E.count),
      j = Math.floor(rand() * E.count);
    if (i === j) continue;
    // A fresh integrator: its pieces are this pair's, whatever path it took.
    const integ = new PairIntegrator(E, ob);
    if (!(integ.exchangeLength(i, j) > 0)) continue; // 0: maybe ended early, pieces incomplete
    const inside = integ as unknown as Inside;
    const P = inside.ends;
    const a0: Pt = [P[0], P[1]],
      a1: Pt = [P[2], P[3]];
    const H: Pt[] = [a0, a1, [P[4], P[5]], [P[6], P[7]]];
    const pieces = inside.pieces;
    const keptEdges = new Set(Array.from(pieces.edge.subarray(0, pieces.count)));
    const whole = new Set(Array.from(pieces.wholeBody.subarray(0, pieces.wholeCount)));
    for (const e of keptEdges) {
      // Surely behind both ends (beyond 1e-9: far above the rule's own margin) would be a piece kept in vain.
      expect(frontBy(E, e, a0, 1e-9) === -1 && frontBy(E, e, a1, 1e-9) === -1).toBe(false);
      kept++;
    }
    for (let e = 0; e < E.count; e++) {
      if (e === i || e === j || keptEdges.has(e) || whole.has(ob.bodyOfPolygon[E.polygon[e]])) continue;
      const faces = frontBy(E, e, a0, 0) > 0 || frontBy(E, e, a1, 0) > 0;
      if (faces && throughRegion(E, e, H)) expect.fail(`pair ${i}-${j}: edge ${e} faces i' inside H but was left out`);
    }
    checked++;
  }
  return { kept, checked };
}

describe('edges facing away from the emitting edge are left out, nothing else', () => {
  it.each([
    ['square tubes', tubeScene(1, 20, 4, 20), 2500],
    ['pentagon tubes', tubeScene(9, 30, 5, 60), 2500],
    ['18-sided tubes', tubeScene(1, 8, 18, 24), 1500],
    ['a hard scene (pocketed walls, bodies)', hardScene(13, 300), 600],
  ])('%s', (_name, scene, pairs) => {
    const { kept, checked } = checkPairs(scene, pairs, 5);
    // The scenes must give pairs past obstacles, or the test would pass vacuously.
    expect(checked).toBeGreaterThan(100);
    expect(kept).toBeGreaterThan(100);
  });
});

describe('a pair ends the same way whichever pairs came before', () => {
  /** Every pair asked in row order by one EdgePairs (remembered obstacles) against a fresh one per pair. */
  function historyFree(scene: Pick<SceneInput, 'polygons' | 'circles'>, step = 1): void {
    const E = buildEdges(scene.polygons, scene.circles);
    const rows = new EdgePairs(E);
    for (let i = 0; i < E.count; i++)
      for (let j = i + 1; j < E.count; j += step) {
        const inOrder = rows.pairExchange(i, j);
        const fresh = new EdgePairs(E).pairExchange(i, j);
        if (!Object.is(inOrder, fresh)) expect.fail(`pair ${i}-${j}: ${inOrder} in row order, ${fresh} alone`);
      }
  }

  it('a bar lying on the floor (invalid: the app refuses it, but the core must stay deterministic)', () => {
    // A 10 x 6 box with a corner every unit, anticlockwise.
    const wall: number[] = [];
    for (let x = 0; x < 10; x++) wall.push(x, 0);
    for (let y = 0; y < 6; y++) wall.push(10, y);
    for (let x = 10; x > 0; x--) wall.push(x, 6);
    for (let y = 6; y > 0; y--) wall.push(0, y);
    historyFree({
      polygons: [
        { kind: 'enclosure', points: wall },
        { kind: 'solid', points: [1, 0, 3, 0, 3, 1, 1, 1] },
      ],
    });
  });

  it('pentagon tubes, where chains end past a corner of the view region', () =>
    historyFree(tubeScene(9, 30, 5, 60), 3));
});

describe('a piece leaving the view region past one of its corners', () => {
  // H: a0 (0, 0), a1 (1, 0) on the emitter; b0 (1, 2), b1 (0, 2) on the target. Side 1 is
  // a1 -> b0 (x = 1), side 3 is b1 -> a0 (x = 0), side 0 is y = 0, side 2 is y = 2.
  const region = new ViewRegion(4);
  region.set(Float64Array.from([0, 0, 1, 0, 1, 2, 0, 2]));
  region.measure();
  const clip = (x0: number, y0: number, x1: number, y1: number): SegmentClip => {
    const E = { ax: [x0], ay: [y0], bx: [x1], by: [y1] } as unknown as EdgeSet;
    const out: SegmentClip = { t0: 0, t1: 1, startInside: false, endInside: false, startSide: -1, endSide: -1 };
    expect(region.clipEdge(E, 0, out)).toBe(true);
    return out;
  };

  it('past a string and the emitter line: the string', () => {
    expect(clip(0.5, 1, -1, -0.5).endSide).toBe(3); // beyond x = 0 and y = 0, leaves through x = 0
    expect(clip(0.5, 1, 2, -0.2).endSide).toBe(1);
  });

  it('past a string and the target line: the string', () => {
    expect(clip(0.5, 1, -0.5, 3).endSide).toBe(3);
    expect(clip(1.5, 3, 0.5, 1).startSide).toBe(1);
  });

  it('past one side only: that side; inside: none', () => {
    expect(clip(0.5, 1, -1, 1).endSide).toBe(3);
    expect(clip(0.5, 1, 0.5, 1.5).endSide).toBe(-1);
  });
});

describe('a body whose chain ends past a corner of the view region blocks exactly', () => {
  it('a pentagon between a tube edge and the floor: exactly 0, as sampled sight lines show', () => {
    const scene = tubeScene(9, 30, 5, 60);
    const E = buildEdges(scene.polygons, scene.circles);
    const value = new EdgePairs(E).pairExchange(3, 191);
    // Independent: every sampled sight line from edge 191 to edge 3 crosses some other edge.
    const at = (e: number, t: number): Pt => [E.ax[e] + t * (E.bx[e] - E.ax[e]), E.ay[e] + t * (E.by[e] - E.ay[e])];
    let open = 0;
    for (let u = 1; u < 20; u++)
      for (let v = 1; v < 20; v++) {
        const p = at(191, u / 20),
          q = at(3, v / 20);
        const hit = Array.from({ length: E.count }, (_, e) => e).some((e) => {
          if (e === 3 || e === 191) return false;
          const a: Pt = [E.ax[e], E.ay[e]],
            b: Pt = [E.bx[e], E.by[e]];
          return left(p, q, a) * left(p, q, b) < 0 && left(a, b, p) * left(a, b, q) < 0;
        });
        if (!hit) open++;
      }
    expect(open).toBe(0);
    expect(Object.is(value, 0)).toBe(true);
  });
});
