import { describe, expect, it } from 'vitest';
import {
  AUTOSAVE_KEY,
  FULL_TEXT,
  SET_ASIDE_PREFIX,
  loadAutosave,
  saveAutosave,
  startAutosave,
} from '../../src/state/autosave';
import { documentApi } from '../../src/state/documentApi';
import { demoSketch } from '../../src/state/demo';
import { createAppStore } from '../../src/state/store';
import { setVertex } from '../../src/state/edits/shapeEdits';
import { MemoryStorage } from './memoryStorage';
import { MAX_EDGES } from '../../src/document/limits';
import type { SketchFile } from '../../src/state/sketchFile';

/** Point 3 of the first shape in the autosaved text. */
const savedCorner = (storage: MemoryStorage): unknown =>
  (JSON.parse(storage.getItem(AUTOSAVE_KEY) ?? 'null') as SketchFile).shapes[0].points[2];

const box: SketchFile = {
  version: 1,
  units: 'cm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [40, 0],
        [40, 20],
        [0, 20],
      ],
      surface: ['floor', 'right', 'roof', 'left'],
    },
  ],
};

describe('autosave', () => {
  it('starts with the demo when nothing is saved', () => {
    const r = loadAutosave(new MemoryStorage(), documentApi, demoSketch);
    expect(r.doc).toBe(demoSketch);
    expect(r.fromAutosave).toBe(false);
    expect(r.notice).toBeUndefined();
  });

  it('restores the saved sketch on the next start', () => {
    const storage = new MemoryStorage();
    expect(saveAutosave(storage, documentApi, box)).toBe(true);
    const r = loadAutosave(storage, documentApi, demoSketch);
    expect(r.fromAutosave).toBe(true);
    expect(r.doc.units).toBe('cm');
    expect(r.doc.shapes[0].points).toEqual(box.shapes[0].points);
    expect(r.doc.shapes[0].surface).toEqual(['floor', 'right', 'roof', 'left']);
  });

  it('sets a corrupt autosave aside (kept, not deleted), opens the demo and says so', () => {
    const storage = new MemoryStorage();
    const corrupt = '{"version": 1, "units": "m", "shapes": [{"kind": "enclosure", "points": [[0,0],[1,0]';
    storage.setItem(AUTOSAVE_KEY, corrupt);
    const r = loadAutosave(storage, documentApi, demoSketch, Date.UTC(2026, 0, 2, 3, 4, 5));
    expect(r.doc).toBe(demoSketch);
    const key = `${SET_ASIDE_PREFIX}2026-01-02T03:04:05.000Z`;
    expect(storage.getItem(key)).toBe(corrupt);
    expect(storage.getItem(AUTOSAVE_KEY)).toBeNull();
    expect(r.notice?.level).toBe('warning');
    expect(r.notice?.text).toContain('could not be read');
    expect(r.notice?.text).toContain(key);
  });

  it('restores an autosave whose geometry is invalid as a draft, naming the problem', () => {
    const storage = new MemoryStorage();
    const crossed: SketchFile = {
      ...box,
      shapes: [
        {
          ...box.shapes[0],
          points: [
            [0, 0],
            [40, 20],
            [40, 0],
            [0, 20],
          ],
        },
      ],
    };
    storage.setItem(AUTOSAVE_KEY, JSON.stringify(crossed));
    const r = loadAutosave(storage, documentApi, demoSketch);
    expect(r.fromAutosave).toBe(true);
    expect(r.doc.units).toBe('cm');
    expect(r.doc.shapes).toEqual(crossed.shapes);
    expect(r.notice?.level).toBe('warning');
    expect(r.notice?.text).toMatch(/as a draft.*shape 1.*cross/);
    expect(storage.keys().some((k) => k.startsWith(SET_ASIDE_PREFIX))).toBe(false);
  });

  it('saves every change, a sketch that breaks a rule too, and it comes back as that draft', () => {
    const storage = new MemoryStorage();
    const store = createAppStore(box);
    const stop = startAutosave(store, storage, documentApi);
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 30]));
    expect(savedCorner(storage)).toEqual([40, 30]);
    // A self-crossing outline (the corner dragged across the opposite wall): saved as it is.
    store.getState().edit((d) => setVertex(d, 0, 2, [-10, 10]));
    const draft = store.getState().doc;
    stop();
    const back = loadAutosave(storage, documentApi, demoSketch);
    expect(back.doc.shapes).toEqual(draft.shapes);
    expect(back.doc.shapes[0].points[2]).toEqual([-10, 10]);
    expect(back.notice?.text).toContain('as a draft');
  });

  it('never overwrites the last good copy with a sketch the reader would refuse, and says so once', () => {
    const storage = new MemoryStorage();
    const store = createAppStore(box);
    const stop = startAutosave(store, storage, documentApi);
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 30]));
    const good = storage.getItem(AUTOSAVE_KEY)!;
    // A 201-character name is past the file's limit (200), so the reader would refuse the sketch.
    store.getState().edit((d) => ({ ...d, shapes: [{ ...d.shapes[0], surface: 'x'.repeat(201) }] }));
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 31]));
    expect(storage.getItem(AUTOSAVE_KEY)).toBe(good);
    const paused = store.getState().notices.filter((n) => n.text.startsWith('Autosave paused'));
    expect(paused).toHaveLength(1);
    expect(paused[0].text).toContain('at most 200 characters');
    expect(paused[0].action?.kind).toBe('save-file');
    stop();
  });

  it('a sketch grown past the edge limit is not written (it would not open); the user is told, with the limit', () => {
    const storage = new MemoryStorage();
    const store = createAppStore(box);
    const stop = startAutosave(store, storage, documentApi);
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 30]));
    const good = storage.getItem(AUTOSAVE_KEY);
    // A polygon one edge past the documented limit.
    const n = MAX_EDGES + 1;
    const ring = Array.from({ length: n }, (_, k): [number, number] => [
      Math.cos((2 * Math.PI * k) / n),
      Math.sin((2 * Math.PI * k) / n),
    ]);
    store.getState().edit((d) => ({ ...d, shapes: [{ kind: 'enclosure', points: ring, surface: 'wall' }] }));
    expect(storage.getItem(AUTOSAVE_KEY)).toBe(good);
    const paused = store.getState().notices.find((n) => n.text.startsWith('Autosave paused'));
    expect(paused?.text).toContain(`${n} edges; the limit is ${MAX_EDGES}`);
    stop();
  });

  it('saves a drag once, when it ends', () => {
    const storage = new MemoryStorage();
    const store = createAppStore(box);
    const stop = startAutosave(store, storage, documentApi);
    store.getState().beginGesture();
    store.getState().updateGesture(setVertex(box, 0, 2, [41, 21]));
    expect(storage.getItem(AUTOSAVE_KEY)).toBeNull();
    store.getState().endGesture();
    expect(savedCorner(storage)).toEqual([41, 21]);
    stop();
  });

  it('storage full: says so once, keeps the last copy, offers a file, and says when it works again', () => {
    const storage = new MemoryStorage();
    const store = createAppStore(box);
    const stop = startAutosave(store, storage, documentApi);
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 30]));
    const good = storage.getItem(AUTOSAVE_KEY);
    storage.refuseWrites = true;
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 31]));
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 32]));
    expect(storage.getItem(AUTOSAVE_KEY)).toBe(good);
    const full = store.getState().notices.filter((n) => n.text === FULL_TEXT);
    expect(full).toHaveLength(1);
    expect(full[0].action).toEqual({ kind: 'save-file', label: 'Save to a file' });
    storage.refuseWrites = false;
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 33]));
    expect(savedCorner(storage)).toEqual([40, 33]);
    expect(store.getState().notices.some((n) => n.text === FULL_TEXT)).toBe(false);
    expect(store.getState().notices.some((n) => n.text.startsWith('Autosave works again'))).toBe(true);
    stop();
  });
});
