// The worker's API over a real message channel (comlink), as the browser runs it.
import { describe, expect, it } from 'vitest';
import * as Comlink from 'comlink';
import { MessageChannel } from 'node:worker_threads';
import nodeEndpoint from 'comlink/dist/esm/node-adapter';
import { createViewFactorApi, viewFactorApi } from '../../src/worker/api';
import {
  isSurfaceAnswer,
  jobFromPolygons,
  type EdgeViewFactors,
  type ViewFactorAnswer,
  type ViewFactorApi,
} from '../../src/worker/job';
import { documentApi } from '../../src/state/documentApi';
import { surfaceFactors } from '../../src/state/results/derive';
import { surfaceIndex } from '../../src/document/surfaceIndex';
import { demoSketch } from '../../src/state/demo';
import { regularPolygon } from '../../src/state/tools/quickShapes';
import type { SketchFile } from '../../src/state/sketchFile';
import { edgeMatrixOf } from './edgeMatrix';

/** The demo oven with each round tube as a 12-sided polygon, for the polygon job. */
function polygonDemo(): SketchFile {
  return {
    ...demoSketch,
    shapes: demoSketch.shapes.map((sh) => {
      if (!sh.circle) return sh;
      const [x, y] = sh.circle.center;
      const points = regularPolygon([x, y], [x + sh.circle.radius, y], 12)!;
      return { kind: sh.kind, points, surface: sh.surface };
    }),
  };
}

/** The checked form of a sketch, as the app passes it to toScene. */
function checked(doc: unknown) {
  const r = documentApi.restore(doc);
  if (!r.ok) throw new Error(JSON.stringify(r.errors));
  return r.sketch;
}

/** The worker's api behind a real channel; close() frees both ports. */
function overChannel(api: ViewFactorApi = viewFactorApi) {
  const { port1, port2 } = new MessageChannel();
  Comlink.expose(api, nodeEndpoint(port1));
  const remote = Comlink.wrap<ViewFactorApi>(nodeEndpoint(port2));
  return {
    remote,
    close: () => {
      port1.close();
      port2.close();
    },
  };
}

/** Edge factors (a job without surfaces never answers surface sums). */
function edgeAnswer(r: ViewFactorAnswer): EdgeViewFactors {
  if (isSurfaceAnswer(r)) throw new Error('expected edge factors');
  return r;
}

/**
 * Independent of the code under test: surfaces numbered by first appearance, and
 * F_IJ = sum_{i in I, j in J} L_i F_ij / L_I (the area-weighted sum of the summation
 * rule; Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.1).
 */
function sumToSurfaces(edges: EdgeViewFactors, shapes: readonly { surface: readonly string[] }[]) {
  const names: string[] = [];
  const of: number[] = [];
  for (const shape of shapes)
    for (const name of shape.surface) {
      if (!names.includes(name)) names.push(name);
      of.push(names.indexOf(name));
    }
  const m = names.length;
  const n = edges.edgeCount;
  const F = edgeMatrixOf(edges);
  const length = new Array<number>(m).fill(0);
  const exchange = new Array<number>(m * m).fill(0);
  for (let i = 0; i < n; i++) {
    length[of[i]] += edges.edgeLength[i];
    for (let j = 0; j < n; j++) exchange[of[i] * m + of[j]] += edges.edgeLength[i] * F[i * n + j];
  }
  return { names, length, F: exchange.map((g, k) => g / length[Math.floor(k / m)]) };
}

