import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { editedSketch, parseParameter } from '../../src/document/study';
import { restore, serialize } from '../../src/document';
import { cliJson, exchangeOf, kiln, runCli, spaced, type ExchangeJson } from './studyHelpers';

// Every value of a sweep must be exactly the object `exchange --json` prints for
// the file edited by hand to that value (same numbers to the last bit: the
// sweep reuses view factors only where the geometry is the same).

interface SweepJson {
  values: number[];
  runs: ExchangeJson[];
}

type Kiln = ReturnType<typeof kiln>;

function sweep(file: Kiln, vary: string, from: number, to: number, steps: number): SweepJson {
  return cliJson(
    { 'kiln.json': file },
    'sweep',
    'kiln.json',
    '--vary',
    vary,
    '--from',
    String(from),
    '--to',
    String(to),
    '--steps',
    String(steps),
  ) as SweepJson;
}

describe('sweep --json: each run is exchange --json of the edited file', () => {
  const cases: [string, boolean, string, number, number, (f: Kiln, v: number) => void][] = [
    ['hearth temperature', false, 'hearth.temperature', 1100, 1400, (f, v) => void (f.surfaces.hearth.temperature = v)],
    [
      'emissivity of a name with a dot and a space',
      false,
      'ware stack.2.emissivity',
      0.3,
      0.95,
      (f, v) => void (f.surfaces['ware stack.2'].emissivity = v),
    ],
    ['wall heat flux', false, 'wall.heatFlux', -200, 400, (f, v) => void (f.surfaces.wall.heatFlux = v)],
    [
      'crown emissivity (adiabatic: no effect on heat)',
      false,
      'crown.emissivity',
      0.2,
      1,
      (f, v) => void (f.surfaces.crown.emissivity = v),
    ],
    [
      'surroundings temperature',
      true,
      'settings.surroundingsTemperature',
      280,
      330,
      (f, v) => void (f.settings.surroundingsTemperature = v),
    ],
    ['depth', true, 'settings.depth', 1, 6, (f, v) => void (f.settings.depth = v)],
  ];
  it.each(cases)('%s', (_label, open, vary, from, to, edit) => {
    const steps = 4;
    const got = sweep(kiln(open), vary, from, to, steps);
    expect(got.values).toEqual(spaced(from, to, steps));
    expect(got.runs).toHaveLength(steps);
    got.values.forEach((v, k) => {
      const file = kiln(open);
      edit(file, v);
      expect(got.runs[k]).toEqual(exchangeOf(file));
    });
  });

  it('moving the ware stack recomputes view factors: each run is exchange --json of the moved file', () => {
    const got = sweep(kiln(), 'ware stack.2.x', 0.8, 2.2, 3);
    const p = parseParameter('ware stack.2.x');
    if (!p.ok) throw new Error(p.message);
    const base = restore(kiln());
    if (!base.ok) throw new Error('kiln');
    got.values.forEach((v, k) => {
      // Exactly the file the study wrote...
      const edited = editedSketch(base.sketch, p.value, v);
      if (!edited.ok) throw new Error(edited.message);
      expect(got.runs[k]).toEqual(exchangeOf(serialize(edited.sketch)));
      // ...which is the stack moved by hand so its middle is at x = v (to rounding of the shift).
      const byHand = kiln();
      byHand.shapes[1].points = byHand.shapes[1].points.map(([x, y]) => [x - 1.5 + v, y]);
      const want = exchangeOf(byHand);
      got.runs[k].surfaces.forEach((s, i) =>
        expect(Math.abs(s.netHeat - want.surfaces[i].netHeat)).toBeLessThanOrEqual(
          1e-9 * Math.abs(want.surfaces[i].netHeat) + 1e-9,
        ),
      );
    });
    // The heat the ware takes up changes as it moves (the view factors were recomputed).
    expect(got.runs[0].surfaces[got.runs[0].surfaces.length - 1].netHeat).not.toBe(
      got.runs[1].surfaces.at(-1)!.netHeat,
    );
  });
});

describe('sweep --json over convection inputs (file version 2)', () => {
  // The hearth and the ware lose heat to a gas at 900 K as well as by radiation.
  function convective(h = 15, gas = 900) {
    const file = kiln() as Kiln & { version: number };
    file.version = 2;
    (file.surfaces.hearth as Record<string, number>).convectionCoefficient = h;
    (file.surfaces['ware stack.2'] as Record<string, number>).convectionCoefficient = 8;
    file.settings.gasTemperature = gas;
    return file;
  }
  it.each([
    ['hearth.convectionCoefficient', 5, 40, (v: number) => convective(v)],
    ['settings.gasTemperature', 800, 1000, (v: number) => convective(15, v)],
  ] as const)('%s', (vary, from, to, edited) => {
    const got = sweep(convective(), vary, from, to, 3);
    got.values.forEach((v, k) => expect(got.runs[k]).toEqual(exchangeOf(edited(v))));
  });
});

