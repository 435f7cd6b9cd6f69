// The radiosity system M J = b with M = I - diag(w) F (w_i: the weight of
// surface i's irradiation in its row; F: view factors, n x n row-major), built
// and factored once, solved for any number of right-hand sides. Units: those
// of J and b (W/m^2); M is dimensionless.
//
// Rows with w_i = 0 (black surfaces, openings) say J_i = b_i and are taken out.
// Every other row, times A_i / w_i, reads
//   (A_i / w_i) J_i - sum_j A_i F_ij J_j = (A_i / w_i) b_i,
// whose matrix S is symmetric by reciprocity (A_i F_ij = A_j F_ji) and
// diagonally dominant (A_i / w_i >= A_i >= sum_j A_i F_ij), so positive
// definite when the system has a unique answer: it is factored by Cholesky
// (cholesky.ts), half the work of LU. The factored matrix is S with each pair
// averaged; the iterative refinement the callers do, with the residual of M
// itself, removes what the averaging changed, so long as that change is tiny
// next to S (checked: otherwise, and when S is not positive definite, M is
// factored by LU with partial pivoting, as before, and that decides whether
// the system is singular).

import { DenseCholesky } from './cholesky';
import { CholeskyRows } from './manyRightHandSides';
import type { SolverMemory } from './solverMemory';
import { estimateInverseNormOne, type FactoredSystem } from './conditionEstimate';
import { DEFAULT_MIN_RECIPROCAL_CONDITION, DenseLuSolver, LinearSolveError } from './linearSolve';

/**
 * Largest accepted estimate of ||M^-1|| ||diag(w/A) (S - averaged S)||_1, the
 * factor by which one refinement step shrinks the error the averaging leaves:
 * at 1e-9 one step brings J to the rounding of the unaveraged system.
 */
const MAX_AVERAGING_CONTRACTION = 1e-9;

/** Rows and columns per tile when S is built (both F_ij and F_ji are read by rows). */
const TILE = 64;

export class RadiositySystem implements FactoredSystem {
  readonly n: number;
  /** Estimated reciprocal 1-norm condition number of M (1 best, tiny = results uncertain). */
  readonly reciprocalCondition: number;
  /** True when the Cholesky factors of S are in use, false for LU of M. */
  readonly symmetric: boolean;
  private readonly lu: DenseLuSolver;
  private cholesky: DenseCholesky | null = null;
  /** Surfaces with w > 0 (the unknowns of S) and with w = 0 (J = b), each in order. */
  private readonly unknown: Int32Array;
  /** Each surface's row of S (-1: a known radiosity, J = b). */
  private readonly place: Int32Array;
  private readonly known: Int32Array;
  private readonly reduced: Float64Array;

  /**
   * Builds and factors M (throws LinearSolveError when it is singular,
   * ill-conditioned or not finite, as DenseLuSolver.factor does). F: n x n
   * view factors; w: row weights in [0, 1]; area: surface lengths, m (> 0).
   * `workspace`: an n x n solver whose memory is reused.
   */
  constructor(
    private readonly F: ArrayLike<number>,
    private readonly w: ArrayLike<number>,
    private readonly area: ArrayLike<number>,
    workspace?: DenseLuSolver,
  ) {
    const n = w.length;
    this.n = n;
    this.lu = workspace && workspace.n === n ? workspace : new DenseLuSolver(n);
    this.unknown = Int32Array.from({ length: n }, (_, i) => i).filter((i) => w[i] > 0);
    this.place = new Int32Array(n).fill(-1);
    this.unknown.forEach((i, a) => (this.place[i] = a));
    this.known = Int32Array.from({ length: n }, (_, i) => i).filter((i) => !(w[i] > 0));
    this.reduced = new Float64Array(this.unknown.length);

    const m = this.unknown.length;
    const symmetric = m > 0 ? this.factorSymmetric(new DenseCholesky(this.lu, m)) : null;
    this.symmetric = symmetric !== null;
    if (symmetric) {
      const { rcond } = symmetric;
      if (!(rcond >= DEFAULT_MIN_RECIPROCAL_CONDITION)) {
        throw new LinearSolveError('ill-conditioned', {
          reciprocalCondition: rcond,
          limit: DEFAULT_MIN_RECIPROCAL_CONDITION,
        });
      }
      this.reciprocalCondition = rcond;
      return;
    }
    // LU of M itself: no usable symmetry, or nothing to solve for.
    const M = this.lu.matrix;
    for (let i = 0; i < n; i++) {
      const ri = i * n;
      const wi = w[i];
      for (let j = 0; j < n; j++) M[ri + j] = -wi * F[ri + j];
      M[ri + i] += 1;
    }
    this.reciprocalCondition = this.lu.factor();
  }

