// `exchange FILE --profile NAME` end to end. A convex black tube inside an
// isothermal black enclosure sees only the enclosure (a convex body does not
// see itself), so every arc absorbs sigma (T_w^4 - T_t^4) whatever the
// enclosure's shape: Incropera et al., Fundamentals of Heat and Mass Transfer,
// 6th ed., sec. 13.2 (blackbody exchange, summation rule).
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';
import { STEFAN_BOLTZMANN as SIGMA } from '../../src/core/exchange';

function run(file: unknown, ...args: string[]) {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: () => JSON.stringify(file),
  };
  const code = main(['exchange', 'oven.json', ...args], io);
  return { code, out, err };
}

const arcs = Array.from({ length: 8 }, (_, k) => `tube 1 ${k + 1}`);
const oven = {
  version: 2,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [2, 0],
        [2, 1.5],
        [0, 1.5],
      ],
      surface: 'walls',
    },
    { kind: 'solid', circle: { center: [0.7, 0.6], radius: 0.1 }, surface: arcs },
  ],
  surfaces: {
    walls: { emissivity: 1, temperature: 1000 },
    ...Object.fromEntries(arcs.map((n) => [n, { emissivity: 1, temperature: 400 }])),
  },
};

describe('exchange --profile', () => {
  it('prints angle against net flux; a black tube in a black isothermal box absorbs the same all round', () => {
    const r = run(oven, '--profile', 'tube 1');
    expect(r.err).toBe('');
    expect(r.code).toBe(0);
    const rows = Papa.parse<string[]>(r.out.trim()).data;
    expect(rows[0][0]).toBe('angle from +x anticlockwise (deg)');
    expect(rows.slice(1).map((row) => Number(row[0]))).toEqual([22.5, 67.5, 112.5, 157.5, 202.5, 247.5, 292.5, 337.5]);
    const expected = -SIGMA * (1000 ** 4 - 400 ** 4);
    for (const row of rows.slice(1)) expect(Math.abs(Number(row[3]) / expected - 1)).toBeLessThanOrEqual(1e-9);
  });

  it('a split tube with a fluid inside lists the metal temperatures of each arc, as the tube resistance says', () => {
    // Film and tube-wall resistance referred to the outer area: R''_o = d_o/(d_i h_i) + d_o ln(d_o/d_i)/(2 k_w),
    // and the inner wall at T_f + q d_o/(d_i h_i) (Incropera et al., 6th ed., ch. 3, cylinder in series; from memory).
    const tube = {
      fluidTemperature: 600,
      insideCoefficient: 800,
      outerDiameter: 0.2,
      innerDiameter: 0.17,
      wallConductivity: 25,
    };
    const hot = {
      ...oven,
      surfaces: {
        walls: { emissivity: 0.9, temperature: 1400 },
        ...Object.fromEntries(arcs.map((n) => [n, { emissivity: 0.85, tube }])),
      },
    };
    const r = run(hot, '--profile', 'tube 1');
    expect(r.err).toBe('');
    const rows = Papa.parse<string[]>(r.out.trim()).data;
    expect(rows[0].slice(3)).toEqual(['net flux (W/m^2)', 'temperature (K)', 'inner wall temperature (K)']);
    const {
      outerDiameter: d0,
      innerDiameter: di,
      insideCoefficient: hi,
      wallConductivity: kw,
      fluidTemperature: Tf,
    } = tube;
    const R = d0 / (di * hi) + (d0 * Math.log(d0 / di)) / (2 * kw);
    expect(rows).toHaveLength(9);
    for (const row of rows.slice(1)) {
      // Heat taken up by radiation (net flux < 0) goes to the fluid through the wall.
      const q = -Number(row[3]);
      const T = Number(row[4]);
      expect(q).toBeGreaterThan(0);
      expect(Math.abs((T - Tf) / R / q - 1)).toBeLessThan(1e-9);
      expect(Math.abs(Number(row[5]) - (Tf + (q * d0) / (di * hi)))).toBeLessThan(1e-9 * T);
    }
  });

  it('refuses a name with no parts and --profile with --json', () => {
    const walls = run(oven, '--profile', 'walls');
    expect(walls.code).toBe(1);
    expect(walls.err).toMatch(/one piece/);
    expect(run(oven, '--profile', 'tube 1', '--json').code).toBe(2);
    expect(run(oven, '--profile').code).toBe(2);
  });
});