describe('sweep --csv and the table', () => {
  // The table and CSV keep only their rows of each case (sweepRowOf), --json the whole
  // runs: the same numbers, for a property and for a position (new view factors each value).
  const cases: [string, string, number, number][] = [
    ['hearth.temperature', "temperature of 'hearth' (K)", 1150, 1350],
    ['ware stack.2.x', "position x of the shape of 'ware stack.2' (m)", 0.8, 2.2],
  ];
  it.each(cases)(
    '%s: one row per value with every surface net heat and temperature, matching --json',
    (vary, label, from, to) => {
      const argv = ['sweep', 'kiln.json', '--vary', vary, '--from', String(from), '--to', String(to), '--steps', '3'];
      const csv = runCli({ 'kiln.json': kiln() }, ...argv, '--csv');
      expect(csv.code).toBe(0);
      const rows = Papa.parse<string[]>(csv.out.trim()).data;
      const json = cliJson({ 'kiln.json': kiln() }, ...argv) as SweepJson;
      const names = json.runs[0].surfaces.map((s) => s.name);
      expect(rows[0]).toEqual([label, ...names.flatMap((n) => [`${n}: net heat (W/m)`, `${n}: temperature (K)`])]);
      expect(rows).toHaveLength(4);
      json.runs.forEach((run, k) => {
        expect(Number(rows[k + 1][0])).toBe(json.values[k]);
        run.surfaces.forEach((s, i) => {
          expect(Number(rows[k + 1][1 + 2 * i])).toBe(s.netHeat);
          expect(Number(rows[k + 1][2 + 2 * i])).toBe(s.temperature);
        });
      });
      const table = runCli({ 'kiln.json': kiln() }, ...argv);
      expect(table.code).toBe(0);
      expect(table.out).toContain(`Sweep of ${label}`);
      expect(table.out).toMatch(/licensed engineering practice/);
    },
  );
});

describe('sweep refusals', () => {
  const files = { 'kiln.json': kiln() };
  const base = ['sweep', 'kiln.json', '--from', '1', '--to', '2', '--steps', '3'];
  it('bad command lines exit 2 with the usage', () => {
    for (const extra of [[], ['--vary', 'hearth'], ['--vary', 'hearth.colour']]) {
      const r = runCli(files, ...base, ...extra);
      expect(r.code).toBe(2);
      expect(r.err).toMatch(/usage: npm run cli -- sweep/);
    }
    expect(
      runCli(files, 'sweep', 'kiln.json', '--vary', 'hearth.temperature', '--from', 'hot', '--to', '2', '--steps', '3')
        .err,
    ).toMatch(/--from must be a number, got 'hot'/);
  });

  it('a temperature is varied only where the file holds the surface at one', () => {
    const r = runCli(files, ...base, '--vary', 'crown.temperature');
    expect(r.code).toBe(1);
    expect(r.err).toMatch(
      /'crown' has no temperature condition to vary; give it a temperature in the file first \(it is adiabatic\)/,
    );
  });

  it('an unknown surface, too many steps, and a value the file cannot hold are refused with what and where', () => {
    expect(runCli(files, ...base, '--vary', 'roof.emissivity').err).toMatch(/no surface named 'roof'/);
    const many = runCli(
      files,
      'sweep',
      'kiln.json',
      '--vary',
      'hearth.emissivity',
      '--from',
      '0.5',
      '--to',
      '1',
      '--steps',
      '1001',
    );
    expect(many.code).toBe(2);
    expect(many.err).toMatch(/--steps must be a whole number from 2 to 1000, got '1001'/);
    const zero = runCli(
      files,
      'sweep',
      'kiln.json',
      '--vary',
      'hearth.emissivity',
      '--from',
      '0',
      '--to',
      '1',
      '--steps',
      '3',
    );
    expect(zero.code).toBe(1);
    expect(zero.err).toMatch(/with emissivity of 'hearth' = 0: surface 'hearth': emissivity must be/);
    const overlap = runCli(
      files,
      'sweep',
      'kiln.json',
      '--vary',
      'ware stack.2.y',
      '--from',
      '0.5',
      '--to',
      '1.6',
      '--steps',
      '2',
    );
    expect(overlap.code).toBe(1);
    expect(overlap.err).toMatch(/with position y of the shape of 'ware stack.2' = 1.6 m: /);
    const twoShapes = kiln();
    twoShapes.shapes.push({
      kind: 'solid',
      points: [
        [2.3, 1],
        [2.6, 1],
        [2.6, 1.2],
        [2.3, 1.2],
      ],
      surface: 'wall',
    });
    const shared = runCli(
      { 'two.json': twoShapes },
      'sweep',
      'two.json',
      '--vary',
      'wall.x',
      '--from',
      '1',
      '--to',
      '2',
      '--steps',
      '2',
    );
    expect(shared.code).toBe(1);
    expect(shared.err).toMatch(
      /'wall' names edges of 2 shapes \(1, 3\); to move one, give it a surface name of its own/,
    );
  });
});
