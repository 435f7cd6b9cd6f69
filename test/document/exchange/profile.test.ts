// The flux profile rows: places of arcs and wall parts, and the peak, the
// length-weighted average and their ratio, checked against values worked out
// by hand from the shapes.
import { describe, expect, it } from 'vitest';
import Papa from 'papaparse';
import { profileCsv, surfaceProfile, type Profile } from '../../../src/document/exchange/profile';
import type { ShapeV1 } from '../../../src/document/schema';

const tube: ShapeV1 = {
  kind: 'solid',
  points: [],
  circle: { center: [0, 0], radius: 0.5 },
  surface: ['t 1', 't 2', 't 3', 't 4'],
};
const box: ShapeV1 = {
  kind: 'enclosure',
  points: [
    [0, 0],
    [1, 0],
    [3, 0],
    [3, 2],
    [0, 2],
  ],
  surface: ['floor 1', 'floor 2', 'right', 'roof', 'left'],
};
const flux: Record<string, number> = { 't 1': -1, 't 2': -2, 't 3': -3, 't 4': -6, 'floor 1': 5, 'floor 2': -1 };
const of = (n: string) => flux[n];

const ok = (p: Profile | { problem: string }): Profile => {
  if ('problem' in p) throw new Error(p.problem);
  return p;
};

describe('flux profile', () => {
  it('arcs: middle angles anticlockwise from +x, peak, mean and ratio', () => {
    const p = ok(surfaceProfile([box, tube], 't', of));
    expect(p.along).toBe('angle');
    expect(p.shape).toBe(1);
    expect(p.rows.map((r) => r.at)).toEqual([45, 135, 225, 315]);
    // Equal arcs: the mean is the plain mean (-12 / 4 = -3); the peak is -6 at 315°.
    expect(p.average).toBeCloseTo(-3, 14);
    expect(p.peak).toBe(-6);
    expect(p.peakAt).toBe(315);
    expect(p.peakToAverage).toBeCloseTo(2, 14);
    for (const r of p.rows) expect(r.length).toBeCloseTo((2 * Math.PI * 0.5) / 4, 14);
  });

  it('wall parts: positions of the middles along the wall, length-weighted mean; no ratio across a sign change', () => {
    const p = ok(surfaceProfile([box, tube], 'floor', of));
    expect(p.along).toBe('position');
    expect(p.rows.map((r) => [r.at, r.length])).toEqual([
      [0.5, 1],
      [2, 2],
    ]);
    // (1 x 5 + 2 x -1) / 3 = 1; the peak (5) is of the mean's sign.
    expect(p.average).toBeCloseTo(1, 14);
    expect(p.peakToAverage).toBeCloseTo(5, 14);
    const q = ok(surfaceProfile([box], 'floor', (n) => (n === 'floor 1' ? 1 : -4)));
    // Mean (1 - 8) / 3 < 0 and peak -4: same sign, ratio 12/7.
    expect(q.peakToAverage).toBeCloseTo(12 / 7, 14);
    const r = ok(surfaceProfile([box], 'floor', (n) => (n === 'floor 1' ? 4 : -1)));
    // Mean (4 - 2) / 3 > 0 and peak 4: ratio 6; a zero mean gives none.
    expect(r.peakToAverage).toBeCloseTo(6, 14);
    expect(ok(surfaceProfile([box], 'floor', (n) => (n === 'floor 1' ? 2 : -1))).peakToAverage).toBeNull();
  });

  it('arcs named with letters ("t a", "t b"...) are parts of "t" on a circle, not on a wall', () => {
    const lettered: ShapeV1 = { ...tube, surface: ['t a', 't b', 't c', 't d'] };
    const byLetter = (n: string) => ({ 't a': 1, 't b': 2, 't c': 3, 't d': 4 })[n];
    expect(ok(surfaceProfile([lettered], 't', byLetter)).rows.map((r) => r.flux)).toEqual([1, 2, 3, 4]);
    const wall: ShapeV1 = { ...box, surface: ['floor a', 'floor b', 'right', 'roof', 'left'] };
    expect('problem' in surfaceProfile([wall], 'floor', () => 1)).toBe(true);
  });

  it('says why there is no profile', () => {
    const problem = (p: Profile | { problem: string }) => ('problem' in p ? p.problem : '');
    expect(problem(surfaceProfile([box], 'roof', of))).toMatch(/one piece; split it/);
    expect(problem(surfaceProfile([box], 'chimney', of))).toMatch(/no surface "chimney"/);
    expect(surfaceProfile([tube], 't', () => undefined)).toEqual({ problem: 'no net flux for surface "t 1"' });
  });

  it('wall parts that wrap past the closing edge, or run against the edges, are read from part 1', () => {
    // Unit square, edges bottom, right, top, left: "w 1" on the left edge, then w 2 bottom, w 3 right.
    const square = (surface: string[]): ShapeV1 => ({
      kind: 'enclosure',
      points: [
        [0, 0],
        [1, 0],
        [1, 1],
        [0, 1],
      ],
      surface,
    });
    const one = () => 1;
    const wrapped = ok(surfaceProfile([square(['w 2', 'w 3', 'top', 'w 1'])], 'w', one));
    expect(wrapped.rows.map((r) => [r.surface, r.at])).toEqual([
      ['w 1', 0.5],
      ['w 2', 1.5],
      ['w 3', 2.5],
    ]);
    const backward = ok(surfaceProfile([square(['w 3', 'w 2', 'w 1', 'top'])], 'w', one));
    expect(backward.rows.map((r) => r.surface)).toEqual(['w 1', 'w 2', 'w 3']);
    // A part made of two edges is one row, its middle halfway along both.
    const long = ok(surfaceProfile([square(['w 1', 'w 2', 'w 2', 'top'])], 'w', one));
    expect(long.rows.map((r) => [r.surface, r.at, r.length])).toEqual([
      ['w 1', 0.5, 1],
      ['w 2', 2, 2],
    ]);
  });

  it('refuses parts out of order, not one run, or on two shapes, saying which', () => {
    const problem = (p: Profile | { problem: string }) => ('problem' in p ? p.problem : '');
    const square = (surface: string[]): ShapeV1 => ({ ...box, points: box.points.slice(0, 4), surface });
    expect(problem(surfaceProfile([square(['w 1', 'w 3', 'w 2', 'top'])], 'w', () => 1))).toMatch(
      /not numbered in order/,
    );
    expect(problem(surfaceProfile([square(['w 1', 'top', 'w 2', 'left'])], 'w', () => 1))).toMatch(
      /not one run of consecutive edges/,
    );
    expect(problem(surfaceProfile([square(['w 1', 'w 2', 'w 1', 'top'])], 'w', () => 1))).toMatch(
      /a part of "w" is not one run/,
    );
    expect(
      problem(surfaceProfile([square(['w 1', 'a', 'b', 'c']), square(['w 2', 'd', 'e', 'f'])], 'w', () => 1)),
    ).toMatch(/more than one shape/);
  });

  it('CSV: angle or position against net flux, one row per piece', () => {
    const rows = Papa.parse<string[]>(profileCsv(ok(surfaceProfile([tube], 't', of)), 'm').trim()).data;
    expect(rows[0]).toEqual(['angle from +x anticlockwise (deg)', 'surface', 'length (m)', 'net flux (W/m^2)']);
    expect(rows[4]).toEqual(['315', 't 4', String(Number(((2 * Math.PI * 0.5) / 4).toPrecision(12))), '-6']);
  });
});
