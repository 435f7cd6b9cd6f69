// Every root of a function over a range: scan it, then Brent's method in each
// interval where the function changes sign.
import { brentRoot, type RootTolerance } from './brent';

/** The varied value is found to 1e-9 of itself (dimensionless). */
export const ROOT_RELATIVE_TOLERANCE = 1e-9;

export type RootsOutcome =
  /** Roots in ascending order (units of the varied quantity). Empty: no sign change and no zero at a scanned value. */
  | { ok: true; roots: number[] }
  /** f gave a non-number at `at`, or Brent's method ran out of steps near `at`. */
  | { ok: false; code: 'not-finite' | 'no-convergence'; at: number };

/**
 * The roots of f that the scan finds: scanned values where f is exactly zero,
 * and one root in each interval between neighbouring scanned values where f
 * changes sign. `values` are the scanned values (in order, either direction),
 * `residuals` f at each of them. A root where f touches zero without changing
 * sign between two scanned values is not found (a finer scan finds it if f
 * goes below and back). Each root is found to ROOT_RELATIVE_TOLERANCE of
 * itself (floored at 1e-15 of the range's largest end, for roots at zero).
 */
export function rootsByScan(
  f: (x: number) => number,
  values: readonly number[],
  residuals: readonly number[],
): RootsOutcome {
  const scale = values.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
  const tolerance: RootTolerance = { relative: ROOT_RELATIVE_TOLERANCE, absolute: 1e-15 * scale, maxEvaluations: 200 };
  const roots: number[] = [];
  for (let k = 0; k < values.length; k++) {
    if (!Number.isFinite(residuals[k])) return { ok: false, code: 'not-finite', at: values[k] };
    if (residuals[k] === 0) roots.push(values[k]);
  }
  for (let k = 0; k + 1 < values.length; k++) {
    const [fa, fb] = [residuals[k], residuals[k + 1]];
    if (!(fa * fb < 0)) continue;
    const found = brentRoot(f, values[k], values[k + 1], fa, fb, tolerance);
    if (!found.ok)
      return { ok: false, code: found.code === 'not-finite' ? 'not-finite' : 'no-convergence', at: found.at };
    roots.push(found.root);
  }
  return { ok: true, roots: roots.sort((x, y) => x - y) };
}
