// Rows packed again after an edit, keeping the pairs the edit cannot change.
import { packedLength, packRows, type EdgePairs } from '../pairRows';
import { MovedShapes } from './movedShapes';

/**
 * Bring `packed`, the given rows packed by `packRows` (pairRows.ts) for the earlier
 * sketch, up to date for the sketch of `pairs`, in place: the pairs `moved` says may
 * have changed are computed again (exchange lengths, sketch units), the others kept.
 * In place because a fresh buffer of this size costs more than the pairs in a
 * browser worker (each new page of memory is a fault). Returns how many were computed.
 */
export function updateRows(
  pairs: EdgePairs,
  rows: ArrayLike<number>,
  packed: Float64Array,
  moved: MovedShapes,
): number {
  const n = pairs.count;
  const size = packedLength(n, rows);
  if (packed.length !== size) throw new Error(`the earlier rows hold ${packed.length} pairs, these rows ${size}`);
  const flags = new Uint8Array(n);
  let at = 0,
    computed = 0;
  for (let k = 0; k < rows.length; k++) {
    const i = rows[k];
    moved.markRow(i, flags);
    for (let j = i; j < n; j++, at++) {
      if (!flags[j]) continue;
      packed[at] = j === i ? pairs.selfExchange(i) : pairs.pairExchange(i, j);
      computed++;
    }
  }
  return computed;
}

/**
 * The given rows packed for the sketch of `pairs` (exchange lengths, sketch units,
 * see packRows): `earlier`, the same rows packed for an earlier sketch, updated in
 * place when that sketch had the same shapes and only some solids or circles moved
 * (updateRows), else packed afresh. With how many pairs were computed.
 */
export function packedRowsAfter(
  earlier: { pairs: EdgePairs; packed: Float64Array } | null,
  pairs: EdgePairs,
  rows: ArrayLike<number>,
): { packed: Float64Array; computed: number } {
  const moved =
    earlier && earlier.packed.length === packedLength(pairs.count, rows)
      ? MovedShapes.between(earlier.pairs, pairs)
      : null;
  if (earlier && moved) return { packed: earlier.packed, computed: updateRows(pairs, rows, earlier.packed, moved) };
  const packed = packRows(pairs, rows);
  return { packed, computed: packed.length };
}
