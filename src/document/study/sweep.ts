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

export type SweepOutcome<R = StudyRun> = { ok: true; values: number[]; runs: R[] } | { ok: false; message: string };

/** Which cases of a sweep one worker takes: case k (from 0) when k % of === part. */
export interface SweepShare {
  part: number;
  of: number;
}

export type SweepShareOutcome<R = StudyRun> =
  | { ok: true; values: number[]; indices: number[]; runs: R[] }
  /** `index`: the case that could not be solved (-1: the range itself was refused). */
  | { ok: false; message: string; index: number };

/** What a sweep may be told as it goes (see runSweep). */
export interface SweepHooks<R = StudyRun> {
  onProgress?: (done: number, total: number) => void;
  stopped?: () => boolean;
  viewFactors?: ViewFactorsOf;
  /**
   * What to keep of each case (default: the whole run). A table needs a few numbers
   * per surface, while a run holds the surfaces^2 exchange matrix: a long sweep of
   * many surfaces that keeps whole runs holds gigabytes.
   */
  keep?: (run: StudyRun) => R;
}

/**
 * The exchange at `steps` evenly spaced values from `from` to `to` (both
 * included; units of the parameter). The first case that cannot be solved ends
 * the sweep with its message. `onProgress(done, total)` is told after each case;
 * `stopped()` returning true ends it early with the message 'stopped';
 * `viewFactors` computes each case's factors (default: caseFactors); `keep`
 * says what to keep of each case (default: the whole run).
 */
export function runSweep<R = StudyRun>(
  sketch: Sketch,
  p: StudyParameter,
  from: number,
  to: number,
  steps: number,
  hooks: SweepHooks<R> = {},
): SweepOutcome<R> {
  const out = sweepShare(sketch, p, from, to, steps, { part: 0, of: 1 }, hooks);
  return out.ok ? { ok: true, values: out.values, runs: out.runs } : { ok: false, message: out.message };
}

/**
 * One share of a sweep (several workers each take one): the cases k with
 * k % of === part, in order, each exactly as the whole sweep solves it. Its first
 * case that cannot be solved ends the share with its index, so that of all shares
 * the lowest index gives the whole sweep's message. Progress counts this share's cases.
 */
export function sweepShare<R = StudyRun>(
  sketch: Sketch,
  p: StudyParameter,
  from: number,
  to: number,
  steps: number,
  share: SweepShare,
  hooks: SweepHooks<R> = {},
): SweepShareOutcome<R> {
  const problem = rangeProblem(from, to, steps);
  if (problem) return { ok: false, message: problem, index: -1 };
  const values = evenlySpaced(from, to, steps);
  const solve = studyRunner(sketch, p, hooks.viewFactors);
  const keep = hooks.keep ?? ((run: StudyRun) => run as unknown as R); // R is StudyRun without `keep`
  const runs: R[] = [],
    indices: number[] = [];
  const total = Math.ceil((values.length - share.part) / share.of);
  for (let k = share.part; k < values.length; k += share.of) {
    if (hooks.stopped?.()) return { ok: false, message: 'stopped', index: k };
    const outcome = solve(values[k]);
    if (!outcome.ok) return { ok: false, message: outcome.message, index: k };
    runs.push(keep(outcome.run));
    indices.push(k);
    hooks.onProgress?.(runs.length, total);
  }
  return { ok: true, values, indices, runs };
}
