// The gesture shared by the quick-shape tools: press at a first point and drag
// to a second (or click twice); the kernel turns the two points into an outline.
// The preview is the store's draft; the shape kind comes from the "makes" setting.
import type { Point } from '../sketchFile';
import type { AppState } from '../store';
import type { DrawingTool, ToolContext, ToolSetting } from './tool';
import { placeShape } from './placeShape';
import type { ShapeStem } from '../edits/surfaceNames';

interface TwoPointGesture {
  /** First point (snapped), sketch units; null before the first press. */
  anchor: Point | null;
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
    init: () => ({ anchor: null }),

    press(ctx, e) {
      if (ctx.gesture.anchor) complete(ctx, e, true);
      else {
        ctx.gesture.anchor = ctx.snapped(e.at);
        ctx.get().setDraft([]);
      }
      return 'handled';
    },

    move(ctx, e) {
      const anchor = ctx.gesture.anchor;
      if (anchor) ctx.get().setDraft(preview(ctx, anchor, e.at) ?? []);
    },

    release(ctx, e) {
      complete(ctx, e, false);
    },

    cancel(ctx) {
      const s = ctx.get();
      if (!ctx.gesture.anchor && !s.draft.length) return false;
      ctx.gesture.anchor = null;
      s.setDraft([]);
      return true;
    },

    draft: (draft) => (draft.length ? { points: draft, closed: true, marks: [], dot: null, tone: 'body' } : null),
  };
}
