// Benchmark of the view factors over threads (issue 13, targets 3 and 6), run by
// `npm run bench` (imported from run.ts):
// - one thread against N threads (N = cores) on a seeded 1600-edge furnace section,
//   timed in alternation, medians; the target is a speed-up of at least 0.7 x cores
//   on an idle machine. The worker threads are started once and kept; untimed rounds
//   of both come first.
// - `npm run bench -- --scale` (minutes, not in the default run): a 20,000-edge
//   section with 300 surfaces summed straight to surfaces over every core, with the
//   process's peak resident memory (target: at most 1 GB; the edge matrix alone
//   would be 3.2 GB). It runs first and alone, then the process ends.
import { availableParallelism, loadavg } from 'node:os';
import type { SceneInput, ViewFactorResult } from '../../src/core/scene';
import { endThreads, threadedViewFactors } from '../../src/cli/threads';
import { coRunCeiling } from './coRun';
import { tubeScene } from './scenes';

const args = process.argv.slice(2);
const cores = availableParallelism();
const median = (a: number[]) => [...a].sort((x, y) => x - y)[a.length >> 1];
const mb = (bytes: number) => `${(bytes / 1e6).toFixed(0)} MB`;

/**
 * A 10 x 4 furnace box whose walls are split into `wallEdges` edges (100 surfaces)
 * around a 10 x 4 bank of `tubes` polygon tubes (radius 0.3 on a 1 m grid), each of
 * `sides` sides split into 5 surfaces.
 */
export function scaleScene(wallEdges: number, sides: number): SceneInput {
  const per = wallEdges / 4;
  const corners = [
    [0, 0],
    [10, 0],
    [10, 4],
    [0, 4],
  ];
  const wall: number[] = [];
  for (let c = 0; c < 4; c++) {
    const [x0, y0] = corners[c];
    const [x1, y1] = corners[(c + 1) % 4];
    for (let k = 0; k < per; k++) wall.push(x0 + ((x1 - x0) * k) / per, y0 + ((y1 - y0) * k) / per);
  }
  const polygons: SceneInput['polygons'] = [{ kind: 'enclosure', points: wall }];
  const edgeSurface: number[] = Array.from({ length: wallEdges }, (_, k) => Math.floor((100 * k) / wallEdges));
  let surfaceCount = 100;
  for (let gx = 0; gx < 10; gx++)
    for (let gy = 0; gy < 4; gy++) {
      const pts: number[] = [];
      for (let k = 0; k < sides; k++) {
        const a = (2 * Math.PI * k) / sides + 0.1 * gx;
        pts.push(0.5 + gx + 0.3 * Math.cos(a), 0.5 + gy + 0.3 * Math.sin(a));
        edgeSurface.push(surfaceCount + Math.floor((5 * k) / sides));
      }
      polygons.push({ kind: 'solid', points: pts });
      surfaceCount += 5;
    }
  return { polygons, edgeSurface, surfaceCount };
}

/** Are two arrays of doubles equal bit for bit? (A plain loop over their words: a closure per element took longer than the runs it checks, and left the threads idle between them.) */
function sameBits(a: Float64Array, b: Float64Array): boolean {
  if (a.length !== b.length) return false;
  const x = new Int32Array(a.buffer, a.byteOffset, 2 * a.length),
    y = new Int32Array(b.buffer, b.byteOffset, 2 * b.length);
  for (let k = 0; k < x.length; k++) if (x[k] !== y[k]) return false;
  return true;
}

function worstRowSum(F: Float64Array, m: number): number {
  let worst = 0;
  for (let I = 0; I < m; I++) {
    let s = 0;
    for (let J = 0; J < m; J++) s += F[I * m + J];
    worst = Math.max(worst, Math.abs(1 - s));
  }
  return worst;
}

