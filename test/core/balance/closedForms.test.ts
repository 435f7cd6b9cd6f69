import { describe, expect, it } from 'vitest';
import { solveBalance, type BalanceInput, type BalanceResult } from '../../../src/core/balance';

// The whole surface balance against closed forms solved here, independently of
// the code under test (each a scalar equation, solved by bisection in the test).
// Sources: Incropera, DeWitt, Bergman & Lavine, Fundamentals of Heat and Mass
// Transfer, 6th ed. (2007): the two-surface enclosure, sec. 13.3.3; radiation
// shields, sec. 13.3.4; the plane wall and composite wall, sec. 3.1; the
// cylinder, sec. 3.3.1. Section numbers and equations are from memory.
// View factors here are exact by the enclosure rules (a convex body sees only
// the duct around it: F12 = 1, F21 = A1/A2 by reciprocity, F22 = 1 - A1/A2).

const SIGMA = 5.670374419e-8; // W/(m^2 K^4), CODATA 2018
/** Newton stops at 1e-10 of the radiation leaving all surfaces, then takes one more step: rounding is ~1e-13. */
const REL = 1e-9;

/** The root of an increasing or decreasing f in [lo, hi], to the last bit (bisection). */
function bisect(f: (x: number) => number, lo: number, hi: number): number {
  let flo = f(lo);
  for (let k = 0; k < 200; k++) {
    const mid = 0.5 * (lo + hi);
    if (mid === lo || mid === hi) break;
    const fm = f(mid);
    if (fm === 0) return mid;
    if (Math.sign(fm) === Math.sign(flo)) {
      lo = mid;
      flo = fm;
    } else hi = mid;
  }
  return 0.5 * (lo + hi);
}

function close(actual: number, expected: number, rel = REL) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.abs(expected));
}

function solved(input: BalanceInput): BalanceResult {
  const out = solveBalance(input);
  if (!out.ok) throw new Error(`expected a solution, got ${out.code}`);
  return out.result;
}

/** Two-surface enclosure, convex body 1 in duct 2: net heat from 1 to 2, W/m (sec. 13.3.3). */
const twoSurface = (T1: number, T2: number, e1: number, e2: number, A1: number, A2: number) =>
  (SIGMA * (T1 ** 4 - T2 ** 4)) / ((1 - e1) / (e1 * A1) + 1 / A1 + (1 - e2) / (e2 * A2));

const ductFactors = (A1: number, A2: number) => [0, 1, A1 / A2, 1 - A1 / A2];

describe('a hot convex body in a lined duct', () => {
  // Body (A1 = 1.2 m/m, e1 = 0.85) held at 1400 K; the duct (A2 = 6 m/m, e2 = 0.7) is a two-layer lining to air at 300 K.
  const A1 = 1.2;
  const A2 = 6;
  const layers = [
    { thickness: 0.23, conductivity: 1.3 },
    { thickness: 0.115, conductivity: 0.2 },
  ];
  const R = 0.23 / 1.3 + 0.115 / 0.2 + 1 / 12; // m^2 K/W: layers then the outside coefficient (sec. 3.1, composite wall)
  const input: BalanceInput = {
    viewFactors: ductFactors(A1, A2),
    area: [A1, A2],
    emissivity: [0.85, 0.7],
    conditions: [
      { kind: 'temperature', temperature: 1400 },
      { kind: 'wall', layers, outsideTemperature: 300, outsideCoefficient: 12 },
    ],
  };

  it('hot face from radiation in series with the wall resistance; the interfaces follow the flux', () => {
    // Radiation reaching the lining = heat through it: twoSurface(1400, T) = A2 (T - 300)/R.
    const T = bisect((t) => twoSurface(1400, t, 0.85, 0.7, A1, A2) - (A2 * (t - 300)) / R, 300, 1400);
    const q = (T - 300) / R; // W/m^2 through the lining
    const r = solved(input);
    close(r.temperature[1], T);
    close(r.netHeat[0], A2 * q);
    close(r.suppliedHeat[0], A2 * q); // the firing the body needs
    close(r.suppliedHeat[1], -A2 * q); // the wall's loss, as heat supplied from behind
    const interfaces = [T, T - (q * 0.23) / 1.3, T - q * (0.23 / 1.3 + 0.115 / 0.2)];
    expect(r.layerTemperatures[1]).toHaveLength(3);
    interfaces.forEach((t, k) => close(r.layerTemperatures[1]![k], t));
    close(r.coldFaceTemperature[1], 300 + q / 12);
    close(r.coldFaceTemperature[1], interfaces[2]);
    expect(Number.isNaN(r.coldFaceTemperature[0])).toBe(true);
    expect(r.energyBalance).toBeLessThan(1e-12);
  });

  it('with a casing emissivity the casing also radiates to the outside at its temperature', () => {
    // Casing balance (T_h - T_c)/R_layers = h (T_c - 300) + e sigma (T_c^4 - 300^4), nested in the duct's balance.
    const Rl = 0.23 / 1.3 + 0.115 / 0.2;
    const casing = (Th: number) =>
      bisect((c) => (Th - c) / Rl - 8 * (c - 300) - 0.9 * SIGMA * (c ** 4 - 300 ** 4), 300, Th);
    const T = bisect((t) => twoSurface(1400, t, 0.85, 0.7, A1, A2) - (A2 * (t - casing(t))) / Rl, 300, 1400);
    const Tc = casing(T);
    const wall = {
      kind: 'wall' as const,
      layers,
      outsideTemperature: 300,
      outsideCoefficient: 8,
      outsideEmissivity: 0.9,
    };
    const r = solved({ ...input, conditions: [input.conditions[0], wall] });
    close(r.temperature[1], T);
    close(r.coldFaceTemperature[1], Tc);
    close(r.suppliedHeat[1], (-A2 * (T - Tc)) / Rl);
  });
});

