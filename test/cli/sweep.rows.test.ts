import { describe, expect, it } from 'vitest';
import { cliJson, exchangeOf, runCli, spaced, type ExchangeJson } from './studyHelpers';

// A tube row's pitch, diameter and distance from its wall as study parameters.
// Each run must be exactly exchange --json of the file with that value written
// in: the row's number and its three tubes, placed here by hand (a 3 m wide
// box, roof at y = 1.5 running from x = 3 to 0; the row centred on x = 1.5,
// its centre line `distance` below the roof).

const twelve = (v: number) => Number(v.toPrecision(12));

function rowFile(pitch = 0.5, diameter = 0.2, distance = 0.4) {
  const tubes = [0, 1, 2].map((k) => ({
    kind: 'solid',
    circle: { center: [twelve(1.5 + pitch - k * pitch), twelve(1.5 - distance)], radius: diameter / 2 },
    surface: `tube ${k + 1}`,
    row: 'roof row',
  }));
  return {
    version: 2,
    units: 'm',
    shapes: [
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [3, 0],
          [3, 1.5],
          [0, 1.5],
        ],
        surface: ['hearth', 'right', 'roof', 'left'],
      },
      ...tubes,
    ],
    surfaces: {
      hearth: { emissivity: 0.9, temperature: 1250 },
      roof: { emissivity: 0.6 },
      'tube 1': { emissivity: 0.85, temperature: 620 },
      'tube 2': { emissivity: 0.85, temperature: 620 },
      'tube 3': { emissivity: 0.85, temperature: 620 },
    },
    rows: { 'roof row': { count: 3, diameter, pitch, from: { wall: 'roof', distance } } },
  };
}

function sweep(file: unknown, vary: string, from: number, to: number, steps: number) {
  return cliJson(
    { 'r.json': file },
    ...['sweep', 'r.json', '--vary', vary, '--from', String(from), '--to', String(to), '--steps', String(steps)],
  ) as { values: number[]; runs: ExchangeJson[] };
}

const tubesNet = (run: ExchangeJson) =>
  run.surfaces.filter((s) => s.name.startsWith('tube ')).reduce((sum, s) => sum + s.netHeat, 0);

describe('sweeps of a tube row', () => {
  it('the hand-written file is a valid row', () => {
    expect(runCli({ 'r.json': rowFile() }, 'exchange', 'r.json').code).toBe(0);
  });

  it('pitch: each run is exchange --json of the file with the tubes at that pitch', () => {
    const got = sweep(rowFile(), 'roof row.pitch', 0.3, 0.9, 4);
    expect(got.values).toEqual(spaced(0.3, 0.9, 4));
    got.values.forEach((s, k) => expect(got.runs[k]).toEqual(exchangeOf(rowFile(s))));
    // Spread apart, the tubes shade one another less: together they take up more heat (more negative).
    const net = got.runs.map(tubesNet);
    for (let k = 1; k < net.length; k++) expect(net[k]).toBeLessThan(net[k - 1]);
  });

  it('diameter and distance: each run is exchange --json of the edited file', () => {
    const d = sweep(rowFile(), 'roof row.diameter', 0.1, 0.3, 3);
    d.values.forEach((v, k) => expect(d.runs[k]).toEqual(exchangeOf(rowFile(0.5, v))));
    const h = sweep(rowFile(), 'roof row.distance', 0.3, 0.9, 3);
    h.values.forEach((v, k) => expect(h.runs[k]).toEqual(exchangeOf(rowFile(0.5, 0.2, v))));
  });

  it('solve-for a pitch: a run of the file at the answer meets the target', () => {
    // Aim at the middle tube's net heat halfway between its values at the ends of the range.
    const middle = (s: number) => exchangeOf(rowFile(s)).surfaces.find((x) => x.name === 'tube 2')!.netHeat;
    const target = (middle(0.3) + middle(0.9)) / 2;
    const got = cliJson(
      { 'r.json': rowFile() },
      ...['solve-for', 'r.json', '--vary', 'roof row.pitch', '--from', '0.3', '--to', '0.9'],
      ...['--target', `tube 2.netHeat=${target}`],
    ) as { value: number; run: ExchangeJson };
    expect(got.run).toEqual(exchangeOf(rowFile(got.value)));
    expect(middle(got.value)).toBeCloseTo(target, 6);
  });

  it('refuses a row that is not there, a distance of a row placed from a point, and overlapping tubes', () => {
    const args = (vary: string, from: string, to: string) =>
      runCli({ 'r.json': rowFile() }, 'sweep', 'r.json', '--vary', vary, '--from', from, '--to', to, '--steps', '2');
    const none = args('floor row.pitch', '0.3', '0.6');
    expect(none.code).toBe(1);
    expect(none.err).toBe("sweep: r.json: the sketch has no tube row named 'floor row'; its rows: 'roof row'\n");
    const overlap = args('roof row.pitch', '0.1', '0.5');
    expect(overlap.code).toBe(1);
    expect(overlap.err).toMatch(
      /with pitch of row 'roof row' = 0\.1 m: row 'roof row': the pitch \(0\.1\) must be greater than the diameter \(0\.2\), or the tubes overlap/,
    );
    const fromPoint = rowFile();
    fromPoint.rows['roof row'].from = { start: [2, 1.1], angle: 180 } as never;
    const r = runCli(
      { 'r.json': fromPoint },
      'sweep',
      'r.json',
      '--vary',
      'roof row.distance',
      '--from',
      '0.3',
      '--to',
      '0.4',
      '--steps',
      '2',
    );
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/row 'roof row' is placed from a start point, not from a wall: it has no distance to vary/);
  });
});
