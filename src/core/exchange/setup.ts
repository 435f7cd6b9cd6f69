// The defaults a surface without properties gets, applied in one place so the
// command line and the app (both through src/document/exchangeInput.ts) agree.

import type { ExchangeInput, SurfaceCondition } from './exchange';

/** Emissivity (dimensionless) of a surface that gives none (typical of oxidised metals and refractories). */
export const DEFAULT_EMISSIVITY = 0.9;

/**
 * Condition of a surface that gives none: adiabatic (insulated, reradiating),
 * the least assuming choice; it neither adds nor removes heat.
 */
export const DEFAULT_CONDITION: SurfaceCondition = { kind: 'adiabatic' };

export interface ExchangeSetup {
  /** Condition per surface in matrix order; undefined: DEFAULT_CONDITION. */
  conditions: ReadonlyArray<SurfaceCondition | undefined>;
  /** Emissivity per surface (dimensionless); undefined: DEFAULT_EMISSIVITY. Openings are black whatever is given. */
  emissivity: ReadonlyArray<number | undefined>;
  /** View factors n x n row-major, row = from (dimensionless). */
  viewFactors: ArrayLike<number>;
  /** Surface lengths in metres (area per metre of depth). */
  lengthMetres: ArrayLike<number>;
  /** Surroundings temperature in K, if set. */
  surroundingsTemperature?: number;
  /** Depth in m, if set. */
  depth?: number;
}

/**
 * The solver input with the defaults applied: emissivity 0.9 and adiabatic
 * where none is given; emissivity 1 for openings (black: the surroundings seen
 * through them absorb all they get). Units as in ExchangeSetup (m, K).
 */
export function exchangeInputFor(setup: ExchangeSetup): ExchangeInput {
  const conditions = setup.conditions.map((c) => c ?? DEFAULT_CONDITION);
  const emissivity = Float64Array.from(conditions, (c, i) =>
    c.kind === 'opening' ? 1 : (setup.emissivity[i] ?? DEFAULT_EMISSIVITY),
  );
  return {
    viewFactors: setup.viewFactors,
    area: setup.lengthMetres,
    emissivity,
    conditions,
    surroundingsTemperature: setup.surroundingsTemperature,
    depth: setup.depth,
  };
}