describe('a tube with a fluid inside, in a hot duct', () => {
  // Tube (A1 = pi d_o per metre) at e = 0.85 inside a duct (A2 = 2 m/m, e = 0.8) held at 1300 K; water-like film inside.
  const tube = {
    kind: 'tube' as const,
    fluidTemperature: 650,
    insideCoefficient: 900,
    outerDiameter: 0.1143,
    innerDiameter: 0.0953,
    wallConductivity: 24,
  };
  const A1 = Math.PI * 0.1143;
  const A2 = 2;
  // Film and cylindrical wall referred to the outer area (sec. 3.3.1): R''_o = d_o/(d_i h_i) + d_o ln(d_o/d_i)/(2 k).
  const Rwall = (0.1143 * Math.log(0.1143 / 0.0953)) / (2 * 24);
  const Ro = 0.1143 / (0.0953 * 900) + Rwall;

  it('outer metal temperature from radiation in series with the tube resistance; the inner wall follows', () => {
    // Radiation the tube takes up = heat to the fluid.
    const T = bisect((t) => -twoSurface(t, 1300, 0.85, 0.8, A1, A2) - (A1 * (t - 650)) / Ro, 650, 1300);
    const q = (T - 650) / Ro;
    const r = solved({
      viewFactors: [1 - A1 / A2, A1 / A2, 1, 0], // the duct first, then the convex tube
      area: [A2, A1],
      emissivity: [0.8, 0.85],
      conditions: [{ kind: 'temperature', temperature: 1300 }, tube],
    });
    close(r.temperature[1], T);
    close(r.suppliedHeat[1], -A1 * q); // what the fluid takes up
    close(r.innerTemperature[1], T - q * Rwall);
    close(r.netHeat[0], A1 * q);
  });
});

describe('a thin linked plate (radiation shield) between a hot floor and a cold roof', () => {
  // Infinite parallel plates with one shield between (sec. 13.3.4): the floor sees only the shield's lower face and the
  // roof only its upper face (F = 1 both ways, equal areas). This is the limit of a long thin duct whose end gaps
  // vanish; here the factors are exactly those of the limit, so the closed form holds exactly:
  // q'' = sigma (T1^4 - T2^4) / (1/e1 + 1/e2 + 1/e3 + 1/e4 - 2).
  it('each face carries the series of radiation resistances; both faces at one temperature', () => {
    const [e1, e2, e3, e4] = [0.8, 0.7, 0.1, 0.25];
    const q = (SIGMA * (1400 ** 4 - 400 ** 4)) / (1 / e1 + 1 / e2 + 1 / e3 + 1 / e4 - 2);
    // Shield temperature from the floor side alone: q = sigma (T1^4 - Ts^4) / (1/e1 + 1/e3 - 1).
    const Ts = (1400 ** 4 - (q * (1 / e1 + 1 / e3 - 1)) / SIGMA) ** 0.25;
    const r = solved({
      viewFactors: [0, 0, 1, 0, 0, 0, 0, 1, 1, 0, 0, 0, 0, 1, 0, 0],
      area: [3, 3, 3, 3],
      emissivity: [e1, e2, e3, e4],
      conditions: [
        { kind: 'temperature', temperature: 1400 },
        { kind: 'temperature', temperature: 400 },
        { kind: 'linked', other: 3 },
        { kind: 'linked', other: 2 },
      ],
    });
    close(r.netHeat[0], 3 * q);
    close(r.netHeat[1], -3 * q);
    close(r.temperature[2], Ts);
    expect(r.temperature[3]).toBe(r.temperature[2]);
    // What one face takes up the other gives off: each reports its own supplied heat, equal and opposite.
    close(r.suppliedHeat[2], -3 * q);
    close(r.suppliedHeat[3], 3 * q);
    expect(Math.abs(r.suppliedHeat[2] + r.suppliedHeat[3])).toBeLessThanOrEqual(1e-10 * 3 * q);
  });
});

describe('convection to a transparent gas', () => {
  it('a reradiating plate heated by a gas and cooled by radiation to a held plate', () => {
    // Parallel plates (F = 1): sigma (T2^4 - T1^4)/(1/e1 + 1/e2 - 1) = h (Tg - T2) on the adiabatic plate 2.
    const [e1, e2, h, Tg] = [0.6, 0.9, 25, 1500];
    const T2 = bisect((t) => (SIGMA * (t ** 4 - 500 ** 4)) / (1 / e1 + 1 / e2 - 1) - h * (Tg - t), 500, Tg);
    const r = solved({
      viewFactors: [0, 1, 1, 0],
      area: [2, 2],
      emissivity: [e1, e2],
      conditions: [{ kind: 'temperature', temperature: 500 }, { kind: 'adiabatic' }],
      convectionCoefficient: [0, h],
      gasTemperature: Tg,
    });
    close(r.temperature[1], T2);
    close(r.convectionHeat[1], 2 * h * (T2 - Tg));
    close(r.netHeat[1], -2 * h * (T2 - Tg)); // adiabatic with convection: net radiation is minus its convection
    expect(r.suppliedHeat[1]).toBe(0);
    close(r.gasConvectionHeat, 2 * h * (Tg - T2));
    expect(r.energyBalance).toBeLessThan(1e-12);
  });
});
