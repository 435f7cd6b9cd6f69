// Undo/redo by snapshots of the document slice. Documents are immutable and
// edits share untouched shapes, so a snapshot costs little. A gesture (a drag)
// updates the document freely and becomes one step when it ends.
import type { StateCreator } from 'zustand';
import type { SketchFile } from './sketchFile';
import type { AppState } from './store';
import { validPicks } from './selection';
import { keepRows } from './edits/rowFollow';

export const HISTORY_LIMIT = 200;

export interface HistorySlice {
  past: SketchFile[];
  future: SketchFile[];
  /** Document at the start of the current gesture, or null when none is running. */
  gestureBase: SketchFile | null;
  /** Make `next` the document as one undo step (no step if nothing changed). */
  commit: (next: SketchFile) => void;
  beginGesture: () => void;
  /** Show a document during a gesture without adding undo steps. */
  updateGesture: (next: SketchFile) => void;
  endGesture: () => void;
  undo: () => void;
  redo: () => void;
}

export const createHistorySlice: StateCreator<AppState, [], [], HistorySlice> = (set, get) => ({
  past: [],
  future: [],
  gestureBase: null,
  commit: (proposed) => {
    const { doc, past, gestureBase } = get();
    // Tube rows stay rows through other edits (their tubes follow a moved wall, etc.).
    const next = keepRows(gestureBase ?? doc, proposed);
    if (gestureBase) {
      set({ doc: next });
      return;
    }
    if (next === doc) return;
    set({ doc: next, past: [...past, doc].slice(-HISTORY_LIMIT), future: [] });
  },
  beginGesture: () => {
    if (!get().gestureBase) set({ gestureBase: get().doc });
  },
  updateGesture: (next) => {
    const base = get().gestureBase;
    if (base) set({ doc: keepRows(base, next) });
  },
  endGesture: () => {
    const { gestureBase, doc, past } = get();
    if (!gestureBase) return;
    if (gestureBase === doc) {
      set({ gestureBase: null });
      return;
    }
    set({ gestureBase: null, past: [...past, gestureBase].slice(-HISTORY_LIMIT), future: [] });
  },
  undo: () => {
    const { past, future, doc, gestureBase } = get();
    if (gestureBase || past.length === 0) return;
    const prev = past[past.length - 1];
    set({
      doc: prev,
      past: past.slice(0, -1),
      future: [doc, ...future],
      selection: validPicks(prev.shapes, get().selection),
    });
  },
  redo: () => {
    const { past, future, doc, gestureBase } = get();
    if (gestureBase || future.length === 0) return;
    set({
      doc: future[0],
      past: [...past, doc],
      future: future.slice(1),
      selection: validPicks(future[0].shapes, get().selection),
    });
  },
});
