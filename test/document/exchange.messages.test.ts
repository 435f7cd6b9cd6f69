import { describe, expect, it } from 'vitest';
import {
  solveExchange,
  type ExchangeFailure,
  type ExchangeInput,
  type SurfaceCondition,
} from '../../src/core/exchange';
import { exchangeFailureMessage } from '../../src/document/exchange/messages';
import { solveSketchExchange, type SketchExchangePart } from '../../src/document/exchangeInput';

// The words people read when an exchange is refused: each names the rule, the
// surface (by name) and the number at fault. The codes come from the core
// (test/core/exchange.errors.test.ts); here only their wording is checked.

const T = (temperature: number): SurfaceCondition => ({ kind: 'temperature', temperature });
const NAMES = ['hot', 'cold'];

function plates(over: Partial<ExchangeInput> = {}): ExchangeInput {
  return { viewFactors: [0, 1, 1, 0], area: [1, 1], emissivity: [0.8, 0.5], conditions: [T(900), T(300)], ...over };
}

function messageFor(input: ExchangeInput, names: readonly string[] | null = NAMES): string {
  const outcome = solveExchange(input);
  if (outcome.ok) throw new Error('expected a refusal');
  return exchangeFailureMessage(outcome, names ?? undefined);
}

describe('solver refusals in words', () => {
  it('values out of range name the surface, the rule and the value', () => {
    expect(messageFor(plates({ emissivity: [2, 0.5] }))).toBe("surface 'hot': emissivity must be in (0, 1], got 2");
    expect(messageFor(plates({ conditions: [T(900), T(-20)] }))).toBe(
      "surface 'cold': temperature must be a finite number of kelvin above 0, got -20",
    );
    expect(messageFor(plates({ conditions: [T(900), { kind: 'heatFlux', heatFlux: Number.NaN }] }))).toBe(
      "surface 'cold': heat flux must be a finite number of W/m^2, got NaN",
    );
    expect(messageFor(plates({ area: [0, 1] }))).toBe(
      "surface 'hot': length must be a finite number of metres above 0, got 0",
    );
    expect(messageFor(plates({ surroundingsTemperature: 0 }))).toBe(
      'surroundings temperature must be a finite number of kelvin above 0, got 0',
    );
    expect(messageFor(plates({ depth: -1 }))).toBe('depth must be a finite number of metres above 0, got -1');
  });

  it('view factors out of range name both surfaces', () => {
    expect(messageFor(plates({ viewFactors: [0, 1.2, 1, 0] }))).toBe(
      "view factor from surface 'hot' to surface 'cold' must be a number in [0, 1], got 1.2",
    );
    expect(messageFor(plates({ viewFactors: [0.3, 0.9, 1, 0] }))).toBe(
      "surface 'hot': view factors sum to 1.2, more than 1",
    );
  });

  it('without names, surfaces are counted from 1', () => {
    expect(messageFor(plates({ emissivity: [0.5, 7] }), null)).toBe('surface 2: emissivity must be in (0, 1], got 7');
  });

  it('problems without a unique answer say what to do', () => {
    expect(messageFor(plates({ conditions: [{ kind: 'heatFlux', heatFlux: 100 }, { kind: 'adiabatic' }] }))).toMatch(
      /^no unique answer: no surface has a temperature .* give at least one surface a temperature$/,
    );
    expect(messageFor(plates({ viewFactors: [0, 0.6, 0.6, 0] }))).toBe(
      "surface 'hot' sees the surroundings (view factor 0.400: the sketch is open), but no surroundings temperature is set",
    );
    expect(messageFor(plates({ conditions: [T(900), { kind: 'opening' }] }))).toBe(
      "surface 'cold' is an opening, but no surroundings temperature is set",
    );
    expect(messageFor(plates({ conditions: [{ kind: 'heatFlux', heatFlux: -1e6 }, T(300)] }))).toBe(
      "surface 'hot': no physical answer: the imposed heat flux of -1000000 W/m^2 would need a temperature below absolute zero (it takes up more than the surface can receive)",
    );
  });

  it('singular equations give the condition number and the cure', () => {
    const failure: ExchangeFailure = { ok: false, code: 'singular', value: 0 };
    expect(exchangeFailureMessage(failure)).toMatch(
      /^no unique answer: the radiosity equations are singular or nearly so \(reciprocal condition number about 0\.0e\+0\); check that every group/,
    );
  });

  it('names are quoted safely: control characters shown as ?, long names cut', () => {
    expect(messageFor(plates({ emissivity: [2, 0.5] }), ['a\nb', 'c'])).toBe(
      "surface 'a?b': emissivity must be in (0, 1], got 2",
    );
  });
});

describe('solveSketchExchange: a message and the surface index, never an exception', () => {
  const part = (
    surfaces: SketchExchangePart['surfaces'],
    settings?: SketchExchangePart['settings'],
  ): SketchExchangePart => ({ units: 'm', surfaces, settings });
  const factors = { F: [0, 1, 1, 0], surfaceLength: [1, 1] };

  it("two conditions on one surface are refused with the file check's words", () => {
    const outcome = solveSketchExchange(part({ cold: { temperature: 300, adiabatic: true } }), NAMES, factors);
    expect(outcome).toEqual({
      ok: false,
      message: "surface 'cold': give one condition, not temperature and adiabatic together",
      surface: 1,
    });
  });

  it('a solver refusal comes back worded, with its surface', () => {
    const outcome = solveSketchExchange(part({ hot: { temperature: 900 }, cold: { opening: true } }), NAMES, factors);
    expect(outcome).toEqual({
      ok: false,
      message: "surface 'cold' is an opening, but no surroundings temperature is set",
      surface: 1,
    });
  });

  it('a refusal without a surface has surface undefined', () => {
    // No properties: every surface is adiabatic by default, so no temperature anywhere.
    const outcome = solveSketchExchange(part({}), NAMES, factors);
    if (outcome.ok) throw new Error('a sketch with no temperature must be refused');
    expect(outcome.surface).toBeUndefined();
    expect(outcome.message).toMatch(
      /^no unique answer: no surface has a temperature .* give at least one surface a temperature$/,
    );
  });
});
