// Which colour each surface is drawn in. The colour follows the surface's first
// edge (shape and side number), not its place in the table, so joining,
// renaming or splitting one surface leaves every other surface's colour as it was.
import type { SketchFile } from '../sketchFile';
import { edgeNames } from '../geometry/polygon';

/** Colour slots (palette index) in use; 8 hues times 4 dash patterns. */
export const COLOUR_SLOTS = 32;
/** Step between shapes: coprime with COLOUR_SLOTS, so 32 shapes in a row start on different slots. */
const SHAPE_STRIDE = 11;

const cache = new WeakMap<SketchFile['shapes'], ReadonlyMap<string, number>>();

/** Surface name to colour slot: (shape × 11 + first side) mod 32 of the surface's first edge. */
export function surfaceColours(shapes: SketchFile['shapes']): ReadonlyMap<string, number> {
  let colours = cache.get(shapes);
  if (colours) return colours;
  const map = new Map<string, number>();
  shapes.forEach((shape, s) =>
    edgeNames(shape).forEach((name, k) => {
      if (!map.has(name)) map.set(name, (s * SHAPE_STRIDE + k) % COLOUR_SLOTS);
    }),
  );
  cache.set(shapes, (colours = map));
  return colours;
}
