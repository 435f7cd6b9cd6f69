// Document edits for heat exchange: a surface's emissivity and condition, and
// the sketch settings. Pure functions for store.edit, so each is one undo step
// and autosaves; an edit that changes nothing returns the same document (no step).
// Units as in the file: temperatures K, heat flux W/m^2 (supplied from behind),
// lengths in walls and tubes m, coefficients W/(m^2 K), conductivities W/(m K), depth m.
import { setOwn } from '../../document/ownRecord';
import type { SketchFile, SurfaceProps } from '../sketchFile';
import { surfacePropertiesSchema } from '../../document/schema';
import { usedSurfaceNames } from '../edits/surfaceNames';
import { conditionCount as givenCount, conditionOf, conditionProps } from '../../document/exchange/conditions';
import type { SketchCondition } from '../../document/exchange/conditions';

/** The defaults for a surface with no properties (emissivity 0.9, adiabatic), as the solver applies them. */
export { DEFAULT_CONDITION, DEFAULT_EMISSIVITY } from '../../document/exchangeInput';

/** The one condition a surface can be given in the app (a linked face names its plate's other face). */
export type ConditionChoice = SketchCondition;

/** The condition a surface's properties give (the first, if a file broke the rule), or undefined: the default applies. */
export function conditionIn(props: SurfaceProps | undefined): ConditionChoice | undefined {
  const given = conditionOf(props);
  return given.ok ? given.condition : undefined;
}

export type SettingsPatch = {
  surroundingsTemperature?: number | undefined;
  gasTemperature?: number | undefined;
  depth?: number | undefined;
};

const SETTING_KEYS = ['surroundingsTemperature', 'gasTemperature', 'depth'] as const;

/** The file's properties for a surface, or undefined when it has none (the defaults apply). */
export function surfacePropsOf(doc: SketchFile, name: string): SurfaceProps | undefined {
  return doc.surfaces && Object.hasOwn(doc.surfaces, name) ? doc.surfaces[name] : undefined;
}

/** The file's property fields, in the schema's order (the order files are written in). */
const KEYS = Object.keys(surfacePropertiesSchema.shape) as (keyof SurfaceProps)[];

/** Properties in the file's key order, without undefined entries. */
function tidy(props: SurfaceProps): SurfaceProps {
  const out: Record<string, unknown> = {};
  for (const k of KEYS) if (props[k] !== undefined) out[k] = props[k];
  return out;
}

function sameProps(a: SurfaceProps | undefined, b: SurfaceProps | undefined): boolean {
  if (!a || !b) return a === b;
  // Walls and tubes are small plain objects: compare what they say.
  return KEYS.every((k) => Object.is(a[k], b[k]) || JSON.stringify(a[k]) === JSON.stringify(b[k]));
}

/** Replace a surface's properties; undefined or {} removes its entry (back to the defaults). Names no edge uses are left alone. */
export function setSurfaceProps(doc: SketchFile, name: string, props: SurfaceProps | undefined): SketchFile {
  if (!usedSurfaceNames(doc).has(name)) return doc;
  const next = props ? tidy(props) : undefined;
  const kept = next && Object.keys(next).length > 0 ? next : undefined;
  if (sameProps(surfacePropsOf(doc, name), kept)) return doc;
  const surfaces = { ...(doc.surfaces ?? {}) };
  if (kept) setOwn(surfaces, name, kept);
  else delete surfaces[name];
  const { surfaces: _old, ...rest } = doc;
  return Object.keys(surfaces).length ? { ...rest, surfaces } : rest;
}

/** Set (a number in (0, 1]) or clear (undefined: the default) a surface's emissivity; the condition is kept. */
export function setEmissivity(doc: SketchFile, name: string, emissivity: number | undefined): SketchFile {
  return setSurfaceProps(doc, name, { ...surfacePropsOf(doc, name), emissivity });
}

/** Give a surface one condition, replacing any other; the emissivity and convection coefficient are kept. */
export function setCondition(doc: SketchFile, name: string, condition: ConditionChoice): SketchFile {
  const old = surfacePropsOf(doc, name);
  const kept = { emissivity: old?.emissivity, convectionCoefficient: old?.convectionCoefficient };
  return setSurfaceProps(doc, name, { ...kept, ...conditionProps(condition) });
}

/** Set (W/(m^2 K), >= 0) or clear (undefined: no convection) a surface's convection coefficient; the rest is kept. */
export function setConvection(doc: SketchFile, name: string, coefficient: number | undefined): SketchFile {
  return setSurfaceProps(doc, name, { ...surfacePropsOf(doc, name), convectionCoefficient: coefficient });
}

/** Set or clear (undefined) the surroundings and gas temperatures (K) and the depth (m). */
export function setSettings(doc: SketchFile, patch: SettingsPatch): SketchFile {
  const old = doc.settings ?? {};
  const merged: Record<string, number> = {};
  for (const k of SETTING_KEYS) {
    const v = Object.hasOwn(patch, k) ? patch[k] : old[k];
    if (v !== undefined) merged[k] = v;
  }
  if (SETTING_KEYS.every((k) => Object.is(merged[k], old[k]))) return doc;
  const { settings: _old, ...rest } = doc;
  return Object.keys(merged).length ? { ...rest, settings: merged } : rest;
}

/**
 * Surfaces that can be the other face of `current`'s plate: used by an edge,
 * not `current`, giving no condition of their own, and not named by another link.
 */
export function linkChoices(doc: SketchFile, current: string): string[] {
  const surfaces = doc.surfaces ?? {};
  const named = new Set(
    Object.entries(surfaces).flatMap(([n, p]) => (n !== current && p.linked !== undefined ? [p.linked] : [])),
  );
  const free = (n: string) => !Object.hasOwn(surfaces, n) || givenCount(surfaces[n]) === 0;
  return [...usedSurfaceNames(doc)].filter((n) => n !== current && !named.has(n) && free(n));
}
