// The main thread's half of a shared job: the workers' packed rows kept together
// as one answer (summed to surfaces later, see core/packedSurfaces.ts), or their
// surface sums added in ascending row order, so the result is the same bit for
// bit whatever the number of workers.
import type { PackedRows } from '../core/pairRows';
import { SurfaceAccumulator } from '../core/surfaceRows';
import type { RowsAnswer, ViewFactorAnswer, ViewFactorJob } from './job';

/** One job's answer from the answers for its row sets (every row exactly once). */
export function assembleAnswer(job: ViewFactorJob, edgeCount: number, parts: readonly RowsAnswer[]): ViewFactorAnswer {
  if (parts.length === 0) throw new Error('a view-factor job needs at least one part');
  const { edgeLength, closed } = parts[0];
  const n = edgeCount;
  if (edgeLength.length !== n) throw new Error(`the workers found ${edgeLength.length} edges, the job has ${n}`);
  if (job.surfaces) {
    const { edgeSurface, count } = job.surfaces;
    const acc = new SurfaceAccumulator(edgeLength, edgeSurface, count);
    for (const p of parts) {
      if (p.kind !== 'surfaces') throw new Error('a worker answered edge rows for a surface job');
      acc.add(p.sums);
    }
    if (!acc.complete) throw new Error('the workers left rows of the view-factor job out');
    const surfaceLength = acc.surfaceLength;
    return {
      edgeCount: n,
      edgeLength,
      edgeSurface,
      surfaceCount: count,
      surfaceLength,
      exchange: acc.exchange,
      closed,
    };
  }
  const rows: PackedRows = { sets: [], packed: [] };
  let count = 0;
  for (const p of parts) {
    if (p.kind !== 'matrix') throw new Error('a worker answered surface sums for an edge job');
    rows.sets.push(p.rows);
    rows.packed.push(p.packed);
    count += p.rows.length;
  }
  if (count !== n) throw new Error(`the workers answered ${count} of ${n} rows`);
  return { edgeCount: n, edgeLength, rows, closed };
}
