import { describe, expect, it } from 'vitest';
import { Matrix, inverse, solve as mlSolve } from 'ml-matrix';
import { LinearSolveError } from '../../src/core/exchange';
import { RadiositySystem } from '../../src/core/exchange/radiositySystem';
import { radiosityResidual } from '../../src/core/exchange/refine';
import { seeded } from './seeded';

// The radiosity system M = I - diag(w) F, solved by Cholesky of the scaled
// symmetric form when reciprocity holds and by LU otherwise. Oracle:
// ml-matrix's general solve and inverse of M itself (an independent package).
// Bounds: a solve that is backward stable has forward error within a small
// multiple of cond(M) u (Higham, Accuracy and Stability of Numerical
// Algorithms, 2nd ed., ch. 7); the condition estimate is a lower bound of the
// true 1-norm condition number, usually within a factor of 3 (Higham, ch. 15).
const U = 2 ** -53;

/**
 * An enclosure of n surfaces whose factors obey reciprocity: a random
 * symmetric exchange area A_i F_ij, rows closed (sum F_ij = 1) or, with
 * `open`, partly seeing the surroundings. Areas vary 1:100.
 */
function enclosure(n: number, seed: number, open = false) {
  const r = seeded(seed);
  const AF = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j <= i; j++) {
      // Some pairs see nothing of each other; neighbours always do, so every surface is connected.
      const v = j === i - 1 || r() > 0.3 ? 0.05 + r() : 0;
      AF[i * n + j] = v;
      AF[j * n + i] = v;
    }
  }
  const area = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) area[i] += AF[i * n + j];
    if (open) area[i] *= 1 + 0.3 * r();
  }
  const F = AF.map((v, k) => v / area[Math.floor(k / n)]);
  return { F, area };
}

function matrixM(F: Float64Array, w: ArrayLike<number>, n: number): number[][] {
  return Array.from({ length: n }, (_, i) =>
    Array.from({ length: n }, (_, j) => (i === j ? 1 : 0) - w[i] * F[i * n + j]),
  );
}

function normOne(rows: number[][]): number {
  let m = 0;
  for (let j = 0; j < rows.length; j++)
    m = Math.max(
      m,
      rows.reduce((s, row) => s + Math.abs(row[j]), 0),
    );
  return m;
}

function check(F: Float64Array, area: Float64Array, w: Float64Array, expectSymmetric: boolean) {
  const n = w.length;
  const system = new RadiositySystem(F, w, area);
  expect(system.symmetric).toBe(expectSymmetric);
  const rows = matrixM(F, w, n);
  const cond = normOne(rows) * normOne(inverse(new Matrix(rows)).to2DArray());
  expect(1 / system.reciprocalCondition).toBeLessThanOrEqual(cond * (1 + 1e-9));
  expect(1 / system.reciprocalCondition).toBeGreaterThan(cond / 3);
  const b = Float64Array.from({ length: n }, (_, i) => 1000 * (1 + Math.sin(i)));
  for (const transposed of [false, true]) {
    const A = transposed ? new Matrix(rows).transpose() : new Matrix(rows);
    const ref = mlSolve(A, Matrix.columnVector(Array.from(b))).to1DArray();
    const x = Float64Array.from(b);
    if (transposed) system.solveTransposed(x);
    else {
      system.solve(x);
      system.refine(x, radiosityResidual(F, w, x, b, new Float64Array(n)));
    }
    const big = Math.max(...ref.map(Math.abs));
    for (let i = 0; i < n; i++) expect(Math.abs(x[i] - ref[i])).toBeLessThanOrEqual(20 * n * U * cond * big);
  }
}

describe('the radiosity system, symmetric where reciprocity allows', () => {
  it('a closed enclosure with temperatures, fluxes and black surfaces: Cholesky, same answer as a general solve', () => {
    for (const n of [3, 12, 41, 97]) {
      const { F, area } = enclosure(n, n);
      const r = seeded(1000 + n);
      // w = 1 - e for temperatures, 1 for fluxes, 0 for black surfaces and openings.
      const w = Float64Array.from({ length: n }, (_, i) => (i % 5 === 0 ? 0 : i % 5 === 1 ? 1 : 0.05 + 0.9 * r()));
      check(F, area, w, true);
    }
  });

  it('an open section (rows sum below one), every surface gray', () => {
    const { F, area } = enclosure(60, 5, true);
    check(
      F,
      area,
      Float64Array.from({ length: 60 }, (_, i) => 0.2 + 0.01 * i),
      true,
    );
  });

  it('factors off reciprocity by rounding only still take Cholesky and refine to the unaveraged answer', () => {
    const { F, area } = enclosure(50, 9);
    const r = seeded(77);
    const G = F.map((f) => f * (1 + 4e-16 * (r() - 0.5)));
    check(
      G,
      area,
      Float64Array.from({ length: 50 }, (_, i) => (i % 2 ? 1 : 0.5)),
      true,
    );
  });

  it('factors that break reciprocity go to LU, which gives the same answer', () => {
    const { F, area } = enclosure(30, 3);
    const G = Float64Array.from(F);
    G[7 * 30 + 6] *= 1.01; // neighbours see each other: reciprocity off by 1%
    check(G, area, new Float64Array(30).fill(0.4), false);
  });

  it('only black surfaces: nothing to factor, J = b', () => {
    const { F, area } = enclosure(6, 2);
    const system = new RadiositySystem(F, new Float64Array(6), area);
    const x = Float64Array.from([1, 2, 3, 4, 5, 6]);
    expect(Array.from(system.solve(x))).toEqual([1, 2, 3, 4, 5, 6]);
    expect(system.reciprocalCondition).toBe(1);
  });

  it('a closed enclosure where every row is a flux has no unique answer and is refused', () => {
    const { F, area } = enclosure(20, 4);
    expect(() => new RadiositySystem(F, new Float64Array(20).fill(1), area)).toThrow(LinearSolveError);
  });

  it('a factor that is not finite is refused as such', () => {
    const { F, area } = enclosure(10, 6);
    F[3 * 10 + 4] = Number.NaN;
    try {
      new RadiositySystem(F, new Float64Array(10).fill(0.5), area);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(LinearSolveError);
      expect((e as LinearSolveError).problem).toBe('not-finite');
    }
  });
});
