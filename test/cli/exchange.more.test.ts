// The command line end to end: sketch file -> view factors -> exchange -> output.
// Physics checks name their source; the chain is exact to rounding (1e-9).
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { run, json, close } from './exchangeHelpers';
import { box } from '../state/boxSketch';

describe('exchange FILE: options and formats', () => {
  // The shared 4 x 2 box holding one block, with the conditions of these runs.
  const duct = {
    ...box,
    surfaces: {
      floor: { emissivity: 0.9, temperature: 1100 },
      roof: { emissivity: 0.3, temperature: 600 },
      block: { heatFlux: -5000 },
    },
  };
  const inMm = {
    ...duct,
    units: 'mm',
    shapes: duct.shapes.map((s) => ({ ...s, points: s.points.map(([x, y]) => [x * 1000, y * 1000]) })),
  };

  it('--json has exactly the documented keys, in surface order', () => {
    const j = json({ 'd.json': duct }, 'd.json');
    expect(Object.keys(j)).toEqual(['surfaces', 'exchange', 'energyBalance']);
    expect(Object.keys(j.surfaces[0])).toEqual([
      'name',
      'length',
      'emissivity',
      'temperature',
      'netHeat',
      'netFlux',
      'radiosity',
      'convectionHeat',
      'suppliedHeat',
    ]);
    expect(j.surfaces.map((s: { name: string }) => s.name)).toEqual(['floor', 'right', 'roof', 'left', 'block']);
    expect(j.exchange).toHaveLength(5);
    expect(j.exchange[0]).toHaveLength(5);
    const sum = j.surfaces.reduce((a: number, s: { netHeat: number }) => a + s.netHeat, 0);
    expect(Math.abs(sum)).toBeLessThan(1e-9 * Math.abs(j.surfaces[0].netHeat));
  });

  it('the same sketch in mm gives the same heat per metre; lengths stay in file units', () => {
    const a = json({ 'd.json': duct }, 'd.json');
    const b = json({ 'd.json': inMm }, 'd.json');
    for (let i = 0; i < 5; i++) {
      close(
        b.surfaces[i].netHeat === 0 ? 1 : b.surfaces[i].netHeat,
        a.surfaces[i].netHeat === 0 ? 1 : a.surfaces[i].netHeat,
      );
      close(b.surfaces[i].temperature, a.surfaces[i].temperature);
      close(b.surfaces[i].length, 1000 * a.surfaces[i].length);
    }
  });

  it('--depth adds totals in W (and overrides settings.depth)', () => {
    const withFileDepth = { ...duct, settings: { depth: 10 } };
    const j = json({ 'd.json': withFileDepth }, 'd.json', '--depth', '2.5');
    expect(j.depth).toBe(2.5);
    expect(j.surfaces).toHaveLength(5);
    for (const s of j.surfaces) expect(s.netHeatTotal).toBe(s.netHeat * 2.5);
    const k = json({ 'd.json': withFileDepth }, 'd.json');
    expect(k.depth).toBe(10);
    expect(json({ 'd.json': duct }, 'd.json', '--depth=4').surfaces[0].netHeatTotal).toBe(
      json({ 'd.json': duct }, 'd.json').surfaces[0].netHeat * 4,
    );
  });

  it('--csv: one row per surface with units in the header', () => {
    const r = run({ 'd.json': duct }, 'd.json', '--csv', '--depth', '3');
    expect(r.code).toBe(0);
    const rows = Papa.parse<string[]>(r.out.trim(), { skipEmptyLines: true }).data;
    expect(rows[0]).toEqual([
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
      'net heat total (W) over 3 m',
    ]);
    expect(rows.map((row) => row[0])).toEqual(['surface', 'floor', 'right', 'roof', 'left', 'block']);
    expect(rows.map((row) => row[3])).toEqual([
      'condition',
      'temperature',
      'adiabatic',
      'temperature',
      'adiabatic',
      'heat flux',
    ]);
  });

  it('the default table names units, sign convention and the safety caution', () => {
    const r = run({ 'd.json': duct }, 'd.json');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/lengths in m, per metre of depth/);
    expect(r.out).toMatch(/net heat \(W\/m\)/);
    expect(r.out).toMatch(/adiabatic \(T solved\)/);
    expect(r.out).toMatch(/Net heat > 0: the surface gives off more radiation than it absorbs/);
    expect(r.out).toMatch(
      /Gray-diffuse radiation, with convection to a transparent gas.*licensed engineering practice/,
    );
  });

  it('--help explains units and defaults', () => {
    const r = run({}, '--help');
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/emissivity 0\.9 and is adiabatic/);
  });
});

