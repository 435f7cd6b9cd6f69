// The unknowns of the surface balance ("nodes") and the radiation part of its
// Newton matrix, shared by the solver (solve.ts) and the derivatives of its answer
// (core/study/sensitivity.ts). Emissive powers in W/m^2, areas in m per metre of depth.
import type { BalanceCondition } from './conditions';
import type { SolverMemory } from '../exchange/solverMemory';
import type { RadiosityNetwork } from './radiosity';

/** Kinds whose temperature is solved for (their own node). */
const SOLVED_KINDS = new Set<BalanceCondition['kind']>(['heatFlux', 'adiabatic', 'wall', 'tube']);

/**
 * The unknowns of the balance ("nodes"), as lists of surface indices: one per
 * surface whose temperature is solved, one per linked plate (its two faces share
 * one temperature), in order of their first surface.
 */
export function balanceNodes(conditions: ReadonlyArray<BalanceCondition>): number[][] {
  const members: number[][] = [];
  conditions.forEach((c, i) => {
    if (SOLVED_KINDS.has(c.kind)) members.push([i]);
    else if (c.kind === 'linked' && c.other > i) members.push([i, c.other]);
  });
  return members;
}

/**
 * dG_i/dE_b for the surfaces `rows` and every node b (the node's faces share one
 * emissive power E_b): rows.length x nodes.length, row-major, dimensionless.
 */
export function nodeIrradiation(
  network: RadiosityNetwork,
  rows: ArrayLike<number>,
  nodes: ReadonlyArray<ReadonlyArray<number>>,
  memory?: SolverMemory,
): Float64Array {
  const unknown = Int32Array.from(nodes.flat());
  const Y = network.sensitivity(rows, unknown);
  const u = unknown.length;
  const m = nodes.length;
  // One surface per node, as is usual: dG/dE by node is Y itself.
  if (u === m) return Y;
  const out = memory ? memory.array('irradiation', rows.length * m) : new Float64Array(rows.length * m);
  for (let r = 0; r < rows.length; r++) {
    let col = 0;
    for (let b = 0; b < m; b++) {
      let dG = 0;
      for (let k = 0; k < nodes[b].length; k++) dG += Y[r * u + col + k];
      out[r * m + b] = dG;
      col += nodes[b].length;
    }
  }
  return out;
}

/**
 * The radiation part of the balance's Newton matrix in emissive powers:
 * d r_a / d E_b = Z_ab - delta_ab W_a (+ the back and convection slope on the
 * diagonal, which the caller adds), with Z_ab = sum_{i in a} A_i e_i dG_i/dE_b and
 * W_a = sum_{i in a} A_i e_i (W per metre of depth per W/m^2). `irradiation` is
 * nodeIrradiation over `rows`; `rowOf(i)` is surface i's row in it.
 */
export function nodeCoupling(
  irradiation: Float64Array,
  rowOf: (surface: number) => number,
  nodes: ReadonlyArray<ReadonlyArray<number>>,
  area: ArrayLike<number>,
  eps: ArrayLike<number>,
  memory?: SolverMemory,
): { Z: Float64Array; W: Float64Array } {
  const m = nodes.length;
  const Z = memory ? memory.array('coupling', m * m) : new Float64Array(m * m);
  const W = new Float64Array(m);
  for (let a = 0; a < m; a++) {
    for (const i of nodes[a]) {
      const w = area[i] * eps[i];
      W[a] += w;
      const r = rowOf(i) * m;
      for (let b = 0; b < m; b++) Z[a * m + b] += w * irradiation[r + b];
    }
  }
  return { Z, W };
}
