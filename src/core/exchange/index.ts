// Gray-diffuse heat exchange: the net-radiation solver, its defaults, its
// failure codes, and the dense linear solver under it.
export {
  CLOSURE_TOLERANCE,
  STEFAN_BOLTZMANN,
  emissivePower,
  solveExchange,
  temperatureOfEmissivePower,
  type ExchangeInput,
  type ExchangeOutcome,
  type ExchangeResult,
  type SurfaceCondition,
} from './exchange';
export { exchangeFailure, type ExchangeFailure, type ExchangeFailureCode } from './failures';
export { DEFAULT_CONDITION, DEFAULT_EMISSIVITY, exchangeInputFor, type ExchangeSetup } from './setup';
export { DEFAULT_MIN_RECIPROCAL_CONDITION, DenseLuSolver, LinearSolveError, solveLinearSystem } from './linearSolve';
export type { FactorOptions, LinearSolution, LinearSolveProblem, SolverOptions } from './linearSolve';
export { SolverMemory } from './solverMemory';
