// The Newton matrix of the surface balance in emissive powers (solve.ts):
//   d r_a / d E_b = Z_ab - delta_ab (W_a - d_a),
// Z from nodes.ts (W per metre of depth per W/m^2), d_a the back and
// convection slope over dE/dT. Factored once per Newton step.
//
// Why two ways: Z = diag(A e) F M^-1 diag(e), summed over each node's faces,
// is symmetric when the factors are reciprocal (A_i F_ij = A_j F_ji), and
// every slope d_a is <= 0 (more heat leaves the back as a surface warms), so
// minus the matrix is symmetric and diagonally dominant: positive definite
// whenever the balance has a unique answer. Cholesky then does half the work
// of LU (Golub & Van Loan, 4th ed., sec. 4.2). The two triangles of Z differ
// by rounding, so their mean is factored: a Newton matrix good to ~1e-8 still
// converges, since every residual is computed exactly. Factors that break
// reciprocity, a matrix that is not positive definite, or a condition below
// the limit go to LU with partial pivoting, which also decides "singular".

import { DenseCholesky } from '../exchange/cholesky';
import { estimateInverseNormOne } from '../exchange/conditionEstimate';
import { DenseLuSolver } from '../exchange/linearSolve';

/** Reciprocal condition below which the Newton matrix counts as singular. */
export const NEWTON_MIN_RECIPROCAL_CONDITION = 1e-15;
/** Largest |Z_ab - Z_ba| / max(W_a, W_b) taken as rounding of a symmetric Z. */
const SYMMETRY_TOLERANCE = 1e-8;

export class NewtonMatrix {
  private readonly m: number;
  private readonly lu: DenseLuSolver;
  private readonly cholesky: DenseCholesky;
  /** Z is symmetric to rounding (decided once). */
  private readonly symmetricZ: boolean;
  /** The last factor() took Cholesky (else LU). */
  usedCholesky = false;
  private readonly scratch: Float64Array[];

  /** `solver`: an m x m solver whose memory is used (kept between solves); a new one otherwise. */
  constructor(
    private readonly Z: Float64Array,
    private readonly W: Float64Array,
    solver?: DenseLuSolver,
  ) {
    const m = W.length;
    this.m = m;
    this.lu = solver && solver.n === m ? solver : new DenseLuSolver(m);
    this.cholesky = new DenseCholesky(this.lu, m);
    this.scratch = [new Float64Array(m), new Float64Array(m), new Float64Array(m)];
    let symmetric = true;
    for (let a = 0; a < m && symmetric; a++) {
      for (let b = 0; b < a; b++) {
        const limit = SYMMETRY_TOLERANCE * Math.max(W[a], W[b]);
        if (!(Math.abs(Z[a * m + b] - Z[b * m + a]) <= limit)) {
          symmetric = false;
          break;
        }
      }
    }
    this.symmetricZ = symmetric;
  }

  /**
   * Factors the matrix for the diagonal slopes d (W per metre per W/m^2).
   * Throws LinearSolveError when it is singular or its reciprocal condition
   * is below NEWTON_MIN_RECIPROCAL_CONDITION (the LU's verdict).
   */
  factor(d: Float64Array): void {
    if (this.symmetricZ && this.factorSymmetric(d)) {
      this.usedCholesky = true;
      return;
    }
    this.usedCholesky = false;
    const { m, Z, W } = this;
    const J = this.lu.matrix;
    J.set(Z);
    for (let a = 0; a < m; a++) J[a * m + a] += d[a] - W[a];
    this.lu.factor({ minReciprocalCondition: NEWTON_MIN_RECIPROCAL_CONDITION });
  }

  /** x := (d r / d E)^-1 x after factor() (x in W per metre; the answer in W/m^2). */
  solve(x: Float64Array): Float64Array {
    if (!this.usedCholesky) return this.lu.solve(x);
    this.cholesky.solve(x);
    for (let a = 0; a < this.m; a++) x[a] = -x[a]; // the factors are of minus the matrix
    return x;
  }

  /** Cholesky of minus the matrix, Z averaged; false when it is not positive definite or too badly conditioned. */
  private factorSymmetric(d: Float64Array): boolean {
    const { m, Z, W, cholesky } = this;
    const S = cholesky.matrix;
    const column = this.scratch[0];
    column.fill(0);
    for (let a = 0; a < m; a++) {
      const ra = a * m;
      for (let b = 0; b < a; b++) {
        const v = -0.5 * (Z[ra + b] + Z[b * m + a]);
        S[ra + b] = v;
        column[a] += Math.abs(v);
        column[b] += Math.abs(v);
      }
      const diagonal = W[a] - d[a] - Z[ra + a];
      S[ra + a] = diagonal;
      column[a] += Math.abs(diagonal);
    }
    let norm = 0;
    for (let a = 0; a < m; a++) norm = Math.max(norm, column[a]);
    if (!(Number.isFinite(norm) && cholesky.factor())) return false;
    const [x, y, z] = this.scratch;
    const system = {
      n: m,
      solve: (v: Float64Array) => cholesky.solve(v),
      solveTransposed: (v: Float64Array) => cholesky.solve(v),
    };
    const inverse = estimateInverseNormOne(system, x, y, z);
    return norm > 0 && inverse > 0 && 1 / (norm * inverse) >= NEWTON_MIN_RECIPROCAL_CONDITION;
  }
}
