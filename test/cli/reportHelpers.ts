// Shared by the report command's tests (report.test.ts, report.more.test.ts).
import { expect } from 'vitest';
import { main } from '../../src/cli/main';
import type { ReportIO } from '../../src/cli/reportCommand';

export const NOW = new Date(Date.UTC(2026, 11, 4, 9, 30));

export function fakeIO(files: Record<string, unknown>) {
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

export function cli(files: Record<string, unknown>, ...argv: string[]) {
  const f = fakeIO(files);
  const code = main(argv, f.io);
  return { code, out: f.out(), err: f.err(), written: f.written };
}

export const parse = (html: string) => new DOMParser().parseFromString(html, 'text/html');

/** Cells of the command line's text tables: columns are two or more spaces apart. */
export function textRows(block: string): string[][] {
  return block
    .split('\n')
    .filter((l) => l.startsWith('  ') && l.trim() !== '')
    .map((l) => l.trim().split(/ {2,}/));
}

export function tableCells(doc: Document, name: string): string[][] {
  const table = doc.querySelector(`table[data-table="${name}"]`)!;
  expect(table, `table ${name}`).not.toBeNull();
  return [...table.querySelectorAll('tbody tr')].map((tr) => [...tr.children].map((c) => c.textContent ?? ''));
}

// A furnace section: fired floor, a roof split into three parts, walls, a block (open to nothing: closed).
export const furnace = {
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
