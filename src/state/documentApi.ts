// The document-layer functions the app state needs, behind one interface so
// the live pipeline and autosave can be tested with stand-ins for faults.
import type { SceneInput } from '../core/scene';
import { restore, serialize, toScene } from '../document';
import type { SketchFile } from './sketchFile';

export type RestoreOutcome =
  | { ok: true; sketch: SketchFile; warnings: string[] }
  | { ok: false; errors: string[] };

export interface DocumentApi {
  /** Parse (from text) or validate (an object) a sketch file, with messages for people. */
  restore(input: string | unknown): RestoreOutcome;
  /** Core input for a sketch that `restore` accepted. */
  toScene(sketch: SketchFile): { scene: SceneInput; surfaceNames: string[] };
  /** File text; a sketch that fails validation is still written (as plain JSON), so work is never lost. */
  serialize(sketch: SketchFile): string;
}

export const documentApi: DocumentApi = {
  restore: (input) => restore(input),
  toScene: (sketch) => {
    const read = restore(sketch);
    if (!read.ok) throw new Error(`toScene needs a valid sketch: ${read.errors[0]}`);
    return toScene(read.sketch);
  },
  serialize: (sketch) => {
    const read = restore(sketch);
    return read.ok ? serialize(read.sketch) : `${JSON.stringify(sketch, null, 2)}\n`;
  },
};
