import { afterEach, describe, expect, it, vi } from 'vitest';
import { solveBalance } from '../../../src/core/balance';
import { RadiosityNetwork } from '../../../src/core/balance/radiosity';
import { SolverMemory } from '../../../src/core/exchange';
import type { BalanceCondition } from '../../../src/core/balance/conditions';
import type { BalanceInput } from '../../../src/core/balance/types';
import { mixedSection } from '../../bench/balanceScene';

// A balance solved with kept memory takes the factored network and the Newton
// coupling of the one before only when their numbers are the same: every
// answer has the bits of a solve with fresh memory, and a temperature edit
// solves no new network.

function bits(input: BalanceInput, memory?: SolverMemory): number[] {
  const out = solveBalance(input, memory);
  if (!out.ok) throw new Error(`refused: ${out.code}`);
  const r = out.result;
  return [...r.temperature, ...r.netHeat, ...r.radiosity, r.iterations];
}

/** The section with surface k's condition replaced. */
const withCondition = (input: BalanceInput, k: number, c: BalanceCondition): BalanceInput => ({
  ...input,
  conditions: input.conditions.map((old, i) => (i === k ? c : old)),
});

afterEach(() => vi.restoreAllMocks());

/** Every array of a result, as a worker hands them over (detached here afterwards). */
function resultBuffers(r: object): ArrayBuffer[] {
  const out = new Set<ArrayBuffer>();
  for (const v of Object.values(r)) if (v instanceof Float64Array && v.byteLength > 0) out.add(v.buffer as ArrayBuffer);
  return [...out];
}

describe('a balance solved with kept memory', () => {
  it('takes what it kept only for the same numbers, and has the bits of fresh memory', () => {
    const base = mixedSection(70, 11, 0.95);
    const held = base.conditions.findIndex((c) => c.kind === 'temperature');
    const adiabatic = base.conditions.findIndex((c) => c.kind === 'adiabatic');
    expect(held).toBeGreaterThanOrEqual(0);
    expect(adiabatic).toBeGreaterThanOrEqual(0);
    // The classic section on the same factors: solved as one linear system, with the same memory.
    const linear: BalanceInput = {
      ...base,
      convectionCoefficient: undefined,
      conditions: base.conditions.map((_, i) =>
        i % 3 === 0
          ? { kind: 'temperature', temperature: 800 + i }
          : i % 3 === 1
            ? { kind: 'adiabatic' }
            : { kind: 'heatFlux', heatFlux: 20 * i },
      ),
    };
    // The same array of factors refilled with other numbers (the app reuses matrices): exchange moved
    // round a cycle of four surfaces, so rows, reciprocity, lengths and emissivities stay as they were.
    const n = base.area.length;
    const refilled = Float64Array.from(base.viewFactors);
    const moved = () => {
      const A = base.area;
      const F0 = base.viewFactors;
      const sees = (i: number, j: number) => F0[i * n + j] > 0;
      let cycle = [0, 0, 0, 0];
      for (let a = 0; a < n && cycle[0] === cycle[1]; a++)
        for (let b = a + 1; b < n; b++)
          if (sees(a, b)) {
            const c = [...Array(n).keys()].find((x) => x > a && x !== b && sees(b, x));
            const e =
              c === undefined
                ? undefined
                : [...Array(n).keys()].find((x) => x > a && x !== b && x !== c && sees(c, x) && sees(x, a));
            if (c !== undefined && e !== undefined) {
              cycle = [a, b, c, e];
              break;
            }
          }
      expect(new Set(cycle).size).toBe(4);
      const d = 0.2 * Math.min(...cycle.map((i, k) => A[i] * refilled[i * n + cycle[(k + 1) % 4]]));
      cycle.forEach((i, k) => {
        const j = cycle[(k + 1) % 4];
        const sign = k % 2 === 0 ? 1 : -1;
        refilled[i * n + j] += (sign * d) / A[i];
        refilled[j * n + i] += (sign * d) / A[j];
      });
      expect(refilled).not.toEqual(Float64Array.from(F0));
      return { ...base, viewFactors: refilled };
    };
    // Made when their turn comes (the refilled factors change in place). Each check follows a step it could wrongly reuse.
    const steps: (() => BalanceInput)[] = [
      () => base,
      () => withCondition(base, held, { kind: 'temperature', temperature: 1111 }), // a temperature: all kept
      () => ({ ...base, gasTemperature: 1250 }), // the gas: all kept
      () => withCondition(base, adiabatic, { kind: 'temperature', temperature: 950 }), // other unknowns: a new coupling
      () => base,
      () => linear, // one linear system, in a solver of its own
      () => base, // the kept network, untouched by it
      () => ({ ...base, viewFactors: refilled }), // the same numbers in another array: kept
      moved, // the same array, other numbers: a new network
      () => base,
      () => ({ ...base, emissivity: Array.from(base.emissivity, (e, i) => (i === 3 ? e * 0.9 : e)) }),
      () => base,
      () => ({ ...base, area: Array.from(base.area, (a, i) => (i === 0 ? a * 1.1 : a)) }),
      () => base,
      () => ({ ...base, surroundingsTemperature: 320 }),
      () => ({
        ...base,
        convectionCoefficient: undefined,
        conditions: base.conditions.map(() => ({ kind: 'adiabatic' })),
      }), // refused
      () => base,
    ];
    const memory = new SolverMemory();
    for (const step of steps) {
      const input = step();
      const fresh = solveBalance(input);
      // The caller's arrays are its own: a copy of them, refilled and handed away after the solve, as the app may.
      const own: BalanceInput = {
        ...input,
        viewFactors: Float64Array.from(input.viewFactors),
        emissivity: Float64Array.from(input.emissivity),
      };
      const kept = solveBalance(own, memory);
      expect(kept.ok).toBe(fresh.ok);
      (own.viewFactors as Float64Array).fill(Number.NaN);
      (own.emissivity as Float64Array).fill(Number.NaN);
      if (kept.ok) structuredClone(kept.result, { transfer: resultBuffers(kept.result) });
      if (fresh.ok) expect(bits(input, memory)).toEqual(bits(input));
    }
  });

  it('solves no new network or coupling for a temperature edit', () => {
    const base = mixedSection(60, 4, 0.95);
    const held = base.conditions.findIndex((c) => c.kind === 'temperature');
    const memory = new SolverMemory();
    const sensitivity = vi.spyOn(RadiosityNetwork.prototype, 'sensitivity');
    solveBalance(base, memory);
    expect(sensitivity).toHaveBeenCalledTimes(1);
    for (const T of [900, 1000, 1100])
      solveBalance(withCondition(base, held, { kind: 'temperature', temperature: T }), memory);
    expect(sensitivity).toHaveBeenCalledTimes(1);
    solveBalance({ ...base, emissivity: Array.from(base.emissivity, (e) => e * 0.95) }, memory);
    expect(sensitivity).toHaveBeenCalledTimes(2);
  });
});
