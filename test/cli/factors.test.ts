import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { main } from '../../src/cli/main';
import type { CliIO } from '../../src/cli/io';

// The factors command end to end through main() with files in memory.

interface Run {
  code: number;
  out: string;
  err: string;
}

function run(args: string[], files: Record<string, string> = {}): Run {
  let out = '';
  let err = '';
  const io: CliIO = {
    out: (t) => {
      out += t;
    },
    err: (t) => {
      err += t;
    },
    readFile: (path) => {
      if (!(path in files))
        throw Object.assign(new Error(`ENOENT: no such file or directory, open '${path}'`), { code: 'ENOENT' });
      return files[path];
    },
  };
  return { code: main(args, io), out, err };
}

const sketch = (shapes: unknown[], extra: object = {}) => JSON.stringify({ version: 1, units: 'm', shapes, ...extra });

/** A 3-4-5 right triangle as an enclosure; surfaces a (3), b (4), c (5). */
const triangle = sketch([
  {
    kind: 'enclosure',
    points: [
      [0, 0],
      [3, 0],
      [3, 4],
    ],
    surface: ['a', 'b', 'c'],
  },
]);
/** A unit square duct, walls named anticlockwise from the floor. */
const square = sketch([
  {
    kind: 'enclosure',
    points: [
      [0, 0],
      [1, 0],
      [1, 1],
      [0, 1],
    ],
    surface: ['floor', 'right', 'roof', 'left'],
  },
]);

function json(r: Run) {
  expect(r.code).toBe(0);
  return JSON.parse(r.out) as {
    surfaces: { name: string; length: number }[];
    viewFactors: number[][];
    rowSumResidual: number[];
    reciprocityResidual: number;
  };
}

/** No stack trace, no internals, a few short lines. */
function expectShortError(r: Run, code: number) {
  expect(r.code).toBe(code);
  expect(r.out).toBe('');
  expect(r.err).not.toMatch(/\n\s+at |Error:|node_modules|\.ts:\d/);
  const lines = r.err.trimEnd().split('\n');
  expect(lines.length).toBeLessThanOrEqual(6);
  for (const l of lines) expect(l.length).toBeLessThan(260);
}

