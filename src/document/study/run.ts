// One case of a study: the sketch with the parameter at one value, checked as
// a file would be (restore of its text), then view factors and the exchange,
// and the object `exchange --json` prints for that file. Property and settings
// studies keep the view factors of the first case (the geometry is the same);
// position and tube-row studies compute them for every value, keeping the pairs
// the move cannot change since the value before (caseFactors).
import type { SceneInput, ViewFactorResult } from '../../core/scene';
import { KeptViewFactors } from '../../core/reuse/keptViewFactors';
import { SolverMemory } from '../../core/exchange';
import { solveSketchExchange } from '../exchangeInput';
import { exchangeJson } from '../exchangeJson';
import { restore } from '../restore';
import type { Sketch } from '../schema';
import { toScene } from '../toScene';
import { withParameterValue } from './apply';
import { describeParameter, parameterUnit, withUnit, type StudyParameter } from './parameter';

type Solved = Extract<ReturnType<typeof solveSketchExchange>, { ok: true }>;

/**
 * One solved case: the checked edited sketch, its surfaces in matrix order and
 * exchange (SI). Its view factors are not kept (surfaces^2 numbers per case: a
 * long sweep of a sketch of many surfaces held gigabytes), only their lengths.
 */
export interface StudyRun {
  value: number;
  sketch: Sketch;
  names: string[];
  /** Surface lengths, sketch units. */
  surfaceLength: Float64Array;
  result: Solved['result'];
  conditions: Solved['input']['conditions'];
  /** Exactly what `exchange --json` prints for the edited file; made when asked (its exchange matrix is surfaces^2 numbers). */
  json(): Record<string, unknown>;
}

export type StudyRunOutcome = { ok: true; run: StudyRun } | { ok: false; message: string };

/** The edited sketch, checked by the reader as a file with that value would be (no text in between). */
export function editedSketch(
  sketch: Sketch,
  p: StudyParameter,
  value: number,
): { ok: true; sketch: Sketch } | { ok: false; message: string } {
  const read = restore(withParameterValue(sketch, p, value));
  if (read.ok) return { ok: true, sketch: read.sketch };
  return { ok: false, message: read.errors.map((e) => e.message).join('; ') };
}

/**
 * Surface view factors of a scene: core computeViewFactors, or the command line's over
 * worker threads (same bits). The runner reads a case's factors only while it solves
 * that case, so the next call may write over them (the command line's threads do).
 */
export type ViewFactorsOf = (scene: SceneInput) => ViewFactorResult;

/**
 * View factors for the cases of one study, one after another: each case computes
 * only the pairs its moved shapes may change since the case before and keeps the
 * rest (core reuse/keptViewFactors.ts), the same bits as computing them all.
 */
export function caseFactors(): ViewFactorsOf {
  const kept = new KeptViewFactors();
  return (scene) => kept.compute(scene);
}

/** A function that solves the case at one value of the parameter, reusing view factors where the geometry is fixed. */
export function studyRunner(
  sketch: Sketch,
  p: StudyParameter,
  viewFactors: ViewFactorsOf = caseFactors(),
): (value: number) => StudyRunOutcome {
  const sameGeometry = p.kind !== 'shape' && p.kind !== 'row';
  let kept: { names: string[]; factors: ViewFactorResult } | undefined;
  // Every case is a balance of the same size: its solvers and scratch are kept from one to the next.
  const memory = new SolverMemory();
  const unit = parameterUnit(p, sketch.units);
  const at = (value: number, message: string): StudyRunOutcome => ({
    ok: false,
    message: `with ${describeParameter(p)} = ${withUnit(value, unit)}: ${message}`,
  });
  return (value) => {
    if (!Number.isFinite(value)) return at(value, 'the value is not a finite number');
    const edited = editedSketch(sketch, p, value);
    if (!edited.ok) return at(value, edited.message);
    let shared = sameGeometry ? kept : undefined;
    if (!shared) {
      const { scene, surfaceNames } = toScene(edited.sketch);
      const factors = viewFactors(scene);
      if (!factors.F.every(Number.isFinite) || !factors.surfaceLength.every(Number.isFinite))
        return at(value, 'internal error: the view factors came out non-finite; please report this file');
      shared = { names: surfaceNames, factors };
      if (sameGeometry) kept = shared;
    }
    const { names, factors } = shared;
    const outcome = solveSketchExchange(edited.sketch, names, factors, undefined, memory);
    if (!outcome.ok) return at(value, outcome.message);
    const { result } = outcome;
    const { surfaceLength } = factors; // the run keeps the lengths, not the factors
    return {
      ok: true,
      run: {
        value,
        sketch: edited.sketch,
        names,
        surfaceLength,
        result,
        conditions: outcome.input.conditions,
        json: () => exchangeJson({ names, factors: { surfaceLength }, result }),
      },
    };
  };
}
