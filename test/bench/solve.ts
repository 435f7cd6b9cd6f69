// The dense solve behind heat exchange at 2000 surfaces (issue 13, target 5).
// The system is the one the exchange builds: a seeded enclosure whose factors
// obey reciprocity, a third of the surfaces at a temperature, a third
// adiabatic, a third at a flux, a few black. Timed: build and factor the
// radiosity system (with the condition estimate), solve, and the one step of
// iterative refinement the exchange adds; then the whole exchange with its
// results, and the whole surface balance the app solves. For comparison, the
// general LU on a random matrix of the same size.
// Part of `npm run bench`; alone: `npx tsx test/bench/solve.ts [--quick]`.
import { pathToFileURL } from 'node:url';
import { solveBalance } from '../../src/core/balance';
import { DenseLuSolver, solveExchange, type SurfaceCondition } from '../../src/core/exchange';
import { RadiositySystem } from '../../src/core/exchange/radiositySystem';
import { SolverMemory } from '../../src/core/exchange/solverMemory';
import { radiosityResidual } from '../../src/core/exchange/refine';

/** Target of the dense solve at 2000 surfaces, ms (issue 13). */
const TARGET_MS = 250;
const N = 2000;

function seeded(seed: number): () => number {
  let s = seed;
  return () => {
    s = (Math.imul(s, 1103515245) + 12345) >>> 0;
    return s / 4294967296;
  };
}

/** A closed enclosure: symmetric random exchange areas A_i F_ij, rows summing to one. */
function enclosure(n: number) {
  const r = seeded(12345);
  const F = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j <= i; j++) F[i * n + j] = F[j * n + i] = r();
  const area = new Float64Array(n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) area[i] += F[i * n + j];
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) F[i * n + j] /= area[i];
  const conditions: SurfaceCondition[] = Array.from({ length: n }, (_, i) =>
    i % 3 === 0
      ? { kind: 'temperature', temperature: 400 + 900 * r() }
      : i % 3 === 1
        ? { kind: 'adiabatic' }
        : { kind: 'heatFlux', heatFlux: 1000 * (r() - 0.5) },
  );
  const emissivity = Float64Array.from({ length: n }, (_, i) => (i % 50 === 0 ? 1 : 0.1 + 0.8 * r()));
  return { viewFactors: F, area, emissivity, conditions };
}

function timeRuns(runs: number, once: () => void): { min: number; median: number } {
  once(); // untimed: let the engine compile first (as after the first solve of a session)
  const t: number[] = [];
  for (let rep = 0; rep < runs; rep++) {
    const t0 = performance.now();
    once();
    t.push(performance.now() - t0);
  }
  t.sort((p, q) => p - q);
  return { min: t[0], median: t[t.length >> 1] };
}

/** Times the solves and prints their lines, the first with its verdict. */
export function benchDenseSolve(quick: boolean): void {
  const runs = quick ? 3 : 7;
  const input = enclosure(N);
  const F = input.viewFactors;
  const weight = input.conditions.map((c, i) => (c.kind === 'temperature' ? 1 - input.emissivity[i] : 1));
  const b = Float64Array.from({ length: N }, (_, i) => 1e4 * (1 + (i % 7)));
  const x = new Float64Array(N);
  const r = new Float64Array(N);
  const workspace = new DenseLuSolver(N);
  const memory = new SolverMemory(); // the balance's, kept between runs as the app keeps it
  let symmetric = false;
  const dense = timeRuns(runs, () => {
    const system = new RadiositySystem(F, weight, input.area, workspace);
    symmetric = system.symmetric;
    x.set(b);
    system.solve(x);
    system.refine(x, radiosityResidual(F, weight, x, b, r));
  });
  const method = `${symmetric ? 'Cholesky of the symmetric form' : 'LU'}, ${workspace.accelerated ? 'SIMD kernel' : 'plain JavaScript'}`;
  console.log(
    `dense solve, ${N} surfaces (${method}, condition estimate, one refinement step): min ${dense.min.toFixed(0)} ms, median ${dense.median.toFixed(0)} ms (target <= ${TARGET_MS} ms): ${dense.median <= TARGET_MS ? 'met' : 'NOT met'}`,
  );
  const whole = timeRuns(runs, () => {
    const out = solveExchange(input, workspace);
    if (!out.ok) throw new Error(`exchange refused: ${out.code}`);
  });
  console.log(
    `whole exchange, ${N} surfaces (the solve above, irradiation, the ${N} x ${N} exchange table, energy balance): min ${whole.min.toFixed(0)} ms, median ${whole.median.toFixed(0)} ms`,
  );
  // What the app and the command line solve: the whole surface balance. With only held,
  // adiabatic and heat-flux surfaces it is linear and takes one system (core balance/linear.ts).
  const balance = timeRuns(runs, () => {
    const out = solveBalance(input, memory);
    if (!out.ok) throw new Error(`balance refused: ${out.code}`);
  });
  console.log(
    `whole surface balance, ${N} surfaces, the same conditions (as the app and the command line solve it; linear: one system): min ${balance.min.toFixed(0)} ms, median ${balance.median.toFixed(0)} ms`,
  );
  // General LU with partial pivoting on a random matrix (systems without reciprocity).
  const s = seeded(12345);
  const a = new Float64Array(N * N).map(() => (s() - 0.5) / N);
  for (let i = 0; i < N; i++) a[i * N + i] += 1;
  const lu = timeRuns(runs, () => {
    workspace.matrix.set(a);
    workspace.factor();
    x.set(b);
    workspace.solve(x);
  });
  console.log(
    `general LU, ${N} x ${N} random matrix (factor, condition estimate, solve): min ${lu.min.toFixed(0)} ms, median ${lu.median.toFixed(0)} ms`,
  );
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) benchDenseSolve(process.argv.includes('--quick'));
