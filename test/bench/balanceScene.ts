// A synthetic section for the surface balance, with exact view factors: a
// random symmetric matrix S (S_ij = A_i F_ij, reciprocal by construction) gives
// A_i = (sum_j S_ij) / closure, so F_ij = S_ij / A_i and each row sums to
// `closure` (1: closed; below 1: the rest goes to the surroundings). Used by
// the benchmark and by the property tests of src/core/balance.
import type { BalanceCondition, BalanceInput } from '../../src/core/balance';

/** A small seeded generator (mulberry32), so a benchmark is the same every run. */
export function seeded(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** View factors and lengths (m) of n surfaces; each row sums to `closure`. */
export function syntheticFactors(
  n: number,
  random: () => number,
  closure = 1,
): { F: Float64Array; area: Float64Array } {
  const S = new Float64Array(n * n);
  for (let i = 0; i < n; i++) {
    for (let j = i + 1; j < n; j++) {
      // Neighbours always see each other, so the section is one connected enclosure.
      const v = j !== i + 1 && random() < 0.3 ? 0 : 1e-3 + random() * random();
      S[i * n + j] = v;
      S[j * n + i] = v;
    }
    S[i * n + i] = random() < 0.5 ? 0 : 0.2 * random(); // a concave surface sees itself
  }
  const area = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    let s = 0;
    for (let j = 0; j < n; j++) s += S[i * n + j];
    if (s === 0) {
      S[i * n + i] = 0.5; // sees nothing else: let it see itself, so its row still sums to `closure`
      s = 0.5;
    }
    area[i] = s / closure;
  }
  const F = new Float64Array(n * n);
  for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) F[i * n + j] = S[i * n + j] / area[i];
  return { F, area };
}

/** One condition of every kind in turn (linked plates in pairs), with values of a furnace's order. */
export function mixedConditions(n: number, random: () => number): BalanceCondition[] {
  const c: BalanceCondition[] = [];
  for (let i = 0; i < n; i++) {
    const k = i % 8;
    if (k === 0) c.push({ kind: 'temperature', temperature: 900 + 600 * random() });
    else if (k === 1) c.push({ kind: 'heatFlux', heatFlux: 2e4 * random() });
    else if (k === 2) c.push({ kind: 'adiabatic' });
    else if (k === 3) {
      c.push({
        kind: 'wall',
        layers: [
          { thickness: 0.1 + 0.2 * random(), conductivity: 0.5 + random() },
          { thickness: 0.05 + 0.1 * random(), conductivity: 0.1 + 0.2 * random() },
        ],
        outsideTemperature: 290 + 20 * random(),
        outsideCoefficient: 5 + 10 * random(),
        ...(random() < 0.5 ? { outsideEmissivity: 0.3 + 0.6 * random() } : {}),
      });
    } else if (k === 4) {
      c.push({
        kind: 'tube',
        fluidTemperature: 400 + 300 * random(),
        insideCoefficient: 200 + 2000 * random(),
        outerDiameter: 0.1143,
        innerDiameter: 0.09 + 0.02 * random(),
        wallConductivity: 20 + 30 * random(),
      });
    } else if (k === 5 && i + 1 < n) {
      c.push({ kind: 'linked', other: i + 1 }, { kind: 'linked', other: i });
      i++;
    } else c.push({ kind: 'adiabatic' });
  }
  return c;
}

/** A section of n surfaces with every kind of condition, convection on about half of them. */
export function mixedSection(n: number, seed: number, closure = 1): BalanceInput {
  const random = seeded(seed);
  const { F, area } = syntheticFactors(n, random, closure);
  const conditions = mixedConditions(n, random);
  return {
    viewFactors: F,
    area,
    emissivity: Float64Array.from({ length: n }, () => 0.2 + 0.8 * random()),
    conditions,
    convectionCoefficient: Float64Array.from({ length: n }, () => (random() < 0.5 ? 30 * random() : 0)),
    gasTemperature: 1400,
    surroundingsTemperature: closure < 1 ? 300 : undefined,
  };
}
