import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { Matrix, solve as mlSolve } from 'ml-matrix';
import {
  STEFAN_BOLTZMANN as SIGMA,
  emissivePower,
  type ExchangeInput,
  type SurfaceCondition,
} from '../../src/core/exchange';
import { solved } from './exchange.solved';

// Random well-posed problems, an independent solve in another formulation,
// and the conservation / reciprocity properties any exchange solution has.
// The solve is exact to rounding; 1e-9 relative leaves room for the
// conditioning of random enclosures (cond up to ~1e4) and nothing else.
const REL = 1e-9;

/**
 * Independent oracle: the net-radiation equations written in net flux q and
 * emissive power E_b instead of radiosity (Modest, Radiative Heat Transfer,
 * 3rd ed., ch. 5, the gray-diffuse enclosure equations in q and E_b; form
 * from memory), substituting J_j = E_j - (1/e_j - 1) q_j into
 * q_i = J_i - sum_j F_ij J_j - F_is E_s:
 *   sum_j [delta_ij / e_j - F_ij (1/e_j - 1)] q_j = sum_j (delta_ij - F_ij) E_j - F_is E_s.
 * Unknown per surface: q_j where T is given, E_j where q is given. Solved with ml-matrix.
 */
function oracle(input: ExchangeInput): { q: number[]; T: number[] } {
  const n = input.conditions.length;
  const F = (i: number, j: number) => input.viewFactors[i * n + j];
  const Ts = input.surroundingsTemperature;
  const Es = Ts === undefined ? 0 : SIGMA * Ts ** 4;
  const eps = input.conditions.map((c, i) => (c.kind === 'opening' ? 1 : input.emissivity[i]));
  const knownE = input.conditions.map((c) =>
    c.kind === 'temperature' ? SIGMA * c.temperature ** 4 : c.kind === 'opening' ? Es : undefined,
  );
  const knownQ = input.conditions.map((c) =>
    c.kind === 'heatFlux' ? c.heatFlux : c.kind === 'adiabatic' ? 0 : undefined,
  );
  const A = Matrix.zeros(n, n);
  const b = Matrix.zeros(n, 1);
  for (let i = 0; i < n; i++) {
    let rowSum = 0;
    for (let j = 0; j < n; j++) rowSum += F(i, j);
    let rhs = -(1 - rowSum) * Es;
    for (let j = 0; j < n; j++) {
      const d = i === j ? 1 : 0;
      const cq = d / eps[j] - F(i, j) * (1 / eps[j] - 1); // coefficient of q_j
      const cE = -(d - F(i, j)); // coefficient of E_j moved to the left: cq q_j + cE E_j = rhs
      if (knownE[j] !== undefined) {
        A.set(i, j, cq);
        rhs -= cE * knownE[j]!;
      } else {
        A.set(i, j, cE);
        rhs -= cq * knownQ[j]!;
      }
    }
    b.set(i, 0, rhs);
  }
  const x = mlSolve(A, b).to1DArray();
  const q = x.map((v, j) => (knownE[j] !== undefined ? v : knownQ[j]!));
  const T = x.map((v, j) => ((knownE[j] ?? v) / SIGMA) ** 0.25);
  return { q, T };
}

interface Problem {
  input: ExchangeInput;
  open: boolean;
}

/**
 * A random valid enclosure: symmetric non-negative exchange areas S_ij = A_i F_ij
 * (reciprocity by construction), A_i = sum_j S_ij (+ S_is to the surroundings
 * when open), F_ij = S_ij / A_i (summation). A ring of links keeps every
 * surface connected; S_ii > 0 makes a concave surface.
 */
