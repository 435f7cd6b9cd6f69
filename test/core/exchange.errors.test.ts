import { describe, expect, it } from 'vitest';
import { ExchangeError, solveExchange, type ExchangeInput, type SurfaceCondition } from '../../src/core/exchange';
import { DEFAULT_EMISSIVITY, conditionOf, exchangeInputFor } from '../../src/core/exchangeSetup';

// Out-of-range values and problems without a unique answer: each must be refused
// with a message that names the surface and the rule.

const T = (temperature: number): SurfaceCondition => ({ kind: 'temperature', temperature });
const ADIABATIC: SurfaceCondition = { kind: 'adiabatic' };

/** Two parallel plates (F = 1 each way), names 'hot' and 'cold'. */
function plates(over: Partial<ExchangeInput> = {}): ExchangeInput {
  return {
    viewFactors: [0, 1, 1, 0],
    area: [1, 1],
    emissivity: [0.8, 0.5],
    conditions: [T(900), T(300)],
    names: ['hot', 'cold'],
    ...over,
  };
}

function refusal(input: ExchangeInput): ExchangeError {
  try {
    solveExchange(input);
  } catch (e) {
    if (e instanceof ExchangeError) return e;
    throw e;
  }
  throw new Error('expected an ExchangeError');
}

describe('values out of range', () => {
  for (const e of [0, -0.1, 1.0000001, 2, Number.NaN, Number.POSITIVE_INFINITY]) {
    it(`emissivity ${e} is refused`, () => {
      const err = refusal(plates({ emissivity: [e, 0.5] }));
      expect(err.message).toMatch(/surface 'hot': emissivity must be in \(0, 1\]/);
      expect(err.surface).toBe(0);
    });
  }

  for (const t of [0, -20, Number.NaN, Number.POSITIVE_INFINITY]) {
    it(`temperature ${t} K is refused`, () => {
      const err = refusal(plates({ conditions: [T(900), T(t)] }));
      expect(err.message).toMatch(/surface 'cold': temperature must be a finite number of kelvin above 0/);
      expect(err.surface).toBe(1);
    });
  }

  it('a non-finite heat flux is refused', () => {
    const err = refusal(plates({ conditions: [T(900), { kind: 'heatFlux', heatFlux: Number.NaN }] }));
    expect(err.message).toMatch(/surface 'cold': heat flux must be a finite number/);
  });

  it('a surroundings temperature at or below 0 K is refused', () => {
    expect(refusal(plates({ surroundingsTemperature: 0 })).message).toMatch(/surroundings temperature must be .* above 0/);
  });

  it('a depth that is not a positive number of metres is refused', () => {
    expect(refusal(plates({ depth: -1 })).message).toMatch(/depth must be a finite number of metres above 0/);
  });

  it('a zero or missing length is refused', () => {
    expect(refusal(plates({ area: [0, 1] })).message).toMatch(/surface 'hot': length must be .* above 0/);
  });

  it('view factors outside [0, 1] or rows summing above one are refused', () => {
    expect(refusal(plates({ viewFactors: [0, 1.2, 1, 0] })).message).toMatch(/view factor from surface 'hot' to surface 'cold' must be a number in \[0, 1\]/);
    expect(refusal(plates({ viewFactors: [0.3, 0.9, 1, 0] })).message).toMatch(/surface 'hot': view factors sum to 1.2, more than 1/);
    expect(refusal(plates({ viewFactors: [0, Number.NaN, 1, 0] })).message).toMatch(/must be a number in \[0, 1\], got NaN/);
  });

  it('arrays of the wrong size are refused', () => {
    expect(refusal(plates({ area: [1] })).message).toMatch(/area has 1 entries, expected 2/);
    expect(refusal(plates({ viewFactors: [0, 1, 1] })).message).toMatch(/viewFactors has 3 entries, expected 4/);
  });

  it('without names, messages give the surface number', () => {
    expect(refusal(plates({ names: undefined, emissivity: [0.5, 7] })).message).toMatch(/^surface 1: emissivity/);
  });
});

