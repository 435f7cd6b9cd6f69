import { describe, expect, it } from 'vitest';
import { solveBalance, type BalanceInput } from '../../src/core/balance';
import type { ExchangeFailureCode } from '../../src/core/exchange';
import { exchangeFailureMessage } from '../../src/document/exchange/messages';

// The surface balance's refusals in words: each names the surface (by name),
// the field as the file writes it, and the number at fault.

const NAMES = ['hearth', 'roof', 'tube 1'];
const base: BalanceInput = {
  viewFactors: [0, 0.5, 0.5, 0.5, 0, 0.5, 0.5, 0.5, 0],
  area: [1, 1, 1],
  emissivity: [0.9, 0.8, 0.7],
  conditions: [{ kind: 'temperature', temperature: 1400 }, { kind: 'adiabatic' }, { kind: 'adiabatic' }],
};
const wall = {
  kind: 'wall' as const,
  layers: [{ thickness: 0.2, conductivity: 1 }],
  outsideTemperature: 300,
  outsideCoefficient: 10,
};
const tube = {
  kind: 'tube' as const,
  fluidTemperature: 600,
  insideCoefficient: 900,
  outerDiameter: 0.1,
  innerDiameter: 0.08,
  wallConductivity: 40,
};

function messageFor(over: Partial<BalanceInput>): string {
  const out = solveBalance({ ...base, ...over });
  if (out.ok) throw new Error('expected a refusal');
  return exchangeFailureMessage(out, NAMES);
}

describe('balance refusals in words', () => {
  it('name the surface, the field and the value', () => {
    expect(
      messageFor({
        conditions: [base.conditions[0], { ...wall, layers: [{ thickness: 0.2, conductivity: 0 }] }, wall],
      }),
    ).toBe("surface 'roof': wall.layers[1].conductivity must be a number of W/(m·K) above 0, got 0");
    expect(messageFor({ conditions: [base.conditions[0], wall, { ...tube, innerDiameter: 0.12 }] })).toBe(
      "surface 'tube 1': tube.innerDiameter must be above 0 and below the outer diameter (0.1 m), got 0.12",
    );
    expect(messageFor({ convectionCoefficient: [0, 12, 0] })).toBe(
      "surface 'roof': convectionCoefficient 12 W/(m²·K) needs a gas temperature; set settings.gasTemperature",
    );
    expect(messageFor({ conditions: [base.conditions[0], { kind: 'linked', other: 2 }, wall] })).toBe(
      "surface 'roof': linked to surface 'tube 1', which is not linked back to it (a plate has two faces, each linked once)",
    );
  });

  it('every balance code has its own words (none falls back to the code)', () => {
    const codes: ExchangeFailureCode[] = [
      'convection-out-of-range',
      'convection-on-opening',
      'convection-without-gas',
      'gas-temperature-out-of-range',
      'wall-without-layers',
      'layer-thickness-out-of-range',
      'layer-conductivity-out-of-range',
      'outside-temperature-out-of-range',
      'outside-coefficient-out-of-range',
      'outside-emissivity-out-of-range',
      'fluid-temperature-out-of-range',
      'inside-coefficient-out-of-range',
      'tube-conductivity-out-of-range',
      'outer-diameter-out-of-range',
      'inner-diameter-out-of-range',
      'link-not-mutual',
      'balance-singular',
      'no-convergence',
      'balance-below-absolute-zero',
    ];
    for (const code of codes) {
      const words = exchangeFailureMessage({ ok: false, code, surface: 0, value: 1, expected: 2 }, NAMES);
      expect(words).not.toContain(code);
      expect(words.length).toBeGreaterThan(20);
    }
  });
});
