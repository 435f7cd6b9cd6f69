// Rows packed again after an edit, keeping the pairs the edit cannot change.
import { packedLength, type EdgePairs } from '../pairRows';
import type { MovedShapes } from './movedShapes';

/**
 * Like `packRows` (pairRows.ts): the exchange lengths of the given rows, packed,
 * sketch units. Pairs that `moved` says cannot have changed are copied from
 * `before`, the same rows packed for the earlier sketch; the others are computed
 * (`computed` counts them).
 */
export function packRowsReusing(
  pairs: EdgePairs,
  rows: ArrayLike<number>,
  before: Float64Array,
  moved: MovedShapes,
): { packed: Float64Array; computed: number } {
  const n = pairs.count;
  const size = packedLength(n, rows);
  if (before.length !== size) throw new Error(`the earlier rows hold ${before.length} pairs, these rows ${size}`);
  const packed = new Float64Array(size);
  const flags = new Uint8Array(n);
  let at = 0,
    computed = 0;
  for (let k = 0; k < rows.length; k++) {
    const i = rows[k];
    moved.markRow(i, flags);
    for (let j = i; j < n; j++, at++) {
      if (!flags[j]) {
        packed[at] = before[at];
        continue;
      }
      packed[at] = j === i ? pairs.selfExchange(i) : pairs.pairExchange(i, j);
      computed++;
    }
  }
  return { packed, computed };
}
