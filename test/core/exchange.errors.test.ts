import { describe, expect, it } from 'vitest';
import {
  DEFAULT_EMISSIVITY,
  exchangeInputFor,
  solveExchange,
  type ExchangeFailure,
  type ExchangeInput,
  type SurfaceCondition,
} from '../../src/core/exchange';

// Out-of-range values and problems without a unique answer: each must be refused
// with a code, the index of the surface concerned and the number at fault
// (the wording is src/document's: test/document/exchange.messages.test.ts).

const T = (temperature: number): SurfaceCondition => ({ kind: 'temperature', temperature });
const ADIABATIC: SurfaceCondition = { kind: 'adiabatic' };

/** Two parallel plates (F = 1 each way): surface 0 'hot', surface 1 'cold'. */
function plates(over: Partial<ExchangeInput> = {}): ExchangeInput {
  return {
    viewFactors: [0, 1, 1, 0],
    area: [1, 1],
    emissivity: [0.8, 0.5],
    conditions: [T(900), T(300)],
    ...over,
  };
}

function refusal(input: ExchangeInput): ExchangeFailure {
  const outcome = solveExchange(input);
  if (outcome.ok) throw new Error('expected a refusal');
  return outcome;
}

describe('values out of range', () => {
  for (const e of [0, -0.1, 1.0000001, 2, Number.NaN, Number.POSITIVE_INFINITY]) {
    it(`emissivity ${e} is refused`, () => {
      expect(refusal(plates({ emissivity: [e, 0.5] }))).toEqual({
        ok: false,
        code: 'emissivity-out-of-range',
        surface: 0,
        value: e,
      });
    });
  }

  for (const t of [0, -20, Number.NaN, Number.POSITIVE_INFINITY]) {
    it(`temperature ${t} K is refused`, () => {
      expect(refusal(plates({ conditions: [T(900), T(t)] }))).toEqual({
        ok: false,
        code: 'temperature-out-of-range',
        surface: 1,
        value: t,
      });
    });
  }

  it('a non-finite heat flux is refused', () => {
    const f = refusal(plates({ conditions: [T(900), { kind: 'heatFlux', heatFlux: Number.NaN }] }));
    expect(f).toEqual({ ok: false, code: 'heat-flux-not-finite', surface: 1, value: Number.NaN });
  });

  it('an unknown condition is refused', () => {
    const odd = { kind: 'radiating' } as unknown as SurfaceCondition;
    expect(refusal(plates({ conditions: [T(900), odd] }))).toEqual({
      ok: false,
      code: 'unknown-condition',
      surface: 1,
    });
  });

  it('a surroundings temperature at or below 0 K is refused', () => {
    expect(refusal(plates({ surroundingsTemperature: 0 }))).toEqual({
      ok: false,
      code: 'surroundings-temperature-out-of-range',
      value: 0,
    });
  });

  it('a depth that is not a positive number of metres is refused', () => {
    expect(refusal(plates({ depth: -1 }))).toEqual({ ok: false, code: 'depth-out-of-range', value: -1 });
  });

  it('a zero length is refused', () => {
    expect(refusal(plates({ area: [0, 1] }))).toEqual({ ok: false, code: 'length-out-of-range', surface: 0, value: 0 });
  });

  it('view factors outside [0, 1] or rows summing above one are refused', () => {
    expect(refusal(plates({ viewFactors: [0, 1.2, 1, 0] }))).toEqual({
      ok: false,
      code: 'view-factor-out-of-range',
      surface: 0,
      other: 1,
      value: 1.2,
    });
    expect(refusal(plates({ viewFactors: [0, Number.NaN, 1, 0] }))).toMatchObject({
      code: 'view-factor-out-of-range',
      surface: 0,
      other: 1,
      value: Number.NaN,
    });
    const sum = refusal(plates({ viewFactors: [0.3, 0.9, 1, 0] }));
    expect(sum).toMatchObject({ code: 'view-factor-sum-above-one', surface: 0 });
    expect(sum.value).toBeCloseTo(1.2, 14);
  });

  it('arrays of the wrong size are refused', () => {
    expect(refusal(plates({ area: [1] }))).toEqual({ ok: false, code: 'area-size', value: 1, expected: 2 });
    expect(refusal(plates({ viewFactors: [0, 1, 1] }))).toEqual({
      ok: false,
      code: 'view-factors-size',
      value: 3,
      expected: 4,
    });
    expect(refusal(plates({ emissivity: [1, 1, 1] }))).toEqual({
      ok: false,
      code: 'emissivity-size',
      value: 3,
      expected: 2,
    });
  });
});

