// Rows shared over threads: every split of the rows gives the same edge matrix and
// the same surface sums, bit for bit, as one thread; surface sums taken straight
// from the pairs equal the edge-matrix path's to rounding. Each "worker" here has
// its own EdgePairs (its own scratch), as a real worker thread would.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { buildEdges, type EdgeSet } from '../../src/core/edges';
import { balancedRowSets, EdgePairs, packRows, packedLength, rowPairCount, unpackRows } from '../../src/core/pairRows';
import type { CircleInput, PolygonInput } from '../../src/core/scene';
import { aggregatePackedRows } from '../../src/core/packedSurfaces';
import { aggregateToSurfaces, surfaceResult } from '../../src/core/surfaces';
import { SurfaceAccumulator, SurfaceRowSummer } from '../../src/core/surfaceRows';
import { computeViewFactors, edgeViewFactors } from '../../src/core/viewFactors';
import { sketchArb } from './arbitraries';
import { mixedSceneArb } from './arc/arbitraries';

const WORKERS = [1, 2, 3, 4];

/** The bytes of a Float64Array, so -0 and 0 (and every last bit) count as different. */
const bytes = (a: Float64Array) => new Uint8Array(a.buffer, a.byteOffset, a.byteLength);

/** The edge matrix computed part by part, each part on its own integrators, assembled here. */
function splitMatrix(edges: EdgeSet, workers: number): Float64Array {
  const one = new EdgePairs(edges);
  const n = one.count;
  const F = new Float64Array(n * n);
  // Parts answered in reverse order: assembly must not depend on arrival.
  for (const rows of balancedRowSets(n, workers).reverse()) {
    const packed = packRows(new EdgePairs(edges), rows);
    expect(packed.length).toBe(packedLength(n, rows));
    unpackRows(one.length, rows, packed, F);
  }
  return F;
}

/** Surface sums part by part, handed to the accumulator last part first. */
function splitSurfaces(edges: EdgeSet, edgeSurface: Int32Array, m: number, workers: number) {
  const L = new EdgePairs(edges).length;
  const acc = new SurfaceAccumulator(L, edgeSurface, m);
  for (const rows of balancedRowSets(L.length, workers).reverse()) {
    acc.add(new SurfaceRowSummer(new EdgePairs(edges), edgeSurface, m).sum(rows));
  }
  return acc.result(edges.hasEnclosure);
}

/** Up to `m` surfaces, edges assigned by a seeded scramble (not contiguous). */
function surfacesOf(n: number, m: number, seed: number): Int32Array {
  const s = Int32Array.from({ length: n }, (_, i) => (Math.imul(i + seed, 2654435761) >>> 7) % m);
  // Renumber to 0..count-1 by first appearance, so no surface is empty.
  const id = new Map<number, number>();
  return s.map((v) => {
    if (!id.has(v)) id.set(v, id.size);
    return id.get(v)!;
  });
}

