// @vitest-environment jsdom
// The report command end to end: the HTML names every surface, and every number
// it shows is the command line's own (the exchange and factors tables' text, the
// --json values in data-value); the file is self-contained and names are escaped.
import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { main } from '../../src/cli/main';
import type { ReportIO } from '../../src/cli/reportCommand';
import { runReport } from '../../src/cli/reportCommand';

const NOW = new Date(Date.UTC(2026, 11, 4, 9, 30));

function fakeIO(files: Record<string, unknown>) {
  const written: Record<string, string> = {};
  let out = '';
  let err = '';
  const io: ReportIO = {
    out: (t) => void (out += t),
    err: (t) => void (err += t),
    readFile: (path) => {
      if (!(path in files)) throw Object.assign(new Error('nope'), { code: 'ENOENT' });
      const f = files[path];
      return typeof f === 'string' ? f : JSON.stringify(f);
    },
    writeFile: (path, text) => void (written[path] = text),
    now: () => NOW,
  };
  return { io, written, out: () => out, err: () => err };
}

function cli(files: Record<string, unknown>, ...argv: string[]) {
  const f = fakeIO(files);
  const code = main(argv, f.io);
  return { code, out: f.out(), err: f.err(), written: f.written };
}

const parse = (html: string) => new DOMParser().parseFromString(html, 'text/html');

/** Cells of the command line's text tables: columns are two or more spaces apart. */
function textRows(block: string): string[][] {
  return block
    .split('\n')
    .filter((l) => l.startsWith('  ') && l.trim() !== '')
    .map((l) => l.trim().split(/ {2,}/));
}

function tableCells(doc: Document, name: string): string[][] {
  const table = doc.querySelector(`table[data-table="${name}"]`)!;
  expect(table, `table ${name}`).not.toBeNull();
  return [...table.querySelectorAll('tbody tr')].map((tr) => [...tr.children].map((c) => c.textContent ?? ''));
}

// A furnace section: fired floor, a roof split into three parts, walls, a block (open to nothing: closed).
const furnace = {
  version: 1,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 2],
        [3, 2],
        [1, 2],
        [0, 2],
      ],
      surface: ['floor', 'right wall', 'roof 1', 'roof 2', 'roof 3', 'left wall'],
    },
    {
      kind: 'solid',
      points: [
        [1.75, 0.75],
        [2.25, 0.75],
        [2.25, 1.25],
        [1.75, 1.25],
      ],
      surface: 'load',
    },
  ],
  surfaces: {
    floor: { emissivity: 0.85, temperature: 1400 },
    load: { emissivity: 0.7, temperature: 600 },
    'roof 2': { emissivity: 0.5 },
  },
  settings: { depth: 3 },
};

