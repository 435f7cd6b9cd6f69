// One drag step as a worker computes it (issue 13, target 4), rows split as for two
// workers: the 1012-edge sketch of the browser drag (bigSketch.ts) with one tube
// moved 0.01 a step, the 50-tube furnace section of exact circles with its middle
// tube moved 0.005 a step, and a tube of the deep bank (four rows) likewise. Each
// step is timed twice in alternation: a full job, and a worker that kept its rows
// from the step before (core reuse/). Both must give the same bits; the bench stops
// if they do not.
import { balancedRowSets } from '../../src/core/pairRows';
import { restore, toScene } from '../../src/document';
import { computeRows } from '../../src/worker/api';
import { RowMemory } from '../../src/worker/rowMemory';
import { jobEdgeCount, jobFromPolygons, type RowsAnswer, type ViewFactorJob } from '../../src/worker/job';
import { bigSketch } from './bigSketch';
import { bankScene, furnaceScene } from './scenes';

function packedOf(r: RowsAnswer) {
  if (r.kind !== 'matrix') throw new Error('drag bench: expected packed rows');
  return r;
}

const median = (t: number[]) => [...t].sort((x, y) => x - y)[t.length >> 1];

/** Time `steps` drag steps of `step(k)` (k = 0 first, untimed), full and with kept rows; print one line. */
function timeSteps(label: string, step: (k: number) => ViewFactorJob, steps: number): void {
  const rows = balancedRowSets(jobEdgeCount(step(0)), 2)[0];
  const memory = new RowMemory();
  packedOf(computeRows(step(0), rows, memory));
  const full: number[] = [],
    kept: number[] = [];
  let computed = 0,
    total = 0;
  for (let k = 1; k <= steps; k++) {
    const job = step(k);
    let t0 = performance.now();
    const a = packedOf(computeRows(job, rows));
    full.push(performance.now() - t0);
    t0 = performance.now();
    const b = packedOf(computeRows(job, rows, memory));
    kept.push(performance.now() - t0);
    for (let q = 0; q < a.packed.length; q++)
      if (!Object.is(a.packed[q], b.packed[q])) throw new Error(`drag bench (${label}): kept rows differ at pair ${q}`);
    computed += b.computed;
    total += b.packed.length;
  }
  console.log(
    `drag step, ${label}, one worker's half (${rows.length} rows): full job median ${median(full).toFixed(1)} ms, ` +
      `with the rows kept from the step before ${median(kept).toFixed(1)} ms (${((100 * computed) / total).toFixed(0)}% of pairs computed, same bits)`,
  );
}

/** Both drag-step lines of `npm run bench`. */
export function dragStepSection(quick: boolean): void {
  const read = restore(bigSketch(false));
  if (!read.ok) throw new Error('drag bench sketch refused');
  const { scene } = toScene(read.sketch);
  // The middle tube of the second row, as the browser drag moves it.
  const tube = scene.polygons.findIndex(
    (p, k) => k > 0 && Math.abs(p.points[0] - 5.25) < 1e-9 && Math.abs(p.points[1] - 1.5) < 1e-9,
  );
  if (tube < 0) throw new Error('drag bench: tube not found');
  console.log('');
  timeSteps(
    '1012-edge sketch',
    (k) =>
      jobFromPolygons(
        scene.polygons.map((p, i) =>
          i === tube ? { ...p, points: Array.from(p.points, (v, c) => (c % 2 === 0 ? v + 0.01 * (k % 5) : v)) } : p,
        ),
      ),
    quick ? 8 : 30,
  );
  const furnace = furnaceScene(0);
  const circles = furnace.circles ?? [];
  const middle = circles.length >> 1;
  timeSteps(
    `furnace section, ${circles.length} exact circles`,
    (k) =>
      jobFromPolygons(
        furnace.polygons,
        circles.map((c, i) => (i === middle ? { ...c, cx: c.cx + 0.005 * (k % 5) } : c)),
      ),
    quick ? 3 : 8,
  );
  // The deep bank (information): the 13th tube of the second of four rows, as the browser drag moves it.
  const bank = bankScene(4);
  const tubes = bank.circles ?? [];
  timeSteps(
    `deep tube bank, ${tubes.length} exact circles in four rows`,
    (k) =>
      jobFromPolygons(
        bank.polygons,
        tubes.map((c, i) => (i === 25 + 12 ? { ...c, cx: c.cx + 0.005 * (k % 5) } : c)),
      ),
    quick ? 2 : 6,
  );
}
