// The document-layer functions the app state needs, behind one interface so
// the live pipeline and autosave can be tested with stand-ins for faults.
import type { SceneInput } from '../core/scene';
import type { SketchFile } from './sketchFile';
import {
  CURRENT_VERSION,
  readDraft,
  readSketch,
  restore,
  serialize,
  toScene,
  type Sketch,
  type SketchProblem,
  type SketchReading,
} from '../document';

export type { SketchProblem, ProblemPlace } from '../document';

/** A sketch as `restore` returns it: checked, one surface name per edge. It is also a valid sketch file. */
export type CheckedSketch = Sketch;

export type RestoreOutcome =
  { ok: true; sketch: CheckedSketch; warnings: string[] } | { ok: false; errors: SketchProblem[] };

/** A file read as the app opens it: a sketch, perhaps a draft with problems, or the reasons it is not a sketch file. */
export type DraftOutcome =
  { ok: true; doc: SketchFile; problems: SketchProblem[]; warnings: string[] } | { ok: false; errors: SketchProblem[] };

export interface DocumentApi {
  /** Parse (from text) or validate (an object) a sketch file, with messages for people. */
  restore(input: unknown): RestoreOutcome;
  /** Like restore, but a sketch whose drawing breaks a rule is read as a draft with its problems. */
  readDraft(input: unknown): DraftOutcome;
  /** Core input for a sketch that `restore` accepted. */
  toScene(sketch: CheckedSketch): { scene: SceneInput; surfaceNames: string[] };
  /** File text; a sketch that fails validation is still written (as plain JSON), so work is never lost. */
  serialize(sketch: SketchFile): string;
}

// Documents are immutable (every edit makes a new object), so the reading of one is
// kept: live results, autosave and serialize each ask about the same document, and
// the checks should run once per edit, not once per question (restore and readDraft
// come from one reading).
const readings = new WeakMap<object, SketchReading>();

function readingOf(input: object): SketchReading {
  let reading = readings.get(input);
  if (!reading) {
    reading = readSketch(input);
    readings.set(input, reading);
  }
  return reading;
}

function restoreOnce(input: unknown): RestoreOutcome {
  if (typeof input !== 'object' || input === null) return restore(input);
  return readingOf(input).restored;
}

/** The sketch in serialize's form without changing what it says: a single name stands for every edge. */
function asWritten(doc: SketchFile): Sketch {
  const shapes = doc.shapes.map((shape) => ({
    ...shape,
    surface:
      typeof shape.surface === 'string'
        ? new Array<string>(Math.max(1, shape.points.length)).fill(shape.surface)
        : shape.surface,
  }));
  // serialize writes the current version whatever the sketch says.
  return {
    version: CURRENT_VERSION,
    units: doc.units,
    shapes,
    surfaces: doc.surfaces ?? {},
    settings: doc.settings ?? {},
    ...(doc.rows ? { rows: doc.rows } : {}),
  };
}

function readDraftOnce(input: unknown): DraftOutcome {
  if (typeof input !== 'object' || input === null) return readDraft(input);
  return readingOf(input).draft;
}

export const documentApi: DocumentApi = {
  restore: restoreOnce,
  readDraft: readDraftOnce,
  toScene: (sketch) => toScene(sketch),
  serialize: (sketch) => {
    const read = restoreOnce(sketch);
    if (read.ok) return serialize(read.sketch);
    // A draft is written in the same layout, as it stands (it reads back as the same draft).
    if (readDraftOnce(sketch).ok) return serialize(asWritten(sketch));
    return `${JSON.stringify(sketch, null, 2)}\n`;
  },
};
