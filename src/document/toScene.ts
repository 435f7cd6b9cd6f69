// From a checked sketch to the view-factor core's plain input.
import type { SceneInput } from '../core/scene';
import type { Sketch } from './schema';

/**
 * The core's input for a sketch. Surfaces are numbered by first appearance
 * along the edges (shape by shape, edge by edge); `surfaceNames[i]` is the name
 * of surface i, the order the command line and the app report surfaces in.
 * Lengths stay in the sketch's units.
 */
export function toScene(sketch: Sketch): { scene: SceneInput; surfaceNames: string[] } {
  const index = new Map<string, number>();
  const edgeSurface: number[] = [];
  for (const shape of sketch.shapes) {
    for (const name of shape.surface) {
      let i = index.get(name);
      if (i === undefined) {
        i = index.size;
        index.set(name, i);
      }
      edgeSurface.push(i);
    }
  }
  const polygons = sketch.shapes.map((shape) => {
    const points = new Float64Array(2 * shape.points.length);
    shape.points.forEach(([x, y], k) => {
      points[2 * k] = x;
      points[2 * k + 1] = y;
    });
    return { kind: shape.kind, points };
  });
  return { scene: { polygons, edgeSurface: Int32Array.from(edgeSurface), surfaceCount: index.size }, surfaceNames: [...index.keys()] };
}
