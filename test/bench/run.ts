// Seeded benchmark of the view-factor core: `npm run bench`.
// Prints min and median wall time of a full edge matrix per scene size, the growth
// from one size to the next, and the memory of the edge matrix.
import { buildEdges, totalEdgeCount } from '../../src/core/edges';
import { edgeViewFactors } from '../../src/core/viewFactors';
import type { SceneInput } from '../../src/core/scene';
import { bankScene, furnaceScene, tubeScene } from './scenes';
import { demoSketch } from '../../src/state/demo';
import { restore, toScene } from '../../src/document';
import { solveBalance } from '../../src/core/balance';
import { mixedSection } from './balanceScene';
import './pool';

function demoScene(): SceneInput {
  const r = restore(demoSketch);
  if (!r.ok) throw new Error(`demo sketch invalid: ${r.errors.map((e) => e.message).join('; ')}`);
  return toScene(r.sketch).scene;
}

function time(scene: SceneInput, repeats: number): { min: number; median: number; edges: number; rowWorst: number } {
  const edges = buildEdges(scene.polygons, scene.circles);
  const n = totalEdgeCount(edges);
  const matrix = new Float64Array(n * n);
  const times: number[] = [];
  // Untimed runs first, so the engine has compiled the hot loop (as in a long drag).
  for (let r = 0; r < Math.min(repeats, 10); r++) edgeViewFactors(edges, { edgeMatrix: matrix });
  for (let r = 0; r < repeats; r++) {
    const t0 = performance.now();
    edgeViewFactors(edges, { edgeMatrix: matrix });
    times.push(performance.now() - t0);
  }
  let rowWorst = 0;
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += matrix[i * n + j];
    rowWorst = Math.max(rowWorst, Math.abs(1 - s));
  }
  times.sort((a, b) => a - b);
  return { min: times[0], median: times[times.length >> 1], edges: n, rowWorst };
}

const args = process.argv.slice(2);
const quick = args.includes('--quick');
const cases: { label: string; scene: SceneInput; repeats: number }[] = [
  { label: 'demo oven (first start)', scene: demoScene(), repeats: quick ? 20 : 300 },
  { label: 'drag-size sketch: 6 bodies', scene: tubeScene(42, 6, 22, 18), repeats: quick ? 20 : 200 },
  { label: '20 tubes, ~100 edges', scene: tubeScene(1, 20, 4, 20), repeats: quick ? 5 : 30 },
  { label: '20 tubes, ~400 edges', scene: tubeScene(1, 20, 18, 40), repeats: quick ? 3 : 10 },
  { label: '20 tubes, ~1600 edges', scene: tubeScene(1, 20, 75, 100), repeats: quick ? 1 : 5 },
];

console.log(`node ${process.version}, ${quick ? 'quick' : 'full'} run`);
console.log(
  'scene                          edges   min ms  median ms  growth                   matrix MB  worst |1-row sum|',
);
let previous: { edges: number; median: number } | null = null;
const verdicts: string[] = [];
for (const c of cases) {
  const r = time(c.scene, c.repeats);
  let growth = '';
  if (previous && c.label.startsWith('20 tubes')) {
    // Per doubling of the edges: the square root of the ratio for 4x the edges.
    const perDoubling = Math.pow(r.median / previous.median, 1 / Math.log2(r.edges / previous.edges));
    growth = `${(r.median / previous.median).toFixed(1)}x (${perDoubling.toFixed(2)}x/doubling)`;
    verdicts.push(
      `growth ${previous.edges}->${r.edges} edges: ${perDoubling.toFixed(2)}x per doubling (target <= 4.5): ${perDoubling <= 4.5 ? 'met' : 'NOT met'}`,
    );
  }
  console.log(
    `${c.label.padEnd(30)} ${String(r.edges).padStart(5)} ${r.min.toFixed(2).padStart(8)} ${r.median.toFixed(2).padStart(10)}  ${growth.padEnd(24)} ${((r.edges * r.edges * 8) / 1e6).toFixed(1).padStart(6)}  ${r.rowWorst.toExponential(1)}`,
  );
  if (c.label.startsWith('drag-size'))
    verdicts.push(
      `drag-size sketch (${r.edges} edges, 6 bodies): median ${r.median.toFixed(1)} ms (target <= 5 ms): ${r.median <= 5 ? 'met' : 'NOT met'}`,
    );
  if (c.label.startsWith('20 tubes, ~1600'))
    verdicts.push(
      `1600 edges: median ${r.median.toFixed(0)} ms (target <= 2000 ms): ${r.median <= 2000 ? 'met' : 'NOT met'}`,
    );
  if (c.label.startsWith('20 tubes')) previous = { edges: r.edges, median: r.median };
}
console.log(
  `peak resident memory ${(process.resourceUsage().maxRSS / 1024).toFixed(0)} MB (the 1600-edge matrix is ${((1600 * 1600 * 8) / 1e6).toFixed(1)} MB)`,
);
for (const v of verdicts) console.log(v);

