// The rule "at most one condition per surface", written once. A surface's
// properties in the file may give a temperature (K), a heat flux (W/m^2,
// positive leaving), adiabatic: true or opening: true; giving none means the
// default (adiabatic), giving two or more is refused. The file check
// (normalise), the solver input (exchangeInput) and the app's edits and panel
// all read conditions through these functions.
import type { SurfaceCondition } from '../../core/exchange';
import type { SurfaceProperties } from '../schema';

export type ConditionKind = SurfaceCondition['kind'];

/** The condition keys of a surface's properties. */
export type ConditionProps = Pick<SurfaceProperties, 'temperature' | 'heatFlux' | 'adiabatic' | 'opening'>;

/** Every condition kind, in the order files and messages list them. */
export const CONDITION_KINDS: readonly ConditionKind[] = ['temperature', 'heatFlux', 'adiabatic', 'opening'];

/** Every condition the properties give, in CONDITION_KINDS order (adiabatic/opening: false is not a condition). */
export function givenConditions(props: ConditionProps | undefined): SurfaceCondition[] {
  if (!props) return [];
  const given: SurfaceCondition[] = [];
  if (props.temperature !== undefined) given.push({ kind: 'temperature', temperature: props.temperature });
  if (props.heatFlux !== undefined) given.push({ kind: 'heatFlux', heatFlux: props.heatFlux });
  if (props.adiabatic === true) given.push({ kind: 'adiabatic' });
  if (props.opening === true) given.push({ kind: 'opening' });
  return given;
}

/** How many conditions the properties give; the rule allows 0 (the default applies) or 1. */
export function conditionCount(props: ConditionProps | undefined): number {
  return givenConditions(props).length;
}

export type ConditionOfOutcome =
  /** `condition` undefined: none given, the default applies. */
  | { ok: true; condition: SurfaceCondition | undefined }
  /** More than one given: the kinds, in CONDITION_KINDS order. */
  | { ok: false; kinds: ConditionKind[] };

/** The one condition the properties give, none, or the refusal of two or more. */
export function conditionOf(props: ConditionProps | undefined): ConditionOfOutcome {
  const given = givenConditions(props);
  if (given.length > 1) return { ok: false, kinds: given.map((c) => c.kind) };
  return { ok: true, condition: given[0] };
}

/** The file keys that give `condition` (the others absent), the inverse of conditionOf. */
export function conditionProps(condition: SurfaceCondition): ConditionProps {
  switch (condition.kind) {
    case 'temperature':
      return { temperature: condition.temperature };
    case 'heatFlux':
      return { heatFlux: condition.heatFlux };
    case 'adiabatic':
      return { adiabatic: true };
    case 'opening':
      return { opening: true };
  }
}
