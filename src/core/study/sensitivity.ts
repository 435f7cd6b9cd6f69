// How each surface's net heat changes with each emissivity and each fixed
// temperature, from the radiosity equations themselves (the derivative of
// their solution), not by re-solving with nudged inputs.
//
// The solver's equations (src/core/exchange/exchange.ts), with w_i the weight
// of the irradiation G_i = sum_j F_ij J_j + F_is E_s in row i (1 - e_i for a
// temperature, 1 for a flux or adiabatic surface, 0 for an opening):
//   M J = b,  M_ij = delta_ij - w_i F_ij,
//   b_i = e_i E_i + (1 - e_i) F_is E_s  (temperature),  q_i + F_is E_s  (flux),  E_s  (opening).
// For a parameter p: M dJ/dp = db/dp - (dM/dp) J, one solve with the same
// factorisation per parameter. Then dG_i = sum_j F_ij dJ_j + F_is dE_s and
//   net heat q'_i = A_i e_i (E_i - G_i)  for temperature rows and openings (e = 1, E = E_s),
//   q'_i = A_i q_i  (fixed) for flux and adiabatic rows, whose derivative is zero.
// Emissivity e_k of a temperature surface: row k only, d(b_k - sum_j M_kj J_j)/de_k = E_k - G_k.
// Temperature T_k: dE_k/dT_k = 4 sigma T_k^3 in row k. Surroundings T_s: dE_s = 4 sigma T_s^3.
import { DenseLuSolver, LinearSolveError, STEFAN_BOLTZMANN, emissivePower, type ExchangeResult } from '../exchange';

/** What the derivatives need of the solver's input (an ExchangeInput or the whole balance's input). */
export interface SensitivityInput {
  /** n x n row-major, row = from (dimensionless). */
  viewFactors: ArrayLike<number>;
  /** Length of each surface, m (area per metre of depth). */
  area: ArrayLike<number>;
  /** Condition kind per surface: only 'temperature', 'heatFlux', 'adiabatic' and 'opening' are linear. */
  conditions: ReadonlyArray<{ readonly kind: string }>;
  /** Film coefficients, W/(m^2 K): above 0 on a surface whose temperature is solved makes the system non-linear. */
  convectionCoefficient?: ArrayLike<number>;
}

/** What the derivatives need of the solved exchange (SI units, as ExchangeResult). */
export type SensitivityBase = Pick<
  ExchangeResult,
  | 'surfaceCount'
  | 'emissivity'
  | 'surroundingsViewFactor'
  | 'irradiation'
  | 'radiosity'
  | 'surroundingsTemperature'
  | 'temperature'
>;

/** What a row of the sensitivity table is taken with respect to. */
export type SensitivityParameter =
  /** The emissivity of surface `surface` (dimensionless). */
  | { kind: 'emissivity'; surface: number }
  /** The fixed temperature of surface `surface`, K. */
  | { kind: 'temperature'; surface: number }
  /** The surroundings temperature, K. */
  | { kind: 'surroundingsTemperature' };

export type SensitivityOutcome =
  | {
      ok: true;
      parameters: SensitivityParameter[];
      /**
       * netHeat[p][i] = d(net heat of surface i)/d(parameter p): W per metre of
       * depth per unit emissivity, or W per metre of depth per K. Signed as net
       * heat: positive when the surface gives off more as the parameter grows.
       */
      netHeat: Float64Array[];
      /** d(surroundings net heat)/d(parameter p), same units. */
      surroundingsNetHeat: Float64Array;
    }
  /** The radiosity equations could not be factored (the solve that gave `result` would have failed too). */
  | { ok: false; code: 'singular' }
  /**
   * `surface` has a condition other than temperature, heat flux, adiabatic or
   * opening, or convection where its temperature is solved: the equations are not linear.
   */
  | { ok: false; code: 'unsupported-condition'; surface: number };

/**
 * Derivatives of every surface's net heat (W per metre of depth) with respect to
 * the emissivity of each surface that is not an opening (per unit emissivity),
 * the temperature of each surface held at a temperature (per K), and the
 * surroundings temperature when the sketch sees the surroundings (per K).
 * `input` and `result` are one solved exchange (solveExchange(input) gave result).
 */