describe('no unique answer', () => {
  it('a closed enclosure where no surface has a temperature', () => {
    const err = refusal(plates({ conditions: [{ kind: 'heatFlux', heatFlux: 100 }, ADIABATIC] }));
    expect(err.message).toMatch(/no unique answer: no surface has a temperature/);
  });

  it('an open sketch without a surroundings temperature', () => {
    const err = refusal(plates({ viewFactors: [0, 0.6, 0.6, 0] }));
    expect(err.message).toMatch(/surface 'hot' sees the surroundings \(view factor 0.400: the sketch is open\), but no surroundings temperature is set/);
  });

  it('an opening without a surroundings temperature', () => {
    const err = refusal(plates({ conditions: [T(900), { kind: 'opening' }] }));
    expect(err.message).toMatch(/surface 'cold' is an opening, but no surroundings temperature is set/);
  });

  it('a group of surfaces that sees only itself and has no temperature (singular equations)', () => {
    // Two separate pairs of plates: the second pair is flux/adiabatic only.
    const F = [0, 1, 0, 0, 1, 0, 0, 0, 0, 0, 0, 1, 0, 0, 1, 0];
    const err = refusal({
      viewFactors: F,
      area: [1, 1, 1, 1],
      emissivity: [0.5, 0.5, 0.5, 0.5],
      conditions: [T(500), T(400), { kind: 'heatFlux', heatFlux: 10 }, ADIABATIC],
    });
    expect(err.message).toMatch(/no unique answer: the radiosity equations are singular or nearly so/);
  });

  it('a flux that would need a temperature below absolute zero', () => {
    // A plate facing a 300 K plate cannot take up 1e6 W/m^2 by radiation.
    const err = refusal(plates({ conditions: [{ kind: 'heatFlux', heatFlux: -1e6 }, T(300)] }));
    expect(err.message).toMatch(/surface 'hot': no physical answer: the imposed heat flux of -1000000 W\/m\^2 would need a temperature below absolute zero/);
  });
});

describe('defaults and conditions from surface properties', () => {
  it('a surface with no properties: emissivity 0.9, adiabatic', () => {
    expect(DEFAULT_EMISSIVITY).toBe(0.9);
    const input = exchangeInputFor({
      names: ['floor', 'roof'],
      properties: { floor: { temperature: 1100, emissivity: 0.7 } },
      viewFactors: [0, 1, 1, 0],
      lengthMetres: [4, 4],
    });
    expect(Array.from(input.emissivity)).toEqual([0.7, 0.9]);
    expect(input.conditions).toEqual([T(1100), ADIABATIC]);
  });

  it('an opening is black whatever emissivity it was given', () => {
    // An opening stands for the surroundings seen through it, which absorb all they get: black (common practice).
    const input = exchangeInputFor({
      names: ['gap'],
      properties: { gap: { opening: true, emissivity: 0.3 } },
      viewFactors: [0],
      lengthMetres: [1],
      surroundingsTemperature: 300,
    });
    expect(input.emissivity[0]).toBe(1);
    expect(input.conditions[0]).toEqual({ kind: 'opening' });
  });

  it('two conditions on one surface are refused', () => {
    expect(() => conditionOf('wall', { temperature: 400, adiabatic: true })).toThrow(/surface 'wall': give one condition, not temperature and adiabatic together/);
    expect(conditionOf('wall', { adiabatic: false, heatFlux: 5 })).toEqual({ kind: 'heatFlux', heatFlux: 5 });
  });

  it('inherited object keys are not surface properties', () => {
    const input = exchangeInputFor({ names: ['constructor'], properties: {}, viewFactors: [0], lengthMetres: [1], surroundingsTemperature: 300 });
    expect(input.conditions[0]).toEqual(ADIABATIC);
  });
});
