// Tube rows in the sketch file: round trip, where the tubes go, rebuilding
// after an edit of the row's numbers, breaking a row into single tubes, and
// the refusals on reading. Expected centres are worked out here by hand from
// the drawing (a 4 × 2 box), not by the code under test.
import { describe, expect, it } from 'vitest';
import { restore, serialize, type SketchFileV1, type TubeRow } from '../../src/document';
import { buildRow, splitRow } from '../../src/document/rows/rebuild';
import { MAX_ROW_TUBES } from '../../src/document/rows/limits';

/** A 4 × 2 box drawn anticlockwise: floor (0,0)-(4,0), right, roof (4,2)-(0,2), left. */
const box = (): SketchFileV1 => ({
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
      surface: ['floor', 'right wall', 'roof', 'left wall'],
    },
  ],
});

const fromRoof: TubeRow = { count: 3, diameter: 0.2, pitch: 0.5, from: { wall: 'roof', distance: 0.3 } };

const built = (doc: SketchFileV1, name: string, row: TubeRow): SketchFileV1 => {
  const r = buildRow(doc, name, row);
  if (!r.ok) throw new Error(r.problem);
  return r.doc;
};
const messages = (doc: unknown): string[] => {
  const r = restore(doc);
  return r.ok ? [] : r.errors.map((e) => e.message);
};
const centres = (doc: SketchFileV1) => doc.shapes.flatMap((s) => (s.circle ? [s.circle.center] : []));

describe('tube rows in the file', () => {
  it('places a row from a wall: centre line at the distance from the wall, the row centred along it', () => {
    const doc = built(box(), 'row 1', fromRoof);
    // Roof at y = 2, inside below it: centre line y = 2 - 0.3. Three tubes at 0.5
    // centre to centre, centred on x = 2: x = 1.5, 2, 2.5 (the roof runs from x = 4 to 0).
    expect(centres(doc)).toEqual([
      [2.5, 1.7],
      [2, 1.7],
      [1.5, 1.7],
    ]);
    expect(doc.shapes.slice(1).map((s) => [s.surface, s.row, s.circle?.radius])).toEqual([
      ['tube 1', 'row 1', 0.1],
      ['tube 2', 'row 1', 0.1],
      ['tube 3', 'row 1', 0.1],
    ]);
    expect(doc.rows).toEqual({ 'row 1': fromRoof });
  });

  it('places a row from a start point along an angle (degrees anticlockwise from +x)', () => {
    const row: TubeRow = { count: 3, diameter: 0.2, pitch: 0.4, from: { start: [1, 0.5], angle: 90 } };
    expect(centres(built(box(), 'up', row))).toEqual([
      [1, 0.5],
      [1, 0.9],
      [1, 1.3],
    ]);
    const slant: TubeRow = { count: 2, diameter: 0.2, pitch: 0.5, from: { start: [1, 0.5], angle: 30 } };
    const [, second] = centres(built(box(), 'slant', slant));
    expect(second[0]).toBeCloseTo(1 + 0.5 * Math.cos(Math.PI / 6), 11);
    expect(second[1]).toBeCloseTo(0.5 + 0.5 * 0.5, 11);
  });

  it('reads back what it writes: rows, tags and tubes unchanged', () => {
    const doc = built(box(), 'row 1', fromRoof);
    const first = restore(doc);
    expect(first.ok).toBe(true);
    if (!first.ok) return;
    expect(first.warnings).toEqual([]);
    const text = serialize(first.sketch);
    expect(text).toContain('"row": "row 1"');
    const again = restore(text);
    expect(again.ok).toBe(true);
    if (!again.ok) return;
    expect(again.sketch).toEqual(first.sketch);
    expect(again.sketch.rows).toEqual({ 'row 1': fromRoof });
    expect(again.sketch.shapes.filter((s) => s.row === 'row 1')).toHaveLength(3);
  });

  it('rebuilds the tubes when n, D or s change, keeping names and properties of the tubes that stay', () => {
    let doc = built(box(), 'row 1', fromRoof);
    // The user renames the middle tube and gives the tubes a fluid temperature.
    doc.shapes[2] = { ...doc.shapes[2], surface: 'hot tube' };
    doc.surfaces = { 'tube 1': { temperature: 500 }, 'hot tube': { temperature: 600 }, 'tube 3': { temperature: 700 } };
    // A single tube elsewhere already holds "tube 9": a new tube must not take it.
    doc.shapes.push({ kind: 'solid', points: [], circle: { center: [0.5, 0.5], radius: 0.1 }, surface: 'tube 9' });
    doc = built(doc, 'row 1', { ...fromRoof, count: 5, diameter: 0.25 });
    const tubes = doc.shapes.filter((s) => s.row === 'row 1');
    expect(tubes.map((s) => s.surface)).toEqual(['tube 1', 'hot tube', 'tube 3', 'tube 10', 'tube 11']);
    expect(tubes.every((s) => s.circle?.radius === 0.125)).toBe(true);
    // Five tubes at 0.5 centred on x = 2, from x = 4 towards 0: 3, 2.5, 2, 1.5, 1.
    expect(tubes.map((s) => s.circle?.center)).toEqual([
      [3, 1.7],
      [2.5, 1.7],
      [2, 1.7],
      [1.5, 1.7],
      [1, 1.7],
    ]);
    // New tubes carry the properties of the row's last tube.
    expect(doc.surfaces?.['tube 10']).toEqual({ temperature: 700 });
    expect(restore(doc).ok).toBe(true);

    doc = built(doc, 'row 1', { ...fromRoof, count: 2, pitch: 0.6 });
    expect(doc.shapes.filter((s) => s.row === 'row 1').map((s) => s.surface)).toEqual(['tube 1', 'hot tube']);
    expect(Object.keys(doc.surfaces ?? {}).sort()).toEqual(['hot tube', 'tube 1']);
    expect(doc.shapes.some((s) => s.surface === 'tube 9')).toBe(true);
    expect(restore(doc).ok).toBe(true);
  });

  it('splits a row into single tubes: the row and its tags go, every tube stays where it is', () => {
    const doc = built(box(), 'row 1', fromRoof);
    const single = splitRow(doc, 'row 1');
    expect(single.rows).toBeUndefined();
    expect(single.shapes.some((s) => 'row' in s)).toBe(false);
    expect(centres(single)).toEqual(centres(doc));
    const read = restore(single);
    expect(read.ok && read.sketch.shapes.length).toBe(4);
  });
});

