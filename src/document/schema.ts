// The sketch file, version 2, as a zod schema; the TypeScript types are
// derived from it. Version 2 is version 1 plus the surface balance's fields
// (wall, tube, linked, convectionCoefficient, settings.gasTemperature); older
// files are migrated (migrate.ts) before this schema reads them. Every node carries its rule as a short message, which the
// reader prefixes with where it applies ("'block' (body, shape 2): point 4 x
// must be a finite number").
import { z } from 'zod';
import { MAX_NAME_LENGTH } from './limits';
import {
  MAX_COEFFICIENT,
  MAX_CONDUCTIVITY,
  MAX_DEPTH,
  MAX_HEAT_FLUX,
  MAX_PROPERTY_LENGTH,
  MAX_TEMPERATURE,
  MIN_CONDUCTIVITY,
  MIN_EMISSIVITY,
  MIN_PROPERTY_LENGTH,
} from './propertyLimits';
import { UNITS } from './units';
import { MAX_ROW_TUBES } from './rows/limits';

/** The newest file version this program reads and the one it writes. */
export const CURRENT_VERSION = 2;

const coordinate = z.number({ error: 'must be a finite number' });

export const pointSchema = z.tuple([coordinate, coordinate], { error: 'must be a pair of numbers [x, y]' });

export const surfaceNameSchema = z
  .string({ error: 'must be a surface name (text)' })
  .min(1, { error: 'must not be empty' })
  .max(MAX_NAME_LENGTH, { error: `must be at most ${MAX_NAME_LENGTH} characters` });

/** A tube row's name (a key of `rows`). */
export const rowNameSchema = z
  .string({ error: 'must be a row name (text)' })
  .min(1, { error: 'must not be empty' })
  .max(MAX_NAME_LENGTH, { error: `must be at most ${MAX_NAME_LENGTH} characters` })
  .refine((name) => name !== '__proto__', { error: 'must not be "__proto__" (a reserved word); choose another name' });

/** An exact circle (version 2): centre [x, y] and radius in file units. */
export const circleSchema = z.object(
  {
    center: pointSchema,
    radius: z
      .number({ error: 'must be a positive finite number' })
      .gt(0, { error: 'must be a positive finite number' }),
  },
  { error: 'must be an object with center [x, y] and radius' },
);

/** A circle shape may leave out points (it has none); a polygon must give them. */
const circleWithoutPoints = (v: unknown): unknown =>
  v !== null && typeof v === 'object' && !Array.isArray(v) && 'circle' in v && !('points' in v)
    ? { ...v, points: [] }
    : v;

export const shapeSchema = z.preprocess(
  circleWithoutPoints,
  z
    .object(
      {
        kind: z.enum(['enclosure', 'solid'], { error: 'must be "enclosure" or "solid"' }),
        /** Vertices [x, y] in file units, either winding; edge k runs from point k to point k+1, the last edge closes the polygon. Empty for a circle. */
        points: z.array(pointSchema, { error: 'must be a list of points [[x, y], ...]' }),
        /** Instead of points: an exact circle, split into one arc per surface name (anticlockwise from +x). */
        circle: circleSchema.optional(),
        /** One surface name for every edge, or one name per edge (per arc for a circle). */
        surface: z.union([surfaceNameSchema, z.array(surfaceNameSchema)], {
          error: 'must be a surface name, or a list of names with one per edge',
        }),
        /** The tube row this circle belongs to (a key of `rows`); its place and size follow the row's numbers. */
        row: rowNameSchema.optional(),
      },
      { error: 'must be an object with kind, points (or circle) and surface' },
    )
    .refine((s) => !(s.circle && s.points.length > 0), {
      error: 'must have either points or circle, not both',
      path: ['circle'],
    }),
);

/** A number in a range, each bound with its message (see propertyLimits.ts for the reasons). */
const ranged = (unit: string, low: number, high: number, lowText = `must be greater than ${low}`) =>
  z
    .number({ error: `must be a number of ${unit}` })
    .gt(low, { error: lowText })
    .lte(high, { error: `must be at most ${high} ${unit}` });
const kelvin = ranged('kelvin', 0, MAX_TEMPERATURE, 'must be above 0 K');
const emissivity = z
  .number({ error: `must be a number from ${MIN_EMISSIVITY} to 1` })
  .gte(MIN_EMISSIVITY, { error: `must be at least ${MIN_EMISSIVITY} (and at most 1)` })
  .lte(1, { error: 'must be at most 1' });
