import { describe, expect, it } from 'vitest';
import { solveBalance, type BalanceInput, type BalanceResult } from '../../../src/core/balance';
import { solveExchange } from '../../../src/core/exchange';

// Limits the balance must reach, each against another solve whose answer is
// known to be that limit: the exchange solver of src/core/exchange (the
// net-radiation method written independently, radiation only) or the balance
// with the limiting condition itself.

function solved(input: BalanceInput): BalanceResult {
  const out = solveBalance(input);
  if (!out.ok) throw new Error(`expected a solution, got ${out.code}`);
  return out.result;
}

// A triangle-like three-surface enclosure with exact reciprocal factors (A_i F_ij = A_j F_ji, rows sum to 1).
const A = [3, 4, 5];
const f = (i: number, j: number) => (A[i] + A[j] - A[3 - i - j]) / (2 * A[i]); // crossed strings, Hottel
const F = [0, f(0, 1), f(0, 2), f(1, 0), 0, f(1, 2), f(2, 0), f(2, 1), 0];
const base = { viewFactors: F, area: A, emissivity: [0.7, 0.4, 0.8] };

describe('limits', () => {
  it('with radiation only it is the exchange solver, to rounding', () => {
    const conditions = [
      { kind: 'temperature' as const, temperature: 1200 },
      { kind: 'heatFlux' as const, heatFlux: -3000 },
      { kind: 'adiabatic' as const },
    ];
    const a = solved({ ...base, conditions });
    const b = solveExchange({ ...base, conditions });
    if (!b.ok) throw new Error(b.code);
    for (let i = 0; i < 3; i++) {
      expect(Math.abs(a.temperature[i] - b.result.temperature[i])).toBeLessThanOrEqual(1e-10 * b.result.temperature[i]);
      expect(Math.abs(a.netHeat[i] - b.result.netHeat[i])).toBeLessThanOrEqual(1e-10 * Math.abs(b.result.netHeat[0]));
    }
  });

  it('a wall whose resistance grows without bound tends to adiabatic', () => {
    const adiabatic = solved({
      ...base,
      conditions: [
        { kind: 'temperature', temperature: 1200 },
        { kind: 'adiabatic' },
        { kind: 'temperature', temperature: 400 },
      ],
    });
    let previous = Number.POSITIVE_INFINITY;
    for (const thickness of [1, 1e3, 1e6]) {
      const wall = {
        kind: 'wall' as const,
        layers: [{ thickness, conductivity: 0.1 }],
        outsideTemperature: 300,
        outsideCoefficient: 10,
      };
      const r = solved({
        ...base,
        conditions: [{ kind: 'temperature', temperature: 1200 }, wall, { kind: 'temperature', temperature: 400 }],
      });
      const gap = Math.abs(r.temperature[1] - adiabatic.temperature[1]);
      expect(gap).toBeLessThan(previous); // closer with every step
      previous = gap;
      // The loss is (T - 300)/R'' per m^2; it vanishes like 1/R''.
      expect(Math.abs(r.suppliedHeat[1])).toBeLessThanOrEqual((4 * (1200 - 300)) / (thickness / 0.1));
    }
    expect(previous).toBeLessThan(1e-3); // K, at R'' = 1e7 m^2 K/W
  });

  it('a tube with very large film and wall coefficients is a surface held at the fluid temperature', () => {
    const held = solved({
      ...base,
      conditions: [
        { kind: 'temperature', temperature: 1200 },
        { kind: 'temperature', temperature: 600 },
        { kind: 'adiabatic' },
      ],
    });
    const tube = {
      kind: 'tube' as const,
      fluidTemperature: 600,
      insideCoefficient: 1e12,
      outerDiameter: 0.1,
      innerDiameter: 0.08,
      wallConductivity: 1e12,
    };
    const r = solved({
      ...base,
      conditions: [{ kind: 'temperature', temperature: 1200 }, tube, { kind: 'adiabatic' }],
    });
    // R''_o ~ 1e-12 m^2 K/W: the metal sits within |q''| R''_o (~1e-8 K) of the fluid.
    expect(Math.abs(r.temperature[1] - 600)).toBeLessThan(1e-6);
    expect(Math.abs(r.netHeat[1] - held.netHeat[1])).toBeLessThanOrEqual(1e-8 * Math.abs(held.netHeat[1]));
    expect(Math.abs(r.innerTemperature[1] - 600)).toBeLessThan(1e-6);
  });

  it('a convection coefficient of 0 is the same as no convection, gas temperature or not', () => {
    const conditions = [
      { kind: 'temperature' as const, temperature: 1200 },
      { kind: 'heatFlux' as const, heatFlux: 500 },
      {
        kind: 'wall' as const,
        layers: [{ thickness: 0.2, conductivity: 1 }],
        outsideTemperature: 300,
        outsideCoefficient: 10,
      },
    ];
    const none = solved({ ...base, conditions });
    const zero = solved({ ...base, conditions, convectionCoefficient: [0, 0, 0], gasTemperature: 1600 });
    expect(Array.from(zero.temperature)).toEqual(Array.from(none.temperature));
    expect(Array.from(zero.netHeat)).toEqual(Array.from(none.netHeat));
    expect(Array.from(zero.convectionHeat)).toEqual([0, 0, 0]);
    expect(zero.gasConvectionHeat).toBe(0);
  });
});

