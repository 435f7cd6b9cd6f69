// Input and result of the whole surface balance. Per metre of depth, SI units:
// lengths m, temperatures K, fluxes W/m^2, heat W per metre of depth.
import type { ExchangeResult } from '../exchange/exchange';
import type { ExchangeFailure } from '../exchange/failures';
import type { BalanceCondition } from './conditions';

export interface BalanceInput {
  /** View factors, n x n row-major, row = from (dimensionless). */
  viewFactors: ArrayLike<number>;
  /** Area per metre of depth of each surface: its length, m. */
  area: ArrayLike<number>;
  /** Hemispherical emissivity of each front, in (0, 1] (openings: ignored, black). */
  emissivity: ArrayLike<number>;
  /** What lies behind each surface. */
  conditions: ReadonlyArray<BalanceCondition>;
  /** Film coefficient between each front and the gas, W/(m^2 K), >= 0; absent: none anywhere. */
  convectionCoefficient?: ArrayLike<number>;
  /** Gas temperature, K: needed where a convection coefficient is above 0. The gas is transparent. */
  gasTemperature?: number;
  /** Temperature of the black surroundings, K: for openings and open sketches. */
  surroundingsTemperature?: number;
  /** Depth in m: adds totals in W. */
  depth?: number;
}

export interface BalanceResult extends ExchangeResult {
  /** Heat leaving each front by convection, A h (T - T_gas), W per metre of depth (0 where none). */
  convectionHeat: Float64Array;
  /**
   * Heat supplied to each surface from behind, W per metre of depth: the
   * firing a held surface needs, a heat-flux surface's A q, 0 when adiabatic,
   * minus a wall's loss, minus what a tube's fluid takes up. Reported as
   * netHeat + convectionHeat, except for heat-flux and adiabatic surfaces,
   * where it is the condition (netHeat then follows from it); the back's own
   * formula agrees to the balance tolerance.
   */
  suppliedHeat: Float64Array;
  /** Per surface: a wall's temperatures from the hot face through each interface to the cold face (K); undefined otherwise. */
  layerTemperatures: ReadonlyArray<Float64Array | undefined>;
  /** Per surface: a wall's cold-face (casing) temperature, K; NaN where the surface is not a wall. */
  coldFaceTemperature: Float64Array;
  /** Per surface: a tube's inner wall temperature, K; NaN where not a tube. `temperature` is the outer metal. */
  innerTemperature: Float64Array;
  /** Gas temperature, K, when set. */
  gasTemperature: number | undefined;
  /** Heat the gas gives to all surfaces by convection, sum of A h (T_gas - T), W per metre of depth. */
  gasConvectionHeat: number;
  /** Newton iterations taken (0 when every temperature was known). */
  iterations: number;
}

/** The solved balance, or why there is none (codes and numbers: src/document words them). */
export type BalanceOutcome = { ok: true; result: BalanceResult } | ExchangeFailure;
