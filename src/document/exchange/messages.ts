// The heat-exchange failures in words: every message a person reads about an
// exchange that could not be solved is written here, from the core's codes and
// numbers (src/core/exchange/failures.ts). Surfaces are named when names are
// known, else counted from 1 as everywhere in messages.
import type { ExchangeFailure } from '../../core/exchange';
import { formatNumber, quoteName } from '../labels';
import { balanceFailureMessage } from './balanceMessages';
import type { ConditionKind, SurfaceRuleProblem } from './conditions';

/** Two or more conditions on one surface (src/document/exchange/conditions.ts): `kinds` in file order. */
export interface ConditionsFailure {
  ok: false;
  code: 'more-than-one-condition';
  surface: number;
  kinds: ConditionKind[];
}

/** Any reason a sketch's exchange was not solved. */
export type SketchExchangeFailure = ExchangeFailure | ConditionsFailure;

const NO_LEVEL_HINT =
  'check that every group of surfaces that see each other has a surface with a temperature, an opening or a view to the surroundings';

/** "give one condition, not temperature and heatFlux together" for a named surface. */
export function moreThanOneConditionMessage(name: string, kinds: readonly ConditionKind[]): string {
  return `surface ${quoteName(name)}: give one condition, not ${kinds.join(' and ')} together`;
}

/** A rule between surfaces (links, convection and the gas) in words, naming the surface and the field. */
export function surfaceRuleMessage(p: SurfaceRuleProblem): string {
  const at = `surface ${quoteName(p.surface)}`;
  const other = quoteName(p.other ?? '');
  switch (p.code) {
    case 'link-to-itself':
      return `${at}: linked names the surface itself; name the other face of the plate`;
    case 'link-to-unused-name':
      return `${at}: linked names ${other}, which no edge uses; name the other face of the plate`;
    case 'link-target-has-condition':
      return `${at}: linked names ${other}, which gives a condition of its own; the other face of a plate gives none (only its emissivity and convectionCoefficient)`;
    case 'linked-twice':
      return `${at}: linked names ${other}, which another surface already links to; a plate has two faces`;
    case 'convection-on-opening':
      return `${at}: an opening takes no convectionCoefficient; remove it`;
    case 'convection-without-gas':
      return `${at}: convectionCoefficient above 0 needs a gas temperature; set settings.gasTemperature`;
  }
}

/** The failure in words: what is wrong, where (surface names from `names`, in matrix order) and the number concerned. */
export function exchangeFailureMessage(failure: SketchExchangeFailure, names?: ReadonlyArray<string>): string {
  const surface = (i: number | undefined) => {
    if (i === undefined) return 'a surface';
    return names && names[i] !== undefined ? `surface ${quoteName(names[i])}` : `surface ${i + 1}`;
  };
  const at = surface(failure.surface);
  if (failure.code === 'more-than-one-condition') {
    return names && names[failure.surface] !== undefined
      ? moreThanOneConditionMessage(names[failure.surface], failure.kinds)
      : `${at}: give one condition, not ${failure.kinds.join(' and ')} together`;
  }
  const got = formatNumber(failure.value ?? Number.NaN);
  switch (failure.code) {
    case 'view-factors-size':
      return `the view factors have ${got} entries, expected ${formatNumber(failure.expected ?? Number.NaN)}`;
    case 'area-size':
      return `the lengths have ${got} entries, expected ${formatNumber(failure.expected ?? Number.NaN)}`;
    case 'emissivity-size':
      return `the emissivities have ${got} entries, expected ${formatNumber(failure.expected ?? Number.NaN)}`;
    case 'surroundings-temperature-out-of-range':
      return `surroundings temperature must be a finite number of kelvin above 0, got ${got}`;
    case 'depth-out-of-range':
      return `depth must be a finite number of metres above 0, got ${got}`;
    case 'length-out-of-range':
      return `${at}: length must be a finite number of metres above 0, got ${got}`;
    case 'emissivity-out-of-range':
      return `${at}: emissivity must be in (0, 1], got ${got}`;
    case 'temperature-out-of-range':
      return `${at}: temperature must be a finite number of kelvin above 0, got ${got}`;
    case 'heat-flux-not-finite':
      return `${at}: heat flux must be a finite number of W/m^2, got ${got}`;
    case 'unknown-condition':
      return `${at}: unknown condition; give a temperature, a heat flux, adiabatic or opening`;
    case 'view-factor-out-of-range':
      return `view factor from ${at} to ${surface(failure.other)} must be a number in [0, 1], got ${got}`;
    case 'view-factor-sum-above-one':
      return `${at}: view factors sum to ${got}, more than 1`;
    case 'opening-without-surroundings':
      return `${at} is an opening, but no surroundings temperature is set`;
    case 'open-without-surroundings':
      return `${at} sees the surroundings (view factor ${(failure.value ?? Number.NaN).toPrecision(3)}: the sketch is open), but no surroundings temperature is set`;
    case 'no-fixed-temperature':
      return 'no unique answer: no surface has a temperature and none sees the surroundings or is an opening, so the temperature level is undetermined; give at least one surface a temperature';
    case 'singular':
      return `no unique answer: the radiosity equations are singular or nearly so (reciprocal condition number about ${(failure.value ?? 0).toExponential(1)}); ${NO_LEVEL_HINT}`;
    case 'not-finite':
      return `no unique answer: the radiosity equations are not finite (a coefficient overflows); ${NO_LEVEL_HINT}`;
    case 'flux-below-absolute-zero':
      return `${at}: no physical answer: the imposed heat flux of ${got} W/m^2 would need a temperature below absolute zero (it takes up more than the surface can receive)`;
    default:
      return balanceFailureMessage(failure, at, got, surface);
  }
}
