// One drag step as a worker computes it (issue 13, target 4): the 1012-edge sketch
// of the browser drag (bigSketch.ts), one tube moved 0.01 a step, rows split as for
// two workers. Each step is timed twice in alternation: a full job, and a worker
// that kept its rows from the step before (core reuse/). Both must give the same
// bits; the bench stops if they do not.
import { balancedRowSets } from '../../src/core/pairRows';
import { restore, toScene } from '../../src/document';
import { computeRows } from '../../src/worker/api';
import { RowMemory } from '../../src/worker/rowMemory';
import { jobFromPolygons, type RowsAnswer } from '../../src/worker/job';
import { bigSketch } from './bigSketch';

/** Time `steps` drag steps, full and with kept rows; print medians and the share of pairs computed. */
export function dragStepSection(quick: boolean): void {
  const read = restore(bigSketch(false));
  if (!read.ok) throw new Error('drag bench sketch refused');
  const { scene } = toScene(read.sketch);
  // The middle tube of the second row, as the browser drag moves it.
  const tube = scene.polygons.findIndex(
    (p, k) => k > 0 && Math.abs(p.points[0] - 5.25) < 1e-9 && Math.abs(p.points[1] - 1.5) < 1e-9,
  );
  if (tube < 0) throw new Error('drag bench: tube not found');
  const step = (k: number) =>
    jobFromPolygons(
      scene.polygons.map((p, i) =>
        i === tube ? { ...p, points: Array.from(p.points, (v, c) => (c % 2 === 0 ? v + 0.01 * (k % 5) : v)) } : p,
      ),
    );
  const n = scene.polygons.reduce((t, p) => t + p.points.length / 2, 0);
  const rows = balancedRowSets(n, 2)[0];
  const memory = new RowMemory();
  const packedOf = (r: RowsAnswer) => {
    if (r.kind !== 'matrix') throw new Error('drag bench: expected packed rows');
    return r;
  };
  packedOf(computeRows(step(0), rows, memory));
  const full: number[] = [],
    kept: number[] = [];
  let computed = 0,
    total = 0;
  const steps = quick ? 8 : 30;
  for (let k = 1; k <= steps; k++) {
    const job = step(k);
    let t0 = performance.now();
    const a = packedOf(computeRows(job, rows));
    full.push(performance.now() - t0);
    t0 = performance.now();
    const b = packedOf(computeRows(job, rows, memory));
    kept.push(performance.now() - t0);
    for (let q = 0; q < a.packed.length; q++)
      if (!Object.is(a.packed[q], b.packed[q])) throw new Error(`drag bench: kept rows differ at pair ${q}`);
    computed += b.computed;
    total += b.packed.length;
  }
  const median = (t: number[]) => [...t].sort((x, y) => x - y)[t.length >> 1];
  console.log(
    `\ndrag step, 1012-edge sketch, one worker's half (${rows.length} rows): full job median ${median(full).toFixed(1)} ms, ` +
      `with the rows kept from the step before ${median(kept).toFixed(1)} ms (${((100 * computed) / total).toFixed(0)}% of pairs computed, same bits)`,
  );
}