describe('worker api', () => {
  it('returns edge factors through the channel; summed to surfaces they match an independent area-weighted sum', async () => {
    const { remote, close } = overChannel();
    const sketch = checked(polygonDemo());
    const { scene } = documentApi.toScene(sketch);
    const viaWorker = edgeAnswer(await remote.compute(jobFromPolygons(scene.polygons)));
    close();
    const edgeCount = sketch.shapes.reduce((k, s) => k + s.points.length, 0); // 6 + 4 x 12
    expect(edgeCount).toBe(54);
    expect(viaWorker.edgeCount).toBe(edgeCount);
    expect(edgeMatrixOf(viaWorker)).toHaveLength(edgeCount * edgeCount);
    expect(viaWorker.closed).toBe(true);
    const expected = sumToSurfaces(viaWorker, sketch.shapes);
    expect(expected.names).toEqual([
      'fired floor',
      'side walls',
      'refractory roof',
      'tube 1',
      'tube 2',
      'tube 3',
      'tube 4',
    ]);
    const summed = surfaceFactors(viaWorker, surfaceIndex(sketch.shapes));
    const m = expected.names.length;
    expect(summed.surfaceCount).toBe(m);
    // Same sums in another order: rounding only (factors are at most 1).
    for (let k = 0; k < m * m; k++) expect(Math.abs(summed.F[k] - expected.F[k])).toBeLessThanOrEqual(1e-12);
    for (let I = 0; I < m; I++) {
      expect(Math.abs(summed.surfaceLength[I] - expected.length[I])).toBeLessThanOrEqual(1e-12);
      // Closed enclosure: every row sums to one (summation rule, Incropera et al., 6th ed., sec. 13.1).
      let row = 0;
      for (let J = 0; J < m; J++) row += expected.F[I * m + J];
      expect(Math.abs(1 - row)).toBeLessThanOrEqual(1e-9);
    }
    // Floor: 2.4 m; roof: 1.8 m flat plus two 0.3 m x 0.3 m chamfers (the demo's own coordinates).
    expect(Math.abs(expected.length[0] - 2.4)).toBeLessThanOrEqual(1e-12);
    expect(Math.abs(expected.length[2] - (1.8 + 2 * 0.3 * Math.SQRT2))).toBeLessThanOrEqual(1e-12);
  });

  it('a unit square duct through the channel: adjacent walls 1 - sqrt(2)/2, opposite walls sqrt(2) - 1', async () => {
    // Hottel's crossed strings (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.1):
    // adjacent (1 + 1 - sqrt 2) / 2, opposite (2 sqrt 2 - 2) / 2; a flat wall does not see itself.
    const { remote, close } = overChannel();
    const r = edgeAnswer(
      await remote.compute({
        polygons: [{ kind: 'enclosure', points: Float64Array.from([0, 0, 1, 0, 1, 1, 0, 1]) }],
      }),
    );
    close();
    expect(r.edgeCount).toBe(4);
    expect(Array.from(r.edgeLength)).toEqual([1, 1, 1, 1]);
    const adjacent = 1 - Math.SQRT2 / 2;
    const opposite = Math.SQRT2 - 1;
    const F = edgeMatrixOf(r);
    for (let i = 0; i < 4; i++)
      for (let j = 0; j < 4; j++) {
        const expected = i === j ? 0 : (i - j + 4) % 2 === 0 ? opposite : adjacent;
        expect(Math.abs(F[i * 4 + j] - expected)).toBeLessThanOrEqual(1e-12);
      }
  });

  it('a worker that remembers its rows, and gets its buffers back, answers a drag with the bits a fresh worker gives', async () => {
    // One tube of the polygon demo moved step by step, as a drag posts jobs; rows 0, 2, 4, ... as one
    // worker of two would get them. Between steps the tube also jumps back, and the rows change once.
    const { remote, close } = overChannel(createViewFactorApi());
    const base = documentApi.toScene(checked(polygonDemo())).scene.polygons;
    const tube = base.findIndex((p) => p.kind === 'solid');
    const moved = (dx: number) =>
      jobFromPolygons(
        base.map((p, k) =>
          k === tube ? { ...p, points: Array.from(p.points, (v, c) => (c % 2 === 0 ? v + dx : v)) } : p,
        ),
      );
    const n = base.reduce((k, p) => k + p.points.length / 2, 0);
    const even = Int32Array.from({ length: Math.ceil(n / 2) }, (_, k) => 2 * k);
    const odd = Int32Array.from({ length: Math.floor(n / 2) }, (_, k) => 2 * k + 1);
    const bytes = (a: Float64Array) => Array.from(new Uint8Array(a.buffer, a.byteOffset, a.byteLength));
    // Whether the pairs can be kept from the step before (false: first job, or other rows).
    for (const [dx, rows, kept] of [
      [0, even, false],
      [0.01, even, true],
      [0.02, even, true],
      [0, even, true],
      [0.03, odd, false],
      [0.04, odd, true],
    ] as const) {
      const job = moved(dx);
      const got = await remote.computeRows(job, rows);
      const fresh = viewFactorApi.computeRows(job, rows) as Awaited<typeof got>;
      if (got.kind !== 'matrix' || fresh.kind !== 'matrix') throw new Error('expected packed rows');
      expect(bytes(got.packed)).toEqual(bytes(fresh.packed));
      expect(Array.from(got.rows)).toEqual(Array.from(rows));
      expect(fresh.computed).toBe(got.packed.length);
      if (kept) expect(got.computed).toBeLessThan(got.packed.length / 2);
      else expect(got.computed).toBe(got.packed.length);
      // Handed back over the channel, as the page does with an answer it dropped: detached here.
      const back = got.packed;
      await remote.recycle(Comlink.transfer([back], [back.buffer as ArrayBuffer]));
      expect(back.length).toBe(0);
    }
    close();
  });
});
