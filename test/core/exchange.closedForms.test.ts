import { describe, expect, it } from 'vitest';
import {
  STEFAN_BOLTZMANN as SIGMA,
  DenseLuSolver,
  emissivePower,
  type SurfaceCondition,
} from '../../src/core/exchange';
import { solved } from './exchange.solved';

// Closed forms of gray-diffuse exchange, each against its published source.
// The radiosity solve is exact up to rounding, so comparisons are at 1e-12
// relative (rounding of a handful of operations on O(1e5) W/m^2 values).
const REL = 1e-12;

const T = (temperature: number): SurfaceCondition => ({ kind: 'temperature', temperature });
const FLUX = (heatFlux: number): SurfaceCondition => ({ kind: 'heatFlux', heatFlux });
const ADIABATIC: SurfaceCondition = { kind: 'adiabatic' };

function close(actual: number, expected: number, rel = REL) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

describe('two-surface enclosure', () => {
  // A convex body (1) inside an enclosure (2): F11 = 0, F12 = 1, F21 = A1/A2
  // (reciprocity), F22 = 1 - A1/A2 (summation). Here: a 0.5 m square bar in a
  // 4 m x 2 m duct, A1 = 2 m, A2 = 12 m per metre of depth.
  const A1 = 2;
  const A2 = 12;
  const F = [0, 1, A1 / A2, 1 - A1 / A2];

  it('net heat matches q = sigma (T1^4 - T2^4) / ((1-e1)/(e1 A1) + 1/(A1 F12) + (1-e2)/(e2 A2))', () => {
    // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.3.3, eq. 13.23 (equation number from memory).
    const [T1, T2, e1, e2] = [1100, 400, 0.8, 0.5];
    const r = solved({ viewFactors: F, area: [A1, A2], emissivity: [e1, e2], conditions: [T(T1), T(T2)] });
    const q = (SIGMA * (T1 ** 4 - T2 ** 4)) / ((1 - e1) / (e1 * A1) + 1 / (A1 * 1) + (1 - e2) / (e2 * A2));
    close(r.netHeat[0], q);
    close(r.netHeat[1], -q);
    close(r.netFlux[0], q / A1);
    // Surface resistance: q = (Eb1 - J1) / ((1-e1)/(e1 A1)) (Incropera, sec. 13.3.1, eq. 13.19, from memory).
    close(r.radiosity[0], emissivePower(T1) - (q * (1 - e1)) / (e1 * A1));
    close(r.radiosity[1], emissivePower(T2) + (q * (1 - e2)) / (e2 * A2));
    // Exchange matrix: q'_12 = A1 F12 (J1 - J2) = q, and antisymmetric.
    close(r.exchange[1], q);
    close(r.exchange[2], -q);
    expect(r.exchange[0]).toBe(0);
    expect(r.energyBalance).toBeLessThan(1e-14);
  });

  it('a heat flux on the body gives back the temperature the closed form needs', () => {
    // Same closed form solved for T1 (Incropera, sec. 13.3.3, eq. 13.23, from memory).
    const [T1, T2, e1, e2] = [950, 500, 0.35, 0.7];
    const R = (1 - e1) / (e1 * A1) + 1 / A1 + (1 - e2) / (e2 * A2);
    const q = (SIGMA * (T1 ** 4 - T2 ** 4)) / R;
    const r = solved({ viewFactors: F, area: [A1, A2], emissivity: [e1, e2], conditions: [FLUX(q / A1), T(T2)] });
    close(r.temperature[0], T1);
    close(r.netHeat[1], -q);
  });
});

