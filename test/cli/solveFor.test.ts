import { describe, expect, it } from 'vitest';
import { STEFAN_BOLTZMANN as SIGMA } from '../../src/core/exchange';
import { cliJson, exchangeOf, kiln, runCli, type ExchangeJson } from './studyHelpers';

// solve-for: the answer against closed forms, re-checked by a run at the
// answer, several roots found, and unreachable targets refused.

interface SolveJson {
  value: number;
  values?: number[];
  run: ExchangeJson;
}

type Pt = [number, number];
const regular = (sides: number, radius: number, phase = 0): Pt[] =>
  Array.from({ length: sides }, (_, k): Pt => [
    radius * Math.cos(phase + (2 * Math.PI * k) / sides),
    radius * Math.sin(phase + (2 * Math.PI * k) / sides),
  ]);

// A hexagonal radiant tube (circumradius 60 mm) in a hexagonal duct (250 mm).
// Similar concentric polygons: F12 = 1 and A1/A2 = r1/r2, so the two-surface
// enclosure form is exact: q' = sigma A1 (T1^4 - T2^4) / (1/e1 + (1 - e2)/e2 A1/A2)
// (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.3, long concentric cylinders).
const [r1, r2] = [60, 250];
const A1 = (6 * r1) / 1000; // m per metre of depth (hexagon side = circumradius)
const [e2, T2] = [0.4, 350];
function tubeInDuct(tube: { emissivity: number; temperature: number }) {
  return {
    version: 1,
    units: 'mm',
    shapes: [
      { kind: 'enclosure', points: regular(6, r2), surface: 'duct wall' },
      { kind: 'solid', points: regular(6, r1, 0.3), surface: 'tube.a' },
    ],
    surfaces: { 'tube.a': tube, 'duct wall': { emissivity: e2, temperature: T2 } },
  };
}
const resistance = (e1: number) => 1 / e1 + ((1 - e2) / e2) * (r1 / r2);

// The root search stops within 1e-9 of the value; the view factors and the
// closed form add rounding of ~1e-13 relative at most.
const VALUE_TOLERANCE = 1e-9 + 1e-12;

function solve(file: unknown, ...args: string[]): SolveJson {
  return cliJson({ 'f.json': file }, 'solve-for', 'f.json', ...args) as SolveJson;
}

/** The net heat of a surface in an exchange --json object, W/m. */
const netHeatOf = (run: ExchangeJson, name: string) => run.surfaces.find((s) => s.name === name)!.netHeat;

describe('solve-for against closed forms, checked by a run at the answer', () => {
  it('the tube temperature that gives off 5 kW per metre', () => {
    const e1 = 0.8;
    const Q = 5000;
    const expected = ((Q * resistance(e1)) / (SIGMA * A1) + T2 ** 4) ** 0.25;
    const args = ['--vary', 'tube.a.temperature', '--from', '400', '--to', '1600', '--target', 'tube.a.netHeat=5000'];
    const got = solve(tubeInDuct({ emissivity: e1, temperature: 900 }), ...args);
    expect(Math.abs(got.value - expected)).toBeLessThanOrEqual(VALUE_TOLERANCE * expected);
    expect(got.values).toBeUndefined();
    // The run is exchange --json at the answer, and the target is crossed within the tolerance of it.
    expect(got.run).toEqual(exchangeOf(tubeInDuct({ emissivity: e1, temperature: got.value })));
    const below = netHeatOf(exchangeOf(tubeInDuct({ emissivity: e1, temperature: got.value * (1 - 1e-9) })), 'tube.a');
    const above = netHeatOf(exchangeOf(tubeInDuct({ emissivity: e1, temperature: got.value * (1 + 1e-9) })), 'tube.a');
    expect(below).toBeLessThan(Q);
    expect(above).toBeGreaterThan(Q);
  });

  it('the tube emissivity that gives off 3 kW per metre at 800 K (target split on the last = and .)', () => {
    const T1 = 800;
    const Q = 3000;
    const expected = 1 / ((SIGMA * A1 * (T1 ** 4 - T2 ** 4)) / Q - ((1 - e2) / e2) * (r1 / r2));
    const got = solve(
      tubeInDuct({ emissivity: 0.5, temperature: T1 }),
      ...[
        '--vary',
        'tube.a.emissivity',
        '--from',
        '0.05',
        '--to',
        '1',
        '--target',
        'tube.a.netHeat=3e3',
        '--steps',
        '5',
      ],
    );
    expect(Math.abs(got.value - expected)).toBeLessThanOrEqual(VALUE_TOLERANCE * expected);
    expect(got.run).toEqual(exchangeOf(tubeInDuct({ emissivity: got.value, temperature: T1 })));
  });
});

