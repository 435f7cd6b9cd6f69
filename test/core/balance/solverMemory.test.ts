import { describe, expect, it } from 'vitest';
import { solveBalance } from '../../../src/core/balance';
import { SolverMemory } from '../../../src/core/exchange';
import type { BalanceInput } from '../../../src/core/balance/types';
import { mixedSection } from '../../bench/balanceScene';

// Memory kept between solves must change nothing: the same bits as a solve with
// fresh memory, whatever was solved with it before (other sizes, the linear
// path, Newton with linked plates, whose nodes have two faces).
const classic = (n: number): BalanceInput => {
  const input = mixedSection(n, 5, 0.9);
  return {
    ...input,
    convectionCoefficient: undefined,
    conditions: input.conditions.map((_, i) =>
      i % 3 === 0
        ? { kind: 'temperature', temperature: 900 + i }
        : i % 3 === 1
          ? { kind: 'adiabatic' }
          : { kind: 'heatFlux', heatFlux: 50 * i },
    ),
  };
};

function bits(input: BalanceInput, memory?: SolverMemory): number[] {
  const out = solveBalance(input, memory);
  if (!out.ok) throw new Error(`refused: ${out.code}`);
  const r = out.result;
  return [...r.temperature, ...r.netHeat, ...r.radiosity, r.iterations];
}

describe('solver memory kept between balances', () => {
  it('gives the bits of fresh memory, in any order of sizes and kinds', () => {
    const cases = [
      mixedSection(120, 7, 0.95),
      classic(90),
      mixedSection(80, 2),
      mixedSection(120, 7, 0.95),
      classic(120),
    ];
    const fresh = cases.map((input) => bits(input));
    expect(cases[0].conditions.some((c) => c.kind === 'linked')).toBe(true);
    const memory = new SolverMemory();
    for (let round = 0; round < 2; round++) cases.forEach((input, k) => expect(bits(input, memory)).toEqual(fresh[k]));
  });
});