const problemArb = (options: { allowFlux?: boolean; allowOpening?: boolean } = {}): fc.Arbitrary<Problem> =>
  fc
    .record({
      n: fc.integer({ min: 2, max: 9 }),
      open: fc.boolean(),
      seed: fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 100, maxLength: 100 }),
      kinds: fc.array(fc.integer({ min: 0, max: 9 }), { minLength: 9, maxLength: 9 }),
      eps: fc.array(fc.double({ min: 0.02, max: 1, noNaN: true }), { minLength: 9, maxLength: 9 }),
      temps: fc.array(fc.double({ min: 250, max: 2000, noNaN: true }), { minLength: 10, maxLength: 10 }),
      fluxes: fc.array(fc.double({ min: 0, max: 5e4, noNaN: true }), { minLength: 9, maxLength: 9 }),
      black: fc.array(fc.boolean(), { minLength: 9, maxLength: 9 }),
    })
    .map(({ n, open, seed, kinds, eps, temps, fluxes, black }) => {
      let k = 0;
      const next = () => seed[k++ % seed.length];
      const S = Array.from({ length: n }, () => new Array<number>(n).fill(0));
      for (let i = 0; i < n; i++) {
        for (let j = i; j < n; j++) {
          const v = next() < 0.3 ? 0 : next();
          S[i][j] = S[j][i] = v;
        }
        const ring = 0.05 + next();
        S[i][(i + 1) % n] += i === (i + 1) % n ? 0 : ring;
        S[(i + 1) % n][i] = S[i][(i + 1) % n];
      }
      const toSurr = Array.from({ length: n }, () => (open ? 0.05 + next() : 0));
      const area = S.map((row, i) => row.reduce((a, b) => a + b, 0) + toSurr[i]);
      const F = S.flatMap((row, i) => row.map((v) => v / area[i]));
      const conditions: SurfaceCondition[] = [];
      for (let i = 0; i < n; i++) {
        const kind = i === 0 ? 0 : kinds[i];
        if (kind <= 3) conditions.push({ kind: 'temperature', temperature: temps[i] });
        else if (kind <= 5 && options.allowFlux !== false) conditions.push({ kind: 'heatFlux', heatFlux: fluxes[i] });
        else if (kind === 9 && options.allowOpening) conditions.push({ kind: 'opening' });
        else conditions.push({ kind: 'adiabatic' });
      }
      const emissivity = eps.slice(0, n).map((e, i) => (black[i] ? 1 : e));
      const surroundings = open || conditions.some((c) => c.kind === 'opening') ? temps[9] : undefined;
      return { input: { viewFactors: F, area, emissivity, conditions, surroundingsTemperature: surroundings }, open };
    });

const maxAbs = (xs: ArrayLike<number>) => Array.from(xs).reduce((m, v) => Math.max(m, Math.abs(v)), 0);
/** Rounding scale of heat per metre: the largest radiated power A_i J_i (net heats can cancel to 0; this cannot). */
const heatScale = (area: ArrayLike<number>, J: ArrayLike<number>) => maxAbs(Array.from(J, (v, i) => v * area[i]));

describe('against an independent solve (ml-matrix, q-E_b formulation)', () => {
  it('a mixed case: temperature, flux, adiabatic, black and an opening, open to the surroundings', () => {
    // Five surfaces of an invented kiln section, with exchange areas chosen by hand.
    const S = [
      [0.0, 0.9, 0.4, 0.3, 0.2],
      [0.9, 0.3, 0.5, 0.1, 0.4],
      [0.4, 0.5, 0.0, 0.6, 0.1],
      [0.3, 0.1, 0.6, 0.0, 0.3],
      [0.2, 0.4, 0.1, 0.3, 0.0],
    ];
    const toSurr = [0.2, 0, 0.1, 0, 0.3];
    const area = S.map((row, i) => row.reduce((a, b) => a + b, 0) + toSurr[i]);
    const input: ExchangeInput = {
      viewFactors: S.flatMap((row, i) => row.map((v) => v / area[i])),
      area,
      emissivity: [0.85, 0.4, 1, 0.6, 0.3],
      conditions: [
        { kind: 'temperature', temperature: 1250 },
        { kind: 'heatFlux', heatFlux: -3000 },
        { kind: 'temperature', temperature: 450 },
        { kind: 'adiabatic' },
        { kind: 'opening' },
      ],
      surroundingsTemperature: 310,
    };
    const r = solved(input);
    const ref = oracle(input);
    for (let i = 0; i < 5; i++) {
      expect(Math.abs(r.netFlux[i] - ref.q[i])).toBeLessThanOrEqual(REL * maxAbs(ref.q));
      expect(Math.abs(r.temperature[i] - ref.T[i])).toBeLessThanOrEqual(REL * ref.T[i]);
    }
    expect(r.energyBalance).toBeLessThan(REL);
  });

  it('random problems agree (fast-check)', () => {
    fc.assert(
      fc.property(problemArb({ allowOpening: true }), ({ input }) => {
        const r = solved(input);
        const ref = oracle(input);
        const qScale = maxAbs(r.radiosity); // fluxes are differences of radiosities
        for (let i = 0; i < input.conditions.length; i++) {
          expect(Math.abs(r.netFlux[i] - ref.q[i])).toBeLessThanOrEqual(REL * qScale);
          expect(Math.abs(r.temperature[i] - ref.T[i])).toBeLessThanOrEqual(REL * ref.T[i]);
        }
      }),
      { numRuns: 200 },
    );
  });
});

