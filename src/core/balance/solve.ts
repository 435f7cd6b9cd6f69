// The whole surface balance: on every surface, heat supplied from behind =
// net radiation leaving the front + convection leaving the front, with the
// radiation by the net-radiation method (radiosity.ts) and the back by its
// condition (conditions.ts). Unknowns are the temperatures of "nodes": one per
// surface whose temperature is not given, one per linked plate (two faces, one
// temperature). A gas node that radiates can later join as one more node with
// its own balance. Units SI (m, K, W/m^2, W per metre of depth).
//
// Numeric choices: radiation goes with T^4 and the rest linearly, so damped
// Newton in T: the Jacobian is dense through the radiosity matrix M, whose
// sensitivity F M^-1 diag(e) is computed once per solve (M does not depend on
// temperature); each step is limited so every temperature stays above a tenth
// of its value (above 0 K), then halved until the largest residual falls
// (backtracking). Converged when every node's residual is at most 1e-10 of
// sum A_i J_i (plus the rounding of its own back and convection terms); at most
// 100 iterations; one more step then polishes to rounding.
import { STEFAN_BOLTZMANN, emissivePower } from '../exchange/exchange';
import { exchangeFailure, surroundingsFactor, type ExchangeFailure } from '../exchange/failures';
import { LinearSolveError } from '../exchange/linearSolve';
import type { SolverMemory } from '../exchange/solverMemory';
import { checkCondition, checkConvection } from './check';
import { backHeat } from './conditions';
import { balanceNodes, nodeCoupling, nodeIrradiation } from './nodes';
import { keptCoupling, keptNetwork } from './kept';
import { NewtonMatrix } from './newtonMatrix';
import { RadiosityNetwork } from './radiosity';
import { isLinearBalance, solveLinearBalance } from './linear';
import { balanceResult, type Solved } from './results';
import type { BalanceInput, BalanceOutcome } from './types';

/** Dimensionless: converged when every residual is at most this fraction of sum A_i J_i. */
export const BALANCE_TOLERANCE = 1e-10;
/** Newton iterations allowed before the case is refused. */
export const MAX_ITERATIONS = 100;

/**
 * Solves the whole surface balance of a 2D section (see the file header).
 * Results per metre of depth in SI; energyBalance = |sum suppliedHeat +
 * gasConvectionHeat + surroundingsNetHeat| / sum A_i J_i. Out-of-range input
 * and cases without a unique answer, or where Newton does not converge, come
 * back as an ExchangeFailure (a code, the surface, the number), never a wrong answer.
 * `memory`: solvers and scratch kept between solves (solverMemory.ts). A balance
 * linear in the radiosities (linear.ts: held, open, adiabatic and heat-flux
 * surfaces, no convection) is solved as one system; `method: 'newton'` (tests)
 * takes Newton for it too.
 */