  /**
   * Builds and factors S; keeps the factors (solve() then uses them) and returns
   * M's reciprocal condition when S is positive definite and the averaging's
   * change is small enough for one refinement step, else null (the LU is used).
   */
  private factorSymmetric(cholesky: DenseCholesky): { rcond: number } | null {
    const { normM, averaging } = this.buildScaled(cholesky.matrix);
    if (!(Number.isFinite(normM) && cholesky.factor())) return null;
    this.cholesky = cholesky; // the condition estimate below solves through it
    const n = this.n;
    const inverse = estimateInverseNormOne(this, new Float64Array(n), new Float64Array(n), new Float64Array(n));
    if (!(Number.isFinite(inverse) && inverse * averaging <= MAX_AVERAGING_CONTRACTION)) {
      this.cholesky = null;
      return null;
    }
    return { rcond: normM > 0 && inverse > 0 ? 1 / (normM * inverse) : 0 };
  }

  /** Solves M x = b: b (length n) is overwritten with x and returned. */
  solve(b: Float64Array): Float64Array {
    const chol = this.cholesky;
    if (!chol) return this.lu.solve(b);
    const { F, w, area, unknown, known, reduced, n } = this;
    // Known radiosities (w = 0) stay b; they move to the right-hand side of S.
    for (let a = 0; a < unknown.length; a++) {
      const i = unknown[a];
      const ri = i * n;
      let fromKnown = 0;
      for (let t = 0; t < known.length; t++) fromKnown += F[ri + known[t]] * b[known[t]];
      reduced[a] = area[i] * (b[i] / w[i] + fromKnown);
    }
    chol.solve(reduced);
    for (let a = 0; a < unknown.length; a++) b[unknown[a]] = reduced[a];
    return b;
  }

  /**
   * x_c = M^-1 (scale_c e_{cols[c]}) for every c, as the columns of an n x
   * cols.length row-major matrix (units of x per unit of scale): what solve()
   * gives column by column, to rounding. With the Cholesky factors the
   * columns are solved together (manyRightHandSides.ts).
   */
  solveColumns(cols: ArrayLike<number>, scale: ArrayLike<number>): Float64Array {
    const { n, cholesky: chol } = this;
    const u = cols.length;
    const X = new Float64Array(n * u);
    if (!chol) {
      const column = new Float64Array(n);
      for (let c = 0; c < u; c++) {
        column.fill(0);
        column[cols[c]] = scale[c];
        this.solve(column);
        for (let i = 0; i < n; i++) X[i * u + c] = column[i];
      }
      return X;
    }
    const { F, w, area, unknown, place } = this;
    const m = unknown.length;
    // One right-hand side of S per column, as solve() reduces it: b has only
    // b_k = scale at k = cols[c]; a known k moves to every unknown row.
    const rows = new Float64Array(u * m);
    for (let c = 0; c < u; c++) {
      const k = cols[c];
      const at = c * m;
      if (place[k] >= 0) rows[at + place[k]] = (area[k] * scale[c]) / w[k];
      else for (let a = 0; a < m; a++) rows[at + a] = area[unknown[a]] * F[unknown[a] * n + k] * scale[c];
      X[k * u + c] = place[k] >= 0 ? 0 : scale[c]; // a known row: J_k = b_k
    }
    new CholeskyRows(chol.matrix, m).solve(rows, u);
    for (let c = 0; c < u; c++) {
      const at = c * m;
      for (let a = 0; a < m; a++) X[unknown[a] * u + c] = rows[at + a];
    }
    return X;
  }

