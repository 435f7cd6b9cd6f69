// Select tool: pick vertices, edges and shapes, drag them (one undo step per
// drag), double-click an edge to insert a vertex. Kernels: hitTest, selectTool.
import type { Point, SketchFile } from '../sketchFile';
import type { DrawingTool } from './tool';
import { hitTest } from './hitTest';
import { dragOffset, pressSelect, type DragPlan } from './selectTool';
import { insertVertex, moveSelection } from '../edits/shapeEdits';

interface SelectGesture {
  /** `offset`: the move shown now; a pointer move within one grid step changes nothing and is skipped. */
  drag: { plan: DragPlan; base: SketchFile; offset: Point } | null;
}

export const selectTool: DrawingTool<SelectGesture, 'select'> = {
  id: 'select',
  label: 'Select',
  shortcut: 'v',
  hint: 'Pick and drag vertices, edges or shapes; shift adds to the selection; double-click an edge to insert a vertex',
  cursor: 'default',
  showsAllHandles: true,
  init: () => ({ drag: null }),

  press(ctx, e) {
    const s = ctx.get();
    const hit = hitTest(s.doc, e.at, e.tolerance);
    const r = pressSelect(s.doc, s.selection, hit, e.at, e.shift);
    s.setSelection(r.selection);
    if (!hit) return 'pan';
    if (r.drag) {
      s.beginGesture();
      ctx.gesture.drag = { plan: r.drag, base: ctx.get().doc, offset: [0, 0] };
    }
    return 'handled';
  },

  move(ctx, e) {
    const drag = ctx.gesture.drag;
    if (!drag) return;
    const s = ctx.get();
    const [dx, dy] = dragOffset(drag.plan, e.at, s.gridStep, s.snap);
    if (dx === drag.offset[0] && dy === drag.offset[1]) return;
    drag.offset = [dx, dy];
    s.previewGesture(moveSelection(drag.base, drag.plan.picks, dx, dy));
  },

  release(ctx) {
    if (!ctx.gesture.drag) return;
    ctx.gesture.drag = null;
    ctx.get().endGesture();
  },

  doubleClick(ctx, e) {
    const s = ctx.get();
    const hit = hitTest(s.doc, e.at, e.tolerance);
    if (hit?.type !== 'edge') return;
    s.edit((d) => insertVertex(d, hit.shape, hit.index, ctx.snapped(hit.at)));
    s.setSelection([{ type: 'vertex', shape: hit.shape, index: hit.index + 1 }]);
  },

  cancel(ctx) {
    const drag = ctx.gesture.drag;
    if (!drag) return false;
    const s = ctx.get();
    s.updateGesture(drag.base);
    ctx.gesture.drag = null;
    s.endGesture();
    return true;
  },

  holding: (g) => g.drag !== null,
  draft: () => null,
};
