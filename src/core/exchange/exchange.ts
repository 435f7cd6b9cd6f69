// Gray-diffuse radiation exchange by the net-radiation (radiosity) method, for
// a long (2D) cross-section: every quantity is per metre of depth unless it
// says "total".
//
// Conventions (used everywhere in Tautline):
// - SI units: lengths in m, temperatures in K, fluxes W/m^2, heat per metre of depth W/m.
// - Net heat and net flux are positive when a surface gives off more radiation
//   than it absorbs (heat leaves the surface by radiation); negative when it
//   takes heat up.
// - q'_ij (the exchange matrix) is the net heat from surface i to surface j,
//   W per metre of depth; q'_ij = -q'_ji when the view factors are reciprocal.
//
// Equations, per surface i with radiosity J_i (unknown), irradiation
// G_i = sum_j F_ij J_j + F_i,s E_s, and net flux q_i = J_i - G_i:
// - temperature given (E_i = sigma T_i^4):  J_i - (1 - e_i) G_i = e_i E_i,
//   the form eps (E - J) = (1 - eps) q, which is finite for black surfaces;
// - heat flux given:                        J_i - G_i = q_i;
// - adiabatic (reradiating):                J_i - G_i = 0;
// - opening (black, at the surroundings temperature): J_i = E_s.
// The surroundings (s) are a black surface at T_s closing an open sketch:
// F_i,s = 1 - sum_j F_ij. They are not an unknown, so not part of the matrix.

import { DenseLuSolver, LinearSolveError } from './linearSolve';
import { exchangeFailure, surroundingsFactor, type ExchangeFailure } from './failures';
import { radiosityResidual, rowProducts } from './refine';
import { RadiositySystem } from './radiositySystem';

/** Stefan-Boltzmann constant, W/(m^2 K^4) (CODATA 2018). */
export const STEFAN_BOLTZMANN = 5.670374419e-8;

/** Row sums of F within this of one count as closed (see failures.ts). */
export { CLOSURE_TOLERANCE } from './failures';

/** Net heats below this fraction of the largest radiated power A_i J_i are rounding, for the energy balance. */
const BALANCE_FLOOR = 1e-9;

/** What is imposed on a surface. */
export type SurfaceCondition =
  /** Temperature in K (> 0). */
  | { kind: 'temperature'; temperature: number }
  /** Imposed net radiative flux in W/m^2, positive when heat leaves the surface. */
  | { kind: 'heatFlux'; heatFlux: number }
  /** Insulated, reradiating: net flux zero. Its emissivity then has no effect. */
  | { kind: 'adiabatic' }
  /** An opening to the surroundings: black, at the surroundings temperature (its emissivity is ignored). */
  | { kind: 'opening' };

export interface ExchangeInput {
  /** View factors, n x n row-major, row = from, column = to (dimensionless). */
  viewFactors: ArrayLike<number>;
  /** Area per metre of depth of each surface, i.e. its length in metres (m). */
  area: ArrayLike<number>;
  /** Hemispherical emissivity of each surface, in (0, 1]. */
  emissivity: ArrayLike<number>;
  /** One condition per surface. */
  conditions: ReadonlyArray<SurfaceCondition>;
  /** Temperature of the surroundings in K: needed for openings and for sketches whose rows sum to less than one. */
  surroundingsTemperature?: number;
  /** Depth of the cross-section in m (duct or furnace length): adds totals in W. */
  depth?: number;
}

export interface ExchangeResult {
  surfaceCount: number;
  /** Radiosity J_i, W/m^2. */
  radiosity: Float64Array;
  /** Irradiation G_i (incident radiation), W/m^2. */
  irradiation: Float64Array;
  /** Temperature, K: as given, the surroundings' for openings, solved for flux and adiabatic surfaces. */
  temperature: Float64Array;
  /** Emissivity used: as given, 1 for openings. */
  emissivity: Float64Array;
  /** Net radiative flux q_i, W/m^2, positive when the surface gives off more than it absorbs. */
  netFlux: Float64Array;
  /** Net heat q'_i = A_i q_i, W per metre of depth, same sign as netFlux. */
  netHeat: Float64Array;
  /** Net exchange q'_ij = A_i F_ij (J_i - J_j), n x n row-major, W per metre of depth from i to j. */
  exchange: Float64Array;
  /** F_i,s = 1 - sum_j F_ij (0 where the row closes within CLOSURE_TOLERANCE). */
  surroundingsViewFactor: Float64Array;
  /** Net heat from surface i to the surroundings, A_i F_i,s (J_i - E_s), W per metre of depth. */
  surroundingsExchange: Float64Array;
  /** Net heat given off by the surroundings (minus the sum of surroundingsExchange), W per metre of depth. */
  surroundingsNetHeat: number;
  /** Surroundings temperature in K, when given. */
  surroundingsTemperature: number | undefined;
  /**
   * |sum of netHeat + surroundingsNetHeat| / largest |term| (the denominator at
   * least 1e-9 x the largest A_i J_i, so equilibrium gives ~1e-7 at most, not noise/noise): conservation
   * check, ~1e-14 when the view factors are reciprocal, larger when they are not.
   */
  energyBalance: number;
  /** Estimated reciprocal condition number of the radiosity system (1 best, tiny = results uncertain). */
  reciprocalCondition: number;
  /** Depth in m, when given. */
  depth: number | undefined;
  /** netHeat x depth, W (only with a depth). */
  netHeatTotal: Float64Array | undefined;
  /** surroundingsNetHeat x depth, W (only with a depth). */
  surroundingsNetHeatTotal: number | undefined;
}

