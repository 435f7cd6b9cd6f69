// Document edits for heat exchange: a surface's emissivity and condition, and
// the sketch settings. Pure functions for store.edit, so each is one undo step
// and autosaves; an edit that changes nothing returns the same document (no step).
// Units as in the file: temperatures K, heat flux W/m^2 (positive leaving), depth m.
import type { SketchFile, SurfaceProps } from '../sketchFile';
import { usedSurfaceNames } from '../edits/surfaceNames';
import { conditionOf, conditionProps } from '../../document/exchange/conditions';
import type { SurfaceCondition } from '../../document/exchangeInput';

/** The defaults for a surface with no properties (emissivity 0.9, adiabatic), as the solver applies them. */
export { DEFAULT_CONDITION, DEFAULT_EMISSIVITY } from '../../document/exchangeInput';

/** The one condition a surface can be given in the app. */
export type ConditionChoice = SurfaceCondition;

/** The condition a surface's properties give (the first, if a file broke the rule), or undefined: the default applies. */
export function conditionIn(props: SurfaceProps | undefined): ConditionChoice | undefined {
  const given = conditionOf(props);
  return given.ok ? given.condition : undefined;
}

export type SettingsPatch = { surroundingsTemperature?: number | undefined; depth?: number | undefined };

/** The file's properties for a surface, or undefined when it has none (the defaults apply). */
export function surfacePropsOf(doc: SketchFile, name: string): SurfaceProps | undefined {
  return doc.surfaces && Object.hasOwn(doc.surfaces, name) ? doc.surfaces[name] : undefined;
}

const KEYS = ['emissivity', 'temperature', 'heatFlux', 'adiabatic', 'opening'] as const;

/** Properties in the file's key order, without undefined entries. */
function tidy(props: SurfaceProps): SurfaceProps {
  const out: Record<string, unknown> = {};
  for (const k of KEYS) if (props[k] !== undefined) out[k] = props[k];
  return out;
}

function sameProps(a: SurfaceProps | undefined, b: SurfaceProps | undefined): boolean {
  if (!a || !b) return a === b;
  return KEYS.every((k) => Object.is(a[k], b[k]));
}

/** Replace a surface's properties; undefined or {} removes its entry (back to the defaults). Names no edge uses are left alone. */
export function setSurfaceProps(doc: SketchFile, name: string, props: SurfaceProps | undefined): SketchFile {
  if (name === '__proto__' || !usedSurfaceNames(doc).has(name)) return doc;
  const next = props ? tidy(props) : undefined;
  const kept = next && Object.keys(next).length > 0 ? next : undefined;
  if (sameProps(surfacePropsOf(doc, name), kept)) return doc;
  const surfaces = { ...(doc.surfaces ?? {}) };
  if (kept) surfaces[name] = kept;
  else delete surfaces[name];
  const { surfaces: _old, ...rest } = doc;
  return Object.keys(surfaces).length ? { ...rest, surfaces } : rest;
}

/** Set (a number in (0, 1]) or clear (undefined: the default) a surface's emissivity; the condition is kept. */
export function setEmissivity(doc: SketchFile, name: string, emissivity: number | undefined): SketchFile {
  return setSurfaceProps(doc, name, { ...surfacePropsOf(doc, name), emissivity });
}

/** Give a surface one condition, replacing any other; the emissivity is kept. */
export function setCondition(doc: SketchFile, name: string, condition: ConditionChoice): SketchFile {
  const old = surfacePropsOf(doc, name);
  return setSurfaceProps(doc, name, { emissivity: old?.emissivity, ...conditionProps(condition) });
}

/** Set or clear (undefined) the surroundings temperature (K) and the depth (m). */
export function setSettings(doc: SketchFile, patch: SettingsPatch): SketchFile {
  const old = doc.settings ?? {};
  const merged: Record<string, number> = {};
  for (const k of ['surroundingsTemperature', 'depth'] as const) {
    const v = Object.hasOwn(patch, k) ? patch[k] : old[k];
    if (v !== undefined) merged[k] = v;
  }
  if (Object.is(merged.surroundingsTemperature, old.surroundingsTemperature) && Object.is(merged.depth, old.depth))
    return doc;
  const { settings: _old, ...rest } = doc;
  return Object.keys(merged).length ? { ...rest, settings: merged } : rest;
}