describe('report FILE', () => {
  const files = { 'furnace.json': furnace };
  const report = cli(files, 'report', 'furnace.json', '--out', 'out.html');
  const doc = parse(report.written['out.html'] ?? '');
  const ex = cli(files, 'exchange', 'furnace.json', '--json');
  const exJson = JSON.parse(ex.out) as {
    surfaces: { name: string; netHeat: number; netFlux: number; radiosity: number; temperature: number }[];
    exchange: number[][];
    energyBalance: number;
  };
  const factorsJson = JSON.parse(cli(files, 'factors', 'furnace.json', '--json').out) as {
    viewFactors: number[][];
    rowSumResidual: number[];
    reciprocityResidual: number;
  };
  const names = exJson.surfaces.map((s) => s.name);

  it('writes one file and says where', () => {
    expect(report.code).toBe(0);
    expect(report.err).toBe('');
    expect(Object.keys(report.written)).toEqual(['out.html']);
    expect(report.out).toBe('report: wrote out.html\n');
  });

  it('names every surface in the picture, the inputs and every table', () => {
    expect(names).toEqual(['floor', 'right wall', 'roof 1', 'roof 2', 'roof 3', 'left wall', 'load']);
    const labels = [...doc.querySelectorAll('svg text[data-surface]')].map((t) => t.textContent);
    expect(labels.sort()).toEqual([...names].sort());
    for (const table of ['inputs', 'view-factors', 'net-heat', 'exchange']) {
      expect(tableCells(doc, table).map((r) => r[0])).toEqual(names);
    }
  });

  it("shows the exchange command's numbers: table text and --json values", () => {
    const table = ex.out === '' ? '' : cli(files, 'exchange', 'furnace.json').out;
    const [cliHead, ...cliRows] = textRows(table.split('\n\n')[1]);
    expect(cliHead[0]).toBe('surface');
    const head = [...doc.querySelectorAll('table[data-table="net-heat"] thead th')].map((th) =>
      th.textContent.replace('²', '^2'),
    );
    const reportRows = tableCells(doc, 'net-heat');
    // Column by column, matched by heading: every column of the report is one of the command line's, same text.
    expect(head).toEqual(cliHead);
    head.forEach((h, k) => {
      const c = cliHead.indexOf(h);
      expect(c, `column ${h} in the command line's table`).toBeGreaterThanOrEqual(0);
      expect(reportRows.map((r) => r[k])).toEqual(cliRows.map((r) => r[c]));
    });
    const cells = doc.querySelectorAll('table[data-table="net-heat"] tbody tr');
    exJson.surfaces.forEach((s, i) => {
      const values = [...cells[i].querySelectorAll('td[data-value]')].map((td) =>
        Number(td.getAttribute('data-value')),
      );
      expect(values).toContain(s.netHeat);
      expect(values).toContain(s.netFlux);
      expect(values).toContain(s.radiosity);
      expect(values).toContain(s.temperature);
    });
    const matrix = tableCells(doc, 'exchange').map((r) => r.slice(1));
    const cliMatrix = textRows(table.split('\n\n')[2])
      .slice(1)
      .map((r) => r.slice(1));
    expect(matrix).toEqual(cliMatrix);
    const values = [...doc.querySelectorAll('table[data-table="exchange"] tbody tr')].map((tr) =>
      [...tr.querySelectorAll('td')].map((td) => Number(td.getAttribute('data-value'))),
    );
    expect(values).toEqual(exJson.exchange);
    const balance = doc.querySelector('[data-name="energy-balance"]')!;
    expect(Number(balance.getAttribute('data-value'))).toBe(exJson.energyBalance);
    expect(table).toContain(`= ${balance.textContent}`);
  });

  it("shows the factors command's matrix, row sums and reciprocity residual", () => {
    const table = cli(files, 'factors', 'furnace.json').out;
    const rows = tableCells(doc, 'view-factors');
    const cliRows = textRows(table.split('F (row = from, column = to):\n')[1].split('\n\n')[0]).slice(1);
    // The factors table is fixed-width with 10-character cells; its numbers are what the report shows.
    rows.forEach((row, i) => {
      const shown = cliRows[i].slice(-names.length).join(' ').split(/\s+/);
      expect(row.slice(1, 1 + names.length)).toEqual(shown);
      const sum = factorsJson.viewFactors[i].reduce((a, b) => a + b, 0);
      expect(Math.abs(Number(row[1 + names.length]) - sum)).toBeLessThanOrEqual(5e-7);
    });
    const values = [...doc.querySelectorAll('table[data-table="view-factors"] tbody tr')].map((tr) =>
      [...tr.querySelectorAll('td')].slice(0, names.length).map((td) => Number(td.getAttribute('data-value'))),
    );
    expect(values).toEqual(factorsJson.viewFactors);
    const recip = doc.querySelector('[data-name="reciprocity"]')!;
    expect(Number(recip.getAttribute('data-value'))).toBe(factorsJson.reciprocityResidual);
    expect(table).toContain(`= ${recip.textContent}`);
  });

  it('states the version, the date, the hash, the file and units, and the surfaces on default properties', () => {
    const meta = doc.querySelector('.meta')!.textContent;
    const pkg = JSON.parse(readFileSync('package.json', 'utf8')) as { version: string };
    expect(meta).toContain(`Tautline ${pkg.version}`);
    expect(meta).toContain('2026-12-04 09:30 UTC');
    expect(meta).toContain('furnace.json');
    expect(meta).toContain('lengths in m');
    expect(doc.querySelector('[data-sha256]')!.textContent).toMatch(/^[0-9a-f]{64}$/);
    const defaults = doc.querySelector('[data-defaults]')!.textContent;
    for (const n of ['right wall (both)', 'roof 1 (both)', 'roof 2 (condition)', 'roof 3 (both)', 'left wall (both)'])
      expect(defaults).toContain(n);
    expect(defaults).not.toContain('floor');
    expect(defaults).not.toContain('load');
  });

  it("gives the profile along the split roof, positions from the wall's start", () => {
    // Roof parts run 4,2 -> 3,2 -> 1,2 -> 0,2: lengths 1, 2, 1, middles at 0.5, 2, 3.5 m.
    const rows = tableCells(doc, 'profile:roof');
    expect(rows.map((r) => r.slice(0, 3))).toEqual([
      ['roof 1', '0.5', '1'],
      ['roof 2', '2', '2'],
      ['roof 3', '3.5', '1'],
    ]);
    const flux = (n: string) => String(Number(exJson.surfaces.find((s) => s.name === n)!.netFlux.toPrecision(6)));
    expect(rows.map((r) => r[4])).toEqual(['roof 1', 'roof 2', 'roof 3'].map(flux));
  });

  it('is self-contained: no scripts, links, images or frames, nothing fetched', () => {
    expect(doc.querySelectorAll('script, link, img, iframe, object, embed').length).toBe(0);
    const html = report.written['out.html'];
    expect(html).not.toMatch(/(src|href)\s*=|url\((?!#)|@import/i);
    expect(doc.querySelector('.method')!.textContent).toMatch(/crossed-strings/);
    expect(doc.querySelector('.method')!.textContent).toMatch(/Incropera.*6th ed\..*ch\. 13/);
    expect(doc.querySelector('.caution')!.textContent).toMatch(/do not replace, local codes/);
  });

  it('its picture parses as SVG', () => {
    const svg = doc.querySelector('svg')!;
    const serialised = new XMLSerializer().serializeToString(svg);
    const parsed = new DOMParser().parseFromString(serialised, 'image/svg+xml');
    expect(parsed.getElementsByTagName('parsererror').length).toBe(0);
    expect(parsed.documentElement.localName).toBe('svg');
  });
});

// The surface balance: a wall lining, a tube, a linked baffle, convection to a hot gas (file version 2).
const balance = {
  version: 2,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 2],
        [0, 2],
      ],
      surface: ['hearth', 'right', 'roof', 'left'],
    },
    {
      kind: 'solid',
      points: [
        [1, 0.9],
        [3, 0.9],
        [3, 1.1],
        [1, 1.1],
      ],
      surface: ['baffle bottom', 'baffle end', 'baffle top', 'baffle end'],
    },
    {
      kind: 'solid',
      points: [
        [0.4, 1.5],
        [0.6, 1.5],
        [0.6, 1.7],
        [0.4, 1.7],
      ],
      surface: 'tube 1',
    },
  ],
  surfaces: {
    hearth: { emissivity: 0.9, temperature: 1450, convectionCoefficient: 15 },
    roof: {
      emissivity: 0.75,
      wall: {
        layers: [
          { thickness: 0.23, conductivity: 1.3 },
          { thickness: 0.115, conductivity: 0.2 },
        ],
        outsideTemperature: 300,
        outsideCoefficient: 12,
      },
    },
    'tube 1': {
      emissivity: 0.85,
      convectionCoefficient: 10,
      tube: {
        fluidTemperature: 650,
        insideCoefficient: 900,
        outerDiameter: 0.1143,
        innerDiameter: 0.0953,
        wallConductivity: 24,
      },
    },
    'baffle top': { emissivity: 0.6, linked: 'baffle bottom' },
    'baffle bottom': { emissivity: 0.3 },
  },
  settings: { gasTemperature: 1500, depth: 2 },
};