describe('solve-for: several roots', () => {
  it('the ware stack takes up a given heat at two positions, mirror images across the kiln middle', () => {
    // The kiln is symmetric about x = 1.5 m (walls, crown and hearth alike), so the heat the stack takes
    // up at x = 1.1 m is taken up at x = 1.9 m too.
    const moved = kiln();
    moved.shapes[1].points = moved.shapes[1].points.map(([x, y]) => [x - 0.4, y]);
    const target = netHeatOf(exchangeOf(moved), 'ware stack.2');
    const got = solve(
      kiln(),
      '--vary',
      'ware stack.2.x',
      '--from',
      '0.7',
      '--to',
      '2.3',
      '--target',
      `ware stack.2.netHeat=${target}`,
    );
    expect(got.values).toHaveLength(2);
    expect(Math.abs(got.values![0] - 1.1)).toBeLessThanOrEqual(1e-8);
    expect(Math.abs(got.values![1] - 1.9)).toBeLessThanOrEqual(1e-8);
    expect(got.value).toBe(got.values![0]);
    const table = runCli(
      { 'k.json': kiln() },
      'solve-for',
      'k.json',
      '--vary',
      'ware stack.2.x',
      '--from',
      '0.7',
      '--to',
      '2.3',
      '--target',
      `ware stack.2.netHeat=${target}`,
    );
    expect(table.out).toMatch(
      /The target is met 2 times in the range, at 1\.1\d* m, 1\.(9|8999)\d* m; the lowest is shown/,
    );
  });
});

describe('solve-for refusals', () => {
  it('a target out of reach exits 1 with the range the result covers over the scan', () => {
    const file = tubeInDuct({ emissivity: 0.8, temperature: 900 });
    const r = runCli(
      { 'f.json': file },
      'solve-for',
      'f.json',
      '--vary',
      'tube.a.temperature',
      '--from',
      '500',
      '--to',
      '700',
      '--target',
      'tube.a.netHeat=50000',
    );
    expect(r.code).toBe(1);
    expect(r.out).toBe('');
    const m =
      /net heat of 'tube\.a' does not reach 50000 W\/m for temperature of 'tube\.a' from 500 to 700 K: at the 16 values scanned it covers (\S+) to (\S+) W\/m/.exec(
        r.err,
      );
    expect(m).not.toBeNull();
    // Net heat grows with the tube temperature: the range is the closed form at the two ends.
    const q = (T1: number) => (SIGMA * A1 * (T1 ** 4 - T2 ** 4)) / resistance(0.8);
    expect(Math.abs(Number(m![1]) - q(500))).toBeLessThanOrEqual(1e-9 * q(500));
    expect(Math.abs(Number(m![2]) - q(700))).toBeLessThanOrEqual(1e-9 * q(700));
  });

  it('a result that does not change with the parameter is refused, not answered with every value', () => {
    // The ware is held at 700 K: its temperature is the target whatever the hearth emissivity.
    const r = runCli(
      { 'k.json': kiln() },
      'solve-for',
      'k.json',
      '--vary',
      'hearth.emissivity',
      '--from',
      '0.2',
      '--to',
      '1',
      '--target',
      'ware stack.2.temperature=700',
    );
    expect(r.code).toBe(1);
    expect(r.err).toMatch(
      /temperature of 'ware stack.2' equals 700 K at every value scanned: it does not change with emissivity of 'hearth'/,
    );
  });

  it('varying the temperature of a surface without a temperature condition is refused', () => {
    const r = runCli(
      { 'k.json': kiln() },
      'solve-for',
      'k.json',
      '--vary',
      'wall.temperature',
      '--from',
      '400',
      '--to',
      '900',
      '--target',
      'wall.netHeat=0',
    );
    expect(r.code).toBe(1);
    expect(r.err).toMatch(
      /'wall' has no temperature condition to vary; give it a temperature in the file first \(it is given a heat flux\)/,
    );
  });

  it('bad targets and a missing target are usage errors (exit 2)', () => {
    const base = ['solve-for', 'k.json', '--vary', 'hearth.temperature', '--from', '1000', '--to', '1400'];
    for (const [target, message] of [
      ['hearth.netHeat', /is not SURFACE.QUANTITY=VALUE/],
      ['hearth.colour=3', /'colour' is not a result to aim at/],
      ['hearth.netHeat=lots', /the target value must be a number, got 'lots'/],
    ] as const) {
      const r = runCli({ 'k.json': kiln() }, ...base, '--target', target);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(message);
    }
    expect(runCli({ 'k.json': kiln() }, ...base).err).toMatch(/give the target/);
    const unknown = runCli({ 'k.json': kiln() }, ...base, '--target', 'roof.netHeat=1');
    expect(unknown.code).toBe(1);
    expect(unknown.err).toMatch(/the target names no surface of the sketch: 'roof'/);
  });
});