export function solveBalance(
  input: BalanceInput,
  memory?: SolverMemory,
  options: { method?: 'auto' | 'newton' } = {},
): BalanceOutcome {
  const setup = prepare(input);
  if ('ok' in setup) return setup;
  if (options.method !== 'newton' && isLinearBalance(input)) {
    const linear = solveLinearBalance(input, memory?.solver('linear', setup.n));
    return 'ok' in linear ? linear : { ok: true, result: balanceResult(input, linear) };
  }
  const { n, eps, Fs, Es, h, Tg, known } = setup;
  let network: RadiosityNetwork;
  try {
    network = keptNetwork(
      memory,
      input.viewFactors,
      input.area,
      eps,
      Fs,
      Es,
      (F, area, e, s) => new RadiosityNetwork(F, area, e, s, Es, memory),
    );
  } catch (err) {
    if (err instanceof LinearSolveError) {
      return err.problem === 'not-finite'
        ? exchangeFailure('not-finite')
        : exchangeFailure('singular', { value: Number.isNaN(err.reciprocalCondition) ? 0 : err.reciprocalCondition });
    }
    throw err;
  }

  const members = balanceNodes(input.conditions);
  const m = members.length;
  const unknown = Int32Array.from(members.flat());
  const A = input.area;
  const E = new Float64Array(n);
  const T = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    T[i] = known[i];
    E[i] = emissivePower(known[i]);
  }
  const J = new Float64Array(n);
  const G = new Float64Array(n);
  const start = startTemperature(input, setup);
  const nodeT = new Float64Array(m).fill(start);
  const residual = new Float64Array(m);
  const slope = new Float64Array(m); // d(back + convection terms)/dT per node, W/(m K)

  // Residual per node: supplied from behind - A (q + h (T - Tg)), W/m; returns the largest |r|, sum A J, and
  // whether every |r| is within the tolerance plus its own rounding (|slope| T x 64 eps: a film of 1e12 W/(m^2 K)
  // cannot place T closer than its last bit allows).
  const evaluate = (temps: Float64Array): { worst: number; scale: number; met: boolean } => {
    for (let a = 0; a < m; a++) {
      for (const i of members[a]) {
        T[i] = temps[a];
        E[i] = emissivePower(temps[a]);
      }
    }
    network.solve(E, J, G);
    let scale = 0;
    for (let i = 0; i < n; i++) scale += A[i] * Math.abs(J[i]);
    let worst = 0;
    let met = true;
    for (let a = 0; a < m; a++) {
      let r = 0;
      let s = 0;
      for (const i of members[a]) {
        const back = backHeat(input.conditions[i], T[i], A[i]);
        r += back.heat - A[i] * (eps[i] * (E[i] - G[i]) + h[i] * (T[i] - Tg));
        s += back.slope - A[i] * h[i];
      }
      residual[a] = r;
      slope[a] = s;
      worst = Math.max(worst, Math.abs(r));
      if (!(Math.abs(r) <= BALANCE_TOLERANCE * scale + 64 * Number.EPSILON * Math.abs(s) * temps[a])) met = false;
    }
    return { worst: Number.isFinite(worst) ? worst : Number.POSITIVE_INFINITY, scale, met };
  };

  let state = evaluate(nodeT);
  let iterations = 0;
  if (m > 0) {
    // In emissive powers the Jacobian is constant but for its diagonal: d r_a / d E_b =
    // Z_ab - delta_ab W_a + delta_ab slope_a / (4 sigma T_a^3), with Z_ab = sum_{i in a} A_i e_i sum_{k in b} dG_i/dE_k
    // and W_a = sum_{i in a} A_i e_i. Z is formed once per solve. Newton solves for changes of E (a temperature
    // near 0 K then leaves its column well scaled instead of vanishing like T^3) and steps T by dE / (4 sigma T^3).
    // dG/dE among the unknown surfaces, rows in `unknown` order (row k is unknown[k]).
    const rowOf = new Int32Array(n);
    unknown.forEach((i, k) => (rowOf[i] = k));
    const { Z, W } = keptCoupling(memory, network, members, () =>
      nodeCoupling(nodeIrradiation(network, unknown, members, memory), (i) => rowOf[i], members, A, eps, memory),
    );
    const jacobian = new NewtonMatrix(Z, W, memory?.solver('newton', m));
    const diagonal = new Float64Array(m);
    const step = new Float64Array(m);
    const colScale = new Float64Array(m);
    const trial = new Float64Array(m);
    let polished = false;
    for (;;) {
      const converged = state.met;
      if (converged && polished) break;
      const zero = stuck(input, nodeT, members, start);
      if (zero) return zero;
      if (iterations >= MAX_ITERATIONS) {
        return exchangeFailure('no-convergence', { value: state.worst / state.scale, expected: MAX_ITERATIONS });
      }
      for (let a = 0; a < m; a++) {
        colScale[a] = 1 / (4 * STEFAN_BOLTZMANN * nodeT[a] ** 3);
        diagonal[a] = slope[a] * colScale[a];
      }
      try {
        jacobian.factor(diagonal);
      } catch (err) {
        if (err instanceof LinearSolveError)
          return exchangeFailure('balance-singular', { value: err.reciprocalCondition || 0 });
        throw err;
      }
      for (let a = 0; a < m; a++) step[a] = -residual[a];
      jacobian.solve(step);
      for (let a = 0; a < m; a++) step[a] *= colScale[a]; // dE to dT
      // Keep every temperature above a tenth of its value: above 0 K.
      let lambda = 1;
      for (let a = 0; a < m; a++) if (step[a] < 0) lambda = Math.min(lambda, (-0.9 * nodeT[a]) / step[a]);
      const before = state.worst;
      const saved = Float64Array.from(residual);
      const savedSlope = Float64Array.from(slope);
      let accepted = false;
      for (let halving = 0; halving < 60; halving++) {
        for (let a = 0; a < m; a++) trial[a] = nodeT[a] + lambda * step[a];
        const next = evaluate(trial);
        if (next.worst <= (1 - 1e-4 * lambda) * before || (converged && next.worst <= before)) {
          nodeT.set(trial);
          state = next;
          accepted = true;
          break;
        }
        lambda *= 0.5;
      }
      iterations++;
      if (!accepted) {
        // Restore the last accepted point; converged already means rounding stops further progress.
        residual.set(saved);
        slope.set(savedSlope);
        state = evaluate(nodeT);
        if (converged) break;
        return (
          stuck(input, nodeT, members, start) ??
          exchangeFailure('no-convergence', { value: state.worst / state.scale, expected: iterations })
        );
      }
      if (converged) polished = true;
    }
  }
  const solved: Solved = {
    T,
    E,
    J,
    G,
    eps,
    Fs,
    Es,
    h,
    Tg,
    iterations,
    reciprocalCondition: network.reciprocalCondition,
  };
  return { ok: true, result: balanceResult(input, solved) };
}