describe('properties of every solution (random problems)', () => {
  it('energy is conserved: sum of net heat including the surroundings is zero (first law; common practice)', () => {
    fc.assert(
      fc.property(problemArb({ allowOpening: true }), ({ input }) => {
        const r = solved(input);
        const sum = Array.from(r.netHeat).reduce((a, b) => a + b, r.surroundingsNetHeat);
        expect(Math.abs(sum)).toBeLessThanOrEqual(REL * heatScale(input.area, r.radiosity));
        // The reported ratio: tiny whenever net heats stand above rounding, and never noise/noise.
        const largest = Math.max(maxAbs(r.netHeat), Math.abs(r.surroundingsNetHeat));
        if (largest > 1e-6 * heatScale(input.area, r.radiosity)) expect(r.energyBalance).toBeLessThan(1e-6);
        expect(r.energyBalance).toBeLessThan(1e-5);
      }),
      { numRuns: 200 },
    );
  });

  it('the exchange matrix is antisymmetric and its rows add up to each net heat (reciprocity A_i F_ij = A_j F_ji; Incropera, sec. 13.1)', () => {
    fc.assert(
      fc.property(problemArb({ allowOpening: true }), ({ input }) => {
        const r = solved(input);
        const n = r.surfaceCount;
        const scale = heatScale(input.area, r.radiosity);
        for (let i = 0; i < n; i++) {
          let row = r.surroundingsExchange[i];
          for (let j = 0; j < n; j++) {
            expect(Math.abs(r.exchange[i * n + j] + r.exchange[j * n + i])).toBeLessThanOrEqual(REL * scale);
            row += r.exchange[i * n + j];
          }
          expect(Math.abs(row - r.netHeat[i])).toBeLessThanOrEqual(REL * scale);
        }
      }),
      { numRuns: 200 },
    );
  });

  it('every condition holds, checked from J alone: J - G = q, J = e E + (1 - e) G', () => {
    fc.assert(
      fc.property(problemArb({ allowOpening: true }), ({ input }) => {
        const r = solved(input);
        const n = r.surfaceCount;
        const Es = input.surroundingsTemperature === undefined ? 0 : emissivePower(input.surroundingsTemperature);
        const Jscale = maxAbs(r.radiosity);
        for (let i = 0; i < n; i++) {
          let G = 0;
          let rowSum = 0;
          for (let j = 0; j < n; j++) {
            G += input.viewFactors[i * n + j] * r.radiosity[j];
            rowSum += input.viewFactors[i * n + j];
          }
          G += (1 - rowSum) * Es;
          const c = input.conditions[i];
          if (c.kind === 'heatFlux' || c.kind === 'adiabatic') {
            const q = c.kind === 'heatFlux' ? c.heatFlux : 0;
            expect(Math.abs(r.radiosity[i] - G - q)).toBeLessThanOrEqual(REL * Jscale);
          } else {
            const e = c.kind === 'opening' ? 1 : input.emissivity[i];
            const E = c.kind === 'opening' ? Es : emissivePower(c.temperature);
            expect(Math.abs(r.radiosity[i] - (e * E + (1 - e) * G))).toBeLessThanOrEqual(REL * Jscale);
            expect(Math.abs(r.netFlux[i] - (r.radiosity[i] - G))).toBeLessThanOrEqual(REL * Jscale);
          }
        }
      }),
      { numRuns: 200 },
    );
  });

  it('reradiating surfaces settle between the coldest and hottest fixed temperatures (maximum principle; common practice)', () => {
    fc.assert(
      fc.property(problemArb({ allowFlux: false, allowOpening: true }), ({ input }) => {
        const r = solved(input);
        const fixed = input.conditions.flatMap((c) => (c.kind === 'temperature' ? [c.temperature] : []));
        if (input.surroundingsTemperature !== undefined) fixed.push(input.surroundingsTemperature);
        const lo = Math.min(...fixed);
        const hi = Math.max(...fixed);
        input.conditions.forEach((c, i) => {
          if (c.kind === 'adiabatic') {
            expect(r.temperature[i]).toBeGreaterThanOrEqual(lo * (1 - REL));
            expect(r.temperature[i]).toBeLessThanOrEqual(hi * (1 + REL));
          }
        });
      }),
      { numRuns: 150 },
    );
  });

  it("a reradiating surface's emissivity changes nothing (Incropera, sec. 13.3.4)", () => {
    fc.assert(
      fc.property(problemArb(), fc.double({ min: 0.01, max: 1, noNaN: true }), ({ input }, e) => {
        const a = solved(input);
        const emissivity = Array.from(input.emissivity, (v, i) => (input.conditions[i].kind === 'adiabatic' ? e : v));
        const b = solved({ ...input, emissivity });
        const scale = heatScale(input.area, a.radiosity);
        for (let i = 0; i < a.surfaceCount; i++) {
          expect(Math.abs(a.netHeat[i] - b.netHeat[i])).toBeLessThanOrEqual(REL * scale);
          expect(Math.abs(a.temperature[i] - b.temperature[i])).toBeLessThanOrEqual(REL * a.temperature[i]);
        }
      }),
      { numRuns: 100 },
    );
  });

  it('uniform temperature means no net heat (equilibrium; common practice)', () => {
    fc.assert(
      fc.property(problemArb({ allowFlux: false }), fc.double({ min: 200, max: 2500, noNaN: true }), ({ input }, t) => {
        const conditions = input.conditions.map((c): SurfaceCondition =>
          c.kind === 'temperature' ? { kind: 'temperature', temperature: t } : c,
        );
        const r = solved({
          ...input,
          conditions,
          surroundingsTemperature: input.surroundingsTemperature === undefined ? undefined : t,
        });
        const E = emissivePower(t);
        for (let i = 0; i < r.surfaceCount; i++) {
          expect(Math.abs(r.netFlux[i])).toBeLessThanOrEqual(REL * E);
          expect(Math.abs(r.radiosity[i] - E)).toBeLessThanOrEqual(REL * E);
        }
      }),
      { numRuns: 100 },
    );
  });

  it('radiosity is linear in the imposed emissive powers and fluxes (superposition; the equations are linear in J)', () => {
    fc.assert(
      fc.property(problemArb(), fc.double({ min: 0.5, max: 2, noNaN: true }), ({ input }, s) => {
        // Scale every temperature by s^(1/4)... i.e. E by s, and every flux by s: J and q scale by s.
        const scaleT = s ** 0.25;
        const conditions = input.conditions.map((c): SurfaceCondition =>
          c.kind === 'temperature'
            ? { kind: 'temperature', temperature: c.temperature * scaleT }
            : c.kind === 'heatFlux'
              ? { kind: 'heatFlux', heatFlux: c.heatFlux * s }
              : c,
        );
        const Ts = input.surroundingsTemperature;
        const a = solved(input);
        const b = solved({ ...input, conditions, surroundingsTemperature: Ts === undefined ? undefined : Ts * scaleT });
        const scale = maxAbs(a.radiosity);
        for (let i = 0; i < a.surfaceCount; i++) {
          expect(Math.abs(b.radiosity[i] - s * a.radiosity[i])).toBeLessThanOrEqual(REL * s * scale);
        }
      }),
      { numRuns: 100 },
    );
  });
});

