// Routes pointer and key input (already in sketch units) to the active drawing
// tool and holds that tool's in-flight state; everything else is in the store.
// The tools themselves come from a registry (src/state/tools/registry.ts).
import type { Point } from './sketchFile';
import type { AppStore } from './store';
import type { Pick } from './selection';
import type { DrawingTool, PointerInfo, PressAnswer, ToolContext } from './tools/tool';
import { toolRegistry, type ToolRegistry } from './tools/registry';
import { snapPoint } from './geometry/snap';
import { deleteShapes, deleteVertices, moveSelection } from './edits/shapeEdits';
import { copyShapes, flipShapes, pasteShapes, repeatShapes } from './edits/shapeCopies';
import { addTubeRow, editTubeRow, splitRow, type RowPlace, type RowSpec } from './edits/tubeRow';
import type { TubeRow } from '../document/schema';

export type { PointerInfo, PressAnswer } from './tools/tool';

export class CanvasController {
  /** The active tool and the context holding its in-flight state. */
  private current: { tool: DrawingTool; ctx: ToolContext<object> } | null = null;
  /** The two latest presses: a double-click counts only when both were at one place. */
  private presses: [Point | null, Point | null] = [null, null];

  constructor(
    private readonly store: AppStore,
    private readonly registry: ToolRegistry = toolRegistry,
  ) {}

  /** The active tool; when the store's tool changed, the old one drops what it had in flight. */
  private active(): { tool: DrawingTool; ctx: ToolContext<object> } {
    const id = this.store.getState().tool;
    if (this.current?.tool.id === id) return this.current;
    if (this.current) this.current.tool.cancel(this.current.ctx);
    const tool = this.registry.get(id);
    const get = this.store.getState;
    const ctx: ToolContext<object> = {
      get,
      gesture: tool.init(),
      snapped: (p) => {
        const { snap, gridStep } = get();
        return snapPoint(p, gridStep, snap);
      },
    };
    this.current = { tool, ctx };
    return this.current;
  }

  press(e: PointerInfo): PressAnswer {
    this.presses = [this.presses[1], e.at];
    const { tool, ctx } = this.active();
    return tool.press(ctx, e);
  }

  move(e: PointerInfo): void {
    const { tool, ctx } = this.active();
    tool.move(ctx, e);
  }

  release(e: PointerInfo): void {
    const { tool, ctx } = this.active();
    tool.release(ctx, e);
  }

  /**
   * The button came up outside the canvas: a drag ends where the pointer last
   * was on the canvas (a drawn shape is placed there if it has a size) and
   * whatever is left in flight is dropped, so no stray draft stays behind.
   */
  releaseOutside(e: PointerInfo): void {
    const { tool, ctx } = this.active();
    if (!(tool.holding?.(ctx.gesture) ?? false)) return;
    tool.release(ctx, e);
    tool.cancel(ctx);
  }

  doubleClick(e: PointerInfo): void {
    // Two quick clicks at different places are two clicks, not a double-click.
    const [p, q] = this.presses;
    if (!p || !q || Math.hypot(p[0] - q[0], p[1] - q[1]) > e.tolerance) return;
    const { tool, ctx } = this.active();
    tool.doubleClick?.(ctx, e);
  }

  /** A key pressed without modifiers (KeyboardEvent.key); true if the active tool took it. */
  key(key: string): boolean {
    const { tool, ctx } = this.active();
    return tool.keyDown?.(ctx, key) ?? false;
  }

  /** Enter: finish the outline being drawn. */
  finishDraft(): void {
    this.key('Enter');
  }

  /** Escape: drop what the tool has in flight (a drag, an outline), or else clear the selection. */
  cancel(): void {
    const { tool, ctx } = this.active();
    if (!tool.cancel(ctx)) this.store.getState().setSelection([]);
  }

  /** Delete: remove selected shapes and vertices (edges alone are not deletable). */
  deleteSelection(): void {
    const s = this.store.getState();
    const shapes = new Set(s.selection.filter((p) => p.type === 'shape').map((p) => p.shape));
    const vertices = s.selection.filter(
      (p): p is Extract<Pick, { type: 'vertex' }> => p.type === 'vertex' && !shapes.has(p.shape),
    );
    if (!shapes.size && !vertices.length) return;
    const before = s.doc;
    let doc = deleteVertices(before, vertices);
    const left = vertices.filter((v) => doc.shapes[v.shape] === before.shapes[v.shape]);
    doc = deleteShapes(doc, [...shapes]);
    s.commit(doc);
    s.setSelection([]);
    if (left.length) s.notify('warning', 'A shape needs at least three points; delete the whole shape instead.');
  }

