// The gesture shared by the quick-shape tools: press at a first point and drag
// to a second (or click twice); the kernel turns the two points into an outline.
// The preview is the store's draft; the shape kind comes from the "makes" setting.
import type { Point } from '../sketchFile';
import type { AppState } from '../store';
import type { DrawingTool, ToolContext, ToolSetting } from './tool';
import { placeShape } from './placeShape';
import { editEntry, readEntry } from './typedEntry';
import type { ShapeStem } from '../edits/surfaceNames';
import { addCircle } from '../edits/shapeEdits';

/** An exact circle made by a tool: centre and radius, sketch units. */
export interface CircleMade {
  center: Point;
  radius: number;
}

/** What a quick-shape tool makes: an outline, or an exact circle. */
export type Made = Point[] | CircleMade;

/** Corners of the preview drawn while dragging a circle (drawing only; the shape placed is exact). */
const PREVIEW_SIDES = 96;

function previewOf(made: Made): Point[] {
  if (Array.isArray(made)) return made;
  const { center, radius } = made;
  return Array.from({ length: PREVIEW_SIDES }, (_, k): Point => {
    const a = (2 * Math.PI * k) / PREVIEW_SIDES;
    return [center[0] + radius * Math.cos(a), center[1] + radius * Math.sin(a)];
  });
}

function place(get: () => AppState, kind: 'solid' | 'enclosure', made: Made, stem: ShapeStem): void {
  if (Array.isArray(made)) {
    placeShape(get, kind, made, stem);
    return;
  }
  const s = get();
  const index = s.doc.shapes.length;
  s.edit((d) => addCircle(d, kind, made.center, made.radius, stem));
  s.setDraft([]);
  s.setHoverPoint(null);
  s.setSelection([{ type: 'shape', shape: index }]);
}

interface TwoPointGesture {
  /** First point (snapped, or typed exactly), sketch units; null before the first press. */
  anchor: Point | null;
  /** True while the button is held after the first press (a drag that must end even off the canvas). */
  held: boolean;
}

interface TwoPointSpec<Id extends string> {
  id: Id;
  label: string;
  shortcut: string;
  hint: string;
  settings: readonly ToolSetting[];
  /** What a body made by the tool is called ("body 2", "tube 3"). */
  stem: ShapeStem;
  /** The outline (or circle) from the first and second points, or null when it has no area. */
  outline(first: Point, second: Point, s: AppState): Made | null;
  /** The outline (or circle) from the first point and typed numbers, or why not. */
  typed(first: Point, numbers: number[], entry: string, s: AppState): Made | { problem: string };
  /** True when the second point is used as the pointer gives it (a tube's radius is not snapped). */
  freeSecond?: boolean;
  /** Characters besides digits that the entry takes after the first point (the tube's "r" for a radius). */
  entryLetters?: string;
}

/** Whether a quick shape becomes a body or the enclosure. */
export const makesSetting: ToolSetting = {
  type: 'choice',
  label: 'makes',
  title: 'Whether the rectangle or tube becomes a solid body or the enclosure',
  options: [
    { value: 'solid', label: 'body' },
    { value: 'enclosure', label: 'enclosure' },
  ],
  read: (s) => s.quickKind,
  write: (s, v) => s.setQuickKind(v === 'enclosure' ? 'enclosure' : 'solid'),
};

export function twoPointTool<Id extends string>(spec: TwoPointSpec<Id>): DrawingTool<TwoPointGesture, Id> {
  type Ctx = ToolContext<TwoPointGesture>;
  const preview = (ctx: Ctx, anchor: Point, at: Point) =>
    spec.outline(anchor, spec.freeSecond ? at : ctx.snapped(at), ctx.get());

  /** Press-drag-release draws the shape; a click without a drag waits for a second click. */
  const complete = (ctx: Ctx, e: { at: Point; tolerance: number }, secondClick: boolean) => {
    const anchor = ctx.gesture.anchor;
    if (!anchor) return;
    const moved = Math.hypot(e.at[0] - anchor[0], e.at[1] - anchor[1]) > e.tolerance;
    if (!moved && !secondClick) return;
    const outline = preview(ctx, anchor, e.at);
    ctx.gesture.anchor = null;
    ctx.gesture.held = false;
    ctx.get().setDraft([]);
    if (outline) place(ctx.get, ctx.get().quickKind, outline, spec.stem);
  };

  return {
    id: spec.id,
    label: spec.label,
    shortcut: spec.shortcut,
    hint: spec.hint,
    cursor: 'crosshair',
    settings: spec.settings,
    init: () => ({ anchor: null, held: false }),

    press(ctx, e) {
      if (ctx.gesture.anchor) complete(ctx, e, true);
      else {
        ctx.gesture.anchor = ctx.snapped(e.at);
        ctx.gesture.held = true;
        ctx.get().setDraft([]);
      }
      return 'handled';
    },

    move(ctx, e) {
      const anchor = ctx.gesture.anchor;
      if (!anchor) return;
      const made = preview(ctx, anchor, e.at);
      ctx.get().setDraft(made ? previewOf(made) : []);
    },

    release(ctx, e) {
      ctx.gesture.held = false;
      complete(ctx, e, false);
    },

    keyDown(ctx, key) {
      const s = ctx.get();
      const anchor = ctx.gesture.anchor;
      const typed = editEntry(s.entry, key, anchor ? (spec.entryLetters ?? '') : '');
      if (typed !== null) {
        s.setEntry(typed);
        return true;
      }
      if (key !== 'Enter' || !s.entry) return false;
      const r = readEntry(s.entry.replace(/[a-z]+$/i, ''));
      if ('problem' in r) {
        s.notify('warning', `Not placed: ${r.problem}.`);
        return true;
      }
      if (!anchor) {
        if (r.numbers.length !== 2) {
          s.notify('warning', 'Not placed: type the first point as x,y.');
          return true;
        }
        ctx.gesture.anchor = [r.numbers[0], r.numbers[1]];
        s.setEntry('');
        return true;
      }
      const outline = spec.typed(anchor, r.numbers, s.entry, s);
      if (!Array.isArray(outline) && 'problem' in outline) {
        s.notify('warning', `Not placed: ${outline.problem}.`);
        return true;
      }
      ctx.gesture.anchor = null;
      s.setEntry('');
      s.setDraft([]);
      place(ctx.get, s.quickKind, outline, spec.stem);
      return true;
    },

    cancel(ctx) {
      const s = ctx.get();
      if (!ctx.gesture.anchor && !s.draft.length && !s.entry) return false;
      ctx.gesture.anchor = null;
      ctx.gesture.held = false;
      s.setEntry('');
      s.setDraft([]);
      return true;
    },

    holding: (g) => g.held,

    draft: (draft) => (draft.length ? { points: draft, closed: true, marks: [], dot: null, tone: 'body' } : null),
  };
}
