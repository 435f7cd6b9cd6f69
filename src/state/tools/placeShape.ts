// The last step of every drawing tool: the finished outline becomes a shape
// (one undo step) and the new shape is selected.
import type { Point, Shape } from '../sketchFile';
import type { AppState } from '../store';
import { addShape } from '../edits/shapeEdits';
import type { ShapeStem } from '../edits/surfaceNames';

export function placeShape(get: () => AppState, kind: Shape['kind'], points: Point[], stem: ShapeStem = 'body'): void {
  const s = get();
  const index = s.doc.shapes.length;
  s.edit((d) => addShape(d, kind, points, stem));
  s.setDraft([]);
  s.setHoverPoint(null);
  s.setSelection([{ type: 'shape', shape: index }]);
}
