// The sketch file, version 1, as a zod schema; the TypeScript types are
// derived from it. Every node carries its rule as a short message, which the
// reader prefixes with where it applies ("shape 2 (solid 'block'): point 4 x
// must be a finite number").
import { z } from 'zod';
import { MAX_NAME_LENGTH } from './limits';
import { UNITS } from './units';

/** The newest file version this program reads and the one it writes. */
export const CURRENT_VERSION = 1;

const coordinate = z.number({ error: 'must be a finite number' });

export const pointSchema = z.tuple([coordinate, coordinate], { error: 'must be a pair of numbers [x, y]' });

export const surfaceNameSchema = z
  .string({ error: 'must be a surface name (text)' })
  .min(1, { error: 'must not be empty' })
  .max(MAX_NAME_LENGTH, { error: `must be at most ${MAX_NAME_LENGTH} characters` })
  // Would replace an object's prototype instead of naming a surface.
  .refine((name) => name !== '__proto__', { error: 'must not be "__proto__" (a reserved word); choose another name' });

export const shapeSchema = z.object(
  {
    kind: z.enum(['enclosure', 'solid'], { error: 'must be "enclosure" or "solid"' }),
    /** Vertices [x, y] in file units, either winding; edge k runs from point k to point k+1, the last edge closes the polygon. */
    points: z.array(pointSchema, { error: 'must be a list of points [[x, y], ...]' }),
    /** One surface name for every edge, or one name per edge. */
    surface: z.union([surfaceNameSchema, z.array(surfaceNameSchema)], {
      error: 'must be a surface name, or a list of names with one per edge',
    }),
  },
  { error: 'must be an object with kind, points and surface' },
);

/** Radiative properties and the one thermal condition of a named surface (used by heat exchange). */
export const surfacePropertiesSchema = z.object(
  {
    /** Hemispherical emissivity, dimensionless, in (0, 1]. */
    emissivity: z
      .number({ error: 'must be a number in (0, 1]' })
      .gt(0, { error: 'must be greater than 0 (and at most 1)' })
      .lte(1, { error: 'must be at most 1' })
      .optional(),
    /** Imposed temperature, kelvin. */
    temperature: z.number({ error: 'must be a number of kelvin' }).gt(0, { error: 'must be above 0 K' }).optional(),
    /** Imposed net radiative flux, W/m^2, positive when heat leaves the surface by radiation. */
    heatFlux: z.number({ error: 'must be a number of W/m^2' }).optional(),
    /** Insulated, reradiating surface (net flux zero). */
    adiabatic: z.boolean({ error: 'must be true or false' }).optional(),
    /** An opening to the surroundings: black, at the surroundings temperature. */
    opening: z.boolean({ error: 'must be true or false' }).optional(),
  },
  { error: 'must be an object of properties (emissivity, temperature, ...)' },
);

export const settingsSchema = z.object(
  {
    /** Temperature of the surroundings seen through openings and by open sketches, kelvin. */
    surroundingsTemperature: z
      .number({ error: 'must be a number of kelvin' })
      .gt(0, { error: 'must be above 0 K' })
      .optional(),
    /** Length of the long dimension (duct or furnace length), metres; turns per-metre results into totals. */
    depth: z.number({ error: 'must be a number of metres' }).gt(0, { error: 'must be greater than 0' }).optional(),
  },
  { error: 'must be an object' },
);

export const sketchFileSchemaV1 = z.object({
  version: z.literal(1, { error: 'must be 1' }),
  units: z.enum(UNITS, { error: `must be one of ${UNITS.join(', ')}` }),
  shapes: z.array(shapeSchema, { error: 'must be a list of shapes' }),
  surfaces: z
    .record(surfaceNameSchema, surfacePropertiesSchema, { error: 'must be an object of surface names' })
    .optional(),
  settings: settingsSchema.optional(),
});

/** A version-1 file as written (surface may be one name or a list). */
export type SketchFileV1 = z.infer<typeof sketchFileSchemaV1>;
export type ShapeV1 = z.infer<typeof shapeSchema>;
export type Point = z.infer<typeof pointSchema>;
export type SurfaceProperties = z.infer<typeof surfacePropertiesSchema>;
export type SketchSettings = z.infer<typeof settingsSchema>;
export type ShapeKind = ShapeV1['kind'];
export type { Units } from './units';

/** A shape after reading: one surface name per edge, no repeated consecutive points. */
export type Shape = Omit<ShapeV1, 'surface'> & { surface: string[] };

/** A sketch after reading and checking: what the program works with. */
export type Sketch = Omit<SketchFileV1, 'shapes' | 'surfaces' | 'settings'> & {
  shapes: Shape[];
  surfaces: Record<string, SurfaceProperties>;
  settings: SketchSettings;
};
