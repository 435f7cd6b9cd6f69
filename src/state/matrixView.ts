// Table-ready numbers from a finished result: rows, residuals and the cells
// whose reciprocity misses the tolerance. Cached per result object; O(surfaces)
// to build (rows are views of the result, a cell's residual is worked out when
// it is drawn), so a 1000-surface result costs no n^2 pass on every update.
import { reciprocityResidualOf } from '../core/surfaces';
import type { ShownResult } from './results/derive';

/** Exact methods agree to rounding; anything above this is reported, not hidden. */
export const RESIDUAL_TOLERANCE = 1e-9;

export interface MatrixView {
  names: string[];
  lengths: number[];
  /** rows[i][j] = F from surface i to surface j (views of the result's matrix). */
  rows: Float64Array[];
  rowResidual: number[];
  /** Pairwise |L_i F_ij - L_j F_ji| / max(L_i F_ij, L_j F_ji). */
  pairResidual: (i: number, j: number) => number;
  reciprocityResidual: number;
  closed: boolean;
  /** Largest |row residual| in a closed sketch (0 in an open one, where it is the factor to surroundings). */
  worstRowResidual: number;
}

// Per surface result (a rename makes a new one; a property edit keeps it).
const cache = new WeakMap<ShownResult['result'], MatrixView>();

export function matrixView(shown: ShownResult): MatrixView {
  const hit = cache.get(shown.result);
  if (hit) return hit;
  const { result, names: surfaceNames } = shown;
  const n = result.surfaceCount;
  const L = Array.from(result.surfaceLength);
  const rows: Float64Array[] = [];
  for (let i = 0; i < n; i++) rows.push(result.F.subarray(i * n, (i + 1) * n));
  const pairResidual = (i: number, j: number) => reciprocityResidualOf(L[i] * rows[i][j], L[j] * rows[j][i]);
  const rowResidual = Array.from(result.rowSumResidual);
  const view: MatrixView = {
    names: surfaceNames.slice(0, n),
    lengths: L,
    rows,
    rowResidual,
    pairResidual,
    reciprocityResidual: result.reciprocityResidual,
    closed: result.closed,
    worstRowResidual: result.closed ? Math.max(0, ...rowResidual.map(Math.abs)) : 0,
  };
  cache.set(shown.result, view);
  return view;
}
