import type { SketchFile } from '../../state/sketchFile';
import { edgeNames } from '../../state/geometry/polygon';

/** Surface names in order of first appearance (shape by shape, edge by edge), the order the table uses. */
export function surfaceOrder(doc: SketchFile): Map<string, number> {
  const order = new Map<string, number>();
  for (const s of doc.shapes) for (const n of edgeNames(s)) if (!order.has(n)) order.set(n, order.size);
  return order;
}
