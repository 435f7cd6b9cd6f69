// View state: tool, selection, camera, grid, table options, notices. Never saved
// in the sketch file and never part of undo.
import type { StateCreator } from 'zustand';
import type { Point, Shape } from './sketchFile';
import type { Pick } from './selection';
import type { AppState } from './store';
import { DEFAULT_TOOL, type ToolId } from './tools/registry';
import { DIGITS_RULE, GRID_STEP_RULE, readNumber } from './edits/numberInput';
import type { Clipboard } from './edits/shapeCopies';

/** At most this many notices show at once; the oldest goes first. */
export const MAX_NOTICES = 3;

/** Screen = origin + scale * (x, -y): y points up in the sketch, down on screen. */
export interface Camera {
  scale: number;
  originX: number;
  originY: number;
}

/** A button on a notice: save the sketch to a file (the page downloads it), or run an action of the state. */
export type NoticeAction = { kind: 'save-file'; label: string } | { kind: 'run'; label: string; run: () => void };

export interface Notice {
  id: number;
  level: 'info' | 'warning' | 'error';
  text: string;
  action?: NoticeAction;
}

export interface ViewSlice {
  /** Id of the active drawing tool in the tool registry (a test may run its own registry). */
  tool: string;
  selection: Pick[];
  camera: Camera;
  snap: boolean;
  gridStep: number;
  /** Kind of shape the rectangle and tube tools make. */
  quickKind: Shape['kind'];
  /** Outline being drawn by the polygon tools, and the live rubber-band point. */
  draft: Point[];
  /** Pointer position (sketch units) while a drawing tool is active, for the rubber band. */
  hoverPoint: Point | null;
  digits: number;
  /** Surfaces under the pointer in the table (from, to), highlighted on the canvas. */
  hoverPair: [string, string] | null;
  helpOpen: boolean;
  /** Bumped to ask the canvas to fit the sketch in view (the canvas knows its size). */
  fitRequest: number;
  notices: Notice[];
  /** Surface names written beside each surface on the canvas. */
  showNames: boolean;
  /** Pointer position in sketch units while it is over the canvas, for the status line. */
  pointer: Point | null;
  /** What is typed for the next point of an outline ("1.2" or "1.2,90"; first point "x,y"). */
  entry: string;
  /** Shapes copied with their surfaces' properties, for paste. */
  clipboard: Clipboard | null;
  setShowNames: (show: boolean) => void;
  setPointer: (p: Point | null) => void;
  setEntry: (entry: string) => void;
  setClipboard: (clipboard: Clipboard | null) => void;
  setTool: (tool: ToolId) => void;
  setSelection: (selection: Pick[]) => void;
  setCamera: (camera: Camera) => void;
  setSnap: (snap: boolean) => void;
  setGridStep: (step: number) => void;
  setQuickKind: (kind: Shape['kind']) => void;
  setDraft: (draft: Point[]) => void;
  setHoverPoint: (p: Point | null) => void;
  setDigits: (digits: number) => void;
  setHoverPair: (pair: [string, string] | null) => void;
  setHelpOpen: (open: boolean) => void;
  requestFit: () => void;
  /** Show a notice; returns its id (to dismiss it when it no longer holds). */
  notify: (level: Notice['level'], text: string, action?: NoticeAction) => number;
  dismissNotice: (id: number) => void;
}

let nextNoticeId = 1;

export const createViewSlice: StateCreator<AppState, [], [], ViewSlice> = (set) => ({
  tool: DEFAULT_TOOL,
  selection: [],
  camera: { scale: 100, originX: 60, originY: 400 },
  snap: true,
  gridStep: 0.1,
  quickKind: 'solid',
  draft: [],
  hoverPoint: null,
  digits: 4,
  hoverPair: null,
  helpOpen: false,
  fitRequest: 0,
  notices: [],
  showNames: true,
  pointer: null,
  entry: '',
  clipboard: null,
  setShowNames: (showNames) => set({ showNames }),
  setPointer: (pointer) => set({ pointer }),
  setEntry: (entry) => set({ entry }),
  setClipboard: (clipboard) => set({ clipboard }),
  setTool: (tool) => set({ tool, draft: [], hoverPoint: null, entry: '' }),
  setSelection: (selection) => set({ selection }),
  setCamera: (camera) => set({ camera }),
  setSnap: (snap) => set({ snap }),
  // Values outside a rule are refused (the field says why), never clamped.
  setGridStep: (gridStep) => {
    if (readNumber(String(gridStep), GRID_STEP_RULE).ok) set({ gridStep });
  },
  setQuickKind: (quickKind) => set({ quickKind }),
  setDraft: (draft) => set({ draft }),
  setHoverPoint: (hoverPoint) => set({ hoverPoint }),
  setDigits: (digits) => {
    if (readNumber(String(digits), DIGITS_RULE).ok) set({ digits });
  },
  setHoverPair: (hoverPair) => set({ hoverPair }),
  setHelpOpen: (helpOpen) => set({ helpOpen }),
  requestFit: () => set((s) => ({ fitRequest: s.fitRequest + 1 })),
  notify: (level, text, action) => {
    const id = nextNoticeId++;
    const notice: Notice = action ? { id, level, text, action } : { id, level, text };
    set((s) => ({ notices: [...s.notices.slice(-(MAX_NOTICES - 1)), notice] }));
    return id;
  },
  dismissNotice: (id) => set((s) => ({ notices: s.notices.filter((n) => n.id !== id) })),
});