  /**
   * solveColumns at the rows of `cols` only: u x u row-major, entry (r, c) the
   * radiosity of surface cols[r] for scale_c e_{cols[c]} (the same to
   * rounding). With the Cholesky factors and every listed surface a row of S,
   * each column is solved only from its own row of S on and the rest taken
   * by the symmetry of S^-1, a third of the work (manyRightHandSides.ts).
   * With `memory` the answer is its 'columns' array (valid until that is handed out again).
   */
  solveColumnsAt(cols: ArrayLike<number>, scale: ArrayLike<number>, memory?: SolverMemory): Float64Array {
    const { cholesky: chol, w, area, unknown, place } = this;
    const u = cols.length;
    const out = memory ? memory.array('columns', u * u) : new Float64Array(u * u);
    let rowsOfS = chol !== null;
    for (let c = 0; c < u && rowsOfS; c++) rowsOfS = place[cols[c]] >= 0 && scale[c] !== 0;
    if (!chol || !rowsOfS) {
      const X = this.solveColumns(cols, scale);
      for (let r = 0; r < u; r++) out.set(X.subarray(cols[r] * u, cols[r] * u + u), r * u);
      return out;
    }
    const m = unknown.length;
    // Right-hand sides by their row of S, so each pass skips the most (its first nonzero is its lowest).
    const order = Int32Array.from({ length: u }, (_, c) => c).sort((p, q) => place[cols[p]] - place[cols[q]]);
    const at = new Int32Array(u); // column c's right-hand side is row at[c]
    const s = new Float64Array(u); // its one entry: area_k scale_c / w_k at place[k]
    const rows = memory ? memory.array('right-hand sides', u * m) : new Float64Array(u * m);
    order.forEach((c, r) => {
      const k = cols[c];
      at[c] = r;
      s[c] = (area[k] * scale[c]) / w[k];
      rows[r * m + place[k]] = s[c];
    });
    (memory ? memory.choleskyRows(chol.matrix, m) : new CholeskyRows(chol.matrix, m)).solve(rows, u, true);
    // In tiles: the reads run down the right-hand sides (rows of `rows`), the writes along rows of `out`.
    for (let r0 = 0; r0 < u; r0 += TILE) {
      for (let c0 = 0; c0 < u; c0 += TILE) {
        for (let r = r0; r < Math.min(u, r0 + TILE); r++) {
          const pr = place[cols[r]];
          for (let c = c0; c < Math.min(u, c0 + TILE); c++) {
            const pc = place[cols[c]];
            // x_r for column c is (S^-1)_{pr pc} s_c: solved where pr >= pc, else (S^-1)_{pc pr} from column r.
            out[r * u + c] = pr >= pc ? rows[at[c] * m + pr] : (rows[at[r] * m + pc] / s[r]) * s[c];
          }
        }
      }
    }
    return out;
  }