const coefficient = ranged('W/(m²·K)', 0, MAX_COEFFICIENT);
const propertyLength = z
  .number({ error: 'must be a number of metres' })
  .gte(MIN_PROPERTY_LENGTH, { error: `must be at least ${MIN_PROPERTY_LENGTH} m` })
  .lte(MAX_PROPERTY_LENGTH, { error: `must be at most ${MAX_PROPERTY_LENGTH} m` });
const conductivity = z
  .number({ error: 'must be a number of W/(m·K)' })
  .gte(MIN_CONDUCTIVITY, { error: `must be at least ${MIN_CONDUCTIVITY} W/(m·K)` })
  .lte(MAX_CONDUCTIVITY, { error: `must be at most ${MAX_CONDUCTIVITY} W/(m·K)` });

/** The range checks of single values, for fields that check a value as it is typed (the app). */
export const valueSchemas = {
  kelvin,
  emissivity,
  heatFlux: z
    .number({ error: 'must be a number of W/m^2' })
    .gte(-MAX_HEAT_FLUX, { error: `must be at least -${MAX_HEAT_FLUX} W/m^2` })
    .lte(MAX_HEAT_FLUX, { error: `must be at most ${MAX_HEAT_FLUX} W/m^2` }),
  coefficient,
  convectionCoefficient: z
    .number({ error: 'must be a number of W/(m²·K)' })
    .gte(0, { error: 'must be 0 or more' })
    .lte(MAX_COEFFICIENT, { error: `must be at most ${MAX_COEFFICIENT} W/(m²·K)` }),
  propertyLength,
  conductivity,
  depth: ranged('metres', 0, MAX_DEPTH),
};

/** One layer of a lined wall; lengths in metres whatever the sketch's units. */
export const wallLayerSchema = z.object(
  {
    /** Thickness, m. */
    thickness: propertyLength,
    /** Conductivity, W/(m·K), constant (take it at the layer's mean temperature). */
    conductivity,
  },
  { error: 'must be an object with thickness and conductivity' },
);

/** A plane lining behind the surface, to outside air. */
export const wallSchema = z.object(
  {
    /** Layers from the hot face outwards. */
    layers: z
      .array(wallLayerSchema, { error: 'must be a list of layers [{thickness, conductivity}, ...]' })
      .min(1, { error: 'must list at least one layer' }),
    /** Outside air temperature, K. */
    outsideTemperature: kelvin,
    /** Outside coefficient, W/(m²·K): convection and casing radiation combined, or convection alone with outsideEmissivity. */
    outsideCoefficient: coefficient,
    /** Casing emissivity; when given the casing also radiates to outsideTemperature. */
    outsideEmissivity: emissivity.optional(),
  },
  { error: 'must be an object with layers, outsideTemperature and outsideCoefficient' },
);

/** A tube carrying a fluid behind the surface; diameters in metres whatever the sketch's units. */
export const tubeSchema = z
  .object(
    {
      /** Fluid temperature, K. */
      fluidTemperature: kelvin,
      /** Inside film coefficient, W/(m²·K). */
      insideCoefficient: coefficient,
      /** Outer diameter, m. */
      outerDiameter: propertyLength,
      /** Inner diameter, m, below the outer. */
      innerDiameter: propertyLength,
      /** Tube wall conductivity, W/(m·K). */
      wallConductivity: conductivity,
    },
    {
      error:
        'must be an object with fluidTemperature, insideCoefficient, outerDiameter, innerDiameter and wallConductivity',
    },
  )
  .superRefine((t, ctx) => {
    if (t.innerDiameter < t.outerDiameter) return;
    ctx.addIssue({
      code: 'custom',
      message: `must be below outerDiameter (${t.outerDiameter} m)`,
      path: ['innerDiameter'],
      input: t.innerDiameter,
    });
  });

