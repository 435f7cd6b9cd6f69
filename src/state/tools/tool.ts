// The one interface every drawing tool implements. A tool module wires a pure
// kernel (polygonTool, quickShapes, selectTool, hitTest) to the store; the canvas
// controller routes input to the active tool and holds its in-flight state.
// A new tool is a module implementing DrawingTool plus a line in registry.ts.
import type { Point } from '../sketchFile';
import type { AppState } from '../store';
import type { NumberRule } from '../edits/numberInput';

export interface PointerInfo {
  /** Pointer position in sketch units. */
  at: Point;
  shift: boolean;
  /** Pick radius in sketch units (a few pixels divided by the zoom). */
  tolerance: number;
}

/** What the UI should do with a press the tool did not take: pan the view. */
export type PressAnswer = 'handled' | 'pan';

/** What a tool gets on each call. */
export interface ToolContext<G> {
  /** The store's state now; read it again after an action, actions replace it. */
  get: () => AppState;
  /** The tool's own in-flight state, made by init() when the tool became active. */
  gesture: G;
  /** p on the grid when snapping is on, else p (sketch units). */
  snapped: (p: Point) => Point;
}

/** What the draft layer draws for the shape being made; pure data, sketch units. */
export interface DraftPicture {
  points: Point[];
  /** Closed outline with a light fill (quick shapes), or an open rubber band (outlines). */
  closed: boolean;
  /** Points marked with a handle; the first one larger (a click there closes the outline). */
  marks: Point[];
  /** The pointer shown as a dot before the first click, if any. */
  dot: Point | null;
  tone: 'enclosure' | 'body';
}

/** A setting shown beside the tools while the tool is active; values live in the store. */
export type ToolSetting =
  | {
      type: 'choice';
      label: string;
      title: string;
      options: readonly { value: string; label: string }[];
      read: (s: AppState) => string;
      write: (s: AppState, value: string) => void;
    }
  | {
      type: 'integer';
      label: string;
      title: string;
      /** Allowed values; the field refuses others with a message. */
      rule?: NumberRule;
      read: (s: AppState) => number;
      write: (s: AppState, value: number) => void;
    };

/**
 * G is the tool's in-flight state (a drag plan, an anchor...). Methods use method
 * syntax on purpose: a DrawingTool<{ anchor }> then fits a list of DrawingTool<object>;
 * the controller only ever hands a tool the state its own init() made.
 */
export interface DrawingTool<G extends object = object, Id extends string = string> {
  id: Id;
  label: string;
  /** Shortcut letter, lower case. */
  shortcut: string;
  /** What the tool expects, for the status line, the tooltip and the help. */
  hint: string;
  cursor: 'default' | 'crosshair';
  /** Show every vertex handle of the selected shapes, not only the picked vertices. */
  showsAllHandles?: boolean;
  settings?: readonly ToolSetting[];
  init(): G;
  press(ctx: ToolContext<G>, e: PointerInfo): PressAnswer;
  move(ctx: ToolContext<G>, e: PointerInfo): void;
  release(ctx: ToolContext<G>, e: PointerInfo): void;
  /** A double-click (the controller has checked both presses were at one place). */
  doubleClick?(ctx: ToolContext<G>, e: PointerInfo): void;
  /** A key (KeyboardEvent.key) pressed without modifiers; true if the tool took it. */
  keyDown?(ctx: ToolContext<G>, key: string): boolean;
  /** Escape, or leaving the tool: drop what is in flight; true if there was something. */
  cancel(ctx: ToolContext<G>): boolean;
  /** True while a press is held that must end even if the pointer is released outside the canvas. */
  holding?(gesture: G): boolean;
  /** What the draft layer draws, from the store's draft outline and pointer point. */
  draft(draft: Point[], hover: Point | null): DraftPicture | null;
  /** Progress for the status line after the hint ('' or absent when none). */
  progress?(draft: Point[]): string;
}
