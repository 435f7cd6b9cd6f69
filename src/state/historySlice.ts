// Undo/redo by snapshots of the document slice. Documents are immutable and
// edits share untouched shapes, so a snapshot costs little. A gesture (a drag)
// updates the document freely and becomes one step when it ends.
//
// Paced gestures: while the view factors of the document are being computed, a
// pointer move only changes what the canvas draws (gesturePreview); the document
// takes the newest position once the answer is filed (results/live.ts). So a big
// sketch's pipeline works on the newest position, and the page is not busy
// checking and rendering positions no job will ever compute.
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
  /**
   * What the canvas draws during a gesture: the newest position, ahead of `doc`
   * while the view factors of `doc` are being computed; null outside gestures.
   */
  gesturePreview: SketchFile | null;
  /** Show a document during a gesture without adding undo steps. */
  updateGesture: (next: SketchFile) => void;
  /**
   * As updateGesture, paced: the document follows at once when no view-factor
   * job for it is running, else when its answer is filed (`catchUpGesture`).
   */
  previewGesture: (next: SketchFile) => void;
  /** Make the gesture's newest position the document if the results are no longer computing. */
  catchUpGesture: () => void;
  endGesture: () => void;
  undo: () => void;
  redo: () => void;
}

/** A view-factor job for the current document is queued or running. */
const computing = (s: AppState) => s.viewFactors.status === 'computing';

/** A paced gesture's newest position is ahead of the document (it waits for the running job). */
export const gestureIsAhead = (s: AppState): boolean => s.gesturePreview !== null && s.gesturePreview !== s.doc;

/** A paced gesture's newest position is ahead of the document, and nothing is computing: the document may take it. */
export const gestureCanCatchUp = (s: AppState): boolean => gestureIsAhead(s) && !computing(s);

export const createHistorySlice: StateCreator<AppState, [], [], HistorySlice> = (set, get) => ({
  past: [],
  future: [],
  gestureBase: null,
  gesturePreview: null,
  commit: (proposed) => {
    const { doc, past, gestureBase } = get();
    // Tube rows stay rows through other edits (their tubes follow a moved wall, etc.).
    const next = keepRows(gestureBase ?? doc, proposed);
    if (gestureBase) {
      set({ doc: next, gesturePreview: next });
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
    if (!base) return;
    const doc = keepRows(base, next);
    set({ doc, gesturePreview: doc });
  },
  previewGesture: (next) => {
    const base = get().gestureBase;
    if (!base) return;
    if (computing(get())) set({ gesturePreview: keepRows(base, next) });
    else get().updateGesture(next);
  },
  catchUpGesture: () => {
    const s = get();
    if (gestureCanCatchUp(s)) set({ doc: s.gesturePreview! });
  },
  endGesture: () => {
    const { gestureBase, gesturePreview, past } = get();
    if (!gestureBase) return;
    // The newest position is the drag's result, whether or not its factors were computed.
    const doc = gesturePreview ?? get().doc;
    if (gestureBase === doc) {
      set({ gestureBase: null, gesturePreview: null, doc });
      return;
    }
    set({
      doc,
      gestureBase: null,
      gesturePreview: null,
      past: [...past, gestureBase].slice(-HISTORY_LIMIT),
      future: [],
    });
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
