// How each surface's net heat changes with each emissivity and each fixed
// temperature: the derivative of the solved balance itself (implicit
// differentiation of its equations at the answer), not re-solving with nudged inputs.
//
// The balance (src/core/balance): every surface's radiosity row
//   J_i - (1 - e_i) G_i = e_i E_i,  G_i = sum_j F_ij J_j + F_is E_s,  i.e. M J = b,
// with E = sigma T^4 (openings: e = 1, E = E_s), and for every node a (a surface
// whose temperature is solved, or a linked plate's two faces) the residual
//   r_a = sum_{i in a} [back_i(T_i) - A_i (e_i (E_i - G_i) + h_i (T_i - T_gas))] = 0.
// For a parameter p, holding the nodes' E fixed, M dJ/dp = rhs_p (below) gives the
// partial dG/dp; the nodes then move by dE = -K^-1 dr/dp, K = dr/dE the balance's
// Newton matrix, and the total dG = dG/dp + Y dE with Y = F M^-1 diag(e) on the
// node columns. Net heat q_i = A_i e_i (E_i - G_i), so
//   dq_i = A_i [de_i (E_i - G_i) + e_i (dE_i - dG_i)].
// Right-hand sides: emissivity e_k: E_k - G_k in row k; a held temperature T_k:
// e_k 4 sigma T_k^3 in row k; the surroundings T_s: (1 - e_i) F_is dE_s in every
// row, plus dE_s in an opening's row (its E is E_s). One factorisation of M and
// one of K serve every parameter.
import { backHeat, balanceNodes, nodeCoupling, nodeIrradiation, RadiosityNetwork, type BalanceInput } from '../balance';
import { DenseLuSolver, LinearSolveError, STEFAN_BOLTZMANN, emissivePower, type ExchangeResult } from '../exchange';

/** What the derivatives need of the balance's input (SI units, as BalanceInput). */
export type SensitivityInput = Pick<
  BalanceInput,
  'viewFactors' | 'area' | 'conditions' | 'convectionCoefficient' | 'surroundingsTemperature'
>;

/** What the derivatives need of the solved balance (SI units, as ExchangeResult). */
export type SensitivityBase = Pick<
  ExchangeResult,
  'surfaceCount' | 'emissivity' | 'surroundingsViewFactor' | 'irradiation' | 'surroundingsTemperature' | 'temperature'
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
  /** The radiosity equations, or the balance's Newton matrix at the answer, could not be factored. */
  | { ok: false; code: 'singular' };

/**
 * Derivatives of every surface's net heat (W per metre of depth) with respect to
 * the emissivity of each surface that is not an opening (per unit emissivity),
 * the temperature of each surface held at a temperature (per K), and the
 * surroundings temperature when the sketch sees the surroundings (per K), with
 * every other surface's temperature following its balance (walls, tubes,
 * linked plates, convection and fluxes included). `input` and `result` are one
 * solved balance (solveBalance(input) gave result).
 */