describe('refusals are codes with the surface and the number', () => {
  const held = { kind: 'temperature' as const, temperature: 1000 };
  const wall = {
    kind: 'wall' as const,
    layers: [{ thickness: 0.2, conductivity: 1 }],
    outsideTemperature: 300,
    outsideCoefficient: 10,
  };
  const tube = {
    kind: 'tube' as const,
    fluidTemperature: 500,
    insideCoefficient: 500,
    outerDiameter: 0.1,
    innerDiameter: 0.08,
    wallConductivity: 40,
  };
  const refuse = (conditions: BalanceInput['conditions'], more: Partial<BalanceInput> = {}) => {
    const r = solveBalance({ ...base, conditions, ...more });
    if (r.ok) throw new Error('expected a refusal');
    return { code: r.code, surface: r.surface, value: r.value, layer: r.layer, other: r.other };
  };

  it('walls, tubes, links and convection out of range', () => {
    expect(refuse([held, { ...wall, layers: [] }, held])).toMatchObject({ code: 'wall-without-layers', surface: 1 });
    expect(
      refuse([held, { ...wall, layers: [wall.layers[0], { thickness: 0, conductivity: 1 }] }, held]),
    ).toMatchObject({ code: 'layer-thickness-out-of-range', surface: 1, layer: 1, value: 0 });
    expect(refuse([held, { ...wall, outsideEmissivity: 1.5 }, held])).toMatchObject({
      code: 'outside-emissivity-out-of-range',
      value: 1.5,
    });
    expect(refuse([held, held, { ...tube, innerDiameter: 0.1 }])).toMatchObject({
      code: 'inner-diameter-out-of-range',
      surface: 2,
      value: 0.1,
    });
    expect(refuse([held, { kind: 'linked', other: 2 }, held])).toMatchObject({
      code: 'link-not-mutual',
      surface: 1,
      other: 2,
    });
    expect(refuse([held, { kind: 'linked', other: 7 }, held])).toMatchObject({ code: 'link-not-mutual', surface: 1 });
    expect(refuse([held, wall, tube], { convectionCoefficient: [0, 5, 0] })).toMatchObject({
      code: 'convection-without-gas',
      surface: 1,
      value: 5,
    });
    expect(
      refuse([held, wall, { kind: 'opening' }], {
        convectionCoefficient: [0, 0, 5],
        gasTemperature: 900,
        surroundingsTemperature: 300,
      }),
    ).toMatchObject({ code: 'convection-on-opening', surface: 2 });
    expect(refuse([held, wall, tube], { convectionCoefficient: [0, -1, 0], gasTemperature: 900 })).toMatchObject({
      code: 'convection-out-of-range',
      surface: 1,
      value: -1,
    });
  });

  it('a closed enclosure tied to no known temperature has no unique answer, but a wall, a tube or convection is enough', () => {
    const flux = { kind: 'heatFlux' as const, heatFlux: 100 };
    expect(refuse([flux, { kind: 'adiabatic' }, flux]).code).toBe('no-fixed-temperature');
    expect(solveBalance({ ...base, conditions: [flux, { kind: 'adiabatic' }, wall] }).ok).toBe(true);
    expect(solveBalance({ ...base, conditions: [flux, { kind: 'adiabatic' }, tube] }).ok).toBe(true);
    const gas = { convectionCoefficient: [0, 10, 0], gasTemperature: 800 };
    expect(solveBalance({ ...base, conditions: [flux, { kind: 'adiabatic' }, flux], ...gas }).ok).toBe(true);
  });

  it('a surface that sees only itself and is tied to nothing known has no unique answer', () => {
    // Surface 1 sees only itself (F11 = 1): its net radiation is 0 whatever its temperature, so a supplied flux cannot balance.
    const r = solveBalance({
      viewFactors: [1, 0, 0, 1],
      area: [1, 1],
      emissivity: [0.5, 0.5],
      conditions: [held, { kind: 'heatFlux', heatFlux: 100 }],
    });
    expect(r.ok ? 'solved' : r.code).toBe('balance-singular');
  });

  it('a surface that must give off more than it receives is named, not answered', () => {
    expect(refuse([held, { kind: 'heatFlux', heatFlux: -1e7 }, { kind: 'adiabatic' }])).toMatchObject({
      code: 'flux-below-absolute-zero',
      surface: 1,
      value: -1e7,
    });
  });
});
