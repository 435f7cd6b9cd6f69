// The dense solve behind heat exchange at 2000 surfaces: factor (with the
// condition estimate), solve, and the one step of iterative refinement the
// exchange adds (residual from the original matrix, one more solve).
// Part of `npm run bench`; alone: `npx tsx test/bench/solve.ts [--quick]`.
import { pathToFileURL } from 'node:url';
import { DenseLuSolver } from '../../src/core/exchange';

/** Target of the dense solve at 2000 surfaces, ms (issue 13). */
const TARGET_MS = 250;

/** Times the solve and prints one line with its verdict. */
export function benchDenseSolve(quick: boolean): void {
  const N = 2000;
  const solver = new DenseLuSolver(N);
  let s = 12345;
  const rnd = () => {
    s = (Math.imul(s, 1103515245) + 12345) >>> 0;
    return s / 4294967296 - 0.5;
  };
  const a = new Float64Array(N * N).map(() => rnd() / N);
  for (let i = 0; i < N; i++) a[i * N + i] += 1; // diagonally dominant, like I - (1 - e) F
  const b = new Float64Array(N).fill(1);
  const x = new Float64Array(N);
  const r = new Float64Array(N);
  // The system is written into the solver's matrix before each timed run, as the exchange builds it there.
  const once = () => {
    solver.factor();
    x.set(b);
    solver.solve(x);
    for (let i = 0; i < N; i++) {
      let t = b[i];
      for (let j = 0; j < N; j++) t -= a[i * N + j] * x[j];
      r[i] = t;
    }
    solver.refine(x, r);
  };
  solver.matrix.set(a);
  once(); // untimed: let the engine compile the kernel first (as after the first solve of a session)
  const solves: number[] = [];
  for (let rep = 0; rep < (quick ? 3 : 7); rep++) {
    solver.matrix.set(a);
    const t0 = performance.now();
    once();
    solves.push(performance.now() - t0);
  }
  solves.sort((p, q) => p - q);
  const med = solves[solves.length >> 1];
  console.log(
    `dense solve, ${N} surfaces (${solver.accelerated ? 'SIMD kernel' : 'plain JavaScript'}, one refinement step): min ${solves[0].toFixed(0)} ms, median ${med.toFixed(0)} ms (target <= ${TARGET_MS} ms): ${med <= TARGET_MS ? 'met' : 'NOT met'}`,
  );
}

if (import.meta.url === pathToFileURL(process.argv[1]).href) benchDenseSolve(process.argv.includes('--quick'));
