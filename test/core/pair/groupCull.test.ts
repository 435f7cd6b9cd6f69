// Rows leave out the pairs that surely exchange nothing (core/pair/groupCull.ts):
// whole groups of edges (a body, a run of enclosure edges) behind the row edge's line,
// its own convex body, or a group one body hides from all of it; and single edges
// that surely do not face it, or that one body hides from all of it. Checked two ways:
// - against an independent exact test (robust-predicates' orient2d, no code of
//   src/core): every pair left out has no corner of one edge in front of the
//   other, or every sampled sight line between them crosses another polygon's edge;
// - rows with those pairs left out equal every pair asked one by one, bit for bit.
import fc from 'fast-check';
import { orient2d } from 'robust-predicates';
import { describe, expect, it } from 'vitest';
import { buildEdges, type EdgeSet } from '../../../src/core/edges';
import { EdgePairs, packRows } from '../../../src/core/pairRows';
import type { SceneInput } from '../../../src/core/scene';
import { allRows } from '../../../src/core/viewFactors';
import { hardScene } from '../../bench/hardScenes';
import { tubeScene } from '../../bench/scenes';
import { gridSketchArb, sketchArb } from '../arbitraries';
import type { Poly } from '../helpers';

type Pt = [number, number];

const corner = (E: EdgeSet, e: number, end: 0 | 1): Pt => (end === 0 ? [E.ax[e], E.ay[e]] : [E.bx[e], E.by[e]]);
const at = (E: EdgeSet, e: number, t: number): Pt => [
  E.ax[e] + t * (E.bx[e] - E.ax[e]),
  E.ay[e] + t * (E.by[e] - E.ay[e]),
];

/** Is point q strictly in front of (left of) edge e? Exact. */
const inFront = (E: EdgeSet, e: number, q: Pt) => orient2d(E.ax[e], E.ay[e], E.bx[e], E.by[e], q[0], q[1]) < 0;

/** Do the open segments p-q and edge e cross at one point inside both? Exact. */
function crosses(E: EdgeSet, e: number, p: Pt, q: Pt): boolean {
  const d1 = orient2d(p[0], p[1], q[0], q[1], E.ax[e], E.ay[e]),
    d2 = orient2d(p[0], p[1], q[0], q[1], E.bx[e], E.by[e]),
    d3 = orient2d(E.ax[e], E.ay[e], E.bx[e], E.by[e], p[0], p[1]),
    d4 = orient2d(E.ax[e], E.ay[e], E.bx[e], E.by[e], q[0], q[1]);
  return d1 * d2 < 0 && d3 * d4 < 0;
}

/** Can edges i and j exchange nothing, shown without src/core: not facing, or every sampled sight line blocked. */
function independentlySilent(E: EdgeSet, i: number, j: number): { silent: boolean; facing: boolean } {
  const facing =
    (inFront(E, i, corner(E, j, 0)) || inFront(E, i, corner(E, j, 1))) &&
    (inFront(E, j, corner(E, i, 0)) || inFront(E, j, corner(E, i, 1)));
  if (!facing) return { silent: true, facing };
  // Fractions off the grid: on sketches with integer corners, samples at (k + 1/2) / 5
  // can line up exactly with two corners of a body (its diagonal), and a line through
  // corners crosses no edge at one interior point though it passes through the body.
  const S = 5,
    off = 1e-3 * Math.SQRT2;
  for (let a = 0; a < S; a++) {
    for (let b = 0; b < S; b++) {
      const p = at(E, i, (a + 0.5 + off) / S),
        q = at(E, j, (b + 0.5 + off) / S);
      let blocked = false;
      for (let e = 0; e < E.count && !blocked; e++) {
        if (e !== i && e !== j && E.polygon[e] !== E.polygon[i] && E.polygon[e] !== E.polygon[j])
          blocked = crosses(E, e, p, q);
      }
      if (!blocked) return { silent: false, facing };
    }
  }
  return { silent: true, facing };
}

/** A scene moved by (dx, dy) and scaled by k about the origin: the margins scale with the extent. */
function moved(scene: SceneInput, k: number, dx: number, dy: number): SceneInput {
  const map = (pts: ArrayLike<number>) => Array.from(pts, (v, m) => k * v + (m % 2 === 0 ? dx : dy));
  return { ...scene, polygons: scene.polygons.map((p) => ({ ...p, points: map(p.points) })) };
}