describe('size', () => {
  it('a 2000-surface enclosure solves, conserves energy, and matches the closed form of its parts', () => {
    // 1000 identical, independent pairs of infinite parallel planes (F = 1 within a pair), every other
    // one with an imposed flux: each pair must give Incropera Table 13.3's q" = sigma (T1^4 - T2^4) / (1/e1 + 1/e2 - 1).
    const n = 2000;
    const F = new Float64Array(n * n);
    const conditions: SurfaceCondition[] = [];
    const emissivity = new Float64Array(n);
    for (let p = 0; p < n / 2; p++) {
      const [i, j] = [2 * p, 2 * p + 1];
      F[i * n + j] = 1;
      F[j * n + i] = 1;
      emissivity[i] = 0.3 + (0.6 * ((p * 7) % 11)) / 10;
      emissivity[j] = 0.8;
      conditions.push({ kind: 'temperature', temperature: 600 + p }, { kind: 'temperature', temperature: 300 });
    }
    const r = solved({ viewFactors: F, area: new Float64Array(n).fill(1), emissivity, conditions });
    for (let p = 0; p < n / 2; p += 37) {
      const q = (SIGMA * ((600 + p) ** 4 - 300 ** 4)) / (1 / emissivity[2 * p] + 1 / 0.8 - 1);
      expect(Math.abs(r.netFlux[2 * p] - q)).toBeLessThanOrEqual(1e-12 * q);
    }
    expect(r.energyBalance).toBeLessThan(1e-12);
  });
});
