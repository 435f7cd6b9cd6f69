// The view-factor commands over worker threads: --threads 1 (in-process) and
// --threads 2 print the same numbers, and every thread count gives the same
// edge matrix sums and surface sums bit for bit (core pairRows.ts: a pair's
// factor depends only on the sketch and the pair).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';
import { parseThreads, threadedViewFactors } from '../../src/cli/threads';
import { surfaceBlocks } from '../../src/cli/threadWork';
import { restore, toScene } from '../../src/document';
import { parseParameter, parseTarget, runSweep, solveForTarget } from '../../src/document/study';
import { computeViewFactors } from '../../src/core/viewFactors';
import type { SceneInput } from '../../src/core/scene';
import { mixedSceneArb, edgeCountOf } from '../core/arc/arbitraries';

function run(args: string[], files: Record<string, string> = {}) {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: (path) => files[path],
  };
  return { code: main(args, io), out, err };
}

const bytes = (a: Float64Array) => new Uint8Array(a.buffer, a.byteOffset, a.byteLength);

/** A duct split into 40 wall pieces (4 surfaces) around three tubes, one exact circle among them. */
function ductFile(): string {
  const wall: number[][] = [];
  for (let k = 0; k < 10; k++) wall.push([k, 0]);
  for (let k = 0; k < 10; k++) wall.push([10, k * 0.4]);
  for (let k = 10; k > 0; k--) wall.push([k, 4]);
  for (let k = 10; k > 0; k--) wall.push([0, k * 0.4]);
  const names = wall.map((_, k) => ['floor', 'right', 'roof', 'left'][Math.floor(k / 10)]);
  const tube = (cx: number, sides: number) =>
    Array.from({ length: sides }, (_, k) => [
      cx + 0.5 * Math.cos((2 * Math.PI * k) / sides),
      2 + 0.5 * Math.sin((2 * Math.PI * k) / sides),
    ]);
  return JSON.stringify({
    version: 2,
    units: 'm',
    shapes: [
      { kind: 'enclosure', points: wall, surface: names },
      { kind: 'solid', points: tube(2.5, 16), surface: 'tube a' },
      { kind: 'solid', points: tube(5, 9), surface: 'tube b' },
      { kind: 'solid', circle: { center: [7.5, 2], radius: 0.5 }, surface: ['tube c 1', 'tube c 2'] },
    ],
    surfaces: { floor: { emissivity: 0.8, temperature: 1200 }, roof: { emissivity: 0.6 } },
  });
}

