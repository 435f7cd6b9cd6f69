// Select-and-drag kernel: a press picks and plans a drag; each pointer move turns
// the plan into an offset from the document at the press, so a whole drag is one
// clean edit with no accumulated rounding.
import type { Point, SketchFile } from '../sketchFile';
import type { Pick } from '../selection';
import { samePick, togglePick } from '../selection';
import type { Hit } from './hitTest';
import { snapPoint } from '../geometry/snap';

export interface DragPlan {
  picks: Pick[];
  /** Pointer position at the press (sketch units). */
  anchor: Point;
  /** A point of the dragged item that snaps to the grid (the vertex itself, or the edge's start). */
  reference: Point;
}

export interface PressResult {
  selection: Pick[];
  drag: DragPlan | null;
}

export function hitToPick(hit: Exclude<Hit, null>): Pick {
  return hit.type === 'shape'
    ? { type: 'shape', shape: hit.shape }
    : { type: hit.type, shape: hit.shape, index: hit.index };
}

/** A press at `pointer` on `hit`; with shift, toggles the pick into the selection. */
export function pressSelect(
  doc: SketchFile,
  selection: readonly Pick[],
  hit: Hit,
  pointer: Point,
  shift: boolean,
): PressResult {
  if (!hit) return { selection: shift ? [...selection] : [], drag: null };
  const pick = hitToPick(hit);
  const already = selection.some((s) => samePick(s, pick));
  const next = already && !shift ? [...selection] : togglePick(selection, pick, shift);
  if (!next.some((s) => samePick(s, pick))) return { selection: next, drag: null };
  const shape = doc.shapes[hit.shape];
  // A circle's reference is its centre, so a dragged tube's centre lands on the grid.
  const reference =
    hit.type === 'vertex' || hit.type === 'edge'
      ? shape.points[hit.index]
      : shape.circle
        ? shape.circle.center
        : shape.points[0];
  return { selection: next, drag: { picks: next, anchor: pointer, reference } };
}

/**
 * The move (dx, dy), sketch units, that brings the reference point under the
 * pointer (snapped); the dragged document is moveSelection(base, plan.picks, dx, dy).
 */
export function dragOffset(plan: DragPlan, pointer: Point, gridStep: number, snap: boolean): Point {
  const target = snapPoint(
    [plan.reference[0] + pointer[0] - plan.anchor[0], plan.reference[1] + pointer[1] - plan.anchor[1]],
    gridStep,
    snap,
  );
  return [target[0] - plan.reference[0], target[1] - plan.reference[1]];
}
