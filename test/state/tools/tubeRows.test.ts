// The tube row in the app stays a row: change n, D, s or the distance and its
// tubes follow (one undo step each); split it and the tubes stay as single
// tubes. Centres are worked out by hand from the drawing (a 2.4 × 1.5 oven).
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { CanvasController } from '../../../src/state/canvasController';
import { selectedRow, tubesOfRow } from '../../../src/state/edits/tubeRow';
import { restore } from '../../../src/document';
import type { SketchFile } from '../../../src/state/sketchFile';
import { studyChoices, runStudy } from '../../../src/state/study';
import { cliJson } from '../../cli/studyHelpers';

const oven = (): SketchFile => ({
  version: 2,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [2.4, 0],
        [2.4, 1.5],
        [0, 1.5],
      ],
      surface: ['floor', 'right wall', 'roof', 'left wall'],
    },
  ],
  surfaces: { floor: { emissivity: 0.9, temperature: 1200 } },
});

const spec = { count: 4, diameter: 0.1143, pitch: 0.3 };

function withRow() {
  const store = createAppStore(oven());
  const c = new CanvasController(store);
  const s = () => store.getState();
  // From the roof (edge 3, index 2), 0.25 to the centre line.
  expect(c.addRow(spec, { from: 'wall', shape: 0, edge: 2, distance: 0.25 })).toBeNull();
  return { c, s };
}
const tubes = (doc: SketchFile) => tubesOfRow(doc, 'row 1').map((k) => doc.shapes[k]);

describe('a tube row stays a row', () => {
  it('is written as a row measured from the roof, its tubes tagged and selected', () => {
    const { s } = withRow();
    const doc = s().doc;
    expect(doc.rows).toEqual({ 'row 1': { ...spec, from: { wall: 'roof', distance: 0.25 } } });
    // The roof runs from x = 2.4 to 0 at y = 1.5: three pitches (0.9) centred on x = 1.2.
    expect(tubes(doc).map((t) => t.circle?.center)).toEqual([
      [1.65, 1.25],
      [1.35, 1.25],
      [1.05, 1.25],
      [0.75, 1.25],
    ]);
    expect(selectedRow(doc, s().selection)).toBe('row 1');
    expect(restore(doc).ok).toBe(true);
  });

  it('change n: tubes follow, names and properties of the tubes that stay are kept; one undo step', () => {
    const { c, s } = withRow();
    s().commit({ ...s().doc, surfaces: { ...s().doc.surfaces, 'tube 2': { temperature: 650 } } });
    const before = s().doc;
    expect(c.editRow('row 1', { ...before.rows!['row 1'], count: 6 })).toBeNull();
    const doc = s().doc;
    expect(tubes(doc).map((t) => t.surface)).toEqual(['tube 1', 'tube 2', 'tube 3', 'tube 4', 'tube 5', 'tube 6']);
    // Five pitches (1.5) centred on 1.2: from x = 1.95 down to 0.45.
    expect(tubes(doc).map((t) => t.circle?.center[0])).toEqual([1.95, 1.65, 1.35, 1.05, 0.75, 0.45]);
    expect(doc.surfaces?.['tube 2']).toEqual({ temperature: 650 });
    expect(restore(doc).ok).toBe(true);
    s().undo();
    expect(s().doc).toBe(before);
  });

  it('change D and s, and the distance: every tube moves or grows, still one step each', () => {
    const { c, s } = withRow();
    const row = s().doc.rows!['row 1'];
    expect(c.editRow('row 1', { ...row, diameter: 0.2 })).toBeNull();
    expect(tubes(s().doc).every((t) => t.circle?.radius === 0.1)).toBe(true);
    expect(c.editRow('row 1', { ...s().doc.rows!['row 1'], pitch: 0.5 })).toBeNull();
    expect(tubes(s().doc).map((t) => t.circle?.center[0])).toEqual([1.95, 1.45, 0.95, 0.45]);
    expect(c.editRow('row 1', { ...s().doc.rows!['row 1'], from: { wall: 'roof', distance: 0.5 } })).toBeNull();
    expect(tubes(s().doc).every((t) => t.circle?.center[1] === 1)).toBe(true);
    expect(restore(s().doc).ok).toBe(true);
    s().undo();
    s().undo();
    expect(s().doc.rows!['row 1']).toEqual({ ...row, diameter: 0.2 });
  });

  it('refuses numbers the row cannot take, leaving the document and the history alone', () => {
    const { c, s } = withRow();
    const before = s().doc;
    const row = before.rows!['row 1'];
    expect(c.editRow('row 1', { ...row, pitch: 0.1 })).toMatch(/pitch \(0\.1\) must be greater than the diameter/);
    expect(c.editRow('row 1', { ...row, count: 20 })).toMatch(/does not fit along the wall 'roof'/);
    expect(c.editRow('row 1', { ...row, count: 2.5 })).toMatch(/whole number from 1 to 500/);
    expect(c.editRow('row 1', { ...row, from: { wall: 'roof', distance: 0.05 } })).toMatch(/more than the radius/);
    expect(s().doc).toBe(before);
  });

  it('split row into tubes: the tags and the row go, the tubes stay; undo brings the row back', () => {
    const { c, s } = withRow();
    const before = s().doc;
    c.splitRow('row 1');
    const doc = s().doc;
    expect(doc.rows).toBeUndefined();
    expect(doc.shapes.some((t) => t.row !== undefined)).toBe(false);
    expect(doc.shapes.map((t) => t.circle?.center)).toEqual(before.shapes.map((t) => t.circle?.center));
    expect(selectedRow(doc, s().selection)).toBeNull();
    s().undo();
    expect(s().doc).toBe(before);
  });

  it('the What-if list offers the row pitch, diameter and distance, and a sweep gives sweep --json numbers', () => {
    const { s } = withRow();
    const read = restore(s().doc);
    if (!read.ok) throw new Error(read.errors[0].message);
    const choices = studyChoices(read.sketch).filter((ch) => ch.address.startsWith('row 1.'));
    expect(choices.map((ch) => [ch.address, ch.label, ch.unit, ch.current, ch.geometry])).toEqual([
      ['row 1.pitch', "pitch of row 'row 1'", 'm', 0.3, true],
      ['row 1.diameter', "tube diameter of row 'row 1'", 'm', 0.1143, true],
      ['row 1.distance', "distance from the wall of row 'row 1'", 'm', 0.25, true],
    ]);
    const reply = runStudy({
      kind: 'sweep',
      sketch: read.sketch,
      address: 'row 1.pitch',
      from: 0.2,
      to: 0.4,
      steps: 3,
    });
    if (reply.kind !== 'sweep') throw new Error(reply.kind === 'failed' ? reply.message : reply.kind);
    const cli = cliJson(
      { 'o.json': s().doc },
      ...['sweep', 'o.json', '--vary', 'row 1.pitch', '--from', '0.2', '--to', '0.4', '--steps', '3'],
    ) as { values: number[]; runs: { surfaces: { netHeat: number }[] }[] };
    expect(reply.table.values).toEqual(cli.values);
    expect(reply.table.netHeat).toEqual(cli.runs.map((r) => r.surfaces.map((x) => x.netHeat)));
  });
});