  /** Shapes the selection touches (a picked vertex or edge counts for its shape), in order. */
  selectedShapes(): number[] {
    const s = this.store.getState();
    return [...new Set(s.selection.map((p) => p.shape))].filter((i) => s.doc.shapes[i]).sort((a, b) => a - b);
  }

  private selectShapes(indices: readonly number[]): void {
    this.store.getState().setSelection(indices.map((shape) => ({ type: 'shape', shape })));
  }

  /** Copy: the selected shapes and their surfaces' properties; false when nothing is selected. */
  copy(): boolean {
    const s = this.store.getState();
    const clip = copyShapes(s.doc, this.selectedShapes());
    if (!clip) return false;
    s.setClipboard(clip);
    this.pastes = 0;
    return true;
  }

  private pastes = 0;

  /** Paste: the copied shapes, one grid step right and down per paste so each copy shows; the copies selected. */
  paste(): boolean {
    const s = this.store.getState();
    if (!s.clipboard) return false;
    this.pastes++;
    const step = s.gridStep * this.pastes;
    const r = pasteShapes(s.doc, s.clipboard, step, -step);
    s.commit(r.doc);
    this.selectShapes(r.added);
    return true;
  }

  /** Duplicate: copy and paste in one step, leaving the clipboard as it was. */
  duplicate(): boolean {
    const s = this.store.getState();
    const clip = copyShapes(s.doc, this.selectedShapes());
    if (!clip) return false;
    const r = pasteShapes(s.doc, clip, s.gridStep, -s.gridStep);
    s.commit(r.doc);
    this.selectShapes(r.added);
    return true;
  }

  /** Move what is selected by (dx, dy), sketch units, as one step. */
  moveBy(dx: number, dy: number): boolean {
    const s = this.store.getState();
    if (!s.selection.length || !Number.isFinite(dx) || !Number.isFinite(dy)) return false;
    s.commit(moveSelection(s.doc, s.selection, dx, dy));
    return true;
  }

  /** Flip the selected shapes about the middle of their bounds. */
  flip(how: 'left-right' | 'upside-down'): boolean {
    const s = this.store.getState();
    const shapes = this.selectedShapes();
    if (!shapes.length) return false;
    s.commit(flipShapes(s.doc, shapes, how));
    return true;
  }

  /** Repeat: n copies of the selected shapes at a pitch along a direction; the copies selected. */
  repeat(n: number, pitch: number, direction: Point): boolean {
    const s = this.store.getState();
    const r = repeatShapes(s.doc, this.selectedShapes(), n, pitch, direction);
    if (!r) return false;
    s.commit(r.doc);
    this.selectShapes(r.added);
    return true;
  }

  /** Tube row: add it (one step) and select its tubes; the problem in words when it cannot be placed. */
  addRow(spec: RowSpec, place: RowPlace): string | null {
    const s = this.store.getState();
    const r = addTubeRow(s.doc, spec, place);
    if (!r.ok) return r.problem;
    s.commit(r.doc);
    this.selectShapes(r.added);
    return null;
  }

  /** Change row `name`'s numbers or place (one step): its tubes follow; the problem in words when it cannot be placed. */
  editRow(name: string, row: TubeRow): string | null {
    const s = this.store.getState();
    const r = editTubeRow(s.doc, name, row);
    if (!r.ok) return r.problem;
    s.commit(r.doc);
    this.selectShapes(r.added);
    return null;
  }

  /** Split row `name` into single tubes (one step): the tubes stay, the row is forgotten. */
  splitRow(name: string): void {
    const s = this.store.getState();
    s.commit(splitRow(s.doc, name));
  }

  /** True while a press is held that must end even if released outside the canvas (a drag). */
  get dragging(): boolean {
    const { tool, ctx } = this.active();
    return tool.holding?.(ctx.gesture) ?? false;
  }
}
