import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';

// The command line with the whole surface balance: walls, tubes, convection to
// a gas; against closed forms solved here by bisection. A square body in a
// square duct is a two-surface enclosure with a convex inner body (F12 = 1,
// exact for this geometry): Incropera et al., Fundamentals of Heat and Mass
// Transfer, 6th ed., sec. 13.3.3, in series with the plane-wall resistance of
// sec. 3.1 or the tube resistance of sec. 3.3.1 (section numbers from memory).

const SIGMA = 5.670374419e-8;
const REL = 1e-9;

function run(file: unknown, ...args: string[]) {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: () => JSON.stringify(file),
  };
  const code = main(['exchange', 'f.json', ...args], io);
  return { code, out, err };
}

interface SurfaceJson {
  name: string;
  temperature: number;
  netHeat: number;
  convectionHeat: number;
  suppliedHeat: number;
  layerTemperatures?: number[];
  coldFaceTemperature?: number;
  innerTemperature?: number;
}
interface BalanceJson {
  surfaces: SurfaceJson[];
  gas?: { temperature: number; convectionHeat: number };
  energyBalance: number;
}

function json(file: unknown): BalanceJson {
  const r = run(file, '--json');
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.out) as BalanceJson;
}

function bisect(f: (x: number) => number, lo: number, hi: number): number {
  const flo = Math.sign(f(lo));
  for (let k = 0; k < 200; k++) {
    const mid = 0.5 * (lo + hi);
    if (Math.sign(f(mid)) === flo) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}

const close = (actual: number, expected: number) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(REL * Math.abs(expected));

/** A 4 m square duct around a 1 m square body: A1 = 4 m/m, A2 = 16 m/m. */
const sketch = (surfaces: Record<string, unknown>, settings: Record<string, unknown> = {}) => ({
  version: 2,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 4],
        [0, 4],
      ],
      surface: 'duct',
    },
    {
      kind: 'solid',
      points: [
        [1.5, 1.5],
        [2.5, 1.5],
        [2.5, 2.5],
        [1.5, 2.5],
      ],
      surface: 'body',
    },
  ],
  surfaces,
  settings,
});

/** Net radiation from the body (1) to the duct (2), W/m. */
const radiation = (T1: number, T2: number, e1: number, e2: number) =>
  (SIGMA * (T1 ** 4 - T2 ** 4)) / ((1 - e1) / (e1 * 4) + 1 / 4 + (1 - e2) / (e2 * 16));

