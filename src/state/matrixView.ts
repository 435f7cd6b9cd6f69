// Table-ready numbers from a finished result: rows, residuals and the cells
// whose reciprocity misses the tolerance. Cached per result object.
import type { ShownResult } from './resultsSlice';

/** Exact methods agree to rounding; anything above this is reported, not hidden. */
export const RESIDUAL_TOLERANCE = 1e-9;

export interface MatrixView {
  names: string[];
  lengths: number[];
  /** rows[i][j] = F from surface i to surface j. */
  rows: number[][];
  rowResidual: number[];
  /** Pairwise |L_i F_ij - L_j F_ji| / max(L_i F_ij, L_j F_ji). */
  pairResidual: number[][];
  reciprocityResidual: number;
  closed: boolean;
  /** Largest |row residual| in a closed sketch (0 in an open one, where it is the factor to surroundings). */
  worstRowResidual: number;
}

const cache = new WeakMap<ShownResult, MatrixView>();

export function matrixView(shown: ShownResult): MatrixView {
  const hit = cache.get(shown);
  if (hit) return hit;
  const { result, surfaceNames } = shown;
  const n = result.surfaceCount;
  const L = Array.from(result.surfaceLength);
  const rows: number[][] = [];
  for (let i = 0; i < n; i++) rows.push(Array.from(result.F.subarray(i * n, (i + 1) * n)));
  const pairResidual = rows.map((row, i) =>
    row.map((f, j) => {
      const a = L[i] * f;
      const b = L[j] * rows[j][i];
      const big = Math.max(a, b);
      return big > 0 ? Math.abs(a - b) / big : 0;
    }),
  );
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
  cache.set(shown, view);
  return view;
}
