// The document slice is exactly the sketch file as written (version 1),
// typed from the document module's schema.
import type { SketchFileV1, ShapeV1, SurfaceProperties, Point as FilePoint } from '../document/schema';

export type SketchFile = SketchFileV1;
export type Shape = ShapeV1;
export type Point = FilePoint;
export type SurfaceProps = SurfaceProperties;
export type { Units } from '../document/units';
export { UNITS } from '../document/units';