function checkScene(polygons: PolygonInput[], circles: CircleInput[], m: number, seed: number) {
  const edges = buildEdges(polygons, circles);
  const single = edgeViewFactors(edges);
  const n = Math.round(Math.sqrt(single.length));
  const edgeSurface = surfacesOf(n, m, seed);
  const count = Math.max(...edgeSurface) + 1;
  const direct: ReturnType<typeof splitSurfaces>[] = [];
  for (const w of WORKERS) {
    expect(bytes(splitMatrix(edges, w))).toEqual(bytes(single));
    direct.push(splitSurfaces(edges, edgeSurface, count, w));
  }
  for (const d of direct.slice(1)) {
    expect(bytes(d.F)).toEqual(bytes(direct[0].F));
    expect(bytes(d.surfaceLength)).toEqual(bytes(direct[0].surfaceLength));
    expect(bytes(d.rowSumResidual)).toEqual(bytes(direct[0].rowSumResidual));
  }
  // The edge-matrix path (aggregateToSurfaces over the one-thread matrix): the same
  // sums of positive terms in another order, so equal to rounding, entry by entry.
  const viaMatrix = aggregateToSurfaces(n, new EdgePairs(edges).length, single, edgeSurface, count, edges.hasEnclosure);
  for (let k = 0; k < count * count; k++) {
    const a = direct[0].F[k],
      b = viaMatrix.F[k];
    expect(Math.abs(a - b)).toBeLessThanOrEqual(1e-13 * Math.max(Math.abs(a), Math.abs(b)));
  }
  for (let I = 0; I < count; I++)
    expect(Math.abs(direct[0].rowSumResidual[I] - viaMatrix.rowSumResidual[I])).toBeLessThanOrEqual(1e-13);
  // Packed rows summed without the matrix: the edge-matrix path's numbers, bit for bit, for any split.
  for (const w of WORKERS) {
    const sets = balancedRowSets(n, w);
    const packed = sets.map((rows) => packRows(new EdgePairs(edges), rows));
    const viaPacked = aggregatePackedRows(
      new EdgePairs(edges).length,
      { sets, packed },
      edgeSurface,
      count,
      edges.hasEnclosure,
    );
    expect(bytes(viaPacked.F)).toEqual(bytes(viaMatrix.F));
    expect(bytes(viaPacked.rowSumResidual)).toEqual(bytes(viaMatrix.rowSumResidual));
    expect(viaPacked.reciprocityResidual).toBe(viaMatrix.reciprocityResidual);
  }
  // The same geometry in other units (lengths times 1000): factors as the matrix path gives them.
  const L = new EdgePairs(edges).length;
  const scaled = L.map((v) => v * 1000);
  const sets = balancedRowSets(n, 2);
  const rows = { sets, packed: sets.map((r) => packRows(new EdgePairs(edges), r)) };
  const packedScaled = aggregatePackedRows(L, rows, edgeSurface, count, edges.hasEnclosure, scaled);
  const matrixScaled = aggregateToSurfaces(n, scaled, single, edgeSurface, count, edges.hasEnclosure);
  expect(bytes(packedScaled.F)).toEqual(bytes(matrixScaled.F));
  expect(bytes(packedScaled.surfaceLength)).toEqual(bytes(matrixScaled.surfaceLength));
  // Summed into a reused buffer still holding another sketch's numbers: cleared first, the same bits, that buffer.
  const reused = new Float64Array(count * count).fill(0.375);
  const intoReused = aggregatePackedRows(L, rows, edgeSurface, count, edges.hasEnclosure, scaled, reused);
  expect(intoReused.F).toBe(reused);
  expect(bytes(intoReused.F)).toEqual(bytes(matrixScaled.F));
  expect(() => aggregatePackedRows(L, rows, edgeSurface, count, true, L, new Float64Array(count * count + 1))).toThrow(
    /buffer/,
  );
}