describe('factors --json', () => {
  it('three-sided enclosure: F_ij = (L_i + L_j - L_k) / (2 L_i)', () => {
    // Hottel's crossed strings for a long three-sided enclosure; Incropera et al.,
    // Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.1 (three-sided enclosure).
    const r = json(run(['factors', 'tri.json', '--json'], { 'tri.json': triangle }));
    expect(Object.keys(r)).toEqual(['surfaces', 'viewFactors', 'rowSumResidual', 'reciprocityResidual']);
    expect(r.surfaces).toEqual([
      { name: 'a', length: 3 },
      { name: 'b', length: 4 },
      { name: 'c', length: 5 },
    ]);
    const L = [3, 4, 5];
    expect(r.viewFactors).toHaveLength(3);
    for (let i = 0; i < 3; i++) {
      expect(r.viewFactors[i]).toHaveLength(3);
      let row = 0;
      for (let j = 0; j < 3; j++) {
        const k = 3 - i - j;
        const expected = i === j ? 0 : (L[i] + L[j] - L[k]) / (2 * L[i]);
        expect(r.viewFactors[i][j]).toBeCloseTo(expected, 12);
        row += r.viewFactors[i][j];
        // Reciprocity, L_i F_ij = L_j F_ji (Incropera et al., 6th ed., sec. 13.1; equation number from memory), from the printed factors.
        expect(Math.abs(L[i] * r.viewFactors[i][j] - L[j] * r.viewFactors[j][i])).toBeLessThan(1e-12);
      }
      // The printed residual is 1 - the row sum of the printed factors, and that sum is one (closed).
      expect(Math.abs(1 - row)).toBeLessThan(1e-12);
      expect(Math.abs(r.rowSumResidual[i] - (1 - row))).toBeLessThan(1e-15);
    }
    expect(r.viewFactors[0][1]).toBeCloseTo(1 / 3, 12); // (3 + 4 - 5) / 6
    expect(r.reciprocityResidual).toBeLessThan(1e-12);
  });

  it('square duct: adjacent walls 1 - sqrt(2)/2, opposite walls sqrt(2) - 1', () => {
    // Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.1:
    // perpendicular plates with a common edge, F = [1 + w/h - sqrt(1 + (w/h)^2)] / 2,
    // and parallel plates with midlines connected by a perpendicular (W = 1 each),
    // F = [sqrt((Wi + Wj)^2 + 4) - sqrt((Wj - Wi)^2 + 4)] / (2 Wi); the same values
    // by Hottel's crossed strings (Modest, Radiative Heat Transfer, 3rd ed., ch. 4).
    const r = json(run(['factors', 'sq.json', '--json'], { 'sq.json': square }));
    const adjacent = 1 - Math.SQRT2 / 2,
      opposite = Math.SQRT2 - 1;
    const expected = [
      [0, adjacent, opposite, adjacent],
      [adjacent, 0, adjacent, opposite],
      [opposite, adjacent, 0, adjacent],
      [adjacent, opposite, adjacent, 0],
    ];
    expect(r.viewFactors.map((row) => row.length)).toEqual([4, 4, 4, 4]);
    r.viewFactors.forEach((row, i) => row.forEach((f, j) => expect(f).toBeCloseTo(expected[i][j], 12)));
  });

  it('open sketch: 1 - row sum is the factor to the surroundings', () => {
    // Two unit squares 1 apart: only the facing sides see each other, as parallel
    // plates of width 1 at distance 1 (Incropera et al., 6th ed., Table 13.1, parallel
    // plates with midlines connected by a perpendicular, Wi = Wj = 1):
    // F = [sqrt(8) - sqrt(4)] / 2 = sqrt(2) - 1; per whole square (perimeter 4): (sqrt(2) - 1) / 4.
    const open = sketch([
      {
        kind: 'solid',
        points: [
          [0, 0],
          [1, 0],
          [1, 1],
          [0, 1],
        ],
        surface: 'left block',
      },
      {
        kind: 'solid',
        points: [
          [2, 0],
          [3, 0],
          [3, 1],
          [2, 1],
        ],
        surface: 'right block',
      },
    ]);
    const r = json(run(['factors', 'o.json', '--json'], { 'o.json': open }));
    const F = (Math.SQRT2 - 1) / 4;
    expect(r.viewFactors[0][1]).toBeCloseTo(F, 12);
    expect(r.viewFactors[1][0]).toBeCloseTo(F, 12);
    expect(r.rowSumResidual[0]).toBeCloseTo(1 - F, 12);
    const table = run(['factors', 'o.json'], { 'o.json': open });
    expect(table.out).toMatch(/surroundings/);
    expect(table.out).toContain((1 - F).toFixed(6));
  });

  it('prints repairs as warnings on stderr and keeps stdout one JSON object', () => {
    const repeated = sketch([
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [3, 0],
          [3, 0],
          [3, 4],
        ],
        surface: ['a', 'gone', 'b', 'c'],
      },
    ]);
    const r = run(['factors', 'rep.json', '--json'], { 'rep.json': repeated });
    expect(json(r).surfaces.map((s) => s.name)).toEqual(['a', 'b', 'c']);
    expect(r.err).toBe(
      'factors: rep.json: warning: the enclosure (shape 1): removed point 2 (same as point 3), which made zero-length edges\n',
    );
  });
});

describe('factors --csv and the table', () => {
  it('CSV: header row and first column of names, every factor the closed form', () => {
    const csv = run(['factors', 'tri.json', '--csv'], { 'tri.json': triangle });
    expect(csv.code).toBe(0);
    expect(csv.out.endsWith('\r\n')).toBe(true);
    const rows = Papa.parse<string[]>(csv.out.trimEnd(), { newline: '\r\n', delimiter: ',' }).data;
    expect(rows[0]).toEqual(['from \\ to', 'a', 'b', 'c']);
    expect(rows.map((r) => r[0])).toEqual(['from \\ to', 'a', 'b', 'c']);
    // Three-sided enclosure: F_ij = (L_i + L_j - L_k) / (2 L_i) (Incropera et al., 6th ed., Table 13.1); flat sides: F_ii = 0.
    const L = [3, 4, 5];
    rows.slice(1).forEach((row, i) => {
      expect(row).toHaveLength(4);
      row
        .slice(1)
        .map(Number)
        .forEach((F, j) => {
          const expected = i === j ? 0 : (L[i] + L[j] - L[3 - i - j]) / (2 * L[i]);
          expect(Math.abs(F - expected)).toBeLessThanOrEqual(1e-9);
        });
    });
  });

  it('CSV neutralises formula-like surface names', () => {
    const names = ['=HYPERLINK("x")', '+wall', '-roof', '@floor'];
    const evil = sketch([
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [1, 0],
          [1, 1],
          [0, 1],
        ],
        surface: names,
      },
    ]);
    const rows = Papa.parse<string[]>(run(['factors', 'e.json', '--csv'], { 'e.json': evil }).out.trimEnd(), {
      newline: '\r\n',
      delimiter: ',',
    }).data;
    expect(rows[0].slice(1)).toEqual(names.map((n) => `'${n}`));
  });

  it('the default table names surfaces, lengths, factors and residuals', () => {
    const r = run(['factors', 'tri.json'], { 'tri.json': triangle });
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/3 surfaces, lengths in m/);
    expect(r.out).toMatch(/^ {2}a +0\.000000 +0\.333333 +0\.666667$/m); // (3+4-5)/6 and (3+5-4)/6
    expect(r.out).toMatch(/Enclosure rule: largest \|1 - row sum\| = /);
    expect(r.out).toMatch(/Reciprocity: /);
  });

  it('the table shows control characters in names as ?', () => {
    const odd = sketch([
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [3, 0],
          [3, 4],
        ],
        surface: ['\u001b[31mred', 'b', 'c'],
      },
    ]);
    const r = run(['factors', 'odd.json'], { 'odd.json': odd });
    expect(r.out).not.toContain('\u001b');
    expect(r.out).toContain('?[31mred');
  });
});

