// Why an exchange problem was refused, as a code and the numbers involved:
// the core says what and where, src/document/exchange/messages.ts says it to people.

/** A code for each refusal; the comment names the fields it fills (units as in ExchangeInput). */
export type ExchangeFailureCode =
  /** An input array has the wrong length: `value` entries, `expected` wanted. */
  | 'view-factors-size'
  | 'area-size'
  | 'emissivity-size'
  /** Surroundings temperature not a finite number of K above 0: `value`. */
  | 'surroundings-temperature-out-of-range'
  /** Depth not a finite number of m above 0: `value`. */
  | 'depth-out-of-range'
  /** `surface`'s length (m) not finite and above 0: `value`. */
  | 'length-out-of-range'
  /** `surface`'s emissivity not in (0, 1]: `value`. */
  | 'emissivity-out-of-range'
  /** `surface`'s temperature not a finite number of K above 0: `value`. */
  | 'temperature-out-of-range'
  /** `surface`'s heat flux (W/m^2) not finite: `value`. */
  | 'heat-flux-not-finite'
  /** `surface`'s condition has a kind the solver does not know. */
  | 'unknown-condition'
  /** View factor from `surface` to `other` not a number in [0, 1]: `value`. */
  | 'view-factor-out-of-range'
  /** `surface`'s view factors sum to `value` > 1. */
  | 'view-factor-sum-above-one'
  /** `surface` is an opening and no surroundings temperature is set. */
  | 'opening-without-surroundings'
  /** `surface` sees the surroundings (view factor `value`) and no surroundings temperature is set. */
  | 'open-without-surroundings'
  /** No surface has a temperature, none is an opening or sees the surroundings: the level is undetermined. */
  | 'no-fixed-temperature'
  /** The radiosity equations are singular or too ill-conditioned: `value` = estimated reciprocal condition number. */
  | 'singular'
  /** The radiosity equations have a non-finite coefficient (overflow). */
  | 'not-finite'
  /** `surface`'s imposed heat flux `value` (W/m^2) would need a temperature below absolute zero. */
  | 'flux-below-absolute-zero'
  // The whole surface balance (src/core/balance): convection and the conditions behind a surface.
  /** `surface`'s convection coefficient (W/(m^2 K)) not a finite number >= 0: `value`. */
  | 'convection-out-of-range'
  /** `surface` is an opening and has a convection coefficient `value` (an opening has no front to convect from). */
  | 'convection-on-opening'
  /** `surface` has a convection coefficient `value` > 0 and no gas temperature is set. */
  | 'convection-without-gas'
  /** Gas temperature not a finite number of K above 0: `value`. */
  | 'gas-temperature-out-of-range'
  /** `surface`'s wall has no layers. */
  | 'wall-without-layers'
  /** `surface`'s wall layer `layer` has a thickness (m) not finite and above 0: `value`. */
  | 'layer-thickness-out-of-range'
  /** `surface`'s wall layer `layer` has a conductivity (W/(m K)) not finite and above 0: `value`. */
  | 'layer-conductivity-out-of-range'
  /** `surface`'s wall outside temperature not a finite number of K above 0: `value`. */
  | 'outside-temperature-out-of-range'
  /** `surface`'s wall outside coefficient (W/(m^2 K)) not finite and above 0: `value`. */
  | 'outside-coefficient-out-of-range'
  /** `surface`'s wall outside emissivity not in (0, 1]: `value`. */
  | 'outside-emissivity-out-of-range'
  /** `surface`'s tube fluid temperature not a finite number of K above 0: `value`. */
  | 'fluid-temperature-out-of-range'
  /** `surface`'s tube inside coefficient (W/(m^2 K)) not finite and above 0: `value`. */
  | 'inside-coefficient-out-of-range'
  /** `surface`'s tube wall conductivity (W/(m K)) not finite and above 0: `value`. */
  | 'tube-conductivity-out-of-range'
  /** `surface`'s tube outer diameter (m) not finite and above 0: `value`. */
  | 'outer-diameter-out-of-range'
  /** `surface`'s tube inner diameter (m) not finite, above 0 and below the outer diameter `expected`: `value`. */
  | 'inner-diameter-out-of-range'
  /** `surface` is linked to `other`, which is not a surface linked back to it (`other` absent: no such surface). */
  | 'link-not-mutual'
  /** The balance's Jacobian is singular: some surfaces that see only each other are tied to no known temperature. `value` = its estimated reciprocal condition number. */
  | 'balance-singular'
  /** Damped Newton stopped without meeting the balance: `value` = largest residual / sum of A_i J_i, `expected` = iterations. */
  | 'no-convergence'
  /** `surface`'s balance would need a temperature below absolute zero (it must give off more than it can): `value` = the last temperature tried, K. */
  | 'balance-below-absolute-zero';

export interface ExchangeFailure {
  ok: false;
  code: ExchangeFailureCode;
  /** Index of the surface concerned, when there is one. */
  surface?: number;
  /** Index of the second surface (view factor from `surface` to `other`). */
  other?: number;
  /** The offending number (units per code). */
  value?: number;
  /** The number wanted (array sizes), or a limit. */
  expected?: number;
  /** Index of a wall's layer concerned, from 0 (inside out). */
  layer?: number;
}

/** Builds a failure; a helper so each refusal in the solver is one line. */
export function exchangeFailure(
  code: ExchangeFailureCode,
  where: Omit<ExchangeFailure, 'ok' | 'code'> = {},
): ExchangeFailure {
  return { ok: false, code, ...where };
}

/**
 * Dimensionless. Row sums of F within this of one count as a closed enclosure (rounding of
 * an exact view-factor method is ~1e-14); the rest goes to the surroundings.
 */
export const CLOSURE_TOLERANCE = 1e-8;

/**
 * Check row i of the surface view-factor matrix F (n x n, row-major, dimensionless):
 * every factor finite and in [0, 1] within CLOSURE_TOLERANCE, and the row summing to
 * at most one. Returns the factor from surface i to the surroundings (0 for a closed
 * row, within the tolerance) or the failure that names the surface.
 */
export function surroundingsFactor(F: ArrayLike<number>, n: number, i: number): number | ExchangeFailure {
  let rowSum = 0;
  for (let j = 0; j < n; j++) {
    const f = F[i * n + j];
    if (!(Number.isFinite(f) && f >= -CLOSURE_TOLERANCE && f <= 1 + CLOSURE_TOLERANCE)) {
      return exchangeFailure('view-factor-out-of-range', { surface: i, other: j, value: f });
    }
    rowSum += f;
  }
  const toSurroundings = 1 - rowSum;
  if (toSurroundings < -CLOSURE_TOLERANCE)
    return exchangeFailure('view-factor-sum-above-one', { surface: i, value: rowSum });
  return toSurroundings > CLOSURE_TOLERANCE ? toSurroundings : 0;
}
