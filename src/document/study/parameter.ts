// What a design study varies and what it aims at, addressed as the command
// line writes them: `SURFACE.PROPERTY` (split on the last '.', so surface names
// may hold dots and spaces), `ROW.pitch` / `.diameter` / `.distance` of a tube
// row, `settings.surroundingsTemperature`, `settings.depth`, and
// `SURFACE.QUANTITY=VALUE` for a target (split on the last '=').
import { conditionOf } from '../exchange/conditions';
import { CONDITION_LABEL } from '../exchange/labels';
import { partOf } from '../exchange/profile';
import { formatNumber, quoteName } from '../labels';
import type { Sketch } from '../schema';
import type { Units } from '../units';

export const SURFACE_PROPERTIES = ['temperature', 'emissivity', 'heatFlux', 'convectionCoefficient'] as const;
export const SETTINGS = ['surroundingsTemperature', 'depth', 'gasTemperature'] as const;
/** A shape's position (x, y: the centre of its bounding box) and, for circles, the radius. */
export const SHAPE_MEASURES = ['x', 'y', 'radius'] as const;
/** A tube row's numbers (file length units): its pitch, its tubes' diameter, its distance from its wall. */
export const ROW_MEASURES = ['pitch', 'diameter', 'distance'] as const;
export const QUANTITIES = ['netHeat', 'netFlux', 'temperature', 'radiosity', 'peakToAverage'] as const;

export type StudyParameter =
  | { kind: 'surface'; surface: string; property: (typeof SURFACE_PROPERTIES)[number] }
  | { kind: 'setting'; setting: (typeof SETTINGS)[number] }
  | { kind: 'shape'; surface: string; measure: (typeof SHAPE_MEASURES)[number] }
  | { kind: 'row'; row: string; measure: (typeof ROW_MEASURES)[number] };

export type Quantity = (typeof QUANTITIES)[number];

/** A result of one surface that a solve aims at: quantity of `surface` equal to `value` (units of the quantity). */
export interface StudyTarget {
  surface: string;
  quantity: Quantity;
  value: number;
}

type Parsed<T> = { ok: true; value: T } | { ok: false; message: string };

const listed = (names: readonly string[]) => names.join(', ');
const isOneOf = <T extends string>(list: readonly T[], word: string): word is T =>
  (list as readonly string[]).includes(word);

/** Read `SURFACE.PROPERTY` or `settings.NAME`. */
export function parseParameter(text: string): Parsed<StudyParameter> {
  const dot = text.lastIndexOf('.');
  if (dot <= 0 || dot === text.length - 1)
    return { ok: false, message: `'${text.slice(0, 40)}' is not SURFACE.PROPERTY (for example "hearth.temperature")` };
  const [owner, word] = [text.slice(0, dot), text.slice(dot + 1)];
  if (owner === 'settings' && isOneOf(SETTINGS, word)) return { ok: true, value: { kind: 'setting', setting: word } };
  if (isOneOf(SURFACE_PROPERTIES, word))
    return { ok: true, value: { kind: 'surface', surface: owner, property: word } };
  if (isOneOf(SHAPE_MEASURES, word)) return { ok: true, value: { kind: 'shape', surface: owner, measure: word } };
  if (isOneOf(ROW_MEASURES, word)) return { ok: true, value: { kind: 'row', row: owner, measure: word } };
  return {
    ok: false,
    message: `'${word.slice(0, 40)}' cannot be varied; choose one of ${listed([...SURFACE_PROPERTIES, ...SHAPE_MEASURES])} of a surface, ${listed(ROW_MEASURES)} of a tube row, or settings.${listed(SETTINGS)}`,
  };
}

/** Read `SURFACE.QUANTITY=VALUE`. */
export function parseTarget(text: string): Parsed<StudyTarget> {
  const eq = text.lastIndexOf('=');
  const dot = eq < 0 ? -1 : text.lastIndexOf('.', eq);
  if (eq < 0 || dot <= 0)
    return {
      ok: false,
      message: `'${text.slice(0, 40)}' is not SURFACE.QUANTITY=VALUE (for example "load.netHeat=-40000")`,
    };
  const [surface, word, number] = [text.slice(0, dot), text.slice(dot + 1, eq), text.slice(eq + 1)];
  if (!isOneOf(QUANTITIES, word))
    return {
      ok: false,
      message: `'${word.slice(0, 40)}' is not a result to aim at; choose one of ${listed(QUANTITIES)}`,
    };
  const value = number.trim() === '' ? Number.NaN : Number(number);
  if (!Number.isFinite(value))
    return { ok: false, message: `the target value must be a number, got '${number.slice(0, 40)}'` };
  return { ok: true, value: { surface, quantity: word, value } };
}