describe('special two-surface enclosures (Incropera et al., 6th ed., Table 13.3)', () => {
  it('infinite parallel planes: q" = sigma (T1^4 - T2^4) / (1/e1 + 1/e2 - 1)', () => {
    // Infinite planes see only each other: F12 = F21 = 1, A1 = A2.
    for (const [T1, T2, e1, e2] of [
      [800, 300, 0.6, 0.2],
      [1500, 1200, 0.05, 0.95],
      [300, 700, 1, 0.4],
    ]) {
      const r = solved({ viewFactors: [0, 1, 1, 0], area: [1, 1], emissivity: [e1, e2], conditions: [T(T1), T(T2)] });
      const q = (SIGMA * (T1 ** 4 - T2 ** 4)) / (1 / e1 + 1 / e2 - 1);
      close(r.netFlux[0], q);
      close(r.netFlux[1], -q);
    }
  });

  it('long concentric cylinders: q = sigma A1 (T1^4 - T2^4) / (1/e1 + (1-e2)/e2 (r1/r2))', () => {
    // Inner cylinder sees only the outer: F12 = 1, F21 = r1/r2, F22 = 1 - r1/r2.
    const [r1, r2] = [0.05, 0.2];
    const [A1, A2] = [2 * Math.PI * r1, 2 * Math.PI * r2];
    const [T1, T2, e1, e2] = [700, 320, 0.9, 0.15];
    const r = solved({
      viewFactors: [0, 1, r1 / r2, 1 - r1 / r2],
      area: [A1, A2],
      emissivity: [e1, e2],
      conditions: [T(T1), T(T2)],
    });
    const q = (SIGMA * A1 * (T1 ** 4 - T2 ** 4)) / (1 / e1 + ((1 - e2) / e2) * (r1 / r2));
    close(r.netHeat[0], q);
    close(r.netHeat[1], -q);
  });

  it('small convex object in a large cavity: q = sigma A1 e1 (T1^4 - T2^4)', () => {
    // A2 >> A1; as the open-sketch limit: the body sees only surroundings at T2 (black).
    const [T1, T2, e1] = [900, 290, 0.45];
    const r = solved({
      viewFactors: [0],
      area: [0.3],
      emissivity: [e1],
      conditions: [T(T1)],
      surroundingsTemperature: T2,
    });
    const q = SIGMA * 0.3 * e1 * (T1 ** 4 - T2 ** 4);
    close(r.netHeat[0], q);
    close(r.surroundingsNetHeat, -q);
    expect(r.surroundingsViewFactor[0]).toBe(1);
  });
});

describe('three-surface enclosure with a reradiating surface', () => {
  // A long duct of triangular section, sides 3, 4 and 5 m; surfaces 1 (3 m) and
  // 2 (4 m) at fixed temperatures, R (5 m) insulated. View factors of the
  // three-sided enclosure: F_ij = (L_i + L_j - L_k) / (2 L_i)
  // (Incropera et al., 6th ed., Table 13.1, from memory).
  const L = [3, 4, 5];
  const f = (i: number, j: number) => (i === j ? 0 : (L[i] + L[j] - L[3 - i - j]) / (2 * L[i]));
  const F = [0, 1, 2].flatMap((i) => [0, 1, 2].map((j) => f(i, j)));
  const [T1, T2, e1, e2] = [1000, 500, 0.7, 0.4];

  // Incropera et al., 6th ed., sec. 13.3.4, eq. 13.30 (number from memory):
  // q1 = -q2 = (Eb1 - Eb2) / (R1 + [A1F12 + (1/(A1F1R) + 1/(A2F2R))^-1]^-1 + R2), R_i = (1-e_i)/(e_i A_i),
  // and the reradiating surface's radiosity from the balance (J1 - JR) A1F1R = (JR - J2) A2F2R, with E_bR = J_R.
  const R1 = (1 - e1) / (e1 * L[0]);
  const R2 = (1 - e2) / (e2 * L[1]);
  const q =
    (emissivePower(T1) - emissivePower(T2)) /
    (R1 + 1 / (L[0] * f(0, 1) + 1 / (1 / (L[0] * f(0, 2)) + 1 / (L[1] * f(1, 2)))) + R2);
  const J1 = emissivePower(T1) - q * R1;
  const J2 = emissivePower(T2) + q * R2;
  const JR = (L[0] * f(0, 2) * J1 + L[1] * f(1, 2) * J2) / (L[0] * f(0, 2) + L[1] * f(1, 2));

  it('net heat, radiosities and the reradiating surface temperature match the network solution', () => {
    for (const eR of [0.3, 0.95, 1]) {
      // The reradiating surface's emissivity has no effect (Incropera, sec. 13.3.4).
      const r = solved({ viewFactors: F, area: L, emissivity: [e1, e2, eR], conditions: [T(T1), T(T2), ADIABATIC] });
      close(r.netHeat[0], q);
      close(r.netHeat[1], -q);
      expect(r.netHeat[2]).toBe(0);
      close(r.radiosity[0], J1);
      close(r.radiosity[1], J2);
      close(r.radiosity[2], JR);
      close(r.temperature[2], (JR / SIGMA) ** 0.25);
      expect(r.temperature[2]).toBeGreaterThan(T2);
      expect(r.temperature[2]).toBeLessThan(T1);
    }
  });

  it('the exchange matrix splits q between the direct path and the path through R', () => {
    const r = solved({ viewFactors: F, area: L, emissivity: [e1, e2, 0.5], conditions: [T(T1), T(T2), ADIABATIC] });
    close(r.exchange[0 * 3 + 1], L[0] * f(0, 1) * (J1 - J2));
    close(r.exchange[0 * 3 + 2], L[0] * f(0, 2) * (J1 - JR));
    // What R receives from 1 it passes to 2.
    close(r.exchange[2 * 3 + 1], L[0] * f(0, 2) * (J1 - JR));
  });
});