describe('report FILE: the surface balance (walls, tubes, gas)', () => {
  const files = { 'b.json': balance };
  const r = cli(files, 'report', 'b.json', '--out', 'b.html');
  const doc = parse(r.written['b.html'] ?? '');
  const table = cli(files, 'exchange', 'b.json').out;

  it("has every column and row of the exchange command's table, with the same text", () => {
    expect(r.code).toBe(0);
    const [cliHead, ...cliRows] = textRows(table.split('\n\n')[1]);
    const head = [...doc.querySelectorAll('table[data-table="net-heat"] thead th')].map((th) =>
      th.textContent.replace(/²/g, '^2'),
    );
    expect(head).toEqual(cliHead);
    // The command line's cells are two spaces apart, so an empty cell cannot be told from the gap: compare filled cells.
    const filled = (row: string[]) => row.filter((c) => c !== '');
    expect(tableCells(doc, 'net-heat').map(filled)).toEqual(cliRows.map(filled));
    expect(tableCells(doc, 'net-heat').map((row) => row[0])).toContain('(gas)');
  });

  it("gives the command line's energy balance, warnings and cautions", () => {
    const note = doc.querySelector('.exchange')!.textContent;
    const balanceLine = table.split('\n').find((l) => l.startsWith('Energy balance:'))!;
    expect(note).toContain(balanceLine);
    for (const line of table.split('\n').filter((l) => /^(Warning: |The gas is treated|Walls are plane)/.test(l)))
      expect(note).toContain(line.replace(/^Warning: /, ''));
    expect(doc.querySelector('[data-table="inputs"]')!.textContent).toContain('layers 0.23 m at 1.3 W/(m·K)');
  });
});

