// @vitest-environment jsdom
// The report command end to end: the HTML names every surface, and every number
// it shows is the command line's own (the exchange and factors tables' text, the
// --json values in data-value); the file is self-contained and names are escaped.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { cli, parse, textRows, tableCells, furnace } from './reportHelpers';

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