export function netHeatSensitivity(input: SensitivityInput, result: SensitivityBase): SensitivityOutcome {
  const n = result.surfaceCount;
  const F = input.viewFactors;
  const { emissivity: eps, surroundingsViewFactor: Fs, irradiation: G, radiosity: J } = result;
  const conditions = input.conditions;
  const area = input.area;
  const Ts = result.surroundingsTemperature;
  const linear: readonly string[] = ['temperature', 'heatFlux', 'adiabatic', 'opening'];
  const h = input.convectionCoefficient;
  const unsupported = conditions.findIndex(
    (c, i) => !linear.includes(c.kind) || (c.kind !== 'temperature' && h !== undefined && h[i] > 0),
  );
  if (unsupported >= 0) return { ok: false, code: 'unsupported-condition', surface: unsupported };
  const weight = (i: number) => {
    const kind = conditions[i].kind;
    return kind === 'temperature' ? 1 - eps[i] : kind === 'opening' ? 0 : 1;
  };
  const solver = new DenseLuSolver(n);
  const M = solver.matrix;
  for (let i = 0; i < n; i++) {
    const w = weight(i);
    for (let j = 0; j < n; j++) M[i * n + j] = -w * F[i * n + j];
    M[i * n + i] += 1;
  }
  try {
    solver.factor();
  } catch (error) {
    if (error instanceof LinearSolveError) return { ok: false, code: 'singular' };
    throw error;
  }

  const parameters: SensitivityParameter[] = [];
  for (let k = 0; k < n; k++) if (conditions[k].kind !== 'opening') parameters.push({ kind: 'emissivity', surface: k });
  for (let k = 0; k < n; k++)
    if (conditions[k].kind === 'temperature') parameters.push({ kind: 'temperature', surface: k });
  const seesSurroundings = conditions.some((c) => c.kind === 'opening') || Fs.some((f) => f > 0);
  if (Ts !== undefined && seesSurroundings) parameters.push({ kind: 'surroundingsTemperature' });

  const emissive = (i: number) => {
    const c = conditions[i];
    return c.kind === 'temperature'
      ? emissivePower(result.temperature[i])
      : c.kind === 'opening'
        ? emissivePower(Ts!)
        : J[i];
  };
  const netHeat: Float64Array[] = [];
  const surroundingsNetHeat = new Float64Array(parameters.length);
  parameters.forEach((p, row) => {
    // Right-hand side of M dJ = db - dM J, and the parameter's direct changes of E_i (dE) and E_s (dEs).
    const rhs = new Float64Array(n);
    const dE = new Float64Array(n);
    let dEs = 0;
    if (p.kind === 'emissivity') {
      if (conditions[p.surface].kind === 'temperature') rhs[p.surface] = emissive(p.surface) - G[p.surface];
    } else if (p.kind === 'temperature') {
      const T = result.temperature[p.surface]; // as given, for a surface held at a temperature
      dE[p.surface] = 4 * STEFAN_BOLTZMANN * T ** 3;
      rhs[p.surface] = eps[p.surface] * dE[p.surface];
    } else {
      dEs = 4 * STEFAN_BOLTZMANN * Ts! ** 3;
      for (let i = 0; i < n; i++) {
        if (conditions[i].kind === 'opening') {
          rhs[i] = dEs;
          dE[i] = dEs;
        } else rhs[i] = weight(i) * Fs[i] * dEs;
      }
    }
    const dJ = solver.solve(rhs);
    const dq = new Float64Array(n);
    let dSurroundings = 0;
    for (let i = 0; i < n; i++) {
      let dG = Fs[i] * dEs;
      for (let j = 0; j < n; j++) dG += F[i * n + j] * dJ[j];
      const kind = conditions[i].kind;
      if (kind === 'temperature' || kind === 'opening') {
        dq[i] = area[i] * eps[i] * (dE[i] - dG);
        if (p.kind === 'emissivity' && p.surface === i) dq[i] += area[i] * (emissive(i) - G[i]);
      }
      // Surroundings net heat = -sum_i A_i F_is (J_i - E_s).
      dSurroundings -= area[i] * Fs[i] * (dJ[i] - dEs);
    }
    netHeat.push(dq);
    surroundingsNetHeat[row] = dSurroundings;
  });
  return { ok: true, parameters, netHeat, surroundingsNetHeat };
}