describe('exchange --json with walls, convection and a gas', () => {
  const wall = {
    layers: [
      { thickness: 0.2, conductivity: 1.1 },
      { thickness: 0.1, conductivity: 0.15 },
    ],
    outsideTemperature: 300,
    outsideCoefficient: 10,
  };
  const file = sketch(
    {
      body: { emissivity: 0.9, temperature: 1300, convectionCoefficient: 20 },
      duct: { emissivity: 0.7, wall, convectionCoefficient: 8 },
    },
    { gasTemperature: 1250 },
  );
  const R = 0.2 / 1.1 + 0.1 / 0.15 + 1 / 10;

  it('hot face, interfaces, cold face, convection and supplied heat against the closed form', () => {
    // Duct: radiation received + convection from the gas = heat lost through the lining.
    const T = bisect((t) => radiation(1300, t, 0.9, 0.7) + 16 * 8 * (1250 - t) - (16 * (t - 300)) / R, 300, 1300);
    const q = (T - 300) / R;
    const j = json(file);
    const [duct, body] = [j.surfaces[0], j.surfaces[1]];
    expect([duct.name, body.name]).toEqual(['duct', 'body']);
    close(duct.temperature, T);
    close(duct.suppliedHeat, -16 * q);
    close(duct.convectionHeat, 16 * 8 * (T - 1250));
    close(duct.netHeat, -radiation(1300, T, 0.9, 0.7));
    expect(duct.layerTemperatures).toHaveLength(3);
    const expected = [T, T - (q * 0.2) / 1.1, 300 + q / 10];
    expected.forEach((t, k) => close(duct.layerTemperatures![k], t));
    close(duct.coldFaceTemperature!, 300 + q / 10);
    expect(duct.innerTemperature).toBeUndefined();
    // The body: its firing is what it radiates plus what it gives the gas.
    close(body.convectionHeat, 4 * 20 * (1300 - 1250));
    close(body.suppliedHeat, radiation(1300, T, 0.9, 0.7) + 4 * 20 * 50);
    expect(body.layerTemperatures).toBeUndefined();
    // The gas gives the surfaces what they take from it by convection.
    expect(j.gas?.temperature).toBe(1250);
    close(j.gas!.convectionHeat, -(body.convectionHeat + duct.convectionHeat));
    expect(j.energyBalance).toBeLessThan(1e-12);
    const sum = body.suppliedHeat + duct.suppliedHeat + j.gas!.convectionHeat;
    expect(Math.abs(sum)).toBeLessThanOrEqual(1e-10 * (4 * SIGMA * 1300 ** 4));
  });

  it('--csv and the table carry the same columns, the gas row, the burn warning and the cautions', () => {
    const csv = Papa.parse<string[]>(run(file, '--csv').out, { newline: '\r\n', skipEmptyLines: true }).data;
    expect(csv[0]).toEqual([
      'surface',
      'length (m)',
      'emissivity',
      'condition',
      'temperature (K)',
      'net heat (W/m)',
      'net flux (W/m^2)',
      'radiosity (W/m^2)',
      'convection heat (W/m)',
      'supplied heat (W/m)',
      'cold face temperature (K)',
      'layer temperatures (K)',
    ]);
    const j = json(file);
    expect(csv[1][3]).toBe('wall');
    close(Number(csv[1][10]), j.surfaces[0].coldFaceTemperature!);
    expect(csv[1][11].split(' ').map(Number)).toHaveLength(3);
    expect(csv[2][10]).toBe('');
    expect(csv[3].slice(0, 5)).toEqual(['(gas)', '', '', 'transparent gas', '1250']);
    close(Number(csv[3][8]), j.gas!.convectionHeat);
    const table = run(file).out;
    expect(table).toMatch(/cold face \(K\)/);
    // The casing is above 60 °C here (300 K + q/h): the table says so, citing the guide.
    expect(j.surfaces[0].coldFaceTemperature!).toBeGreaterThan(333.15);
    expect(table).toMatch(/Warning: burn hazard: the casing of 'duct' is at \d+ °C, above 60 °C.*ASTM C1055/);
    expect(table).toMatch(/gas is treated as transparent.*openings carry no gas flow/);
    expect(table).toMatch(/constant conductivities/);
  });
});

describe('exchange --json with a tube', () => {
  it('outer metal and inner wall temperatures against the closed form', () => {
    const tube = {
      fluidTemperature: 600,
      insideCoefficient: 800,
      outerDiameter: 0.1,
      innerDiameter: 0.085,
      wallConductivity: 30,
    };
    const Rw = (0.1 * Math.log(0.1 / 0.085)) / (2 * 30);
    const Ro = 0.1 / (0.085 * 800) + Rw;
    const file = sketch({ body: { emissivity: 0.8, tube }, duct: { emissivity: 0.6, temperature: 1400 } });
    const T = bisect((t) => -radiation(t, 1400, 0.8, 0.6) - (4 * (t - 600)) / Ro, 600, 1400);
    const body = json(file).surfaces[1];
    close(body.temperature, T);
    close(body.suppliedHeat, (-4 * (T - 600)) / Ro);
    close(body.innerTemperature!, T - ((T - 600) / Ro) * Rw);
    expect(body.coldFaceTemperature).toBeUndefined();
  });

  it('refuses a bad tube with a message naming the surface and the field', () => {
    const bad = sketch({
      body: {
        tube: {
          fluidTemperature: 600,
          insideCoefficient: 0,
          outerDiameter: 0.1,
          innerDiameter: 0.08,
          wallConductivity: 30,
        },
      },
    });
    const r = run(bad, '--json');
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    expect(r.err).toMatch(/surface 'body': tube.insideCoefficient must be greater than 0 \(got 0\)/);
  });
});
