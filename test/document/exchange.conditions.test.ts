import { describe, expect, it } from 'vitest';
import { STEFAN_BOLTZMANN as SIGMA } from '../../src/core/exchange';
import { conditionCount, conditionOf, conditionProps, givenConditions } from '../../src/document/exchange/conditions';
import { sketchExchangeInput, solveSketchExchange } from '../../src/document/exchangeInput';
import { restore } from '../../src/document';
import { METRES_PER_UNIT, UNITS, unitFactor } from '../../src/document/units';

// The rule "at most one condition per surface", the defaults, and the file's
// lengths in metres: the document's side of heat exchange.

describe('at most one condition per surface', () => {
  it('reads each condition from the file keys; false flags are no condition', () => {
    expect(conditionOf({ temperature: 400 })).toEqual({
      ok: true,
      condition: { kind: 'temperature', temperature: 400 },
    });
    expect(conditionOf({ heatFlux: -5 })).toEqual({ ok: true, condition: { kind: 'heatFlux', heatFlux: -5 } });
    expect(conditionOf({ adiabatic: true })).toEqual({ ok: true, condition: { kind: 'adiabatic' } });
    expect(conditionOf({ opening: true })).toEqual({ ok: true, condition: { kind: 'opening' } });
    expect(conditionOf({ adiabatic: false, heatFlux: 5 })).toEqual({
      ok: true,
      condition: { kind: 'heatFlux', heatFlux: 5 },
    });
    expect(conditionOf({})).toEqual({ ok: true, condition: undefined });
    expect(conditionOf(undefined)).toEqual({ ok: true, condition: undefined });
  });

  it('two or more are refused, listing them in file order', () => {
    expect(conditionOf({ opening: true, temperature: 400 })).toEqual({ ok: false, kinds: ['temperature', 'opening'] });
    expect(conditionCount({ temperature: 1, heatFlux: 2, adiabatic: true, opening: true })).toBe(4);
    expect(conditionCount({ emissivity: 0.5 } as never)).toBe(0);
  });

  it('conditionProps writes exactly the key conditionOf reads back', () => {
    // The file keys of each condition (README, "The sketch file"), written out here.
    const cases = [
      [{ kind: 'temperature', temperature: 350 }, { temperature: 350 }],
      [{ kind: 'heatFlux', heatFlux: 0 }, { heatFlux: 0 }],
      [{ kind: 'adiabatic' }, { adiabatic: true }],
      [{ kind: 'opening' }, { opening: true }],
    ] as const;
    for (const [c, props] of cases) {
      expect(conditionProps(c)).toEqual(props);
      expect(givenConditions(conditionProps(c))).toEqual([c]);
    }
  });

  it('the file check and the solver input apply the same rule with the same words', () => {
    const file = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [1, 0],
            [1, 1],
            [0, 1],
          ],
          surface: ['floor', 'wall', 'wall', 'wall'],
        },
      ],
      surfaces: { floor: { temperature: 300, heatFlux: 100 } },
    };
    const restored = restore(file);
    expect(restored.ok).toBe(false);
    const fileMessages = restored.ok ? [] : restored.errors.map((e) => (typeof e === 'string' ? e : e.message));
    const solve = solveSketchExchange({ units: 'm', surfaces: file.surfaces }, ['floor', 'wall'], {
      F: [0, 1, 0.25, 0.75],
      surfaceLength: [1, 3],
    });
    if (solve.ok) throw new Error('two conditions on one surface must be refused');
    // The words, written out here, rather than one output checked against the other only.
    const words = "surface 'floor': give one condition, not temperature and heatFlux together";
    expect(solve.message).toBe(words);
    expect(fileMessages).toContain(words);
  });
});

describe('defaults and units', () => {
  it('a surface with no properties: emissivity 0.9, adiabatic; an opening is black; inherited keys are not properties', () => {
    const prepared = sketchExchangeInput(
      {
        units: 'm',
        surfaces: { floor: { temperature: 1100, emissivity: 0.7 }, gap: { opening: true, emissivity: 0.3 } },
        settings: { surroundingsTemperature: 300 },
      },
      ['floor', 'roof', 'gap', 'constructor'],
      { F: new Array(16).fill(0), surfaceLength: [1, 1, 1, 1] },
    );
    if (!prepared.ok) throw new Error(prepared.code);
    expect(Array.from(prepared.input.emissivity)).toEqual([0.7, 0.9, 1, 0.9]);
    expect(prepared.input.conditions).toEqual([
      { kind: 'temperature', temperature: 1100 },
      { kind: 'adiabatic' },
      { kind: 'opening' },
      { kind: 'adiabatic' },
    ]);
  });

  it('lengths in file units become metres (inch and foot exact by definition, 1959)', () => {
    expect(METRES_PER_UNIT).toEqual({ m: 1, cm: 0.01, mm: 0.001, in: 0.0254, ft: 0.3048 });
    expect(unitFactor('ft', 'in')).toBeCloseTo(12, 12);
    for (const u of UNITS) {
      const prepared = sketchExchangeInput({ units: u, surfaces: {} }, ['a'], { F: [0], surfaceLength: [2] });
      if (!prepared.ok) throw new Error(prepared.code);
      expect(prepared.input.area[0]).toBe(2 * METRES_PER_UNIT[u]);
    }
  });

  it('a strip in open space, drawn in inches: q = e sigma A (T^4 - Ts^4) with A in metres', () => {
    // Small convex object in large surroundings (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., eq. 1.7).
    const outcome = solveSketchExchange(
      {
        units: 'in',
        surfaces: { bar: { emissivity: 0.55, temperature: 700 } },
        settings: { surroundingsTemperature: 295 },
      },
      ['bar'],
      { F: [0], surfaceLength: [10] },
    );
    if (!outcome.ok) throw new Error(outcome.message);
    const q = 0.55 * SIGMA * (10 * 0.0254) * (700 ** 4 - 295 ** 4);
    expect(Math.abs(outcome.result.netHeat[0] - q)).toBeLessThanOrEqual(1e-12 * q);
  });
});
