// Shared by the design-study command tests: run the command line with files in
// memory, and a sketch of our own (a tile kiln cross-section) to study.
import { expect } from 'vitest';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';

export function runCli(files: Record<string, unknown>, ...argv: string[]) {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: (path) => {
      if (!Object.hasOwn(files, path)) throw Object.assign(new Error('nope'), { code: 'ENOENT' });
      const f = files[path];
      return typeof f === 'string' ? f : JSON.stringify(f);
    },
  };
  const code = main(argv, io);
  return { code, out, err };
}

/** The command's --json output, checked to have succeeded. */
export function cliJson(files: Record<string, unknown>, ...argv: string[]): unknown {
  const r = runCli(files, ...argv, '--json');
  expect(r.err).toBe('');
  expect(r.code).toBe(0);
  return JSON.parse(r.out) as unknown;
}

/** What `exchange --json` prints for one file. */
export function exchangeOf(file: unknown): ExchangeJson {
  return cliJson({ 'edited.json': file }, 'exchange', 'edited.json') as ExchangeJson;
}

export interface ExchangeJson {
  surfaces: { name: string; netHeat: number; netFlux: number; temperature: number; radiosity: number }[];
  [key: string]: unknown;
}

type Pt = [number, number];

/**
 * A tile kiln, 3 m x 1.5 m inside: a hot hearth, an insulated crown and walls,
 * a stack of ware on the hearth (a name with a space and a dot), and, when
 * `open`, a door slot in the right wall to a 300 K room.
 */
export function kiln(open = false) {
  const enclosure: Pt[] = [
    [0, 0],
    [3, 0],
    [3, 0.6],
    [3, 1.5],
    [0, 1.5],
  ];
  const surface = ['hearth', open ? 'door' : 'wall', 'wall', 'crown', 'wall'];
  return {
    version: 1,
    units: 'm',
    shapes: [
      { kind: 'enclosure', points: enclosure, surface },
      {
        kind: 'solid',
        points: [
          [1, 0.3],
          [2, 0.3],
          [2, 0.8],
          [1, 0.8],
        ] as Pt[],
        surface: 'ware stack.2',
      },
    ],
    surfaces: {
      hearth: { emissivity: 0.85, temperature: 1250 },
      crown: { emissivity: 0.6, adiabatic: true },
      wall: { emissivity: 0.7, heatFlux: 150 },
      'ware stack.2': { emissivity: 0.75, temperature: 700 },
      ...(open ? { door: { opening: true } } : {}),
    } as Record<string, Record<string, number | boolean>>,
    settings: open ? { surroundingsTemperature: 300, depth: 4 } : ({} as Record<string, number>),
  };
}

/** Evenly spaced values, both ends exact (written out here, not taken from the code under test). */
export function spaced(from: number, to: number, n: number): number[] {
  return Array.from({ length: n }, (_, k) => (k === n - 1 ? to : from + ((to - from) * k) / (n - 1)));
}