/** Squares on a grid in a box: many edges on one line, corners exactly on other bodies' edge lines. */
function alignedSquares(): SceneInput {
  const polygons: SceneInput['polygons'] = [{ kind: 'enclosure', points: [0, 0, 12, 0, 12, 6, 0, 6] }];
  for (let r = 0; r < 2; r++)
    for (let c = 0; c < 5; c++) {
      const x = 1 + 2 * c,
        y = 1.5 + 2 * r;
      polygons.push({ kind: 'solid', points: [x, y, x + 1, y, x + 1, y + 1, x, y + 1] });
    }
  const count = polygons.reduce((n, p) => n + p.points.length / 2, 0);
  return { polygons, edgeSurface: Array.from({ length: count }, (_, k) => k), surfaceCount: count };
}

/**
 * A floor of 24 edges of 0.5, a unit square tube 2 above it and a 48-sided tube of
 * radius 2 behind the square: the square hides the big tube's lowest edges from the
 * floor edges below it, but not the big tube whole (its circle is far wider than the
 * square's umbra), so only a test per edge leaves those pairs out.
 */
function bigBehindSmall(): SceneInput {
  const floor: number[] = [];
  for (let k = 0; k <= 24; k++) floor.push(0.5 * k, 0);
  const polygons: SceneInput['polygons'] = [{ kind: 'enclosure', points: [...floor, 12, 10, 0, 10] }];
  polygons.push({ kind: 'solid', points: [5.5, 2, 6.5, 2, 6.5, 3, 5.5, 3] });
  const tube: number[] = [];
  for (let k = 0; k < 48; k++)
    tube.push(6 + 2 * Math.cos((2 * Math.PI * k) / 48), 7 + 2 * Math.sin((2 * Math.PI * k) / 48));
  polygons.push({ kind: 'solid', points: tube });
  const count = polygons.reduce((n, p) => n + p.points.length / 2, 0);
  return { polygons, edgeSurface: Array.from({ length: count }, (_, k) => k), surfaceCount: count };
}

/**
 * A floor of 24 edges of 0.5, a flat bar 2.2 above it and a 48-sided tube of radius 1.5
 * just above the bar: from the floor edges under them the bar's underside lies inside
 * the tube's cones from both ends, but in front of the tube (short of the chord of its
 * umbra), so it stays in view; the tube is listed for the bar (it enters the bar's
 * widened triangle), so only the chord keeps those pairs.
 */
function barBeforeTube(): SceneInput {
  const floor: number[] = [];
  for (let k = 0; k <= 24; k++) floor.push(0.5 * k, 0);
  const tube: number[] = [];
  for (let k = 0; k < 48; k++)
    tube.push(6 + 1.5 * Math.cos((2 * Math.PI * k) / 48), 4 + 1.5 * Math.sin((2 * Math.PI * k) / 48));
  const polygons: SceneInput['polygons'] = [
    { kind: 'enclosure', points: [...floor, 12, 10, 0, 10] },
    { kind: 'solid', points: [5.3, 2.2, 6.7, 2.2, 6.7, 2.3, 5.3, 2.3] },
    { kind: 'solid', points: tube },
  ];
  const count = polygons.reduce((n, p) => n + p.points.length / 2, 0);
  return { polygons, edgeSurface: Array.from({ length: count }, (_, k) => k), surfaceCount: count };
}

const scenes: [string, SceneInput, boolean][] = [
  ['a flat bar just in front of a big tube', barBeforeTube(), false],
  ['a big tube partly hidden behind a small square', bigBehindSmall(), true],
  // Squares no bigger than their neighbours hide none whole: their umbra closes before the next.
  ['squares in line (collinear edges)', alignedSquares(), false],
  ['12 hexagonal tubes, 1e-4 of the size, 1e3 from the origin', moved(tubeScene(3, 12, 6, 24), 1e-4, 1e3, -1e3), true],
  ['20 square tubes', tubeScene(1, 20, 4, 20), true],
  ['12 hexagonal tubes', tubeScene(3, 12, 6, 24), true],
  ['20 tubes of 18 sides', tubeScene(1, 20, 18, 40), true],
  ['hard scene: fins, zigzag walls, stars', hardScene(5, 300), true],
];

/**
 * Mark in `listed` the columns row i lists (ascending, checked), asking each pair as the
 * rows do, so that the pairs leave their hints (the bodies that blocked them).
 */
