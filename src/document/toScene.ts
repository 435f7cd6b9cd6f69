// From a checked sketch to the view-factor core's plain input.
import type { CircleInput, PolygonInput, SceneInput } from '../core/scene';
import { splitShapes } from './circles';
import type { Sketch } from './schema';
import { surfaceIndex } from './surfaceIndex';

/** The polygons of a sketch as the core takes them: flat [x0, y0, x1, y1, ...] in the sketch's units. */
export function scenePolygons(sketch: Pick<Sketch, 'shapes'>): PolygonInput[] {
  return sketch.shapes
    .filter((shape) => !shape.circle)
    .map((shape) => {
      const points = new Float64Array(2 * shape.points.length);
      shape.points.forEach(([x, y], k) => {
        points[2 * k] = x;
        points[2 * k + 1] = y;
      });
      return { kind: shape.kind, points };
    });
}

/** The exact circles of a sketch, in file order (their arcs follow every polygon edge). */
export function sceneCircles(sketch: Pick<Sketch, 'shapes'>): CircleInput[] {
  return splitShapes(sketch.shapes).circles.map((c) => c.circle);
}

/**
 * The core's input for a sketch. Surfaces are numbered as `surfaceIndex` does
 * (first appearance along the edges, polygons before circles); `surfaceNames[i]` is the name of surface
 * i, the order the command line and the app report surfaces in. Lengths stay
 * in the sketch's units.
 */
export function toScene(sketch: Sketch): { scene: SceneInput; surfaceNames: string[] } {
  const index = surfaceIndex(sketch.shapes);
  return {
    scene: {
      polygons: scenePolygons(sketch),
      circles: sceneCircles(sketch),
      edgeSurface: index.edgeSurface,
      surfaceCount: index.names.length,
    },
    surfaceNames: [...index.names],
  };
}