/** The solved exchange, or why there is none (codes and numbers: src/document words them). */
export type ExchangeOutcome = { ok: true; result: ExchangeResult } | ExchangeFailure;

/** Blackbody emissive power sigma T^4, W/m^2, of a temperature in K. */
export function emissivePower(temperature: number): number {
  return STEFAN_BOLTZMANN * temperature ** 4;
}

/** Temperature in K whose blackbody emissive power is e W/m^2 (e >= 0). */
export function temperatureOfEmissivePower(e: number): number {
  return Math.sqrt(Math.sqrt(e / STEFAN_BOLTZMANN));
}

/**
 * Solves gray-diffuse exchange in a 2D enclosure or open sketch by the
 * net-radiation method (equations in the file header). Input and results in
 * SI: lengths m, temperatures K, fluxes and radiosities W/m^2, net heat W per
 * metre of depth, totals W; net heat and flux positive when the surface gives
 * off more radiation than it absorbs.
 * Values out of range and problems without a unique answer (e.g. a closed
 * enclosure where no surface has a temperature) come back as an
 * ExchangeFailure: a code, the surface index and the number concerned.
 * `workspace`: a solver of size n to reuse between calls (live updates), so its
 * n x n matrix is not allocated again; one of another size is not used.
 */
export function solveExchange(input: ExchangeInput, workspace?: DenseLuSolver): ExchangeOutcome {
  const n = input.conditions.length;
  const sizeFailure = checkSizes(input, n);
  if (sizeFailure) return sizeFailure;
  const F = input.viewFactors;
  const area = input.area;
  const Ts = input.surroundingsTemperature;
  if (Ts !== undefined && !(Number.isFinite(Ts) && Ts > 0)) {
    return exchangeFailure('surroundings-temperature-out-of-range', { value: Ts });
  }
  const depth = input.depth;
  if (depth !== undefined && !(Number.isFinite(depth) && depth > 0)) {
    return exchangeFailure('depth-out-of-range', { value: depth });
  }
  const Es = Ts === undefined ? 0 : emissivePower(Ts);

  // Per-surface values; validate as we go so failures name the surface.
  const eps = new Float64Array(n);
  const Eb = new Float64Array(n); // emissive power where known, W/m^2
  const fixedFlux = new Float64Array(n);
  const Fs = new Float64Array(n);
  let anchored = false; // some surface with a known temperature, or a view to the surroundings
  for (let i = 0; i < n; i++) {
    const c = input.conditions[i];
    if (!(Number.isFinite(area[i]) && area[i] > 0)) {
      return exchangeFailure('length-out-of-range', { surface: i, value: area[i] });
    }
    const e = input.emissivity[i];
    if (c.kind === 'opening') {
      if (Ts === undefined) return exchangeFailure('opening-without-surroundings', { surface: i });
      eps[i] = 1;
      Eb[i] = Es;
      anchored = true;
    } else {
      if (!(Number.isFinite(e) && e > 0 && e <= 1)) {
        return exchangeFailure('emissivity-out-of-range', { surface: i, value: e });
      }
      eps[i] = e;
      if (c.kind === 'temperature') {
        if (!(Number.isFinite(c.temperature) && c.temperature > 0)) {
          return exchangeFailure('temperature-out-of-range', { surface: i, value: c.temperature });
        }
        Eb[i] = emissivePower(c.temperature);
        anchored = true;
      } else if (c.kind === 'heatFlux') {
        if (!Number.isFinite(c.heatFlux))
          return exchangeFailure('heat-flux-not-finite', { surface: i, value: c.heatFlux });
        fixedFlux[i] = c.heatFlux;
      } else if (c.kind !== 'adiabatic') {
        return exchangeFailure('unknown-condition', { surface: i });
      }
    }
    const toSurroundings = surroundingsFactor(F, n, i);
    if (typeof toSurroundings !== 'number') return toSurroundings;
    if (toSurroundings > 0) {
      if (Ts === undefined) return exchangeFailure('open-without-surroundings', { surface: i, value: toSurroundings });
      Fs[i] = toSurroundings;
      anchored = true;
    }
  }
  if (n > 0 && !anchored) return exchangeFailure('no-fixed-temperature');

  // Radiosity system M J = rhs, M = I - diag(weight) F, factored in the workspace's memory.
  const J = new Float64Array(n);
  const weight = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const c = input.conditions[i];
    // Row weight of G_i: (1 - e) for a temperature, 1 for flux/adiabatic, 0 for black or opening rows (J_i = E_i).
    weight[i] = c.kind === 'temperature' ? 1 - eps[i] : c.kind === 'opening' ? 0 : 1;
    J[i] =
      c.kind === 'temperature' || c.kind === 'opening'
        ? eps[i] * Eb[i] + weight[i] * Fs[i] * Es
        : fixedFlux[i] + Fs[i] * Es;
  }
  let system: RadiositySystem;
  try {
    system = new RadiositySystem(F, weight, area, workspace);
  } catch (err) {
    if (err instanceof LinearSolveError) {
      return err.problem === 'not-finite'
        ? exchangeFailure('not-finite')
        : exchangeFailure('singular', { value: Number.isNaN(err.reciprocalCondition) ? 0 : err.reciprocalCondition });
    }
    throw err;
  }
  const reciprocalCondition = system.reciprocalCondition;
  const rhs = Float64Array.from(J);
  system.solve(J);
  // One step of iterative refinement (the residual from F itself), so every
  // row holds to the rounding of J, which is what the energy balance sums.
  system.refine(J, radiosityResidual(F, weight, J, rhs, new Float64Array(n)));

  // Results.
  const G = new Float64Array(n);
  const q = new Float64Array(n);
  const T = new Float64Array(n);
  const qp = new Float64Array(n);
  const exchange = new Float64Array(n * n);
  const toSurr = new Float64Array(n);
  rowProducts(F, J, G); // compensated: the energy balance adds A_i G_i over every surface
  for (let i = 0; i < n; i++) {
    const ri = i * n;
    const g = Fs[i] * Es + G[i];
    G[i] = g;
    const c = input.conditions[i];
    if (c.kind === 'temperature' || c.kind === 'opening') {
      // eps (E - G) equals J - G without its cancellation when eps is small.
      q[i] = eps[i] * (Eb[i] - g);
      T[i] = c.kind === 'temperature' ? c.temperature : (Ts as number);
    } else {
      q[i] = fixedFlux[i]; // the condition; the solve meets it to rounding
      // E = J + (1 - e)/e q; for adiabatic surfaces E = J whatever e is.
      const E = J[i] + ((1 - eps[i]) / eps[i]) * q[i];
      const scale = Math.abs(J[i]) + Math.abs(E - J[i]) + G[i];
      if (J[i] < -1e-12 * scale || E < -1e-12 * scale) {
        return exchangeFailure('flux-below-absolute-zero', { surface: i, value: fixedFlux[i] });
      }
      T[i] = temperatureOfEmissivePower(Math.max(E, 0));
    }
    qp[i] = area[i] * q[i];
    for (let j = 0; j < n; j++) exchange[ri + j] = area[i] * F[ri + j] * (J[i] - J[j]);
    toSurr[i] = area[i] * Fs[i] * (J[i] - Es);
  }
  let surroundingsNetHeat = 0;
  for (let i = 0; i < n; i++) surroundingsNetHeat -= toSurr[i];
  let sum = surroundingsNetHeat;
  let largest = Math.abs(surroundingsNetHeat);
  let radiated = 0; // largest A_i J_i, W/m
  for (let i = 0; i < n; i++) {
    sum += qp[i];
    largest = Math.max(largest, Math.abs(qp[i]));
    radiated = Math.max(radiated, area[i] * Math.abs(J[i]));
  }
  // Relative to the largest |q'|; floored at rounding level of what is radiated,
  // so an enclosure at equilibrium (every q' ~ 1e-16 A J) reports ~0, not noise/noise.
  const denominator = Math.max(largest, BALANCE_FLOOR * radiated);
  const energyBalance = denominator > 0 ? Math.abs(sum) / denominator : 0;

  const result: ExchangeResult = {
    surfaceCount: n,
    radiosity: J,
    irradiation: G,
    temperature: T,
    emissivity: eps,
    netFlux: q,
    netHeat: qp,
    exchange,
    surroundingsViewFactor: Fs,
    surroundingsExchange: toSurr,
    surroundingsNetHeat,
    surroundingsTemperature: Ts,
    energyBalance,
    reciprocalCondition,
    depth,
    netHeatTotal: depth === undefined ? undefined : qp.map((v) => v * depth),
    surroundingsNetHeatTotal: depth === undefined ? undefined : surroundingsNetHeat * depth,
  };
  return { ok: true, result };
}

function checkSizes(input: ExchangeInput, n: number): ExchangeFailure | null {
  const sizes = [
    ['view-factors-size', input.viewFactors.length, n * n],
    ['area-size', input.area.length, n],
    ['emissivity-size', input.emissivity.length, n],
  ] as const;
  for (const [code, got, want] of sizes) {
    if (got !== want) return exchangeFailure(code, { value: got, expected: want });
  }
  return null;
}