describe('no unique answer', () => {
  it('a closed enclosure where no surface has a temperature', () => {
    expect(refusal(plates({ conditions: [{ kind: 'heatFlux', heatFlux: 100 }, ADIABATIC] }))).toEqual({
      ok: false,
      code: 'no-fixed-temperature',
    });
  });

  it('an open sketch without a surroundings temperature names the surface and its view factor to the surroundings', () => {
    const f = refusal(plates({ viewFactors: [0, 0.6, 0.6, 0] }));
    expect(f).toMatchObject({ code: 'open-without-surroundings', surface: 0 });
    expect(f.value).toBeCloseTo(0.4, 14);
  });

  it('an opening without a surroundings temperature', () => {
    expect(refusal(plates({ conditions: [T(900), { kind: 'opening' }] }))).toEqual({
      ok: false,
      code: 'opening-without-surroundings',
      surface: 1,
    });
  });

  it('a group of surfaces that sees only itself and has no temperature (singular equations)', () => {
    // Two separate pairs of plates: the second pair is flux/adiabatic only.
    const F = [0, 1, 0, 0, 1, 0, 0, 0, 0, 0, 0, 1, 0, 0, 1, 0];
    const f = refusal({
      viewFactors: F,
      area: [1, 1, 1, 1],
      emissivity: [0.5, 0.5, 0.5, 0.5],
      conditions: [T(500), T(400), { kind: 'heatFlux', heatFlux: 10 }, ADIABATIC],
    });
    expect(f.code).toBe('singular');
    expect(f.value).toBeLessThan(1e-12); // reciprocal condition number
  });

  it('a flux that would need a temperature below absolute zero', () => {
    // A plate facing a 300 K plate cannot take up 1e6 W/m^2 by radiation: it receives sigma 300^4 = 459 W/m^2 at most.
    expect(refusal(plates({ conditions: [{ kind: 'heatFlux', heatFlux: -1e6 }, T(300)] }))).toEqual({
      ok: false,
      code: 'flux-below-absolute-zero',
      surface: 0,
      value: -1e6,
    });
  });
});

describe('defaults', () => {
  it('a surface with no condition or emissivity: emissivity 0.9, adiabatic', () => {
    expect(DEFAULT_EMISSIVITY).toBe(0.9);
    const input = exchangeInputFor({
      conditions: [T(1100), undefined],
      emissivity: [0.7, undefined],
      viewFactors: [0, 1, 1, 0],
      lengthMetres: [4, 4],
    });
    expect(Array.from(input.emissivity)).toEqual([0.7, 0.9]);
    expect(input.conditions).toEqual([T(1100), ADIABATIC]);
  });

  it('an opening is black whatever emissivity it was given', () => {
    // An opening stands for the surroundings seen through it, which absorb all they get: black (common practice).
    const input = exchangeInputFor({
      conditions: [{ kind: 'opening' }],
      emissivity: [0.3],
      viewFactors: [0],
      lengthMetres: [1],
      surroundingsTemperature: 300,
    });
    expect(input.emissivity[0]).toBe(1);
    expect(input.conditions[0]).toEqual({ kind: 'opening' });
  });
});