describe('factors errors', () => {
  it('a file that is not there', () => {
    const r = run(['factors', 'missing.json']);
    expectShortError(r, 1);
    expect(r.err).toBe("factors: cannot read 'missing.json': no such file\n");
  });

  it('bad files name what is wrong and where', () => {
    const cases: [string, RegExp][] = [
      ['', /^factors: bad\.json: the file is empty\n$/],
      ['{"version": 1, "units": "m", "shapes": [', /the file ends too early/],
      ['{"version": 3, "units": "m", "shapes": []}', /version 3 is newer than this program reads/],
      [
        sketch([
          {
            kind: 'solid',
            points: [
              [0, 0],
              [2, 0],
              [0, 2],
              [2, 2],
            ],
            surface: 'bow',
          },
        ]),
        /'bow' \(body, shape 1\): edge 2 crosses edge 4 at \(1, 1\)/,
      ],
      [
        sketch([
          {
            kind: 'enclosure',
            points: [
              [0, 0],
              [4, 0],
              [4, 2],
              [0, 2],
            ],
            surface: 'w',
          },
          {
            kind: 'solid',
            points: [
              [3.5, 0.5],
              [4.5, 0.5],
              [4.5, 1],
              [3.5, 1],
            ],
            surface: 'block',
          },
        ]),
        /'block' \(body, shape 2\): edge 1 crosses the enclosure wall 'w' \(shape 1, edge 2\) at \(4, 0.5\)/,
      ],
      [
        sketch([
          {
            kind: 'solid',
            points: [
              [0, 0],
              [1, 'x'],
              [0, 1],
            ],
            surface: 'a',
          },
        ]),
        /'a' \(body, shape 1\): point 2 y must be a finite number \(got "x"\)/,
      ],
      [sketch([], { units: 'yards' }), /units must be one of m, cm, mm, in, ft \(got "yards"\)/],
      [sketch([]), /the sketch has no shapes; nothing to compute/],
    ];
    for (const [text, message] of cases) {
      const r = run(['factors', 'bad.json', '--json'], { 'bad.json': text });
      expectShortError(r, 1);
      expect(r.err).toMatch(message);
    }
  });

  it('many problems stay a few lines', () => {
    const r = run(['factors', 'bad.json'], {
      'bad.json': sketch([{ kind: 'solid', points: Array.from({ length: 50 }, () => [null, null]), surface: 'a' }]),
    });
    expectShortError(r, 1);
    expect(r.err).toMatch(/…and \d+ more problems\n$/);
  });

  it('bad arguments exit 2 with the usage', () => {
    const files = { 'tri.json': triangle };
    for (const args of [
      ['factors'],
      ['factors', 'tri.json', '--xml'],
      ['factors', 'tri.json', '--json', '--csv'],
      ['factors', 'tri.json', 'tri.json'],
    ]) {
      const r = run(args, files);
      expectShortError(r, 2);
      expect(r.err).toMatch(/usage: npm run cli -- factors FILE \[--json \| --csv\]/);
    }
    expectShortError(run([]), 2);
    const unknown = run(['factorz', 'tri.json'], files);
    expectShortError(unknown, 2);
    expect(unknown.err).toMatch(/unknown command 'factorz'\nusage: .*commands: factors, exchange/);
  });

  it('--help prints to stdout and exits 0', () => {
    const r = run(['factors', '--help']);
    expect(r.code).toBe(0);
    expect(r.out).toMatch(/rowSumResidual/);
    expect(run(['--help']).out).toMatch(/factors FILE/);
  });

  it('a fault while reading becomes one line, not a trace', () => {
    const io: CliIO = {
      out: () => {},
      err: (t) => {
        err += t;
      },
      readFile: () => {
        throw new TypeError('disk on fire');
      },
    };
    let err = '';
    expect(main(['factors', 'x.json'], io)).toBe(1);
    expect(err).toBe("factors: cannot read 'x.json': disk on fire\n");
  });
});
