// Outline tools (enclosure and body): click the corners, finish on the first
// point, with Enter or a double-click. One module, the shape kind as parameter.
// Kernel: polygonTool. The outline in progress is the store's draft, so the
// canvas and the status line can show it.
import type { Shape } from '../sketchFile';
import type { DrawingTool, ToolContext } from './tool';
import { clickPoint, finish, removeLastPoint } from './polygonTool';
import { placeShape } from './placeShape';
import { editEntry, nextOutlinePoint } from './typedEntry';

interface OutlineSpec<Id extends string> {
  id: Id;
  kind: Shape['kind'];
  label: string;
  shortcut: string;
  hint: string;
}

export function outlineTool<Id extends string>(spec: OutlineSpec<Id>): DrawingTool<object, Id> {
  const { kind } = spec;
  const finishOutline = (ctx: ToolContext<object>) => {
    const s = ctx.get();
    const step = finish({ points: s.draft });
    if (step.finished) placeShape(ctx.get, kind, step.finished);
    else if (s.draft.length) s.notify('info', 'An outline needs at least three points.');
  };
  return {
    id: spec.id,
    label: spec.label,
    shortcut: spec.shortcut,
    hint: spec.hint,
    cursor: 'crosshair',
    init: () => ({}),

    press(ctx, e) {
      const s = ctx.get();
      const step = clickPoint({ points: s.draft }, ctx.snapped(e.at), e.tolerance);
      s.setDraft(step.draft.points);
      if (step.finished) placeShape(ctx.get, kind, step.finished);
      return 'handled';
    },

    move(ctx, e) {
      const s = ctx.get();
      const p = ctx.snapped(e.at);
      // With snapping most moves land on the same grid point: no new state, no re-render.
      if (!s.hoverPoint || p[0] !== s.hoverPoint[0] || p[1] !== s.hoverPoint[1]) s.setHoverPoint(p);
    },

    release() {},
    doubleClick: finishOutline,

    keyDown(ctx, key) {
      const s = ctx.get();
      const typed = editEntry(s.entry, key);
      if (typed !== null) {
        s.setEntry(typed);
        return true;
      }
      if (key === 'Enter' && s.entry) {
        const p = nextOutlinePoint(s.entry, s.draft, s.hoverPoint ?? s.pointer);
        if ('problem' in p) {
          s.notify('warning', `Not placed: ${p.problem}.`);
          return true;
        }
        s.setEntry('');
        const step = clickPoint({ points: s.draft }, p, 0);
        s.setDraft(step.draft.points);
        if (step.finished) placeShape(ctx.get, kind, step.finished);
        return true;
      }
      if (key === 'Enter') {
        finishOutline(ctx);
        return true;
      }
      if ((key === 'Delete' || key === 'Backspace') && s.draft.length) {
        s.setDraft(removeLastPoint({ points: s.draft }).points);
        return true;
      }
      return false;
    },

    cancel(ctx) {
      const s = ctx.get();
      if (s.entry) {
        s.setEntry('');
        return true;
      }
      if (!s.draft.length) return false;
      s.setDraft([]);
      return true;
    },

    draft(draft, hover) {
      if (!draft.length && !hover) return null;
      return {
        points: hover && draft.length ? [...draft, hover] : draft,
        closed: false,
        marks: draft,
        dot: hover && !draft.length ? hover : null,
        tone: kind === 'enclosure' ? 'enclosure' : 'body',
      };
    },

    progress: (draft) => (draft.length ? ` — ${draft.length} point${draft.length > 1 ? 's' : ''} so far` : ''),
  };
}

export const enclosureTool = outlineTool({
  id: 'enclosure',
  kind: 'enclosure',
  label: 'Enclosure',
  shortcut: 'e',
  hint: 'Click the corners of the enclosing wall, or type x,y then length or length,angle and Enter; finish on the first point, with Enter or a double-click',
});

export const bodyTool = outlineTool({
  id: 'solid',
  kind: 'solid',
  label: 'Body',
  shortcut: 'b',
  hint: 'Click the corners of a solid body (or type them like the enclosure); finish like the enclosure',
});