/** The unit of a parameter's values (the file's length units for positions). */
export function parameterUnit(p: StudyParameter, units: Units): string {
  if (p.kind === 'setting') return p.setting === 'depth' ? 'm' : 'K';
  if (p.kind === 'shape' || p.kind === 'row') return units;
  if (p.property === 'convectionCoefficient') return 'W/(m^2 K)';
  return p.property === 'temperature' ? 'K' : p.property === 'heatFlux' ? 'W/m^2' : '';
}

export const QUANTITY_UNIT: Readonly<Record<Quantity, string>> = {
  netHeat: 'W/m',
  netFlux: 'W/m^2',
  temperature: 'K',
  radiosity: 'W/m^2',
  peakToAverage: '',
};

const PROPERTY_WORDS = {
  temperature: 'temperature',
  emissivity: 'emissivity',
  heatFlux: 'heat flux',
  convectionCoefficient: 'convection coefficient',
} as const;
const SETTING_WORDS = {
  surroundingsTemperature: 'the surroundings temperature',
  depth: 'the depth',
  gasTemperature: 'the gas temperature',
} as const;
const MEASURE_WORDS = { x: 'position x', y: 'position y', radius: 'radius' } as const;
const ROW_WORDS = { pitch: 'pitch', diameter: 'tube diameter', distance: 'distance from the wall' } as const;
const QUANTITY_WORDS: Readonly<Record<Quantity, string>> = {
  netHeat: 'net heat',
  netFlux: 'net flux',
  temperature: 'temperature',
  radiosity: 'radiosity',
  peakToAverage: 'peak-to-average net flux',
};

/** "temperature of 'hearth'", "the surroundings temperature", "position x of the shape of 'block'". */
export function describeParameter(p: StudyParameter): string {
  if (p.kind === 'setting') return SETTING_WORDS[p.setting];
  if (p.kind === 'shape') return `${MEASURE_WORDS[p.measure]} of the shape of ${quoteName(p.surface)}`;
  if (p.kind === 'row') return `${ROW_WORDS[p.measure]} of row ${quoteName(p.row)}`;
  return `${PROPERTY_WORDS[p.property]} of ${quoteName(p.surface)}`;
}

/** "net heat of 'load'". */
export function describeQuantity(surface: string, quantity: Quantity): string {
  return `${QUANTITY_WORDS[quantity]} of ${quoteName(surface)}`;
}

/** A value with its unit, for messages. */
export function withUnit(value: number, unit: string): string {
  return unit === '' ? formatNumber(value) : `${formatNumber(value)} ${unit}`;
}

// Lookups made once per sketch (documents are never changed in place): the panel
// asks about every surface of a 1000-surface sketch after each edit, and a scan of
// all names and shapes per question made that 1000^2.
const shapeIndex = new WeakMap<Sketch['shapes'], Map<string, number[]>>();
const nameSets = new WeakMap<readonly string[], ReadonlySet<string>>();

/** Where `surface` names edges: the indices of the shapes (0-based). */
export function shapesOfSurface(sketch: Pick<Sketch, 'shapes'>, surface: string): number[] {
  let index = shapeIndex.get(sketch.shapes);
  if (!index) {
    index = new Map();
    for (let k = 0; k < sketch.shapes.length; k++) {
      for (const name of new Set(sketch.shapes[k].surface)) {
        const list = index.get(name);
        if (list) list.push(k);
        else index.set(name, [k]);
      }
    }
    shapeIndex.set(sketch.shapes, index);
  }
  return [...(index.get(surface) ?? [])];
}

function namesInclude(names: readonly string[], surface: string): boolean {
  let set = nameSets.get(names);
  if (!set) nameSets.set(names, (set = new Set(names)));
  return set.has(surface);
}

/** Why a parameter cannot be varied, as data; `parameterProblem` words it. */
export type ParameterRefusal =
  | { kind: 'no-surface'; surface: string }
  | { kind: 'several-shapes'; surface: string; shapes: number[] }
  | { kind: 'not-circle'; surface: string }
  | { kind: 'no-temperature' | 'no-heat-flux' | 'opening-emissivity'; surface: string }
  | { kind: 'no-row'; row: string }
  | { kind: 'row-from-start'; row: string };

/**
 * Why the parameter cannot be varied in this sketch, or null. Temperature and
 * heat flux are varied only where the surface is held at one (the file must give
 * that condition: varying it must not add a second); an opening has no emissivity
 * of its own; a position names a surface of exactly one shape. Data only: the
 * studies panel asks this of every choice of a 1000-surface sketch after each edit.
 */
