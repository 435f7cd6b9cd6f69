// @vitest-environment jsdom
// The report command end to end: the HTML names every surface, and every number
// it shows is the command line's own (the exchange and factors tables' text, the
// --json values in data-value); the file is self-contained and names are escaped.
import { describe, expect, it } from 'vitest';
import { execFileSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { ReportIO } from '../../src/cli/reportCommand';
import { runReport } from '../../src/cli/reportCommand';
import { cli, parse, tableCells, furnace } from './reportHelpers';

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
