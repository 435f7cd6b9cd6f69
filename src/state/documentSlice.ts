// The document slice: exactly the sketch file, nothing else. Every change goes
// through the history slice's commit so it can be undone.
import type { StateCreator } from 'zustand';
import type { SketchFile } from './sketchFile';
import type { AppState } from './store';

export interface DocumentSlice {
  doc: SketchFile;
  /** Apply a pure edit as one undo step. */
  edit: (fn: (doc: SketchFile) => SketchFile) => void;
}

export const emptySketch: SketchFile = { version: 2, units: 'm', shapes: [] };

export const createDocumentSlice =
  (initial: SketchFile): StateCreator<AppState, [], [], DocumentSlice> =>
  (_set, get) => ({
    doc: initial,
    edit: (fn) => get().commit(fn(get().doc)),
  });