function listRow(pairs: EdgePairs, i: number, listed: Uint8Array, asked: (j: number, g: number) => void): void {
  listed.fill(0);
  const live = pairs.liveColumns(i);
  for (let q = 0; q < live; q++) {
    const j = pairs.live[q];
    if (q > 0) expect(j, 'ascending').toBeGreaterThan(pairs.live[q - 1]);
    listed[j] = 1;
    asked(j, pairs.pairExchange(i, j));
  }
}

describe('pairs left out of a row', () => {
  it.each(scenes)('%s: every pair left out is 0, and shown so independently', (_name, scene, hides) => {
    const E = buildEdges(scene.polygons, scene.circles);
    const pairs = new EdgePairs(E);
    const n = pairs.count;
    let leftOut = 0,
      hiddenPairs = 0;
    const listed = new Uint8Array(n);
    for (let i = 0; i < n; i++) {
      listRow(pairs, i, listed, () => {});
      for (let j = i + 1; j < n; j++) {
        if (listed[j]) continue;
        leftOut++;
        expect(pairs.pairExchange(i, j), `pair ${i}, ${j}`).toBe(0);
        const shown = independentlySilent(E, i, j);
        expect(shown.silent, `pair ${i}, ${j}: a sampled sight line is clear`).toBe(true);
        if (shown.facing) hiddenPairs++;
      }
    }
    // Not vacuous: pairs not facing and (where a body is big enough) pairs hidden by one body.
    expect(leftOut).toBeGreaterThan(0);
    if (hides) expect(hiddenPairs).toBeGreaterThan(0);
  });

  it('single edges of a group one body hides only in part are left out (the per-edge shadow)', () => {
    const scene = bigBehindSmall();
    const E = buildEdges(scene.polygons, scene.circles);
    const pairs = new EdgePairs(E);
    // Floor edges 11 and 12 (x from 5.5 to 6.5) lie under the square; the big tube's edges follow the square's 4.
    const tubeFrom = 26 + 4;
    let hiddenInPart = 0;
    for (const i of [11, 12]) {
      const live = pairs.liveColumns(i);
      const listed = new Set(Array.from(pairs.live.subarray(0, live)));
      let listedOfTube = 0;
      for (let j = tubeFrom; j < tubeFrom + 48; j++) {
        if (listed.has(j)) listedOfTube++;
        else if (independentlySilent(E, i, j).facing) hiddenInPart++;
      }
      expect(listedOfTube, `floor edge ${i} still sees part of the big tube`).toBeGreaterThan(0);
    }
    expect(hiddenInPart).toBeGreaterThan(0);
  });

  it('random sketches (stars, bars on a grid): every pair left out is 0 and shown so, and rows equal pairs asked one by one', () => {
    const check = (polys: Poly[]) => {
      const scene: SceneInput = {
        polygons: polys.map((p) => ({ kind: p.kind, points: p.points.flat() })),
        edgeSurface: [],
        surfaceCount: 0,
      };
      const E = buildEdges(scene.polygons);
      const rows = new EdgePairs(E),
        one = new EdgePairs(E);
      const n = rows.count;
      const listed = new Uint8Array(n);
      for (let i = 0; i < n; i++) {
        listRow(rows, i, listed, (j, g) => expect(Object.is(g, one.pairExchange(i, j))).toBe(true));
        for (let j = i + 1; j < n; j++) {
          if (listed[j]) continue;
          expect(one.pairExchange(i, j), `pair ${i}, ${j}`).toBe(0);
          expect(independentlySilent(E, i, j).silent, `pair ${i}, ${j}: a sampled sight line is clear`).toBe(true);
        }
      }
    };
    fc.assert(fc.property(sketchArb, check), { numRuns: 60, seed: 11 });
    fc.assert(fc.property(gridSketchArb, check), { numRuns: 40, seed: 12 });
  });

  it.each(scenes)('%s: rows with pairs left out equal every pair asked one by one, bit for bit', (_name, scene) => {
    const E = buildEdges(scene.polygons, scene.circles);
    const n = new EdgePairs(E).count;
    const packed = packRows(new EdgePairs(E), allRows(n));
    const one = new EdgePairs(E);
    const asked = new Float64Array(packed.length);
    let at = 0;
    for (let i = 0; i < n; i++) {
      asked[at++] = one.selfExchange(i);
      for (let j = i + 1; j < n; j++) asked[at++] = one.pairExchange(i, j);
    }
    expect(at).toBe(packed.length);
    let differ = 0;
    for (let k = 0; k < at; k++) if (!Object.is(packed[k], asked[k])) differ++;
    expect(differ).toBe(0);
  });
});