/** Radiative properties, the one condition behind a named surface, and convection on its front (used by heat exchange). */
export const surfacePropertiesSchema = z.object(
  {
    /** Hemispherical emissivity, dimensionless, in [MIN_EMISSIVITY, 1]. */
    emissivity: emissivity.optional(),
    /** Held temperature, kelvin. */
    temperature: kelvin.optional(),
    /** Heat supplied from behind, W/m², > 0 when it enters from behind and leaves the front (with no convection: the net radiation leaving, as in version 1). */
    heatFlux: valueSchemas.heatFlux.optional(),
    /** Insulated: nothing passes through the back. */
    adiabatic: z.boolean({ error: 'must be true or false' }).optional(),
    /** An opening to the surroundings: black, at the surroundings temperature. */
    opening: z.boolean({ error: 'must be true or false' }).optional(),
    /** A lined wall to outside air. */
    wall: wallSchema.optional(),
    /** A tube carrying a fluid. */
    tube: tubeSchema.optional(),
    /** The other face of the same thin plate (a surface name); that face gives no condition of its own. */
    linked: surfaceNameSchema.optional(),
    /** Film coefficient to the gas, W/(m²·K), >= 0; above 0 needs settings.gasTemperature. */
    convectionCoefficient: valueSchemas.convectionCoefficient.optional(),
  },
  { error: 'must be an object of properties (emissivity, temperature, ...)' },
);

const rowLength = z
  .number({ error: 'must be a positive finite number (file units)' })
  .gt(0, { error: 'must be greater than 0 (file units)' });

/**
 * A tube row: `count` round tubes of outer `diameter`, `pitch` centre to centre
 * (file units), placed from a wall (the tubes' centre line `distance` from it,
 * measured into the section, the row centred along the wall) or from the first
 * tube's centre `start` along `angle` degrees anticlockwise from +x. The
 * tubes are the circle shapes tagged with the row's name, in file order.
 */
export const rowSchema = z.object(
  {
    count: z
      .number({ error: `must be a whole number from 1 to ${MAX_ROW_TUBES}` })
      .int({ error: `must be a whole number from 1 to ${MAX_ROW_TUBES}` })
      .gte(1, { error: `must be a whole number from 1 to ${MAX_ROW_TUBES}` })
      .lte(MAX_ROW_TUBES, { error: `must be at most ${MAX_ROW_TUBES}` }),
    diameter: rowLength,
    pitch: rowLength,
    from: z.union(
      [
        z.object({ wall: surfaceNameSchema, distance: z.number() }),
        z.object({ start: pointSchema, angle: z.number() }),
      ],
      { error: 'must be {"wall": SURFACE, "distance": D} or {"start": [x, y], "angle": DEGREES}' },
    ),
  },
  { error: 'must be an object with count, diameter, pitch and from' },
);

export const settingsSchema = z.object(
  {
    /** Temperature of the surroundings seen through openings and by open sketches, kelvin. */
    surroundingsTemperature: kelvin.optional(),
    /** Temperature of the gas in the section, kelvin (transparent: it exchanges heat by convection only). */
    gasTemperature: kelvin.optional(),
    /** Length of the long dimension (duct or furnace length), metres; turns per-metre results into totals. */
    depth: valueSchemas.depth.optional(),
  },
  { error: 'must be an object' },
);

export const sketchFileSchema = z.object({
  version: z.literal(2, { error: 'must be 2' }),
  units: z.enum(UNITS, { error: `must be one of ${UNITS.join(', ')}` }),
  shapes: z.array(shapeSchema, { error: 'must be a list of shapes' }),
  surfaces: z
    .record(surfaceNameSchema, surfacePropertiesSchema, { error: 'must be an object of surface names' })
    .optional(),
  settings: settingsSchema.optional(),
  /** Tube rows by name; each row's tubes are the shapes tagged `"row": NAME`. */
  rows: z.record(rowNameSchema, rowSchema, { error: 'must be an object of row names' }).optional(),
});

/** A file of the current version as written (surface may be one name or a list). */
export type SketchFileV2 = z.infer<typeof sketchFileSchema>;
/** Older name still imported elsewhere: the schema of the current version (2), which version-1 files migrate to. */
export const sketchFileSchemaV1 = sketchFileSchema;
/**
 * A document as the app holds it and as files are written: version 2's
 * fields, and version 1 or 2 (version 1 has a subset of the fields and means
 * the same; `restore` brings it to 2, and the program writes 2).
 */
export type SketchFileV1 = Omit<SketchFileV2, 'version'> & { version: 1 | 2 };
export type ShapeV1 = z.infer<typeof shapeSchema>;
export type Point = z.infer<typeof pointSchema>;
export type CircleShape = z.infer<typeof circleSchema>;
export type SurfaceProperties = z.infer<typeof surfacePropertiesSchema>;
export type WallProperties = z.infer<typeof wallSchema>;
export type TubeProperties = z.infer<typeof tubeSchema>;
export type SketchSettings = z.infer<typeof settingsSchema>;
export type TubeRow = z.infer<typeof rowSchema>;
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