export function netHeatSensitivity(input: SensitivityInput, result: SensitivityBase): SensitivityOutcome {
  const n = result.surfaceCount;
  const F = input.viewFactors;
  const A = input.area;
  const { emissivity: eps, surroundingsViewFactor: Fs, irradiation: G, temperature: T } = result;
  const conditions = input.conditions;
  const Ts = result.surroundingsTemperature;
  const h = (i: number) => input.convectionCoefficient?.[i] ?? 0;
  const E = Float64Array.from(T, (t) => emissivePower(t)); // openings report T_s, so E_i = E_s there

  // The balance's own radiosity network (M factored once) and the nodes' Newton matrix at the answer.
  let network: RadiosityNetwork;
  try {
    network = new RadiosityNetwork(F, A, eps, Fs, Ts === undefined ? 0 : emissivePower(Ts));
  } catch (error) {
    if (error instanceof LinearSolveError) return { ok: false, code: 'singular' };
    throw error;
  }
  const nodes = balanceNodes(conditions);
  const m = nodes.length;
  const all = Int32Array.from({ length: n }, (_, i) => i);
  const Y = nodeIrradiation(network, all, nodes); // dG_i/dE_b, n x m
  let jacobian: DenseLuSolver | null = null;
  if (m > 0) {
    const { Z, W } = nodeCoupling(Y, (i) => i, nodes, A, eps);
    const K = new DenseLuSolver(m);
    K.matrix.set(Z);
    nodes.forEach((members, a) => {
      let slope = 0; // d(back - convection)/dT of the node, W/(m K)
      for (const i of members) slope += backHeat(conditions[i], T[i], A[i]).slope - A[i] * h(i);
      K.matrix[a * m + a] += slope / (4 * STEFAN_BOLTZMANN * T[members[0]] ** 3) - W[a];
    });
    try {
      K.factor();
      jacobian = K;
    } catch (error) {
      if (error instanceof LinearSolveError) return { ok: false, code: 'singular' };
      throw error;
    }
  }

  const parameters: SensitivityParameter[] = [];
  for (let k = 0; k < n; k++) if (conditions[k].kind !== 'opening') parameters.push({ kind: 'emissivity', surface: k });
  for (let k = 0; k < n; k++)
    if (conditions[k].kind === 'temperature') parameters.push({ kind: 'temperature', surface: k });
  const seesSurroundings = conditions.some((c) => c.kind === 'opening') || Fs.some((f) => f > 0);
  if (Ts !== undefined && seesSurroundings) parameters.push({ kind: 'surroundingsTemperature' });

  // A flux or adiabatic back with no convection fixes the surface's net radiation.
  const fixesItsRadiation = (i: number) =>
    (conditions[i].kind === 'heatFlux' || conditions[i].kind === 'adiabatic') && !(h(i) > 0);
  const netHeat: Float64Array[] = [];
  const surroundingsNetHeat = new Float64Array(parameters.length);
  parameters.forEach((p, row) => {
    if (p.kind === 'emissivity' && fixesItsRadiation(p.surface)) {
      // Its radiosity is G + q whatever e is: only its own temperature moves. Exact zeros, not rounding.
      netHeat.push(new Float64Array(n));
      return;
    }
    // The parameter's direct changes: of E_i (dE), E_s (dEs) and e_i (de), and the rhs of M dJ.
    const rhs = new Float64Array(n);
    const dE = new Float64Array(n);
    const de = new Float64Array(n);
    let dEs = 0;
    if (p.kind === 'emissivity') {
      de[p.surface] = 1;
      rhs[p.surface] = E[p.surface] - G[p.surface];
    } else if (p.kind === 'temperature') {
      dE[p.surface] = 4 * STEFAN_BOLTZMANN * T[p.surface] ** 3;
      rhs[p.surface] = eps[p.surface] * dE[p.surface];
    } else {
      dEs = 4 * STEFAN_BOLTZMANN * Ts! ** 3;
      for (let i = 0; i < n; i++) {
        if (conditions[i].kind === 'opening') dE[i] = dEs;
        rhs[i] = (1 - eps[i]) * Fs[i] * dEs + eps[i] * dE[i];
      }
    }
    const dJ = network.solveRows(rhs);
    const dG = new Float64Array(n);
    network.irradiation(dJ, dG, dEs);
    if (jacobian) {
      // -dr_a/dp with the nodes held, then the nodes' answer dE = K^-1 (-dr/dp).
      const minusDr = Float64Array.from(nodes, (members) => {
        let s = 0;
        for (const i of members) s += A[i] * (de[i] * (E[i] - G[i]) - eps[i] * dG[i]);
        return s;
      });
      const dNode = jacobian.solve(minusDr);
      nodes.forEach((members, b) => {
        for (const i of members) dE[i] += dNode[b];
        for (let i = 0; i < n; i++) dG[i] += Y[i * m + b] * dNode[b];
      });
    }
    const dq = new Float64Array(n);
    let dSurroundings = 0;
    for (let i = 0; i < n; i++) {
      dq[i] = A[i] * (de[i] * (E[i] - G[i]) + eps[i] * (dE[i] - dG[i]));
      // Surroundings net heat = -sum_i A_i F_is (J_i - E_s), and J_i - G_i = q_i / A_i, so dJ_i = dG_i + dq_i / A_i.
      dSurroundings -= Fs[i] * (A[i] * dG[i] + dq[i] - A[i] * dEs);
    }
    netHeat.push(dq);
    surroundingsNetHeat[row] = dSurroundings;
  });
  return { ok: true, parameters, netHeat, surroundingsNetHeat };
}
