// The edges x edges matrix of a worker's edge answer, for tests that read single
// edge factors (the app itself only sums the packed rows to surfaces).
import { unpackRows } from '../../src/core/pairRows';
import type { EdgeViewFactors } from '../../src/worker/job';

/** Row-major edgeCount x edgeCount view factors (row = from; dimensionless). */
export function edgeMatrixOf(answer: EdgeViewFactors): Float64Array {
  const n = answer.edgeCount;
  const F = new Float64Array(n * n);
  answer.rows.sets.forEach((set, p) => unpackRows(answer.edgeLength, set, answer.rows.packed[p], F));
  return F;
}
