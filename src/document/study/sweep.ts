// A sweep: the exchange at evenly spaced values of one parameter.
import { evenlySpaced } from '../../core/study';
import { formatNumber } from '../labels';
import type { Sketch } from '../schema';
import { studyRunner, type StudyRun, type ViewFactorsOf } from './run';
import type { StudyParameter } from './parameter';

/** Most values a study may take (each may need a view-factor computation). */
export const MAX_STUDY_STEPS = 1000;

/** Why a range or step count cannot be used, or null. `steps`: number of values, both ends included. */
export function rangeProblem(from: number, to: number, steps: number, least = 2): string | null {
  if (!Number.isFinite(from) || !Number.isFinite(to)) return 'the range ends must be finite numbers';
  if (!Number.isInteger(steps) || steps < least)
    return `the number of steps must be a whole number of at least ${least}, got ${formatNumber(steps)}`;
  if (steps > MAX_STUDY_STEPS) return `at most ${MAX_STUDY_STEPS} steps, got ${formatNumber(steps)}`;
  return null;
}

export type SweepOutcome = { ok: true; values: number[]; runs: StudyRun[] } | { ok: false; message: string };

/**
 * The exchange at `steps` evenly spaced values from `from` to `to` (both
 * included; units of the parameter). The first case that cannot be solved ends
 * the sweep with its message. `onProgress(done, total)` is told after each case;
 * `stopped()` returning true ends it early with the message 'stopped';
 * `viewFactors` computes each case's factors (default: core, one thread).
 */
export function runSweep(
  sketch: Sketch,
  p: StudyParameter,
  from: number,
  to: number,
  steps: number,
  hooks: {
    onProgress?: (done: number, total: number) => void;
    stopped?: () => boolean;
    viewFactors?: ViewFactorsOf;
  } = {},
): SweepOutcome {
  const problem = rangeProblem(from, to, steps);
  if (problem) return { ok: false, message: problem };
  const values = evenlySpaced(from, to, steps);
  const solve = studyRunner(sketch, p, hooks.viewFactors);
  const runs: StudyRun[] = [];
  for (const value of values) {
    if (hooks.stopped?.()) return { ok: false, message: 'stopped' };
    const outcome = solve(value);
    if (!outcome.ok) return outcome;
    runs.push(outcome.run);
    hooks.onProgress?.(runs.length, values.length);
  }
  return { ok: true, values, runs };
}