  /** Solves M^T x = b (for the condition estimate): b is overwritten with x and returned. */
  solveTransposed(b: Float64Array): Float64Array {
    const chol = this.cholesky;
    if (!chol) return this.lu.solveTransposed(b);
    const { F, w, area, unknown, known, reduced, n } = this;
    // Unknown rows: M_UU = diag(w/A) S, so M_UU^-T b = diag(A/w) S^-1 b (S symmetric).
    for (let a = 0; a < unknown.length; a++) reduced[a] = b[unknown[a]];
    chol.solve(reduced);
    for (let a = 0; a < unknown.length; a++) {
      const i = unknown[a];
      reduced[a] *= area[i] / w[i];
    }
    // Known rows: x_k = b_k + sum over unknowns i of w_i F_ik x_i (M_ik = -w_i F_ik).
    for (const k of known) {
      let s = b[k];
      for (let a = 0; a < unknown.length; a++) s += w[unknown[a]] * F[unknown[a] * n + k] * reduced[a];
      b[k] = s;
    }
    for (let a = 0; a < unknown.length; a++) b[unknown[a]] = reduced[a];
    return b;
  }

  /**
   * One step of iterative refinement after solve(): x += M^-1 r, where
   * r = b - M x is the residual the caller computed from F (units of x); r is
   * overwritten with the correction.
   */
  refine(x: Float64Array, residual: Float64Array): Float64Array {
    this.solve(residual);
    for (let i = 0; i < this.n; i++) x[i] += residual[i];
    return x;
  }

  /**
   * Writes the lower triangle of the averaged S into `s` (stride m), tile by
   * tile so that F_ij and F_ji are both read along rows. Returns the 1-norm of
   * M and ||diag(w/A) (S - averaged S)||_1 (NaN norm when an entry is not finite).
   */
  private buildScaled(s: Float64Array): { normM: number; averaging: number } {
    const { F, w, area, unknown, known, n } = this;
    const m = unknown.length;
    // Per unknown, in their order: area, weight, weight / area (typed, for the inner loop).
    const Au = Float64Array.from(unknown, (i) => area[i]);
    const wu = Float64Array.from(unknown, (i) => w[i]);
    const ratio = Float64Array.from(unknown, (i) => w[i] / area[i]);
    const columnM = new Float64Array(m); // column sums of |M| over the unknowns' columns
    const columnDelta = new Float64Array(m);
    for (let a0 = 0; a0 < m; a0 += TILE) {
      const a1 = Math.min(m, a0 + TILE);
      for (let b0 = 0; b0 <= a0; b0 += TILE) {
        const b1 = Math.min(m, b0 + TILE);
        for (let a = a0; a < a1; a++) {
          const i = unknown[a];
          const ri = i * n;
          const Ai = Au[a];
          const wi = wu[a];
          const ra = ratio[a];
          const sa = a * m;
          const last = Math.min(b1, a);
          let deltaA = 0;
          let sumA = 0;
          for (let b = b0; b < last; b++) {
            const j = unknown[b];
            const fij = F[ri + j];
            const fji = F[j * n + i];
            const sij = Ai * fij;
            const sji = Au[b] * fji;
            s[sa + b] = -0.5 * (sij + sji);
            const half = Math.abs(sij - sji) * 0.5;
            columnDelta[b] += ra * half;
            deltaA += ratio[b] * half;
            columnM[b] += wi * Math.abs(fij);
            sumA += wu[b] * Math.abs(fji);
          }
          columnDelta[a] += deltaA;
          columnM[a] += sumA;
          if (b0 <= a && a < b1) {
            const fii = F[ri + i];
            s[sa + a] = Ai / wi - Ai * fii;
            columnM[a] += Math.abs(1 - wi * fii);
          }
        }
      }
    }
    let normM = 0;
    const larger = (v: number) => (normM = v > normM || Number.isNaN(v) ? v : normM);
    for (let a = 0; a < m; a++) larger(columnM[a]);
    // Columns of known surfaces: 1 from their own row, w_i |F_ik| from each unknown row.
    for (const k of known) {
      let sum = 1;
      for (let a = 0; a < m; a++) sum += wu[a] * Math.abs(F[unknown[a] * n + k]);
      larger(sum);
    }
    let averaging = 0;
    for (let a = 0; a < m; a++) averaging = Math.max(averaging, columnDelta[a]);
    return { normM, averaging };
  }
}