function scaleRun(): void {
  const scene = scaleScene(4000, 400);
  const n = scene.edgeSurface.length;
  const before = process.resourceUsage().maxRSS / 1024;
  console.log(
    `scale: ${n} edges, ${scene.surfaceCount} surfaces, ${cores} threads; the edge matrix would be ${mb(8 * n * n)}, the surface sums take ${mb(8 * scene.surfaceCount ** 2)}`,
  );
  const t0 = performance.now();
  const r = threadedViewFactors(scene, cores);
  const seconds = (performance.now() - t0) / 1000;
  const peak = process.resourceUsage().maxRSS / 1024;
  console.log(
    `scale: ${seconds.toFixed(0)} s (${(((seconds * 1e9) / ((n * (n + 1)) / 2)) * cores).toFixed(0)} ns per pair per thread), worst |1 - row sum| ${worstRowSum(r.F, r.surfaceCount).toExponential(1)}`,
  );
  console.log(
    `scale: peak resident memory ${peak.toFixed(0)} MB (before the run ${before.toFixed(0)} MB; target <= 1000 MB): ${peak <= 1000 ? 'met' : 'NOT met'}`,
  );
}

function speedUp(quick: boolean): void {
  const scene = quick ? tubeScene(1, 20, 18, 40) : tubeScene(1, 20, 75, 100);
  const n = scene.edgeSurface.length;
  const threads = Math.max(2, cores);
  const first = threadedViewFactors(scene, threads); // starts the worker threads (kept), untimed
  // Untimed rounds of both first, as for every scene of the bench: the engine takes
  // 3-5 runs of this scene to compile its hot code, and the worker threads run only
  // their share of each, so timing from the first run measured the warm-up (one
  // thread fell from 330 to 140 ms over the timed runs, and the ratio with it).
  // Each run writes over the run before's surface factors, as a study's cases do
  // (sweepCommand's studyViewFactors): fresh memory for 1600^2 doubles took longer
  // to fault in than the whole surface stage.
  let a: ViewFactorResult | undefined, b: ViewFactorResult | undefined;
  for (let w = 0; w < (quick ? 1 : 5); w++) {
    a = threadedViewFactors(scene, 1, { reuse: a });
    b = threadedViewFactors(scene, threads, { reuse: b });
  }
  const one: number[] = [];
  const many: number[] = [];
  let identical = true;
  for (let r = 0; r < (quick ? 3 : 7); r++) {
    let t0 = performance.now();
    a = threadedViewFactors(scene, 1, { reuse: a });
    one.push(performance.now() - t0);
    t0 = performance.now();
    b = threadedViewFactors(scene, threads, { reuse: b });
    many.push(performance.now() - t0);
    identical &&= sameBits(a.F, b.F) && sameBits(a.F, first.F);
  }
  endThreads();
  const t1 = median(one);
  const tN = median(many);
  const target = 0.7 * cores;
  console.log(
    `threads: ${n} edges, one thread median ${t1.toFixed(0)} ms, ${threads} threads median ${tN.toFixed(0)} ms: speed-up ${(t1 / tN).toFixed(3)}x (target >= 0.7 x ${cores} cores = ${target.toFixed(1)}x on an idle machine; load now ${loadavg()[0].toFixed(1)}): ${t1 / tN >= target ? 'met' : 'NOT met'}; results identical: ${identical ? 'yes' : 'NO'}`,
  );
  // Right after, what the machine allows: the edge matrix alone, then one copy per thread at once (information).
  const c = coRunCeiling(scene, threads, quick ? 3 : 7);
  console.log(
    `threads, the machine now: the edge matrix alone ${c.alone.toFixed(0)} ms; ${threads} copies at once, a thread each, ${c.together.map((t) => t.toFixed(0)).join(' and ')} ms: no code could gain more than ${c.ceiling.toFixed(2)}x over ${threads} threads now (information)`,
  );
}

if (args.includes('--scale')) {
  scaleRun();
  endThreads();
  process.exit(0);
}
speedUp(args.includes('--quick'));