describe('report FILE: an exact circle split into arcs', () => {
  it('draws the tube and gives the profile around it, positions along the arcs', () => {
    const R = 0.1;
    const file = {
      version: 2,
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
          surface: ['floor', 'right', 'roof', 'left'],
        },
        { kind: 'solid', circle: { center: [0.5, 0.5], radius: R }, surface: ['tube 1', 'tube 2', 'tube 3', 'tube 4'] },
      ],
      surfaces: { floor: { temperature: 1200, emissivity: 0.9 }, 'tube 1': { temperature: 500, emissivity: 0.8 } },
    };
    const r = cli({ 'c.json': file }, 'report', 'c.json', '--out', 'c.html');
    expect(r.err).toBe('');
    const doc = parse(r.written['c.html']);
    const labels = [...doc.querySelectorAll('svg text[data-surface]')].map((t) => t.textContent);
    expect(labels).toEqual(expect.arrayContaining(['tube 1', 'tube 2', 'tube 3', 'tube 4']));
    const rows = [...doc.querySelectorAll('table[data-table="profile:tube"] tbody tr')];
    expect(rows.map((tr) => tr.querySelector('th')!.textContent)).toEqual(['tube 1', 'tube 2', 'tube 3', 'tube 4']);
    // Four equal arcs of a circle: each pi R / 2 long, middles at (k + 1/2) pi R / 2 from the start of arc 1.
    rows.forEach((tr, k) => {
      const [position, length] = [...tr.querySelectorAll('td')]
        .slice(0, 2)
        .map((td) => Number(td.getAttribute('data-value')));
      expect(Math.abs(length - (Math.PI * R) / 2)).toBeLessThan(1e-12);
      expect(Math.abs(position - ((k + 0.5) * Math.PI * R) / 2)).toBeLessThan(1e-12);
    });
  });
});

describe('report FILE: many surfaces', () => {
  it('leaves out the two matrices above 60 surfaces, says so and names the commands that give them', () => {
    const n = 61;
    const points = Array.from({ length: n }, (_, k) => [
      Math.cos((2 * Math.PI * k) / n),
      Math.sin((2 * Math.PI * k) / n),
    ]);
    const names = points.map((_, k) => `s${k + 1}`);
    const file = {
      version: 1,
      units: 'm',
      shapes: [{ kind: 'enclosure', points, surface: names }],
      surfaces: { s1: { temperature: 1000 }, s2: { temperature: 300 } },
    };
    const r = cli({ 'n.json': file }, 'report', 'n.json', '--out', 'n.html');
    expect(r.code).toBe(0);
    const doc = parse(r.written['n.html']);
    const notes = [...doc.querySelectorAll('[data-left-out]')].map((p) => p.textContent);
    expect(notes).toEqual([
      expect.stringMatching(/view-factor matrix has 61 × 61 entries.*factors FILE --csv/),
      expect.stringMatching(/exchange matrix has 61 × 61 entries.*exchange FILE --json/),
    ]);
    expect(doc.querySelector('table[data-table="view-factors"]')).toBeNull();
    expect(tableCells(doc, 'net-heat').map((row) => row[0])).toEqual(names);
  });
});