describe('tube rows refused on reading, naming the row', () => {
  const good = () => built(box(), 'row 1', fromRoof);

  it('a tag naming no row, a tag on a polygon, a row with no tubes', () => {
    const tagged = good();
    tagged.shapes[1] = { ...tagged.shapes[1], row: 'row 2' };
    expect(messages(tagged)).toEqual([
      `'tube 1' (body, shape 2, row 'row 2'): belongs to row 'row 2', which the file's "rows" does not list; add the row or remove the shape's "row"`,
    ]);
    const polygon = good();
    polygon.shapes[0] = { ...polygon.shapes[0], row: 'row 1' };
    expect(messages(polygon)[0]).toMatch(
      /^the enclosure \(shape 1, row 'row 1'\): belongs to row 'row 1' but is not a round tube/,
    );
    const empty = splitRow(good(), 'row 1');
    empty.rows = { lonely: fromRoof };
    expect(messages(empty)).toEqual([
      `row 'lonely' has no tubes: no shape has "row": "lonely"; tag its tubes or remove the row`,
    ]);
  });

  it('tubes that differ from the row: count, diameter, centre', () => {
    const fewer = good();
    fewer.shapes.pop();
    expect(messages(fewer)[0]).toMatch(/^row 'row 1' gives count 3 but 2 tubes are tagged with it; change the row/);
    const fat = good();
    fat.rows = { 'row 1': { ...fromRoof, diameter: 0.3 } };
    expect(messages(fat)[0]).toBe(
      `row 'row 1': 'tube 1' (body, shape 2, row 'row 1'), tube 1 of 3 in the row, has diameter 0.2; the row gives 0.3; change the row's numbers in the app (its tubes follow), or split the row into single tubes`,
    );
    const moved = good();
    moved.shapes[3] = { ...moved.shapes[3], circle: { center: [1.5, 1.6], radius: 0.1 } };
    expect(messages(moved)[0]).toMatch(
      /^row 'row 1': 'tube 3' \(body, shape 4, row 'row 1'\), tube 3 of 3 in the row, has its centre at \(1\.5, 1\.6\); the row's numbers put it at \(1\.5, 1\.7\)/,
    );
    // Rounding far below the drawing is not a difference.
    const typed = good();
    typed.shapes[1] = { ...typed.shapes[1], circle: { center: [2.5 + 1e-13, 1.7], radius: 0.1 } };
    expect(messages(typed)).toEqual([]);
  });

  it('tubes that would overlap each other, cross their wall or not fit along it', () => {
    const overlap = good();
    overlap.rows = { 'row 1': { ...fromRoof, pitch: 0.2 } };
    expect(messages(overlap)).toEqual([
      `row 'row 1': the pitch (0.2) must be greater than the diameter (0.2), or the tubes overlap`,
    ]);
    const crossing = good();
    crossing.rows = { 'row 1': { ...fromRoof, from: { wall: 'roof', distance: 0.1 } } };
    expect(messages(crossing)).toEqual([
      `row 'row 1': the distance from the wall 'roof' (0.1) must be more than the radius of the tubes (0.1), or the tubes cross the wall`,
    ]);
    const wide = good();
    wide.rows = { 'row 1': { ...fromRoof, pitch: 2 } };
    expect(messages(wide)).toEqual([`row 'row 1': the row (4.2 wide) does not fit along the wall 'roof' (4 long)`]);
    const nowall = good();
    nowall.rows = { 'row 1': { ...fromRoof, from: { wall: 'ceiling', distance: 0.3 } } };
    expect(messages(nowall)).toEqual([`row 'row 1': no straight edge is named 'ceiling'`]);
    const bent = good();
    bent.shapes[0] = { ...bent.shapes[0], surface: 'walls' };
    bent.rows = { 'row 1': { ...fromRoof, from: { wall: 'walls', distance: 0.3 } } };
    expect(messages(bent)).toEqual([
      `row 'row 1': the wall 'walls' is not straight (its edges do not lie on one line)`,
    ]);
  });

  it('a reserved row name is refused, an unknown field in a row is a warning', () => {
    const reserved = good();
    (reserved as { rows: unknown }).rows = JSON.parse(`{"__proto__": ${JSON.stringify(fromRoof)}}`) as unknown;
    expect(messages(reserved)).toEqual([
      `rows: the name '__proto__' must not be "__proto__" (a reserved word); choose another name`,
    ]);
    const extra = good();
    (extra.rows!['row 1'] as Record<string, unknown>).spacing = 0.5;
    const read = restore(extra);
    expect(read.ok && read.warnings).toEqual([`row 'row 1': ignored unknown field 'spacing'`]);
  });

  it('numbers out of range: count, diameter, pitch, the place', () => {
    const withRow = (row: unknown) => ({ ...good(), rows: { 'row 1': row } });
    expect(messages(withRow({ ...fromRoof, count: 0 }))).toEqual([
      `row 'row 1': count must be a whole number from 1 to ${MAX_ROW_TUBES} (got 0)`,
    ]);
    expect(messages(withRow({ ...fromRoof, count: 2.5 }))).toEqual([
      `row 'row 1': count must be a whole number from 1 to ${MAX_ROW_TUBES} (got 2.5)`,
    ]);
    expect(messages(withRow({ ...fromRoof, count: MAX_ROW_TUBES + 1 }))).toEqual([
      `row 'row 1': count must be at most ${MAX_ROW_TUBES} (got ${MAX_ROW_TUBES + 1})`,
    ]);
    expect(messages(withRow({ ...fromRoof, diameter: -1 }))).toEqual([
      `row 'row 1': diameter must be greater than 0 (file units) (got -1)`,
    ]);
    expect(messages(withRow({ ...fromRoof, pitch: Infinity }))).toEqual([
      `row 'row 1': pitch must be a positive finite number (file units) (got Infinity)`,
    ]);
    expect(messages(withRow({ ...fromRoof, from: { distance: 1 } }))[0]).toMatch(
      /^row 'row 1': from must be \{"wall": SURFACE, "distance": D\} or \{"start": \[x, y\], "angle": DEGREES\}/,
    );
  });
});
