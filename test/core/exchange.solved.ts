import { solveExchange, type DenseLuSolver, type ExchangeInput, type ExchangeResult } from '../../src/core/exchange';

/** The result of a problem the test expects to be solved; a refusal fails the test with its code. */
export function solved(input: ExchangeInput, workspace?: DenseLuSolver): ExchangeResult {
  const outcome = solveExchange(input, workspace);
  if (!outcome.ok) throw new Error(`expected a solution, got the refusal ${JSON.stringify(outcome)}`);
  return outcome.result;
}
