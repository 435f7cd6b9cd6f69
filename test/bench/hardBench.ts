// Hard scenes and the crossed-strings floor in `npm run bench` (issue 13, targets 1
// and 2). Imported by run.ts for its side effect: the two sections run and print.
import { floorSection, timeEdgeMatrix } from './floor';
import { hardScene } from './hardScenes';

/** Hard-scene sizes (target edges) and full-run repeats; quick runs skip 4000 edges. */
const SIZES: { target: number; repeats: number }[] = [
  { target: 500, repeats: 5 },
  { target: 1000, repeats: 3 },
  { target: 2000, repeats: 3 },
  { target: 4000, repeats: 1 },
];

/** Time the hard scenes, print growth per doubling and the verdicts of target 1. */
export function hardSection(quick: boolean): void {
  console.log('\nhard scenes: finned floor, zigzag walls, 100-200 bodies, every edge a surface (seed 13)');
  console.log('edges   min ms  median ms  growth per doubling  worst |1-row sum|');
  const verdicts: string[] = [];
  let previous: { edges: number; median: number } | null = null;
  let worstGrowth = 0;
  for (const size of SIZES) {
    if (quick && size.target > 2000) {
      console.log(`${size.target} edges skipped in a quick run`);
      continue;
    }
    const repeats = quick ? 1 : size.repeats;
    const r = timeEdgeMatrix(hardScene(13, size.target), repeats, quick ? 1 : Math.min(2, repeats));
    let growth = '';
    if (previous) {
      const perDoubling = Math.pow(r.median / previous.median, 1 / Math.log2(r.edges / previous.edges));
      worstGrowth = Math.max(worstGrowth, perDoubling);
      growth = `${perDoubling.toFixed(2)}x`;
    }
    console.log(
      `${String(r.edges).padStart(5)} ${r.min.toFixed(0).padStart(8)} ${r.median.toFixed(0).padStart(10)}  ${growth.padEnd(19)}  ${r.rowWorst.toExponential(1)}`,
    );
    if (size.target === 2000)
      verdicts.push(
        `hard scene, ${r.edges} edges: median ${r.median.toFixed(0)} ms (target <= 1000 ms): ${r.median <= 1000 ? 'met' : 'NOT met'}`,
      );
    previous = { edges: r.edges, median: r.median };
  }
  verdicts.push(
    `hard scenes, worst growth per doubling up to ${quick ? 2000 : 4000} edges: ${worstGrowth.toFixed(2)}x (target <= 4.5x): ${worstGrowth <= 4.5 ? 'met' : 'NOT met'}${quick ? ' (4000 edges only in a full run)' : ''}`,
  );
  for (const v of verdicts) console.log(v);
}

const quick = process.argv.slice(2).includes('--quick');
hardSection(quick);
floorSection(quick);
