// Memory kept between solves of systems of one size: the solvers' kernel memory
// and the n x n scratch arrays of the surface balance. Fresh memory is costly
// where pages are faulted in on first touch: 22 ms per 8 MB array (1012 x 1012
// doubles) on the development machine, against about 2 ms to clear a kept
// one; a Newton balance of 1012 surfaces made eight such arrays per solve.
// Whoever solves again and again (the app's exchange stage) keeps one of
// these per thread; every role's memory is handed to one user at a time.

import { CholeskyRows } from './manyRightHandSides';
import { DenseLuSolver } from './linearSolve';

/** What each kept piece of memory is for (one of each is kept). */
export type MemoryRole =
  | 'radiosity' // the radiosity system's solver (n), whose factors a later solve may take again
  | 'linear' // the classic balance's one system (n): its own, so it never overwrites those factors
  | 'newton' // the Newton matrix's solver (nodes)
  | 'right-hand sides' // many right-hand sides of the radiosity system
  | 'columns' // M^-1 among the unknown surfaces
  | 'irradiation' // dG/dE by node
  | 'coupling'; // the Newton matrix's radiation part

export class SolverMemory {
  private readonly solvers = new Map<MemoryRole, DenseLuSolver>();
  private readonly arrays = new Map<MemoryRole, Float64Array>();
  private rows: CholeskyRows | null = null;

  /** An n x n solver for `role`: the one kept, when of this size. */
  solver(role: MemoryRole, n: number): DenseLuSolver {
    const kept = this.solvers.get(role);
    if (kept && kept.n === n) return kept;
    const made = new DenseLuSolver(n);
    this.solvers.set(role, made);
    return made;
  }

  /** `length` zeros for `role`: the array kept, cleared, when of this length. */
  array(role: MemoryRole, length: number): Float64Array {
    const kept = this.arrays.get(role);
    if (kept && kept.length === length) return kept.fill(0);
    const made = new Float64Array(length);
    this.arrays.set(role, made);
    return made;
  }

  /** Many right-hand sides of an m x m Cholesky factor (copied in): the kept ones, when of this size. */
  choleskyRows(factor: Float64Array, m: number): CholeskyRows {
    if (this.rows && this.rows.n === m) return this.rows.load(factor);
    return (this.rows = new CholeskyRows(factor, m));
  }
}
