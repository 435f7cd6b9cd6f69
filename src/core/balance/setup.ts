// The whole-balance input with the exchange's defaults applied (emissivity 0.9,
// adiabatic, openings black), so the command line and the app agree.
import { DEFAULT_CONDITION, DEFAULT_EMISSIVITY } from '../exchange/setup';
import type { BalanceCondition } from './conditions';
import type { BalanceInput } from './types';

export interface BalanceSetup {
  /** Condition per surface in matrix order; undefined: DEFAULT_CONDITION (adiabatic). */
  conditions: ReadonlyArray<BalanceCondition | undefined>;
  /** Emissivity per surface; undefined: DEFAULT_EMISSIVITY. Openings are black whatever is given. */
  emissivity: ReadonlyArray<number | undefined>;
  /** Film coefficient per surface, W/(m^2 K); undefined: none (0). */
  convectionCoefficient: ReadonlyArray<number | undefined>;
  /** View factors n x n row-major (dimensionless). */
  viewFactors: ArrayLike<number>;
  /** Surface lengths in metres. */
  lengthMetres: ArrayLike<number>;
  /** K, if set. */
  surroundingsTemperature?: number;
  /** K, if set. */
  gasTemperature?: number;
  /** m, if set. */
  depth?: number;
}

/** The solver input with the defaults applied (units as in BalanceSetup). */
export function balanceInputFor(setup: BalanceSetup): BalanceInput {
  const conditions = setup.conditions.map((c) => c ?? DEFAULT_CONDITION);
  return {
    viewFactors: setup.viewFactors,
    area: setup.lengthMetres,
    emissivity: Float64Array.from(conditions, (c, i) =>
      c.kind === 'opening' ? 1 : (setup.emissivity[i] ?? DEFAULT_EMISSIVITY),
    ),
    conditions,
    convectionCoefficient: Float64Array.from(conditions, (_, i) => setup.convectionCoefficient[i] ?? 0),
    gasTemperature: setup.gasTemperature,
    surroundingsTemperature: setup.surroundingsTemperature,
    depth: setup.depth,
  };
}
