// The few document-layer functions the app state needs, behind one interface so
// the live pipeline and autosave can be tested with the real reader.
import type { SceneInput } from '../core/scene';
import type { SketchFile } from './sketchFile';

export type RestoreOutcome =
  | { ok: true; sketch: SketchFile; warnings: string[] }
  | { ok: false; errors: string[] };

export interface DocumentApi {
  /** Parse (from text) or validate (an object) a sketch file, with messages for people. */
  restore(input: string | unknown): RestoreOutcome;
  toScene(sketch: SketchFile): { scene: SceneInput; surfaceNames: string[] };
  serialize(sketch: SketchFile): string;
}
