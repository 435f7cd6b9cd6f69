import { describe, expect, it } from 'vitest';
import { cliJson, exchangeOf, runCli, spaced, type ExchangeJson } from './studyHelpers';

// Round tubes: a study varies an exact circle's radius or centre. Each run must
// be exactly exchange --json of the file with that radius or centre written in.

function tubeInDuct(radius = 0.1, center: [number, number] = [0.5, 0.4]) {
  return {
    version: 2,
    units: 'm',
    shapes: [
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [1, 0],
          [1, 0.8],
          [0, 0.8],
        ],
        surface: ['floor', 'wall', 'roof', 'wall'],
      },
      { kind: 'solid', circle: { center, radius }, surface: 'tube' },
    ],
    surfaces: {
      floor: { emissivity: 0.9, temperature: 1150 },
      tube: { emissivity: 0.8, temperature: 650 },
      roof: { emissivity: 0.6 },
    },
  };
}

function sweep(file: unknown, vary: string, from: number, to: number, steps: number) {
  return cliJson(
    { 't.json': file },
    ...['sweep', 't.json', '--vary', vary, '--from', String(from), '--to', String(to), '--steps', String(steps)],
  ) as { values: number[]; runs: ExchangeJson[] };
}

describe('sweeps of a round tube', () => {
  it('radius: each run is exchange --json of the file with that radius, and the tube takes up more as it grows', () => {
    const got = sweep(tubeInDuct(), 'tube.radius', 0.05, 0.2, 4);
    expect(got.values).toEqual(spaced(0.05, 0.2, 4));
    got.values.forEach((r, k) => expect(got.runs[k]).toEqual(exchangeOf(tubeInDuct(r))));
    const tube = got.runs.map((run) => run.surfaces.find((s) => s.name === 'tube')!.netHeat);
    for (let k = 1; k < tube.length; k++) expect(tube[k]).toBeLessThan(tube[k - 1]);
  });

  it('centre y: each run is exchange --json of the file with the tube moved', () => {
    const got = sweep(tubeInDuct(), 'tube.y', 0.2, 0.6, 3);
    got.values.forEach((y, k) => expect(got.runs[k]).toEqual(exchangeOf(tubeInDuct(0.1, [0.5, y]))));
  });

  it('a radius that makes the tube touch the floor is refused with the value; a polygon has no radius', () => {
    const r = runCli(
      { 't.json': tubeInDuct() },
      'sweep',
      't.json',
      '--vary',
      'tube.radius',
      '--from',
      '0.1',
      '--to',
      '0.5',
      '--steps',
      '2',
    );
    expect(r.code).toBe(1);
    expect(r.err).toMatch(/with radius of the shape of 'tube' = 0\.5 m: /);
    const poly = runCli(
      { 't.json': tubeInDuct() },
      'sweep',
      't.json',
      '--vary',
      'roof.radius',
      '--from',
      '1',
      '--to',
      '2',
      '--steps',
      '2',
    );
    expect(poly.err).toMatch(/'roof' is not on a circle/);
  });
});
