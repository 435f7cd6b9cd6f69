import { describe, expect, it } from 'vitest';
import { solveExchange, type ExchangeInput, type SurfaceCondition } from '../../../src/core/exchange';
import { netHeatSensitivity, type SensitivityParameter } from '../../../src/core/study';

// Derivatives from the linear system against central finite differences of the
// solver itself. Central differences with step h have truncation error
// h^2/6 |f'''|: for emissivity (h = 1e-4 on values of order 1) and temperature
// (h = 0.1 K at 300-1200 K, h/T <= 3e-4; f ~ T^4 gives f'''/f' ~ 6/T^2) that is
// below 1e-7 of the largest derivative, and rounding adds ~1e-16 |q'| / h
// (~1e-12 relative). So they must agree to 1e-6 of the largest derivative for that parameter.
const TOLERANCE = 1e-6;

// Unit square duct, sides 0 bottom, 1 right, 2 top, 3 left. Crossed strings
// (Hottel; Incropera et al., 6th ed., sec. 13.1.4): adjacent sides F = (1 + 1 - sqrt 2)/2,
// opposite sides F = (sqrt 2 + sqrt 2 - 2)/2.
const adj = 1 - Math.SQRT2 / 2;
const opp = Math.SQRT2 - 1;
const squareF = [0, adj, opp, adj, adj, 0, adj, opp, opp, adj, 0, adj, adj, opp, adj, 0];

function input(
  conditions: SurfaceCondition[],
  emissivity: number[],
  extra: Partial<ExchangeInput> = {},
): ExchangeInput {
  return { viewFactors: squareF, area: [0.5, 0.5, 0.5, 0.5], emissivity, conditions, ...extra };
}

function perturbed(base: ExchangeInput, p: SensitivityParameter, delta: number): ExchangeInput {
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

function netHeats(i: ExchangeInput): { q: Float64Array; s: number } {
  const out = solveExchange(i);
  if (!out.ok) throw new Error(out.code);
  return { q: out.result.netHeat, s: out.result.surroundingsNetHeat };
}

function checkAgainstDifferences(base: ExchangeInput) {
  const solved = solveExchange(base);
  expect(solved.ok).toBe(true);
  if (!solved.ok) return;
  const s = netHeatSensitivity(base, solved.result);
  expect(s.ok).toBe(true);
  if (!s.ok) return;
  s.parameters.forEach((p, row) => {
    const h = p.kind === 'emissivity' ? 1e-4 : 0.1;
    const up = netHeats(perturbed(base, p, h));
    const down = netHeats(perturbed(base, p, -h));
    const fd = Array.from(up.q, (v, i) => (v - down.q[i]) / (2 * h));
    fd.push((up.s - down.s) / (2 * h));
    const got = [...s.netHeat[row], s.surroundingsNetHeat[row]];
    const scale = Math.max(...fd.map(Math.abs));
    if (scale === 0) {
      // No effect at all (emissivity of a flux or adiabatic surface): the derivative is exactly zero too.
      expect(got.every((g) => g === 0)).toBe(true);
      return;
    }
    got.forEach((g, i) => expect(Math.abs(g - fd[i])).toBeLessThanOrEqual(TOLERANCE * scale));
  });
  return s;
}

describe('netHeatSensitivity against central differences', () => {
  it('closed duct: two temperatures, a flux and an adiabatic side', () => {
    const s = checkAgainstDifferences(
      input(
        [
          { kind: 'temperature', temperature: 1200 },
          { kind: 'heatFlux', heatFlux: -2000 },
          { kind: 'temperature', temperature: 400 },
          { kind: 'adiabatic' },
        ],
        [0.8, 0.6, 0.3, 0.5],
      ),
    );
    // Every emissivity and the two fixed temperatures; no surroundings.
    expect(s?.parameters.map((p) => p.kind)).toEqual([
      'emissivity',
      'emissivity',
      'emissivity',
      'emissivity',
      'temperature',
      'temperature',
    ]);
  });

  it('duct with one side an opening to surroundings at 300 K (surroundings temperature a parameter)', () => {
    const s = checkAgainstDifferences(
      input(
        [
          { kind: 'temperature', temperature: 900 },
          { kind: 'adiabatic' },
          { kind: 'opening' },
          { kind: 'temperature', temperature: 500 },
        ],
        [0.9, 0.4, 1, 0.7],
        { surroundingsTemperature: 300 },
      ),
    );
    expect(s?.parameters).toContainEqual({ kind: 'surroundingsTemperature' });
    expect(s?.parameters).not.toContainEqual({ kind: 'emissivity', surface: 2 });
  });

  it('open sketch: two facing strips that see the surroundings past their ends', () => {
    // Parallel strips of width 1 at distance 1: F = sqrt 2 - 1 (crossed strings), the rest to the surroundings.
    const F = [0, Math.SQRT2 - 1, Math.SQRT2 - 1, 0];
    checkAgainstDifferences({
      viewFactors: F,
      area: [1, 1],
      emissivity: [0.7, 0.2],
      conditions: [
        { kind: 'temperature', temperature: 800 },
        { kind: 'heatFlux', heatFlux: 500 },
      ],
      surroundingsTemperature: 290,
    });
  });
});
