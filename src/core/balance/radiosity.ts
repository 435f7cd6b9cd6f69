// The radiosity network of the whole surface balance, written so that its
// matrix does not depend on temperature: every surface's row is
//   J_i - (1 - e_i) G_i = e_i E_i,   G_i = sum_j F_ij J_j + F_i,s E_s,
// (openings: e = 1, E = E_s), so M = I - diag(1 - e) F is factored once per
// solve (exchange/radiositySystem.ts) and each new set of emissive powers
// E = sigma T^4 costs two triangular solves. Fluxes and powers in W/m^2.
import type { SolverMemory } from '../exchange/solverMemory';
import { RadiositySystem } from '../exchange/radiositySystem';
import { radiosityResidual } from '../exchange/refine';

export class RadiosityNetwork {
  readonly n: number;
  /** Estimated reciprocal condition number of M (dimensionless). */
  readonly reciprocalCondition: number;
  private readonly system: RadiositySystem;
  private readonly weight: Float64Array;
  private readonly rhs: Float64Array;
  private readonly residual: Float64Array;

  /**
   * Builds and factors M (throws LinearSolveError when it is singular or not
   * finite). F: n x n view factors row-major; area: surface lengths, m;
   * eps: emissivity (1 for openings); Fs: view factor to the surroundings;
   * Es: their emissive power, W/m^2. `memory`: kept memory for the
   * factors and the sensitivity's scratch (solverMemory.ts).
   */
  constructor(
    private readonly F: ArrayLike<number>,
    area: ArrayLike<number>,
    private readonly eps: Float64Array,
    private readonly Fs: Float64Array,
    private readonly Es: number,
    private readonly memory?: SolverMemory,
  ) {
    const n = eps.length;
    this.n = n;
    this.weight = eps.map((e) => 1 - e);
    this.rhs = new Float64Array(n);
    this.residual = new Float64Array(n);
    this.system = new RadiositySystem(F, this.weight, area, memory?.solver('radiosity', n));
    this.reciprocalCondition = this.system.reciprocalCondition;
  }

  /**
   * Radiosity J and irradiation G (W/m^2) for the emissive powers E (W/m^2);
   * J and G are overwritten. One step of iterative refinement (the residual
   * from F: the factors have overwritten M) makes every row hold to the
   * rounding of J itself, which is what the energy balance sums.
   */
  solve(E: Float64Array, J: Float64Array, G: Float64Array): void {
    const { n, eps, rhs } = this;
    for (let i = 0; i < n; i++) rhs[i] = eps[i] * E[i] + (1 - eps[i]) * this.Fs[i] * this.Es;
    J.set(rhs);
    this.system.solve(J);
    this.system.refine(J, radiosityResidual(this.F, this.weight, J, rhs, this.residual));
    this.irradiation(J, G);
  }

  /**
   * M x = b for any right-hand side (W/m^2, or its change per unit of a parameter),
   * in place: how the radiosities answer a change of the rows' sources.
   */
  solveRows(b: Float64Array): Float64Array {
    return this.system.solve(b);
  }

  /** G_i = sum_j F_ij J_j + F_i,s E_s (W/m^2) into G; `Es` defaults to the network's own (pass a change of it for a change of G). */
  irradiation(J: Float64Array, G: Float64Array, Es = this.Es): void {
    const { n, Fs, F } = this;
    for (let i = 0; i < n; i++) {
      const ri = i * n;
      let g = Fs[i] * Es;
      for (let j = 0; j < n; j++) g += F[ri + j] * J[j];
      G[i] = g;
    }
  }

  /**
   * dG_r/dE_c for the surfaces `rows` and `cols` (dimensionless, >= 0),
   * rows.length x cols.length row-major: F M^-1 diag(e) restricted to them.
   * X = M^-1 diag(e) costs about n^2 x cols.length, solved for all columns
   * together (radiositySystem.ts, solveColumns). Since
   * M X = diag(e) gives diag(1 - e) F X = X - diag(e), a row of F X is
   * (X_r - e_r delta_r)/(1 - e_r) where 1 - e_r is not small (the loss of digits is
   * 1/(1 - e_r), at most 1e3 here: harmless in a Jacobian, whose residual is
   * computed exactly); nearly black rows take the product with F.
   */
  sensitivity(rows: ArrayLike<number>, cols: ArrayLike<number>): Float64Array {
    const { n, eps, F } = this;
    const u = cols.length;
    if (this.onlyAmong(rows, cols)) {
      // Rows are the columns' own surfaces, none nearly black: M^-1 there only (solveColumnsAt).
      const Y = this.system.solveColumnsAt(
        cols,
        Float64Array.from(cols, (k) => eps[k]),
        this.memory,
      );
      for (let r = 0; r < u; r++) {
        const i = cols[r];
        const w = 1 - eps[i];
        for (let c = 0; c < u; c++) Y[r * u + c] = (Y[r * u + c] - (c === r ? eps[i] : 0)) / w;
      }
      return Y;
    }
    const X = this.inverseColumns(cols);
    const Y = new Float64Array(rows.length * u);
    for (let r = 0; r < rows.length; r++) {
      const i = rows[r];
      const yr = r * u;
      const w = 1 - eps[i];
      if (w >= 1e-3) {
        const xi = i * u;
        for (let c = 0; c < u; c++) Y[yr + c] = (X[xi + c] - (cols[c] === i ? eps[i] : 0)) / w;
        continue;
      }
      const fr = i * n;
      for (let k = 0; k < n; k++) {
        const f = F[fr + k];
        if (f === 0) continue;
        const xk = k * u;
        for (let c = 0; c < u; c++) Y[yr + c] += f * X[xk + c];
      }
    }
    return Y;
  }

  /** Are the rows the columns' surfaces, in the same order, with none nearly black (1 - e >= 1e-3)? */
  private onlyAmong(rows: ArrayLike<number>, cols: ArrayLike<number>): boolean {
    if (rows.length !== cols.length) return false;
    for (let r = 0; r < rows.length; r++) if (rows[r] !== cols[r] || 1 - this.eps[rows[r]] < 1e-3) return false;
    return true;
  }

  /** M^-1 diag(e) restricted to the columns `cols`: n x cols.length, row-major (all columns solved together). */
  private inverseColumns(cols: ArrayLike<number>): Float64Array {
    const { eps } = this;
    return this.system.solveColumns(
      cols,
      Float64Array.from(cols, (k) => eps[k]),
    );
  }
}