describe('black surfaces (emissivity 1)', () => {
  const L = [3, 4, 5];
  const f = (i: number, j: number) => (i === j ? 0 : (L[i] + L[j] - L[3 - i - j]) / (2 * L[i]));
  const F = [0, 1, 2].flatMap((i) => [0, 1, 2].map((j) => f(i, j)));

  it('radiosity equals emissive power and q_i = sum_j A_i F_ij sigma (T_i^4 - T_j^4)', () => {
    // Blackbody exchange (Incropera et al., 6th ed., sec. 13.2, eq. 13.17, from memory).
    const temps = [1200, 600, 350];
    const r = solved({ viewFactors: F, area: L, emissivity: [1, 1, 1], conditions: temps.map(T) });
    for (let i = 0; i < 3; i++) {
      expect(r.radiosity[i]).toBe(emissivePower(temps[i]));
      let q = 0;
      for (let j = 0; j < 3; j++) q += L[i] * f(i, j) * (emissivePower(temps[i]) - emissivePower(temps[j]));
      close(r.netHeat[i], q);
    }
  });

  it('black surfaces with a reradiating one: J_R is the view-weighted mean of the others', () => {
    // Incropera et al., 6th ed., sec. 13.3.4 with R1 = R2 = 0 (from memory).
    const r = solved({ viewFactors: F, area: L, emissivity: [1, 1, 1], conditions: [T(1000), T(400), ADIABATIC] });
    const JR =
      (L[0] * f(0, 2) * emissivePower(1000) + L[1] * f(1, 2) * emissivePower(400)) / (L[0] * f(0, 2) + L[1] * f(1, 2));
    close(r.radiosity[2], JR);
    close(r.temperature[2], (JR / SIGMA) ** 0.25);
  });

  it('a black surface with an imposed flux: E = J, so T = (J/sigma)^(1/4)', () => {
    // Parallel planes, Incropera Table 13.3 with e1 = 1: q" = sigma (T1^4 - T2^4) / (1/e2).
    const [T2, e2, q] = [400, 0.3, 2500];
    const r = solved({ viewFactors: [0, 1, 1, 0], area: [1, 1], emissivity: [1, e2], conditions: [FLUX(q), T(T2)] });
    const T1 = (T2 ** 4 + q / (SIGMA * e2)) ** 0.25;
    close(r.temperature[0], T1);
    close(r.radiosity[0], emissivePower(T1));
  });
});

