// Why a linear system was refused: a code and the numbers involved, no wording
// (src/document/exchange/messages.ts words the exchange failures built on it).

export type LinearSolveProblem = 'singular' | 'ill-conditioned' | 'not-finite' | 'not-factored' | 'bad-size';

export interface LinearSolveDetail {
  /** Estimated reciprocal 1-norm condition number (0 when exactly singular). */
  reciprocalCondition?: number;
  /** The reciprocal condition number below which the system was refused. */
  limit?: number;
  /** Row (equation) concerned, from 0; for a right-hand side, its entry. */
  row?: number;
  /** Column concerned, from 0 (a singular pivot, a non-finite entry). */
  column?: number;
  /** The offending number (an entry, a size). */
  value?: number;
  /** The size wanted. */
  expected?: number;
}

/** Thrown for a system with no unique, trustworthy solution, or a misuse; `problem` says which kind. Its message is the code. */
export class LinearSolveError extends Error {
  readonly problem: LinearSolveProblem;
  /** Estimated reciprocal 1-norm condition number (0 when exactly singular, NaN when unknown). */
  readonly reciprocalCondition: number;
  readonly detail: Readonly<LinearSolveDetail>;
  constructor(problem: LinearSolveProblem, detail: LinearSolveDetail = {}) {
    super(problem);
    this.name = 'LinearSolveError';
    this.problem = problem;
    this.reciprocalCondition = detail.reciprocalCondition ?? Number.NaN;
    this.detail = detail;
  }
}
