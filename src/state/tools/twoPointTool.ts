// The gesture shared by the quick-shape tools: press at a first point and drag
// to a second (or click twice); the kernel turns the two points into an outline.
// The preview is the store's draft; the shape kind comes from the "makes" setting.
import type { Point } from '../sketchFile';
import type { AppState } from '../store';
import type { DrawingTool, ToolContext, ToolSetting } from './tool';
import { placeShape } from './placeShape';
import { editEntry, readEntry } from './typedEntry';
import type { ShapeStem } from '../edits/surfaceNames';

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
  /** The outline from the first and second points, or null when it has no area. */
  outline(first: Point, second: Point, s: AppState): Point[] | null;
  /** The outline from the first point and typed numbers, or why not. */
  typed(first: Point, numbers: number[], entry: string, s: AppState): Point[] | { problem: string };
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
  const preview = (ctx: Ctx, anchor: Point, at: Point) => spec.outline(anchor, ctx.snapped(at), ctx.get());

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
    if (outline) placeShape(ctx.get, ctx.get().quickKind, outline, spec.stem);
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
      if (anchor) ctx.get().setDraft(preview(ctx, anchor, e.at) ?? []);
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
      if ('problem' in outline) {
        s.notify('warning', `Not placed: ${outline.problem}.`);
        return true;
      }
      ctx.gesture.anchor = null;
      s.setEntry('');
      s.setDraft([]);
      placeShape(ctx.get, s.quickKind, outline, spec.stem);
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
