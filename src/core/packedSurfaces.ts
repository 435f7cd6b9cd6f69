// Surface factors straight from the workers' packed rows, without building the
// edges x edges matrix: at 1012 edges that matrix is 8 MB of fresh memory per
// job, and touching it for the first time costs more than the sum itself.
// The numbers are those of aggregateToSurfaces on the unpacked matrix, bit for
// bit: each edge factor is the same quotient g / L_i, and each surface sum adds
// its terms in the same order (rows ascending, then columns ascending).

import { packedLength, type PackedRows } from './pairRows';
import type { ViewFactorResult } from './scene';
import { surfaceLengths, surfaceResult } from './surfaces';

/**
 * Where each row of an n-edge matrix sits in packed rows: part[i] (which packed
 * array) and base[i] (the packed index of pair (i, j) is base[i] + j, j >= i).
 * Throws unless every row 0..n-1 appears exactly once and every part has the
 * length its rows need.
 */
export function packedRowIndex(n: number, rows: PackedRows): { part: Int32Array; base: Float64Array } {
  const part = new Int32Array(n).fill(-1);
  const base = new Float64Array(n);
  if (rows.sets.length !== rows.packed.length) throw new Error('packed rows: one packed array per row set');
  rows.sets.forEach((set, p) => {
    if (rows.packed[p].length !== packedLength(n, set))
      throw new Error(`packed rows: part ${p} holds ${rows.packed[p].length} numbers for ${set.length} rows`);
    let at = 0;
    for (let k = 0; k < set.length; k++) {
      const i = set[k];
      if (!(i >= 0 && i < n) || part[i] >= 0) throw new Error(`packed rows: row ${i} out of range or twice`);
      part[i] = p;
      base[i] = at - i;
      at += n - i;
    }
  });
  const missing = part.indexOf(-1);
  if (missing >= 0) throw new Error(`packed rows: row ${missing} of ${n} is missing`);
  return { part, base };
}

/** Rows summed per block (see aggregatePackedRows): the block's columns stay in the cache. */
const BLOCK = 32;
let scratch = new Float64Array(0);

/** The block's column copies: one buffer, grown when a sketch needs more, never shrunk. */
function columnScratch(length: number): Float64Array {
  if (scratch.length < length) scratch = new Float64Array(length);
  return scratch;
}

/**
 * View factors between surfaces from packed edge rows (exchange lengths g_ij in
 * the units of `edgeLength`, see packRows): F_ij = g_ij / L_i and
 * F_IJ = sum_{i in I, j in J} W_i F_ij / W_I, plus the row-sum and reciprocity
 * residuals, exactly as aggregateToSurfaces gives them from the unpacked edge
 * matrix and the lengths W. `weightLength` (default: edgeLength) is the same
 * geometry in other units (each L_i times one scale): the factors do not
 * change, the lengths reported do. `into`, when given, is an m x m buffer the
 * caller no longer needs: it is cleared and becomes the result's F (a fresh
 * array of 1000 surfaces, 8 MB, costs a browser's main thread 30-50 ms here).
 */
export function aggregatePackedRows(
  edgeLength: Float64Array,
  rows: PackedRows,
  edgeSurface: ArrayLike<number>,
  surfaceCount: number,
  closed: boolean,
  weightLength: Float64Array = edgeLength,
  into?: Float64Array,
): ViewFactorResult {
  const n = edgeLength.length;
  const m = surfaceCount;
  if (weightLength.length !== n) throw new Error(`${weightLength.length} weight lengths for ${n} edges`);
  if (into && into.length !== m * m) throw new Error(`a buffer of ${into.length} numbers for ${m} x ${m} surfaces`);
  const surfaceLength = surfaceLengths(weightLength, edgeSurface, m);
  const { part, base } = packedRowIndex(n, rows);
  const packed = rows.packed;
  const G = into ? into.fill(0) : new Float64Array(m * m); // G_IJ = L_I F_IJ, sketch units
  // Rows go in blocks of BLOCK. Row i's columns j < i (g_ji) sit in row j's packed
  // part, one per row j: read one at a time they cost a cache miss each. So each
  // block first copies them, BLOCK contiguous numbers per row j, into `column`
  // (row i's at (i - start) * n + j); the sums below then run exactly as before.
  const column = columnScratch(BLOCK * n);
  for (let start = 0; start < n; start += BLOCK) {
    const end = Math.min(n, start + BLOCK);
    for (let j = 0; j < end - 1; j++) {
      const from = packed[part[j]];
      const b = base[j];
      for (let i = Math.max(start, j + 1); i < end; i++) column[(i - start) * n + j] = from[b + i];
    }
    for (let i = start; i < end; i++) {
      const row = edgeSurface[i] * m;
      const Li = edgeLength[i];
      const Wi = weightLength[i];
      const at = (i - start) * n;
      for (let j = 0; j < i; j++) {
        const g = column[at + j];
        if (g > 0) G[row + edgeSurface[j]] += Wi * (g / Li);
      }
      const own = packed[part[i]];
      const b = base[i];
      for (let j = i; j < n; j++) {
        const g = own[b + j];
        if (g > 0) G[row + edgeSurface[j]] += Wi * (g / Li);
      }
    }
  }
  return surfaceResult(n, weightLength, surfaceLength, G, closed, true);
}