describe('--threads', () => {
  it('factors and exchange print the same with --threads 1 and --threads 2', () => {
    const files = { 'duct.json': ductFile() };
    for (const command of [
      ['factors', 'duct.json', '--json'],
      ['exchange', 'duct.json', '--json'],
    ]) {
      const one = run([...command, '--threads', '1'], files);
      const two = run([...command, '--threads=2'], files);
      expect(one.err).toBe('');
      expect(one.code).toBe(0);
      expect(two.err).toBe('');
      expect(two.code).toBe(0);
      // JSON prints every double in full (shortest round-trip form), so equal text is equal bits.
      expect(two.out).toBe(one.out);
    }
  });

  it('random sketches with circles: 1, 2 and 3 threads give identical surface factors, by edge matrix and by direct sums', () => {
    const scenes = fc.sample(mixedSceneArb, { numRuns: 6, seed: 1331 }).filter((s) => edgeCountOf(s) >= 6);
    expect(scenes.length).toBeGreaterThan(2);
    for (const s of scenes) {
      const n = edgeCountOf(s);
      const scene: SceneInput = {
        polygons: s.polygons,
        circles: s.circles,
        edgeSurface: Array.from({ length: n }, (_, k) => k % 3),
        surfaceCount: Math.min(3, n),
      };
      const single = computeViewFactors(scene);
      const direct = threadedViewFactors(scene, 1);
      expect(bytes(direct.F)).toEqual(bytes(single.F));
      // workersOnly: the worker threads do every chunk (the main thread would otherwise take them all before they start).
      const summed = [1, 2, 3].map((t) => threadedViewFactors(scene, t, { sumToSurfaces: true, workersOnly: t > 1 }));
      for (const t of [2, 3])
        expect(bytes(threadedViewFactors(scene, t, { workersOnly: true }).F)).toEqual(bytes(single.F));
      for (const r of summed.slice(1)) expect(bytes(r.F)).toEqual(bytes(summed[0].F));
      // Direct sums against the edge-matrix path: the same positive terms in another order.
      for (let k = 0; k < single.F.length; k++)
        expect(Math.abs(summed[1].F[k] - single.F[k])).toBeLessThanOrEqual(1e-13 * Math.abs(single.F[k]));
    }
  }, 120_000); // starting worker threads (tsx compiles their modules) is slow on a busy machine

  it('sweep and solve-for of a position print the same with --threads 1 and --threads 2', () => {
    // A cooler tube, so that the floor's net heat depends on where tube b stands.
    const duct = JSON.parse(ductFile()) as { surfaces: Record<string, object> };
    duct.surfaces['tube a'] = { emissivity: 0.9, temperature: 500 };
    const files = { 'duct.json': JSON.stringify(duct) };
    // Moving a tube recomputes the view factors for every value: each case over the threads.
    const sweep = ['sweep', 'duct.json', '--vary', 'tube b.x', '--from', '4', '--to', '6', '--steps', '3', '--json'];
    const swept = run([...sweep, '--threads', '1'], files);
    expect(swept.err).toBe('');
    const floorHeat = (JSON.parse(swept.out) as { runs: { surfaces: { name: string; netHeat: number }[] }[] }).runs.map(
      (r) => r.surfaces.find((x) => x.name === 'floor')!.netHeat,
    );
    expect(floorHeat[0]).not.toBe(floorHeat[2]);
    const middle = (floorHeat[0] + floorHeat[2]) / 2;
    const solveFor = [
      ...['solve-for', 'duct.json', '--vary', 'tube b.x', '--from', '4', '--to', '6', '--steps', '3'],
      ...['--target', `floor.netHeat=${middle}`, '--json'],
    ];
    for (const command of [sweep, solveFor]) {
      const one = run([...command, '--threads', '1'], files);
      const two = run([...command, '--threads=2'], files);
      expect(one.err).toBe('');
      expect(one.code).toBe(0);
      expect(two.out).toBe(one.out);
      expect(two.code).toBe(0);
    }
    expect(run([...sweep, '--threads', '0'], files).code).toBe(2);
  }, 120_000);

  it('sweep and solve-for compute each case through the view-factor function they are given', () => {
    const read = restore(JSON.parse(ductFile()));
    if (!read.ok) throw new Error('duct sketch invalid');
    const position = parseParameter('tube b.x'),
      emissivity = parseParameter('roof.emissivity'),
      target = parseTarget('roof.temperature=1200');
    if (!position.ok || !emissivity.ok || !target.ok) throw new Error('parameters invalid');
    let calls = 0;
    const counted = (scene: SceneInput) => {
      calls++;
      return computeViewFactors(scene);
    };
    expect(runSweep(read.sketch, position.value, 4.5, 5.5, 3, { viewFactors: counted }).ok).toBe(true);
    expect(calls).toBe(3); // a position: every case
    calls = 0;
    expect(runSweep(read.sketch, emissivity.value, 0.5, 0.7, 3, { viewFactors: counted }).ok).toBe(true);
    expect(calls).toBe(1); // a property: the first case's factors serve all
    calls = 0;
    const names = ['floor', 'right', 'roof', 'left', 'tube a', 'tube b', 'tube c 1', 'tube c 2'];
    solveForTarget(read.sketch, names, position.value, 4.5, 5.5, target.value, 3, counted);
    expect(calls).toBeGreaterThanOrEqual(3);
  });

  it('a smaller sketch after a larger one (the kept edge matrix is bigger than it needs) gives the same bits, on 2 threads then 1', () => {
    // Polygon rooms of falling size: many of their pairs are silent and never written, so
    // a kept matrix not cleared between sketches would show the larger one's factors.
    for (const [pieces, tubes, sides] of [
      [12, 6, 9],
      [6, 3, 5],
      [3, 1, 4],
    ]) {
      const room: number[] = [];
      for (let k = 0; k < pieces; k++) room.push((8 * k) / pieces, 0);
      for (let k = 0; k < pieces; k++) room.push(8, (3 * k) / pieces);
      for (let k = pieces; k > 0; k--) room.push((8 * k) / pieces, 3);
      for (let k = pieces; k > 0; k--) room.push(0, (3 * k) / pieces);
      const polygons: SceneInput['polygons'] = [{ kind: 'enclosure', points: room }];
      for (let t = 0; t < tubes; t++) {
        const points: number[] = [];
        for (let k = 0; k < sides; k++)
          points.push(
            1 + t + 0.3 * Math.cos((2 * Math.PI * k) / sides),
            1.5 + 0.3 * Math.sin((2 * Math.PI * k) / sides),
          );
        polygons.push({ kind: 'solid', points });
      }
      const n = 4 * pieces + tubes * sides;
      // Two edges a surface, so the surface stages add rows of several edges.
      const scene: SceneInput = {
        polygons,
        edgeSurface: Array.from({ length: n }, (_, k) => k >> 1),
        surfaceCount: (n + 1) >> 1,
      };
      const single = computeViewFactors(scene);
      for (const t of [2, 1]) {
        const r = threadedViewFactors(scene, t);
        expect(bytes(r.F)).toEqual(bytes(single.F));
        expect(bytes(r.rowSumResidual)).toEqual(bytes(single.rowSumResidual));
        expect(r.reciprocityResidual).toBe(single.reciprocityResidual);
      }
    }
  }, 120_000);

  it('a result handed back (reuse) is written over with the same bits as fresh memory, on 2 threads and 1', () => {
    const read = restore(JSON.parse(ductFile()));
    if (!read.ok) throw new Error('duct sketch invalid');
    const { scene } = toScene(read.sketch);
    const single = computeViewFactors(scene);
    const m = scene.surfaceCount;
    // Buffers holding something else, as an earlier case's factors would.
    const stale = (shared: boolean) => {
      const F = new Float64Array(shared ? new SharedArrayBuffer(8 * m * m) : new ArrayBuffer(8 * m * m)).fill(0.25);
      return { ...single, F };
    };
    for (const t of [2, 1]) {
      for (const shared of [true, false]) {
        const earlier = stale(shared);
        const r = threadedViewFactors(scene, t, { reuse: earlier, workersOnly: t > 1 });
        expect(bytes(r.F)).toEqual(bytes(single.F));
        expect(bytes(r.rowSumResidual)).toEqual(bytes(single.rowSumResidual));
        // Written in place: over threads only into shared memory, in-process into either.
        expect(r.F.buffer === earlier.F.buffer).toBe(t === 1 || shared);
      }
      // A buffer of another size is left as it was.
      const other = { ...single, F: new Float64Array(new SharedArrayBuffer(8 * (m * m + 1))).fill(0.25) };
      expect(bytes(threadedViewFactors(scene, t, { reuse: other }).F)).toEqual(bytes(single.F));
      expect(other.F.every((f) => f === 0.25)).toBe(true);
    }
  }, 120_000);

  it('surface blocks cover every surface once, in order, none empty', () => {
    for (const [surfaces, threads] of [
      [1, 4],
      [7, 2],
      [300, 3],
    ]) {
      const edgeSurface = Array.from({ length: 3 * surfaces }, (_, k) => (k * 7) % surfaces);
      const start = surfaceBlocks(edgeSurface, surfaces, threads);
      expect(start[0]).toBe(0);
      expect(start[start.length - 1]).toBe(surfaces);
      for (let b = 0; b + 1 < start.length; b++) expect(start[b + 1]).toBeGreaterThan(start[b]);
      if (surfaces >= 8 * threads) expect(start.length - 1).toBeGreaterThanOrEqual(4 * threads);
    }
  });

  it('refuses a bad thread count with exit 2, and the help names the option', () => {
    const files = { 'duct.json': ductFile() };
    for (const bad of ['0', '-1', '1.5', 'many', '100000']) {
      const r = run(['factors', 'duct.json', '--threads', bad], files);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/--threads needs a whole number from 1 to 256/);
    }
    expect(run(['factors', 'duct.json', '--threads'], files).err).toMatch(/--threads needs a number/);
    expect(parseThreads('4')).toBe(4);
    for (const command of ['factors', 'exchange', 'sensitivity', 'report', 'sweep', 'solve-for'])
      expect(run([command, '--help']).out).toMatch(/--threads N {2}worker threads/);
  });
});
