// How heat-exchange results name conditions and the surroundings, the same
// words in the command line's table and CSV and in the app's table.
import type { BalanceResult } from '../../core/balance';
import type { ExchangeResult } from '../../core/exchange';
import type { ConditionKind } from './conditions';

/** How each condition is named in tables and CSV. */
export const CONDITION_LABEL: Readonly<Record<ConditionKind, string>> = {
  temperature: 'temperature',
  heatFlux: 'heat flux',
  adiabatic: 'adiabatic',
  opening: 'opening',
  wall: 'wall',
  tube: 'tube',
  linked: 'linked plate',
};

/** The condition as results tables name it: "(T solved)" where the temperature is an answer, not an input. */
export function conditionInTable(kind: ConditionKind): string {
  return kind === 'temperature' || kind === 'opening' ? CONDITION_LABEL[kind] : `${CONDITION_LABEL[kind]} (T solved)`;
}

/**
 * The row and column for the surroundings of an open sketch: its name, and its
 * condition (a black surface at the surroundings temperature).
 */
export const SURROUNDINGS_LABEL = { name: '(surroundings)', condition: 'black' } as const;

/** True when some surface sees the surroundings (an open sketch). */
export const seesSurroundings = (r: ExchangeResult): boolean => r.surroundingsViewFactor.some((f) => f > 0);

/** The row for the gas when it has a temperature: transparent, exchanging heat by convection only. */
export const GAS_LABEL = { name: '(gas)', condition: 'transparent gas' } as const;

/** True when the sketch sets a gas temperature. */
export const hasGas = (r: BalanceResult): boolean => r.gasTemperature !== undefined;