describe('openings and surroundings', () => {
  it('an opening is the same as leaving the surface out of an open sketch', () => {
    // Both describe a black surface at T_s (common practice: an opening radiates as a black surface at the surroundings temperature).
    // A square cavity 1 x 1: floor, two walls, top opening. Side-to-side of a unit square: sqrt(2) - 1 (crossed strings).
    const s = Math.SQRT2 - 1;
    const a = (1 - s) / 2; // adjacent sides of a square
    // order: floor, left, right, top
    const F = [
      [0, a, a, s],
      [a, 0, s, a],
      [a, s, 0, a],
      [s, a, a, 0],
    ];
    const area = [1, 1, 1, 1];
    const conditions = [T(900), ADIABATIC, FLUX(-1200)];
    const eps = [0.6, 0.8, 0.3];
    const withOpening = solved({
      viewFactors: F.flat(),
      area,
      emissivity: [...eps, 0.5],
      conditions: [...conditions, { kind: 'opening' }],
      surroundingsTemperature: 300,
    });
    const open = solved({
      viewFactors: F.slice(0, 3).flatMap((row) => row.slice(0, 3)),
      area: area.slice(0, 3),
      emissivity: eps,
      conditions,
      surroundingsTemperature: 300,
    });
    for (let i = 0; i < 3; i++) {
      close(withOpening.netHeat[i], open.netHeat[i]);
      close(withOpening.temperature[i], open.temperature[i]);
      close(withOpening.exchange[i * 4 + 3], open.surroundingsExchange[i]);
    }
    close(withOpening.netHeat[3], open.surroundingsNetHeat);
    expect(withOpening.temperature[3]).toBe(300);
    expect(withOpening.emissivity[3]).toBe(1);
    close(open.surroundingsViewFactor[0], s);
  });

  it('everything at one temperature: no net heat anywhere, J = sigma T^4 (equilibrium, Kirchhoff; common practice)', () => {
    const r = solved({
      viewFactors: [0, 0.4, 0.5, 0.1],
      area: [1, 0.8],
      emissivity: [0.3, 0.7],
      conditions: [T(650), ADIABATIC],
      surroundingsTemperature: 650,
    });
    for (let i = 0; i < 2; i++) {
      expect(Math.abs(r.netHeat[i])).toBeLessThan(1e-12 * emissivePower(650));
      close(r.radiosity[i], emissivePower(650));
      close(r.temperature[i], 650);
    }
    // Net heats are rounding here; the balance must say "conserved", not noise/noise.
    expect(r.energyBalance).toBeLessThan(1e-6);
  });
});

describe('depth', () => {
  it('totals are per-metre values times the depth in metres', () => {
    const r = solved({
      viewFactors: [0, 1, 1, 0],
      area: [2, 2],
      emissivity: [0.5, 0.5],
      conditions: [T(800), T(400)],
      depth: 3.5,
    });
    expect(r.depth).toBe(3.5);
    expect(r.netHeatTotal![0]).toBe(r.netHeat[0] * 3.5);
    expect(r.netHeatTotal![1]).toBe(r.netHeat[1] * 3.5);
    expect(r.surroundingsNetHeatTotal).toBe(0);
  });
});

describe('workspace reuse', () => {
  it('a reused solver gives the same answers as a fresh one, call after call', () => {
    // Parallel planes again (Incropera et al., 6th ed., Table 13.3).
    const workspace = new DenseLuSolver(2);
    for (const [T1, e1] of [
      [900, 0.3],
      [1200, 0.8],
      [500, 1],
    ]) {
      const input = { viewFactors: [0, 1, 1, 0], area: [1, 1], emissivity: [e1, 0.6], conditions: [T(T1), T(300)] };
      const r = solved(input, workspace);
      close(r.netFlux[0], (SIGMA * (T1 ** 4 - 300 ** 4)) / (1 / e1 + 1 / 0.6 - 1));
    }
    // A workspace of another size is left alone.
    const r3 = solved(
      { viewFactors: [0], area: [1], emissivity: [0.5], conditions: [T(400)], surroundingsTemperature: 300 },
      workspace,
    );
    close(r3.netFlux[0], 0.5 * SIGMA * (400 ** 4 - 300 ** 4));
  });
});