export function parameterRefusal(
  sketch: Sketch,
  surfaceNames: readonly string[],
  p: StudyParameter,
): ParameterRefusal | null {
  if (p.kind === 'setting') return null;
  if (p.kind === 'row') {
    const rows = sketch.rows ?? {};
    if (!Object.hasOwn(rows, p.row)) return { kind: 'no-row', row: p.row };
    // A row's distance only when it is measured from a wall.
    if (p.measure === 'distance' && !('wall' in rows[p.row].from)) return { kind: 'row-from-start', row: p.row };
    return null;
  }
  if (!namesInclude(surfaceNames, p.surface)) return { kind: 'no-surface', surface: p.surface };
  if (p.kind === 'shape') {
    const shapes = shapesOfSurface(sketch, p.surface);
    if (shapes.length > 1) return { kind: 'several-shapes', surface: p.surface, shapes };
    if (p.measure === 'radius' && !sketch.shapes[shapes[0]].circle) return { kind: 'not-circle', surface: p.surface };
    return null;
  }
  const props = ownProperties(sketch, p.surface);
  if (p.property === 'temperature' && props?.temperature === undefined)
    return { kind: 'no-temperature', surface: p.surface };
  if (p.property === 'heatFlux' && props?.heatFlux === undefined) return { kind: 'no-heat-flux', surface: p.surface };
  if (p.property === 'emissivity' && props?.opening === true) return { kind: 'opening-emissivity', surface: p.surface };
  return null;
}

/** The file's properties of `surface` (never an inherited member: names such as "constructor" are plain names). */
function ownProperties(sketch: Sketch, surface: string): Sketch['surfaces'][string] | undefined {
  return Object.hasOwn(sketch.surfaces, surface) ? sketch.surfaces[surface] : undefined;
}

/** parameterRefusal in words for people, or null. */
export function parameterProblem(sketch: Sketch, surfaceNames: readonly string[], p: StudyParameter): string | null {
  const r = parameterRefusal(sketch, surfaceNames, p);
  if (r === null) return null;
  switch (r.kind) {
    case 'no-surface': {
      // A tube split into arcs, or a wall into parts, is named by its parts ("tube 1 3"):
      // a profile's rule for parts, the looser one of a circle (any one word added).
      const parts = surfaceNames.filter((n) => partOf(n, r.surface, true));
      if (parts.length > 0) {
        const some = parts.slice(0, 3).map(quoteName).join(', ');
        return `the sketch has no surface named ${quoteName(r.surface)}, but ${parts.length} part${parts.length === 1 ? '' : 's'} of it (${some}${parts.length > 3 ? ', …' : ''}): name one part (a position or radius moves or sizes the whole shape it lies on)`;
      }
      const some = surfaceNames.slice(0, 6).map(quoteName).join(', ');
      return `the sketch has no surface named ${quoteName(r.surface)}; its surfaces: ${some}${surfaceNames.length > 6 ? ', …' : ''}`;
    }
    case 'several-shapes':
      return `${quoteName(r.surface)} names edges of ${r.shapes.length} shapes (${r.shapes.map((k) => k + 1).join(', ')}); to move one, give it a surface name of its own`;
    case 'not-circle':
      return `${quoteName(r.surface)} is not on a circle: only a round tube (a circle shape) has a radius to vary`;
    case 'no-temperature':
      return `${quoteName(r.surface)} has no temperature condition to vary; give it a temperature in the file first (it is ${conditionWords(ownProperties(sketch, r.surface))})`;
    case 'no-heat-flux':
      return `${quoteName(r.surface)} has no heat-flux condition to vary; give it a heatFlux in the file first (it is ${conditionWords(ownProperties(sketch, r.surface))})`;
    case 'opening-emissivity':
      return `${quoteName(r.surface)} is an opening: it is black (emissivity 1) whatever the file says, so its emissivity has no effect`;
    case 'no-row': {
      const names = Object.keys(sketch.rows ?? {});
      const some = names.slice(0, 6).map(quoteName).join(', ');
      return names.length === 0
        ? `the sketch has no tube row named ${quoteName(r.row)} (it has no rows)`
        : `the sketch has no tube row named ${quoteName(r.row)}; its rows: ${some}${names.length > 6 ? ', …' : ''}`;
    }
    case 'row-from-start':
      return `row ${quoteName(r.row)} is placed from a start point, not from a wall: it has no distance to vary`;
  }
}

function conditionWords(props: Sketch['surfaces'][string] | undefined): string {
  const given = conditionOf(props);
  if (!given.ok) return `given ${given.kinds.length} conditions`;
  const kind = given.condition?.kind ?? 'adiabatic';
  return kind === 'temperature'
    ? 'held at a temperature'
    : kind === 'heatFlux'
      ? 'given a heat flux'
      : `${CONDITION_LABEL[kind]}`;
}