describe('rows shared over workers', () => {
  it('random polygon sketches: edge matrix and surface sums identical for 1 to 4 workers', () => {
    fc.assert(
      fc.property(sketchArb, fc.integer({ min: 1, max: 6 }), fc.nat(1000), (polys, m, seed) => {
        const polygons = polys.map((p) => ({ kind: p.kind, points: p.points.flat() }));
        checkScene(polygons, [], m, seed);
      }),
      { numRuns: 25, seed: 1304 },
    );
  });

  it('random sketches with exact circles (arcs that see themselves included): identical for 1 to 4 workers', () => {
    fc.assert(
      fc.property(mixedSceneArb, fc.integer({ min: 1, max: 6 }), fc.nat(1000), (scene, m, seed) => {
        checkScene(scene.polygons, scene.circles, m, seed);
      }),
      { numRuns: 25, seed: 1306 },
    );
  });

  it('sketches of several blocks of rows (over 32 edges): the same sums, bit for bit, per edge and in few surfaces', () => {
    const ring = (cx: number, cy: number, r: number, k: number) =>
      Array.from({ length: k }, (_, t) => [
        cx + r * Math.cos((2 * Math.PI * t) / k),
        cy + r * Math.sin((2 * Math.PI * t) / k),
      ]).flat();
    const polygons: PolygonInput[] = [
      { kind: 'enclosure', points: ring(0, 0, 10, 70) },
      { kind: 'solid', points: ring(-4, 0, 1.5, 17) },
      { kind: 'solid', points: ring(4, 1, 2, 23) },
      { kind: 'solid', points: ring(0, -5, 1, 6) },
    ];
    expect(buildEdges(polygons, []).count).toBe(116);
    for (const [m, seed] of [
      [1000, 0],
      [3, 7],
    ])
      checkScene(polygons, [], m, seed);
  });

  it('unpackRows writes what a plain pair-by-pair loop writes, over many rows in several parts', () => {
    // n = 700 edges in three parts; packed values
    // include zeros (pairs that do not see each other) and the lengths differ per edge.
    const n = 700;
    const length = Float64Array.from({ length: n }, (_, i) => 0.5 + ((i * 37) % 101) / 50);
    for (const rows of balancedRowSets(n, 3)) {
      const packed = Float64Array.from({ length: packedLength(n, rows) }, (_, k) => (k % 7 === 3 ? 0 : 1 + (k % 13)));
      const tiled = new Float64Array(n * n);
      unpackRows(length, rows, packed, tiled);
      const plain = new Float64Array(n * n);
      let at = 0;
      for (const i of rows) {
        const self = packed[at++];
        if (self > 0) plain[i * n + i] = self / length[i];
        for (let j = i + 1; j < n; j++) {
          const g = packed[at++];
          if (g > 0) {
            plain[i * n + j] = g / length[i];
            plain[j * n + i] = g / length[j];
          }
        }
      }
      // The first entry whose bits differ (-1: none); a plain loop, as deep equality of 4 MB is slow.
      const a = bytes(tiled);
      const b = bytes(plain);
      let first = -1;
      for (let k = 0; k < a.length && first < 0; k++) if (a[k] !== b[k]) first = k >> 3;
      expect(first).toBe(-1);
    }
  });

  it('packed rows with a row missing, twice, or the wrong length are refused, not summed', () => {
    const L = new Float64Array([1, 1, 1]);
    const sum = (sets: number[][], lengths: number[]) =>
      aggregatePackedRows(
        L,
        { sets: sets.map((r) => Int32Array.from(r)), packed: lengths.map((k) => new Float64Array(k)) },
        [0, 0, 0],
        1,
        true,
      );
    expect(() => sum([[0, 1, 2]], [6])).not.toThrow();
    expect(() => sum([[0, 2]], [4])).toThrow(/row 1 of 3 is missing/);
    expect(() =>
      sum(
        [
          [0, 1],
          [1, 2],
        ],
        [5, 3],
      ),
    ).toThrow(/row 1 out of range or twice/);
    expect(() => sum([[0, 1, 2]], [5])).toThrow(/holds 5 numbers for 3 rows/);
  });

  it('surface factors written over their exchange sums are the numbers a fresh array gets, bit for bit', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 0, max: 2 ** 31 - 1 }), (m, seed) => {
        let x = seed || 1;
        const next = () => ((x = (x * 16807) % 2147483647) / 2147483647) * 3;
        // Nearly reciprocal sums (G_IJ against G_JI), a zero-length surface now and then.
        const G = Float64Array.from({ length: m * m }, next);
        for (let I = 0; I < m; I++) for (let J = 0; J < I; J++) G[I * m + J] = G[J * m + I] * (1 + 1e-15 * next());
        const lengths = Float64Array.from({ length: m }, (_, I) => (I === 2 ? 0 : 1 + next()));
        const fresh = surfaceResult(3, lengths, lengths, G, true);
        const scratch = G.slice();
        const over = surfaceResult(3, lengths, lengths, scratch, true, true);
        expect(over.F).toBe(scratch);
        expect(bytes(over.F)).toEqual(bytes(fresh.F));
        expect(bytes(over.rowSumResidual)).toEqual(bytes(fresh.rowSumResidual));
        expect(over.reciprocityResidual).toBe(fresh.reciprocityResidual);
      }),
    );
  });

  it('balanced row sets: every row once, ascending, pair counts within one row of each other', () => {
    for (const n of [1, 2, 7, 100, 1013])
      for (const p of [1, 2, 3, 4, 8]) {
        const sets = balancedRowSets(n, p);
        expect(sets).toHaveLength(p);
        const seen = new Uint8Array(n);
        const loads = sets.map((rows) => {
          let load = 0;
          rows.forEach((i, k) => {
            if (k > 0) expect(i).toBeGreaterThan(rows[k - 1]);
            seen[i]++;
            load += rowPairCount(n, i);
          });
          return load;
        });
        expect(Array.from(seen)).toEqual(new Array<number>(n).fill(1));
        // Greedy dealing of decreasing costs: no set exceeds another by more than the largest row (n pairs).
        expect(Math.max(...loads) - Math.min(...loads)).toBeLessThanOrEqual(n);
        // All pairs counted once: n rows of n - i pairs (the diagonal included).
        expect(loads.reduce((a, b) => a + b, 0)).toBe((n * (n + 1)) / 2);
      }
  });

  it('the direct sums give exact reciprocity and match an independent area-weighted sum over the whole matrix', () => {
    // A 3 x 1 duct split in 12 unit edges around a square bar, 4 surfaces.
    const wall = [0, 0, 1, 0, 2, 0, 3, 0, 3, 1, 2, 1, 1, 1, 0, 1];
    const bar = [1.4, 0.4, 1.6, 0.4, 1.6, 0.6, 1.4, 0.6];
    const polygons: PolygonInput[] = [
      { kind: 'enclosure', points: wall },
      { kind: 'solid', points: bar },
    ];
    const edgeSurface = Int32Array.from([0, 0, 0, 1, 2, 2, 2, 1, 3, 3, 3, 3]);
    const edges = buildEdges(polygons);
    const L = new EdgePairs(edges).length;
    const F = edgeViewFactors(edges);
    // Independent of both paths: F_IJ = sum L_i F_ij / sum L_i over the full matrix
    // (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.1).
    const m = 4;
    const num = new Array<number>(m * m).fill(0);
    const den = new Array<number>(m).fill(0);
    for (let i = 0; i < 12; i++) {
      den[edgeSurface[i]] += L[i];
      for (let j = 0; j < 12; j++) num[edgeSurface[i] * m + edgeSurface[j]] += L[i] * F[i * 12 + j];
    }
    const direct = splitSurfaces(edges, edgeSurface, m, 3);
    expect(direct.reciprocityResidual).toBe(0);
    for (let k = 0; k < m * m; k++)
      expect(Math.abs(direct.F[k] - num[k] / den[Math.floor(k / m)])).toBeLessThanOrEqual(1e-14);
    // Closed duct: every row sums to one (summation rule, Incropera et al., 6th ed., sec. 13.1).
    for (let I = 0; I < m; I++) expect(Math.abs(direct.rowSumResidual[I])).toBeLessThan(1e-12);
  });

  it('computeViewFactors keeps the edge-matrix path below the budget (the same bits as summing the matrix)', () => {
    const polygons: PolygonInput[] = [{ kind: 'enclosure', points: [0, 0, 2, 0, 2, 1, 1, 2, 0, 1] }];
    const edges = buildEdges(polygons);
    const edgeSurface = [0, 1, 1, 0, 2];
    const r = computeViewFactors({ polygons, edgeSurface, surfaceCount: 3 });
    const viaMatrix = aggregateToSurfaces(5, new EdgePairs(edges).length, edgeViewFactors(edges), edgeSurface, 3, true);
    expect(bytes(r.F)).toEqual(bytes(viaMatrix.F));
  });
});