/** Below this fraction of the starting temperature a node is taken as driven to 0 K (no physical answer). */
const ZERO_FRACTION = 1e-6;

/**
 * Why Newton cannot go on, when a temperature is being driven to 0 K: its
 * surface must give off more than it can receive. A heat-flux surface is named
 * with its flux (W/m^2), others with the last temperature tried (K). Null otherwise.
 */
function stuck(input: BalanceInput, nodeT: Float64Array, members: number[][], start: number): ExchangeFailure | null {
  let low = -1;
  for (let a = 0; a < nodeT.length; a++) if (low < 0 || nodeT[a] < nodeT[low]) low = a;
  if (low < 0 || !(nodeT[low] < ZERO_FRACTION * start)) return null;
  const i = members[low][0];
  const c = input.conditions[i];
  return c.kind === 'heatFlux'
    ? exchangeFailure('flux-below-absolute-zero', { surface: i, value: c.heatFlux })
    : exchangeFailure('balance-below-absolute-zero', { surface: i, value: nodeT[low] });
}

interface Prepared {
  n: number;
  eps: Float64Array;
  Fs: Float64Array;
  Es: number;
  h: Float64Array;
  Tg: number;
  /** Known temperatures (held, openings), K; 0 where solved. */
  known: Float64Array;
}