describe('solve-for a split tube’s peak-to-average flux', () => {
  // A cold tube split into 8 arcs above a hot floor, cooler walls: the flux around it is uneven.
  const arcs = Array.from({ length: 8 }, (_, k) => `tube ${k + 1}`);
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
        surface: ['floor', 'right', 'roof', 'left'],
      },
      { kind: 'solid', circle: { center: [1, 0.75], radius: 0.1 }, surface: arcs },
    ],
    surfaces: {
      floor: { emissivity: 0.9, temperature: 1400 },
      right: { temperature: 500 },
      roof: { temperature: 500 },
      left: { temperature: 500 },
      ...Object.fromEntries(arcs.map((n) => [n, { temperature: 600 }])),
    },
  };

  it('finds the height at which the ratio is met; a run of the edited file at the answer gives it', () => {
    const out = cliJson(
      { 'oven.json': oven },
      'solve-for',
      'oven.json',
      '--vary',
      'tube 1.y',
      '--from',
      '0.3',
      '--to',
      '1.2',
      '--target',
      'tube.peakToAverage=2.3',
    ) as SolveJson;
    expect(out.value).toBeGreaterThan(0.3);
    expect(out.value).toBeLessThan(1.2);
    const edited = structuredClone(oven);
    edited.shapes[1].circle!.center[1] = out.value;
    const run = exchangeOf(edited);
    // Peak-to-average worked out here from the arcs' net fluxes (equal arcs: the plain mean).
    const q = arcs.map((n) => run.surfaces.find((s) => s.name === n)!.netFlux);
    expect(q).toHaveLength(8);
    const mean = q.reduce((a, b) => a + b, 0) / q.length;
    const peak = q.reduce((a, b) => (Math.abs(b) > Math.abs(a) ? b : a));
    // Brent stops within 1e-9 (relative) of the height, about 5e-10 m; the ratio changes by about 0.5 per metre
    // of height here, so it is met to well within 1e-8.
    expect(Math.abs(peak / mean - 2.3)).toBeLessThan(1e-8);
  });

  it('refuses a name that is not split into parts', () => {
    const r = runCli(
      { 'oven.json': oven },
      'solve-for',
      'oven.json',
      '--vary',
      'tube 1.y',
      '--from',
      '0.3',
      '--to',
      '1.2',
      '--target',
      'floor.peakToAverage=2',
    );
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/peak-to-average net flux of 'floor' is not defined/);
  });
});
