// The rule "at most one condition per surface", written once. A surface's
// properties in the file may give a temperature (K), a heat flux (W/m^2,
// supplied from behind), adiabatic: true, opening: true, a wall, a tube, or
// linked (the name of the plate's other face); giving none means the default
// (adiabatic), giving two or more is refused. The rules between surfaces
// (links, convection and the gas) are here too. The file check (normalise), the
// solver input (exchangeInput) and the app's edits and panel all read
// conditions through these functions.
import type { SketchCondition, TubeProperties, WallProperties } from './conditionTypes';
import type { SketchSettings, SurfaceProperties } from '../schema';

export type { LinkedByName, SketchCondition, SurfaceCondition } from './conditionTypes';

export type ConditionKind = SketchCondition['kind'];

/** The condition keys of a surface's properties. */
export type ConditionProps = Pick<
  SurfaceProperties,
  'temperature' | 'heatFlux' | 'adiabatic' | 'opening' | 'wall' | 'tube' | 'linked'
>;

/** Every condition kind, in the order files and messages list them. */
export const CONDITION_KINDS: readonly ConditionKind[] = [
  'temperature',
  'heatFlux',
  'adiabatic',
  'opening',
  'wall',
  'tube',
  'linked',
];

/** Every condition the properties give, in CONDITION_KINDS order (adiabatic/opening: false is not a condition). */
export function givenConditions(props: ConditionProps | undefined): SketchCondition[] {
  if (!props) return [];
  const given: SketchCondition[] = [];
  if (props.temperature !== undefined) given.push({ kind: 'temperature', temperature: props.temperature });
  if (props.heatFlux !== undefined) given.push({ kind: 'heatFlux', heatFlux: props.heatFlux });
  if (props.adiabatic === true) given.push({ kind: 'adiabatic' });
  if (props.opening === true) given.push({ kind: 'opening' });
  if (props.wall !== undefined) given.push(wallCondition(props.wall));
  if (props.tube !== undefined) given.push({ kind: 'tube', ...props.tube });
  if (props.linked !== undefined) given.push({ kind: 'linked', surface: props.linked });
  return given;
}

function wallCondition(w: WallProperties): SketchCondition {
  const layers = w.layers.map((l) => ({ thickness: l.thickness, conductivity: l.conductivity }));
  const base = { kind: 'wall' as const, layers, outsideTemperature: w.outsideTemperature };
  return w.outsideEmissivity === undefined
    ? { ...base, outsideCoefficient: w.outsideCoefficient }
    : { ...base, outsideCoefficient: w.outsideCoefficient, outsideEmissivity: w.outsideEmissivity };
}

/** How many conditions the properties give; the rule allows 0 (the default applies) or 1. */
export function conditionCount(props: ConditionProps | undefined): number {
  return givenConditions(props).length;
}

export type ConditionOfOutcome =
  /** `condition` undefined: none given, the default applies. */
  | { ok: true; condition: SketchCondition | undefined }
  /** More than one given: the kinds, in CONDITION_KINDS order. */
  | { ok: false; kinds: ConditionKind[] };

/** The one condition the properties give, none, or the refusal of two or more. */
export function conditionOf(props: ConditionProps | undefined): ConditionOfOutcome {
  const given = givenConditions(props);
  if (given.length > 1) return { ok: false, kinds: given.map((c) => c.kind) };
  return { ok: true, condition: given[0] };
}

/** The file keys that give `condition` (the others absent), the inverse of conditionOf. */
export function conditionProps(condition: SketchCondition): ConditionProps {
  switch (condition.kind) {
    case 'temperature':
      return { temperature: condition.temperature };
    case 'heatFlux':
      return { heatFlux: condition.heatFlux };
    case 'adiabatic':
      return { adiabatic: true };
    case 'opening':
      return { opening: true };
    case 'wall': {
      const { kind: _kind, ...wall } = condition;
      return { wall: { ...wall, layers: wall.layers.map((l) => ({ ...l })) } };
    }
    case 'tube': {
      const { kind: _kind, ...tube } = condition;
      return { tube: tube satisfies TubeProperties };
    }
    case 'linked':
      return { linked: condition.surface };
  }
}

/** A problem between surfaces: the code, the surface concerned and, for links, the other face. */
export interface SurfaceRuleProblem {
  code:
    | 'link-to-itself'
    | 'link-to-unused-name'
    | 'link-target-has-condition'
    | 'linked-twice'
    | 'convection-on-opening'
    | 'convection-without-gas';
  surface: string;
  other?: string;
}

/**
 * The rules between surfaces: a linked face names another face that an edge
 * uses, that gives no condition of its own and that no other face names;
 * convection (a coefficient above 0) needs settings.gasTemperature and is
 * refused on an opening. `used`: the surface names some edge carries.
 */
export function surfaceRuleProblems(
  surfaces: Readonly<Record<string, SurfaceProperties>>,
  settings: SketchSettings | undefined,
  used: ReadonlySet<string>,
): SurfaceRuleProblem[] {
  const problems: SurfaceRuleProblem[] = [];
  const namedBy = new Map<string, string>();
  for (const [name, props] of Object.entries(surfaces)) {
    const target = props.linked;
    if (target !== undefined) {
      const own = Object.hasOwn(surfaces, target) ? conditionCount(surfaces[target]) : 0;
      if (target === name) problems.push({ code: 'link-to-itself', surface: name });
      else if (!used.has(target)) problems.push({ code: 'link-to-unused-name', surface: name, other: target });
      else if (own > 0) problems.push({ code: 'link-target-has-condition', surface: name, other: target });
      else if (namedBy.has(target)) problems.push({ code: 'linked-twice', surface: name, other: target });
      namedBy.set(target, name);
    }
    const h = props.convectionCoefficient;
    if (h !== undefined && props.opening === true) problems.push({ code: 'convection-on-opening', surface: name });
    else if (h !== undefined && h > 0 && settings?.gasTemperature === undefined) {
      problems.push({ code: 'convection-without-gas', surface: name });
    }
  }
  return problems;
}
