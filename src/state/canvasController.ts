// Routes pointer and key input (already in sketch units) to the tool kernels
// and the store. Holds only the in-flight gesture; everything else is in the store.
import type { Point, SketchFile } from './sketchFile';
import type { AppStore } from './store';
import type { Pick } from './selection';
import { hitTest } from './tools/hitTest';
import { pressSelect, dragOffset, type DragPlan } from './tools/selectTool';
import { clickPoint, finish } from './tools/polygonTool';
import { rectangleFromCorners, regularPolygon } from './tools/quickShapes';
import { snapPoint } from './geometry/snap';
import { addShape, deleteShapes, deleteVertices, insertVertex, moveSelection } from './edits/shapeEdits';

export interface PointerInfo {
  /** Pointer position in sketch units. */
  at: Point;
  shift: boolean;
  /** Pick radius in sketch units (a few pixels divided by the zoom). */
  tolerance: number;
}

/** What the UI should do with a press the tools did not take: pan the view. */
export type PressAnswer = 'handled' | 'pan';

export class CanvasController {
  /** `offset`: the move shown now; a pointer move within one grid step changes nothing and is skipped. */
  private drag: { plan: DragPlan; base: SketchFile; offset: Point } | null = null;
  private anchor: Point | null = null; // rectangle corner or tube centre
  /** The two latest presses: a double-click counts only when both were at one place. */
  private presses: [Point | null, Point | null] = [null, null];

  constructor(private readonly store: AppStore) {}

  private snapped(p: Point): Point {
    const { snap, gridStep } = this.store.getState();
    return snapPoint(p, gridStep, snap);
  }

  press(e: PointerInfo): PressAnswer {
    const s = this.store.getState();
    this.presses = [this.presses[1], e.at];
    switch (s.tool) {
      case 'select': {
        const hit = hitTest(s.doc, e.at, e.tolerance);
        const r = pressSelect(s.doc, s.selection, hit, e.at, e.shift);
        s.setSelection(r.selection);
        if (!hit) return 'pan';
        if (r.drag) {
          s.beginGesture();
          this.drag = { plan: r.drag, base: this.store.getState().doc, offset: [0, 0] };
        }
        return 'handled';
      }
      case 'enclosure':
      case 'solid': {
        const step = clickPoint({ points: s.draft }, this.snapped(e.at), e.tolerance);
        s.setDraft(step.draft.points);
        if (step.finished) this.addOutline(s.tool, step.finished);
        return 'handled';
      }
      case 'rectangle':
      case 'tube': {
        if (this.anchor) this.finishQuick(e.at, e.tolerance, true);
        else { this.anchor = this.snapped(e.at); s.setDraft([]); }
        return 'handled';
      }
    }
  }

  move(e: PointerInfo): void {
    const s = this.store.getState();
    if (this.drag) {
      const [dx, dy] = dragOffset(this.drag.plan, e.at, s.gridStep, s.snap);
      if (dx === this.drag.offset[0] && dy === this.drag.offset[1]) return;
      this.drag.offset = [dx, dy];
      s.updateGesture(moveSelection(this.drag.base, this.drag.plan.picks, dx, dy));
      return;
    }
    if (s.tool === 'enclosure' || s.tool === 'solid') {
      const p = this.snapped(e.at);
      // With snapping most moves land on the same grid point: no new state, no re-render.
      if (!s.hoverPoint || p[0] !== s.hoverPoint[0] || p[1] !== s.hoverPoint[1]) s.setHoverPoint(p);
    }
    if ((s.tool === 'rectangle' || s.tool === 'tube') && this.anchor) s.setDraft(this.quickOutline(e.at) ?? []);
  }

  release(e: PointerInfo): void {
    if (this.drag) {
      this.drag = null;
      this.store.getState().endGesture();
      return;
    }
    // Press-drag-release draws a quick shape; a click without a drag waits for a second click.
    if (this.anchor) this.finishQuick(e.at, e.tolerance, false);
  }

  doubleClick(e: PointerInfo): void {
    const s = this.store.getState();
    // Two quick clicks at different places are two clicks, not a double-click.
    const [p, q] = this.presses;
    if (!p || !q || Math.hypot(p[0] - q[0], p[1] - q[1]) > e.tolerance) return;
    if (s.tool === 'enclosure' || s.tool === 'solid') { this.finishDraft(); return; }
    if (s.tool !== 'select') return;
    const hit = hitTest(s.doc, e.at, e.tolerance);
    if (hit?.type !== 'edge') return;
    s.edit((d) => insertVertex(d, hit.shape, hit.index, this.snapped(hit.at)));
    s.setSelection([{ type: 'vertex', shape: hit.shape, index: hit.index + 1 }]);
  }

  /** Enter: finish the outline being drawn. */
  finishDraft(): void {
    const s = this.store.getState();
    if (s.tool !== 'enclosure' && s.tool !== 'solid') return;
    const step = finish({ points: s.draft });
    if (step.finished) this.addOutline(s.tool, step.finished);
    else if (s.draft.length) s.notify('info', 'An outline needs at least three points.');
  }

  /** Escape: drop the outline being drawn, or clear the selection. */
  cancel(): void {
    const s = this.store.getState();
    if (this.drag) { s.updateGesture(this.drag.base); this.drag = null; s.endGesture(); return; }
    if (s.draft.length || this.anchor) { this.anchor = null; s.setDraft([]); return; }
    s.setSelection([]);
  }

  /** Delete: remove selected shapes and vertices (edges alone are not deletable). */
  deleteSelection(): void {
    const s = this.store.getState();
    const shapes = new Set(s.selection.filter((p) => p.type === 'shape').map((p) => p.shape));
    const vertices = s.selection.filter((p): p is Extract<Pick, { type: 'vertex' }> => p.type === 'vertex' && !shapes.has(p.shape));
    if (!shapes.size && !vertices.length) return;
    const before = s.doc;
    let doc = deleteVertices(before, vertices);
    const left = vertices.filter((v) => doc.shapes[v.shape] === before.shapes[v.shape]);
    doc = deleteShapes(doc, [...shapes]);
    s.commit(doc);
    s.setSelection([]);
    if (left.length) s.notify('warning', 'A shape needs at least three points; delete the whole shape instead.');
  }

  get dragging(): boolean {
    return this.drag !== null;
  }

  private addOutline(kind: 'enclosure' | 'solid', points: Point[]): void {
    const s = this.store.getState();
    const index = s.doc.shapes.length;
    s.edit((d) => addShape(d, kind, points));
    s.setDraft([]);
    s.setHoverPoint(null);
    s.setSelection([{ type: 'shape', shape: index }]);
  }

  private quickOutline(at: Point): Point[] | null {
    const s = this.store.getState();
    if (!this.anchor) return null;
    const p = this.snapped(at);
    return s.tool === 'rectangle' ? rectangleFromCorners(this.anchor, p) : regularPolygon(this.anchor, p, s.tubeSides);
  }

  private finishQuick(at: Point, tolerance: number, secondClick: boolean): void {
    if (!this.anchor) return;
    const moved = Math.hypot(at[0] - this.anchor[0], at[1] - this.anchor[1]) > tolerance;
    if (!moved && !secondClick) return;
    const outline = this.quickOutline(at);
    this.anchor = null;
    this.store.getState().setDraft([]);
    if (outline) this.addOutline(this.store.getState().quickKind, outline);
  }
}