/** Checks every input and gathers per-surface values, or the first failure. */
function prepare(input: BalanceInput): Prepared | ExchangeFailure {
  const n = input.conditions.length;
  const sizes = [
    ['view-factors-size', input.viewFactors.length, n * n],
    ['area-size', input.area.length, n],
    ['emissivity-size', input.emissivity.length, n],
  ] as const;
  for (const [code, got, want] of sizes) {
    if (got !== want) return exchangeFailure(code, { value: got, expected: want });
  }
  const Ts = input.surroundingsTemperature;
  if (Ts !== undefined && !(Number.isFinite(Ts) && Ts > 0)) {
    return exchangeFailure('surroundings-temperature-out-of-range', { value: Ts });
  }
  const depth = input.depth;
  if (depth !== undefined && !(Number.isFinite(depth) && depth > 0)) {
    return exchangeFailure('depth-out-of-range', { value: depth });
  }
  const convection = checkConvection(input.convectionCoefficient, input.gasTemperature, input.conditions);
  if (convection) return convection;
  const h = Float64Array.from({ length: n }, (_, i) => input.convectionCoefficient?.[i] ?? 0);
  const eps = new Float64Array(n);
  const Fs = new Float64Array(n);
  const known = new Float64Array(n);
  const F = input.viewFactors;
  let anchored = false; // a surface tied to a known temperature
  for (let i = 0; i < n; i++) {
    const c = input.conditions[i];
    const area = input.area[i];
    if (!(Number.isFinite(area) && area > 0))
      return exchangeFailure('length-out-of-range', { surface: i, value: area });
    const e = input.emissivity[i];
    if (c.kind === 'opening') {
      if (Ts === undefined) return exchangeFailure('opening-without-surroundings', { surface: i });
      eps[i] = 1;
      known[i] = Ts;
      anchored = true;
    } else if (!(Number.isFinite(e) && e > 0 && e <= 1)) {
      return exchangeFailure('emissivity-out-of-range', { surface: i, value: e });
    } else {
      eps[i] = e;
    }
    if (c.kind === 'temperature') {
      if (!(Number.isFinite(c.temperature) && c.temperature > 0)) {
        return exchangeFailure('temperature-out-of-range', { surface: i, value: c.temperature });
      }
      known[i] = c.temperature;
      anchored = true;
    } else if (c.kind === 'heatFlux') {
      if (!Number.isFinite(c.heatFlux))
        return exchangeFailure('heat-flux-not-finite', { surface: i, value: c.heatFlux });
    } else if (!['adiabatic', 'opening', 'wall', 'tube', 'linked'].includes(c.kind)) {
      return exchangeFailure('unknown-condition', { surface: i });
    }
    const problem = checkCondition(c, i, input.conditions);
    if (problem) return problem;
    if (c.kind === 'wall' || c.kind === 'tube' || h[i] > 0) anchored = true;
    const toSurroundings = surroundingsFactor(F, n, i);
    if (typeof toSurroundings !== 'number') return toSurroundings;
    if (toSurroundings > 0) {
      if (Ts === undefined) return exchangeFailure('open-without-surroundings', { surface: i, value: toSurroundings });
      Fs[i] = toSurroundings;
      anchored = true;
    }
  }
  if (n > 0 && !anchored) return exchangeFailure('no-fixed-temperature');
  return { n, eps, Fs, Es: Ts === undefined ? 0 : emissivePower(Ts), h, Tg: input.gasTemperature ?? 0, known };
}

/**
 * Where Newton starts, K: above every temperature the answer can have from
 * the known ones, and above what an imposed flux needs (sigma T^4 e >= q),
 * so the convex T^4 terms are approached from above.
 */
function startTemperature(input: BalanceInput, p: Prepared): number {
  let T = 0;
  let flux = 0;
  let minEps = 1;
  input.conditions.forEach((c, i) => {
    if (c.kind === 'temperature') T = Math.max(T, c.temperature);
    if (c.kind === 'wall') T = Math.max(T, c.outsideTemperature);
    if (c.kind === 'tube') T = Math.max(T, c.fluidTemperature);
    if (c.kind === 'heatFlux') flux += Math.abs(c.heatFlux) * input.area[i];
    if (c.kind !== 'opening') minEps = Math.min(minEps, p.eps[i]);
    if (p.Fs[i] > 0 || c.kind === 'opening') T = Math.max(T, input.surroundingsTemperature ?? 0);
    if (p.h[i] > 0) T = Math.max(T, p.Tg);
  });
  let minArea = Number.POSITIVE_INFINITY;
  for (let i = 0; i < input.area.length; i++) minArea = Math.min(minArea, input.area[i]);
  const needed = flux > 0 ? Math.sqrt(Math.sqrt(flux / (minArea * minEps * STEFAN_BOLTZMANN))) : 0;
  return Math.max(T, needed, 1);
}
