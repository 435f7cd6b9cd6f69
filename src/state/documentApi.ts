// The document-layer functions the app state needs, behind one interface so
// the live pipeline and autosave can be tested with stand-ins for faults.
import type { SceneInput } from '../core/scene';
import type { SketchFile } from './sketchFile';
import { restore, serialize, toScene, type Sketch, type SketchProblem } from '../document';

export type { SketchProblem, ProblemPlace } from '../document';

/** A sketch as `restore` returns it: checked, one surface name per edge. It is also a valid sketch file. */
export type CheckedSketch = Sketch;

export type RestoreOutcome =
  { ok: true; sketch: CheckedSketch; warnings: string[] } | { ok: false; errors: SketchProblem[] };

export interface DocumentApi {
  /** Parse (from text) or validate (an object) a sketch file, with messages for people. */
  restore(input: unknown): RestoreOutcome;
  /** Core input for a sketch that `restore` accepted. */
  toScene(sketch: CheckedSketch): { scene: SceneInput; surfaceNames: string[] };
  /** File text; a sketch that fails validation is still written (as plain JSON), so work is never lost. */
  serialize(sketch: SketchFile): string;
}

// Documents are immutable (every edit makes a new object), so the verdict on one is
// kept: live results, autosave and serialize each ask about the same document, and
// the geometry checks should run once per edit, not three times.
const verdicts = new WeakMap<object, RestoreOutcome>();

function restoreOnce(input: unknown): RestoreOutcome {
  if (typeof input !== 'object' || input === null) return restore(input);
  let verdict = verdicts.get(input);
  if (!verdict) {
    verdict = restore(input);
    verdicts.set(input, verdict);
  }
  return verdict;
}

export const documentApi: DocumentApi = {
  restore: restoreOnce,
  toScene: (sketch) => toScene(sketch),
  serialize: (sketch) => {
    const read = restoreOnce(sketch);
    return read.ok ? serialize(read.sketch) : `${JSON.stringify(sketch, null, 2)}\n`;
  },
};
