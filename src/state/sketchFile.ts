// The document slice is exactly the sketch file (version 1). Until the
// document module's schema types are wired in, this mirrors its agreed shape.
export type Units = 'm' | 'cm' | 'mm' | 'in' | 'ft';
export const UNITS: readonly Units[] = ['m', 'cm', 'mm', 'in', 'ft'];
export type Point = [number, number];

export interface SurfaceProps {
  emissivity?: number;
  temperature?: number;
  heatFlux?: number;
  adiabatic?: boolean;
  [key: string]: unknown;
}

export interface Shape {
  kind: 'enclosure' | 'solid';
  points: Point[];
  /** One name for the whole shape, or one per edge (edge k: point k -> k+1). */
  surface: string | string[];
}

export interface SketchFile {
  version: 1;
  units: Units;
  shapes: Shape[];
  surfaces?: Record<string, SurfaceProps>;
}
