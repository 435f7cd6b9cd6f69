// Stage 1 of the results pipeline: the checked geometry of a document. Kept per
// shapes array (documents are immutable, and a property edit keeps the shapes),
// so an emissivity or temperature edit reuses the same key and surface index.
import type { CircleInput, PolygonInput } from '../../core/scene';
import { sceneCircles, scenePolygons } from '../../document/toScene';
import { sameSurfaceIndex, surfaceIndex, type SurfaceIndex } from '../../document/surfaceIndex';
import type { CheckedSketch } from '../documentApi';
import { geometryKey, type GeometryKey } from './geometry';

/** A valid sketch's geometry, keyed for the view-factor stage, with its surfaces. */
export interface CheckedGeometry {
  sketch: CheckedSketch;
  polygons: PolygonInput[];
  /** Exact circles (their arcs follow every polygon edge). */
  circles: CircleInput[];
  key: GeometryKey;
  /** The same object while the names of the edges stay the same (a drag keeps it). */
  surfaces: SurfaceIndex;
}

const byShapes = new WeakMap<object, CheckedGeometry>();
let lastSurfaces: SurfaceIndex | null = null;

/**
 * The checked geometry of `sketch` (as `restore` accepted it); `rawShapes` is
 * the document's own shapes array, the cache key.
 */
export function checkedGeometry(rawShapes: object, sketch: CheckedSketch): CheckedGeometry {
  const hit = byShapes.get(rawShapes);
  if (hit) return { ...hit, sketch };
  const polygons = scenePolygons(sketch);
  const circles = sceneCircles(sketch);
  let surfaces = surfaceIndex(sketch.shapes);
  if (lastSurfaces && sameSurfaceIndex(lastSurfaces, surfaces)) surfaces = lastSurfaces;
  lastSurfaces = surfaces;
  const geometry: CheckedGeometry = { sketch, polygons, circles, key: geometryKey(polygons, circles), surfaces };
  byShapes.set(rawShapes, geometry);
  return geometry;
}