describe('report FILE: names from a hostile file stay text', () => {
  const evil = '<img src=x onerror="alert(1)">&\'';
  const file = {
    version: 1,
    units: 'mm',
    shapes: [
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [3, 0],
          [0, 4],
        ],
        surface: [evil, '</td><script>x()</script>', 'c'],
      },
    ],
    surfaces: { c: { temperature: 500 }, [evil]: { temperature: 300, emissivity: 0.5 } },
  };
  it('escapes every name; the document has no element the names would make', () => {
    const r = cli({ 'evil.json': file }, 'report', 'evil.json', '--out', 'e.html');
    expect(r.code).toBe(0);
    const doc = parse(r.written['e.html']);
    expect(doc.querySelectorAll('script, img').length).toBe(0);
    expect(tableCells(doc, 'net-heat').map((row) => row[0])).toEqual([evil, '</td><script>x()</script>', 'c']);
    expect([...doc.querySelectorAll('svg text[data-surface]')].map((t) => t.getAttribute('data-surface'))).toContain(
      evil,
    );
  });
});

describe('report FILE: without properties, and the command line', () => {
  it('leaves out the heat tables when no surface has properties', () => {
    const plain = {
      version: 1,
      units: 'cm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [3, 0],
            [0, 4],
          ],
          surface: ['a', 'b', 'c'],
        },
      ],
    };
    const r = cli({ 'p.json': plain }, 'report', 'p.json', '--out', '-');
    expect(r.code).toBe(0);
    const doc = parse(r.out);
    expect(doc.querySelector('table[data-table="net-heat"]')).toBeNull();
    expect(doc.querySelector('.exchange')!.textContent).toMatch(/No surface has properties/);
    // Incropera et al., 6th ed., Table 13.1, three-sided enclosure: F_ij = (L_i + L_j - L_k) / (2 L_i); sides 3, 5, 4.
    const F01 = Number(
      doc.querySelector('table[data-table="view-factors"] tbody tr td')!.nextElementSibling!.getAttribute('data-value'),
    );
    expect(Math.abs(F01 - (3 + 5 - 4) / (2 * 3))).toBeLessThan(1e-12);
  });

  it('shows the solver message when there is no answer', () => {
    const stuck = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [3, 0],
            [0, 4],
          ],
          surface: ['a', 'b', 'c'],
        },
      ],
      surfaces: { a: { emissivity: 0.5 } },
    };
    const r = cli({ 's.json': stuck }, 'report', 's.json', '--out', 's.html');
    expect(r.code).toBe(0);
    const err = cli({ 's.json': stuck }, 'exchange', 's.json').err;
    const message = err.replace(/^exchange: s\.json: /, '').trim();
    expect(parse(r.written['s.html']).querySelector('.exchange.failed')!.textContent).toContain(message);
  });

  it('refuses bad arguments (2) and bad files (1)', () => {
    expect(cli({}, 'report', 'x.json', '--json').code).toBe(2);
    expect(cli({}, 'report', '-').code).toBe(2);
    expect(cli({}, 'report', 'x.json', '--out').code).toBe(2);
    expect(cli({}, 'report', 'x.json', '--out', 'x.json').code).toBe(2);
    const missing = cli({}, 'report', 'x.json');
    expect(missing.code).toBe(1);
    expect(missing.err).toBe("report: cannot read 'x.json': no such file\n");
    expect(cli({ 'b.json': '{' }, 'report', 'b.json').code).toBe(1);
    const help = cli({}, 'report', '--help');
    expect(help.code).toBe(0);
    expect(help.out).toMatch(/--out PATH/);
  });

  it('writes beside the file by default, with the hash sha256sum gives', () => {
    const dir = mkdtempSync(join(tmpdir(), 'tautline-report-'));
    try {
      const path = join(dir, 'sketch.json');
      writeFileSync(path, `${JSON.stringify(furnace, null, 2)}\n`);
      let out = '';
      const io: ReportIO = {
        out: (t) => void (out += t),
        err: (t) => void (out += t),
        readFile: (p) => readFileSync(p, 'utf8'),
      };
      expect(runReport([path], io)).toBe(0);
      const target = join(dir, 'sketch-report.html');
      expect(existsSync(target)).toBe(true);
      expect(out).toBe(`report: wrote ${target}\n`);
      const expected = execFileSync('sha256sum', [path], { encoding: 'utf8' }).split(' ')[0];
      expect(parse(readFileSync(target, 'utf8')).querySelector('[data-sha256]')!.textContent).toBe(expected);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });
});
