import { describe, expect, it } from 'vitest';
import { solveBalance, type BalanceCondition, type BalanceInput } from '../../../src/core/balance';
import { netHeatSensitivity, type SensitivityParameter } from '../../../src/core/study';

// Derivatives of the whole surface balance (walls, tubes, a linked plate,
// convection on surfaces whose temperature is solved) against central finite
// differences of the balance solver itself. Steps and tolerance as in
// sensitivity.test.ts: truncation (h^2/6 |f'''|) below 1e-7 of the largest
// derivative; the solver converges to 1e-10 of sum A J and is then polished to
// rounding, so a difference carries ~1e-13 |q| / h. Agreement to 1e-6 of the
// largest derivative of each parameter.
const TOLERANCE = 1e-6;

// Unit square duct, sides 0 bottom, 1 right, 2 top, 3 left (crossed strings,
// Incropera et al., 6th ed., sec. 13.1.4): adjacent F = 1 - sqrt2/2, opposite sqrt2 - 1.
const adj = 1 - Math.SQRT2 / 2;
const opp = Math.SQRT2 - 1;
const squareF = [0, adj, opp, adj, adj, 0, adj, opp, opp, adj, 0, adj, adj, opp, adj, 0];

function perturbed(base: BalanceInput, p: SensitivityParameter, delta: number): BalanceInput {
  if (p.kind === 'emissivity') {
    const e = Array.from(base.emissivity);
    e[p.surface] += delta;
    return { ...base, emissivity: e };
  }
  if (p.kind === 'temperature') {
    const conditions = base.conditions.map((c, i) =>
      i === p.surface && c.kind === 'temperature' ? { ...c, temperature: c.temperature + delta } : c,
    );
    return { ...base, conditions };
  }
  return { ...base, surroundingsTemperature: base.surroundingsTemperature! + delta };
}

function netHeats(input: BalanceInput): number[] {
  const out = solveBalance(input);
  if (!out.ok) throw new Error(out.code);
  return [...out.result.netHeat, out.result.surroundingsNetHeat];
}

function checkAgainstDifferences(base: BalanceInput) {
  const solved = solveBalance(base);
  expect(solved.ok).toBe(true);
  if (!solved.ok) return null;
  const s = netHeatSensitivity(base, solved.result);
  expect(s.ok).toBe(true);
  if (!s.ok) return null;
  s.parameters.forEach((p, row) => {
    const h = p.kind === 'emissivity' ? 1e-4 : 0.1;
    const up = netHeats(perturbed(base, p, h));
    const down = netHeats(perturbed(base, p, -h));
    const fd = up.map((v, i) => (v - down[i]) / (2 * h));
    const got = [...s.netHeat[row], s.surroundingsNetHeat[row]];
    const scale = Math.max(...fd.map(Math.abs));
    expect(scale).toBeGreaterThan(0);
    got.forEach((g, i) => expect(Math.abs(g - fd[i])).toBeLessThanOrEqual(TOLERANCE * scale));
  });
  return s;
}

const wall: BalanceCondition = {
  kind: 'wall',
  layers: [
    { thickness: 0.23, conductivity: 1.1 },
    { thickness: 0.115, conductivity: 0.25 },
  ],
  outsideTemperature: 300,
  outsideCoefficient: 10,
};

describe('netHeatSensitivity of the whole surface balance against central differences', () => {
  it('a duct with a held floor, a lined wall, a tube and a wall that also radiates from its casing', () => {
    const s = checkAgainstDifferences({
      viewFactors: squareF,
      area: [0.5, 0.5, 0.5, 0.5],
      emissivity: [0.85, 0.7, 0.8, 0.6],
      conditions: [
        { kind: 'temperature', temperature: 1250 },
        wall,
        {
          kind: 'tube',
          fluidTemperature: 650,
          insideCoefficient: 900,
          outerDiameter: 0.1143,
          innerDiameter: 0.1023,
          wallConductivity: 25,
        },
        { ...wall, outsideEmissivity: 0.8 },
      ],
    });
    expect(s?.parameters.map((p) => p.kind)).toEqual([
      'emissivity',
      'emissivity',
      'emissivity',
      'emissivity',
      'temperature',
    ]);
  });

  it('convection to a gas on surfaces whose temperature is solved (a flux and an adiabatic side)', () => {
    checkAgainstDifferences({
      viewFactors: squareF,
      area: [0.5, 0.5, 0.5, 0.5],
      emissivity: [0.9, 0.5, 0.7, 0.4],
      conditions: [
        { kind: 'temperature', temperature: 1100 },
        { kind: 'heatFlux', heatFlux: -3000 },
        { kind: 'temperature', temperature: 600 },
        { kind: 'adiabatic' },
      ],
      convectionCoefficient: [15, 8, 0, 20],
      gasTemperature: 1000,
    });
  });

  it('a thin plate across two facing strips (linked faces) in an open sketch', () => {
    // Three parallel strips of width 1, 1 apart: hot, plate (two faces), cold. Each face sees
    // only its neighbour strip: F = sqrt 2 - 1 (crossed strings), the rest to the surroundings.
    const f = Math.SQRT2 - 1;
    // Surfaces: 0 hot, 1 plate face to hot, 2 plate face to cold, 3 cold.
    const F = [0, f, 0, 0, f, 0, 0, 0, 0, 0, 0, f, 0, 0, f, 0];
    const s = checkAgainstDifferences({
      viewFactors: F,
      area: [1, 1, 1, 1],
      emissivity: [0.9, 0.3, 0.6, 0.8],
      conditions: [
        { kind: 'temperature', temperature: 1000 },
        { kind: 'linked', other: 2 },
        { kind: 'linked', other: 1 },
        { kind: 'temperature', temperature: 400 },
      ],
      surroundingsTemperature: 300,
    });
    expect(s?.parameters).toContainEqual({ kind: 'surroundingsTemperature' });
  });
});