// Exact circles against polygon tubes: the same 50-tube furnace section, timed in
// alternation (one round each, in turn) so a busy machine slows both alike.
{
  const rounds = quick ? 3 : 9;
  const exact: number[] = [],
    polygon: number[] = [];
  const circles = furnaceScene(0),
    gons = furnaceScene(24);
  for (let r = 0; r < rounds; r++) {
    exact.push(time(circles, 1).min);
    polygon.push(time(gons, 1).min);
  }
  const median = (a: number[]) => [...a].sort((x, y) => x - y)[a.length >> 1];
  const e = median(exact),
    g = median(polygon);
  console.log(
    `50-tube furnace section: exact circles median ${e.toFixed(0)} ms, 24-sided tubes median ${g.toFixed(0)} ms (target: circles no slower): ${e <= g ? 'met' : 'NOT met'}`,
  );
  const bank = time(bankScene(), rounds);
  console.log(
    `tube bank, two staggered rows of 25 exact circles (54 edges): min ${bank.min.toFixed(0)} ms, median ${bank.median.toFixed(0)} ms`,
  );
  // The slow case of exact circles (information): pairs between rows see past dozens of tubes.
  const deep = time(bankScene(4), Math.max(1, rounds >> 1));
  console.log(
    `deep tube bank, four staggered rows of 25 exact circles (104 edges): min ${deep.min.toFixed(0)} ms, median ${deep.median.toFixed(0)} ms`,
  );
}

// Other targets: reading a 1600-edge sketch file (validation included) and the
// dense solve behind heat exchange at 2000 surfaces (solve.ts).
{
  const ring = (cx: number, cy: number, r: number, n: number) =>
    Array.from({ length: n }, (_, k) => [
      cx + r * Math.cos((2 * Math.PI * k) / n),
      cy + r * Math.sin((2 * Math.PI * k) / n),
    ]);
  const shapes = [{ kind: 'enclosure', points: ring(0, 0, 100, 400), surface: 'shell' }];
  for (let t = 0; t < 20; t++)
    shapes.push({
      kind: 'solid',
      points: ring(-60 + (t % 5) * 30, -45 + Math.floor(t / 5) * 30, 10, 60),
      surface: `tube ${t + 1}`,
    });
  const text = JSON.stringify({ version: 1, units: 'mm', shapes });
  const reads: number[] = [];
  for (let r = 0; r < (quick ? 5 : 30); r++) {
    const t0 = performance.now();
    if (!restore(text).ok) throw new Error('bench sketch refused');
    reads.push(performance.now() - t0);
  }
  reads.sort((a, b) => a - b);
  console.log(
    `read and check a 1600-edge sketch file: min ${reads[0].toFixed(1)} ms, median ${reads[reads.length >> 1].toFixed(1)} ms`,
  );

  (await import('./solve')).benchDenseSolve(quick);
}

// The whole surface balance with the factors known: every kind of condition (held,
// heat flux, adiabatic, walls with and without casing radiation, tubes, linked
// plates), convection on about half, an open section. 200 surfaces has a target;
// 1000 (a furnace whose tubes are split into arcs for their profiles) is information.
for (const [n, rounds, target] of [
  [200, quick ? 10 : 40, 50],
  [1000, quick ? 1 : 5, 0],
] as const) {
  const input = mixedSection(n, 7, 0.95);
  const times: number[] = [];
  let iterations = 0;
  for (let r = 0; r < (n > 200 ? 1 : 5); r++) solveBalance(input); // untimed: let the engine compile the loops first
  for (let r = 0; r < rounds; r++) {
    const t0 = performance.now();
    const out = solveBalance(input);
    times.push(performance.now() - t0);
    if (!out.ok) throw new Error(`bench balance refused: ${out.code}`);
    iterations = out.result.iterations;
  }
  times.sort((p, q) => p - q);
  const med = times[times.length >> 1];
  const verdict = target > 0 ? ` (target <= ${target} ms): ${med <= target ? 'met' : 'NOT met'}` : ' (information)';
  console.log(
    `surface balance, ${n} surfaces, every condition (${iterations} Newton steps): min ${times[0].toFixed(1)} ms, median ${med.toFixed(1)} ms${verdict}`,
  );
}
await import('./hardBench'); // hard scenes and the crossed-strings floor (issue 13)
(await import('./dragStep')).dragStepSection(quick);