describe('exchange FILE: errors are short, on stderr, without a stack trace', () => {
  const expectShortError = (r: { code: number; out: string; err: string }, code: number, pattern: RegExp) => {
    expect(r.code).toBe(code);
    expect(r.out).toBe('');
    expect(r.err).toMatch(pattern);
    expect(r.err.split('\n').filter(Boolean).length).toBeLessThanOrEqual(3);
    expect(r.err).not.toMatch(/\n\s+at /);
  };
  const box = (surfaces: object, settings?: object) => ({
    version: 1,
    units: 'm',
    shapes: [
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [1, 0],
          [1, 1],
          [0, 1],
        ],
        surface: ['a', 'b', 'c', 'd'],
      },
    ],
    surfaces,
    ...(settings ? { settings } : {}),
  });

  it('no surface with a temperature (every surface defaults to adiabatic)', () => {
    expectShortError(
      run({ 'x.json': box({}) }, 'x.json'),
      1,
      /^exchange: x\.json: no unique answer: no surface has a temperature/,
    );
  });

  it('an open sketch without a surroundings temperature', () => {
    const file = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'solid',
          points: [
            [0, 0],
            [1, 0],
            [1, 1],
          ],
          surface: 'p',
        },
      ],
      surfaces: { p: { temperature: 500 } },
    };
    expectShortError(
      run({ 'o.json': file }, 'o.json'),
      1,
      /surface 'p' sees the surroundings .* but no surroundings temperature is set/,
    );
  });

  it('an opening without a surroundings temperature', () => {
    expectShortError(
      run({ 'x.json': box({ a: { temperature: 500 }, c: { opening: true } }) }, 'x.json'),
      1,
      /surface 'c' is an opening, but no surroundings temperature is set/,
    );
  });

  it('an impossible heat flux', () => {
    expectShortError(
      run({ 'x.json': box({ a: { temperature: 300 }, b: { heatFlux: -1e7 } }) }, 'x.json'),
      1,
      /surface 'b': no physical answer/,
    );
  });

  it('values out of range are refused by the file reader', () => {
    expectShortError(run({ 'x.json': box({ a: { emissivity: 1.5, temperature: 300 } }) }, 'x.json'), 1, /emissivity/);
    expectShortError(run({ 'x.json': box({ a: { temperature: -4 } }) }, 'x.json'), 1, /temperature/);
  });

  it('bad arguments exit 2 with the usage', () => {
    expectShortError(run({}, 'x.json', '--depth', 'deep'), 2, /--depth must be a number of metres above 0, got 'deep'/);
    expectShortError(run({}, 'x.json', '--depth', '0'), 2, /--depth must be a number of metres above 0/);
    expectShortError(run({}, 'x.json', '--depth'), 2, /--depth needs a number of metres/);
    expectShortError(run({}, 'x.json', '--json', '--csv'), 2, /choose one of --json and --csv/);
    expectShortError(run({}, 'x.json', '--colour'), 2, /unknown option '--colour'/);
    expectShortError(run({}), 2, /no sketch file given/);
  });

  it('a missing file or one that is not JSON', () => {
    expectShortError(run({}, 'gone.json'), 1, /cannot read 'gone\.json': no such file/);
    expectShortError(run({ 'bad.json': '{"version": 1,' }, 'bad.json'), 1, /^exchange: bad\.json: /);
  });
});
