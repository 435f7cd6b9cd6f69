// Solving for a target: the value of one parameter at which one result of one
// surface equals a given number. The range is scanned first (so every
// crossing is seen), then Brent's method finds each root in its bracket to
// 1e-9 of the value.
import { surfaceProfile } from '../exchange/profile';
import { evenlySpaced, rootsByScan } from '../../core/study';
import { formatNumber, quoteName } from '../labels';
import type { Sketch } from '../schema';
import {
  QUANTITY_UNIT,
  describeParameter,
  describeQuantity,
  parameterUnit,
  withUnit,
  type StudyParameter,
  type StudyTarget,
} from './parameter';
import { studyRunner, type StudyRun, type ViewFactorsOf } from './run';
import { rangeProblem } from './sweep';

/** Scanned values when none is asked for. */
export const DEFAULT_SCAN_STEPS = 16;

export type SolveForOutcome =
  /** `value`: the lowest root; `values`: every root found, ascending; `run`: the case at `value`. */
  | { ok: true; value: number; values: number[]; run: StudyRun }
  /** `covered`: the lowest and highest value of the quantity at the scanned values, when the target was not reached. */
  | { ok: false; message: string; covered?: [number, number] };

/**
 * The quantity of the target's surface in a run (units of QUANTITY_UNIT). For
 * peakToAverage, `surface` names a tube split into arcs or a wall split into
 * parts (see exchange/profile.ts); NaN when it has no profile or its flux changes sign.
 */
export function targetQuantity(run: StudyRun, target: Pick<StudyTarget, 'surface' | 'quantity'>): number {
  if (target.quantity === 'peakToAverage') {
    const profile = surfaceProfile(run.sketch.shapes, target.surface, (n) => {
      const i = run.names.indexOf(n);
      return i < 0 ? undefined : run.result.netFlux[i];
    });
    return 'problem' in profile || profile.peakToAverage === null ? Number.NaN : profile.peakToAverage;
  }
  const i = run.names.indexOf(target.surface);
  return run.result[target.quantity][i];
}

/**
 * Values of `p` in [from, to] where the target's quantity equals target.value.
 * Refused, with the range the quantity covers at the `steps` scanned values,
 * when no scanned interval brackets the target (a crossing and recrossing
 * between two scanned values is not seen: scan finer). `viewFactors` computes
 * each case's factors (default: caseFactors, which keeps the pairs a moved
 * shape cannot change from one case to the next).
 */
export function solveForTarget(
  sketch: Sketch,
  names: readonly string[],
  p: StudyParameter,
  from: number,
  to: number,
  target: StudyTarget,
  steps = DEFAULT_SCAN_STEPS,
  viewFactors?: ViewFactorsOf,
): SolveForOutcome {
  const problem = rangeProblem(from, to, steps);
  if (problem) return { ok: false, message: problem };
  if (from === to) return { ok: false, message: 'the range is empty: --from and --to are the same value' };
  if (target.quantity !== 'peakToAverage' && !names.includes(target.surface))
    return { ok: false, message: `the target names no surface of the sketch: ${quoteName(target.surface)}` };
  const solve = studyRunner(sketch, p, viewFactors);
  let failure: string | undefined;
  const runs = new Map<number, StudyRun>();
  const residual = (value: number): number => {
    const outcome = solve(value);
    if (!outcome.ok) {
      failure ??= outcome.message;
      return Number.NaN;
    }
    // Keep the last few cases only (each holds n x n arrays): the answer is one of them or is solved again.
    runs.set(value, outcome.run);
    if (runs.size > 4) runs.delete(runs.keys().next().value!);
    const q = targetQuantity(outcome.run, target);
    if (!Number.isFinite(q)) {
      failure ??= `${describeQuantity(target.surface, target.quantity)} is not defined at ${describeParameter(p)} = ${formatNumber(value)}: ${quoteName(target.surface)} must be split into parts (a tube into arcs) whose net flux keeps one sign`;
      return Number.NaN;
    }
    return q - target.value;
  };
  const values = evenlySpaced(from, to, steps);
  const residuals: number[] = [];
  for (const v of values) {
    residuals.push(residual(v));
    if (failure !== undefined) return { ok: false, message: failure };
  }
  if (residuals.every((r) => r === 0))
    return {
      ok: false,
      message: `${describeQuantity(target.surface, target.quantity)} equals ${withUnit(target.value, QUANTITY_UNIT[target.quantity])} at every value scanned: it does not change with ${describeParameter(p)}, so no one value answers`,
    };
  const found = rootsByScan(residual, values, residuals);
  if (failure !== undefined) return { ok: false, message: failure };
  const unit = parameterUnit(p, sketch.units);
  if (!found.ok)
    return {
      ok: false,
      message: `no answer found near ${describeParameter(p)} = ${withUnit(found.at, unit)} (the root search did not settle)`,
    };
  const qUnit = QUANTITY_UNIT[target.quantity];
  if (found.roots.length === 0) {
    const reached = residuals.map((r) => r + target.value);
    const covered: [number, number] = [Math.min(...reached), Math.max(...reached)];
    return {
      ok: false,
      covered,
      message:
        `${describeQuantity(target.surface, target.quantity)} does not reach ${withUnit(target.value, qUnit)} ` +
        `for ${describeParameter(p)} from ${formatNumber(from)} to ${withUnit(to, unit)}: at the ${steps} values scanned it ` +
        `covers ${formatNumber(covered[0])} to ${withUnit(covered[1], qUnit)}`,
    };
  }
  const value = found.roots[0];
  let run = runs.get(value);
  if (!run) {
    const again = solve(value);
    if (!again.ok) return { ok: false, message: again.message };
    run = again.run;
  }
  return { ok: true, value, values: found.roots, run };
}
