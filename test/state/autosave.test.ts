import { describe, expect, it } from 'vitest';
import { AUTOSAVE_KEY, SET_ASIDE_PREFIX, loadAutosave, saveAutosave, startAutosave } from '../../src/state/autosave';
import { documentApi } from '../../src/state/documentApi';
import { demoSketch } from '../../src/state/demo';
import { createAppStore } from '../../src/state/store';
import { setVertex } from '../../src/state/edits/shapeEdits';
import { MemoryStorage } from './memoryStorage';
import type { SketchFile } from '../../src/state/sketchFile';

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

  it('sets aside an autosave whose geometry is invalid, naming the problem', () => {
    const storage = new MemoryStorage();
    const crossed = {
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
    expect(r.doc).toBe(demoSketch);
    expect(r.notice?.text).toMatch(/shape 1.*cross/);
  });

  it('saves every valid change but never overwrites the last good copy with an invalid one', () => {
    const storage = new MemoryStorage();
    const store = createAppStore(box);
    const stop = startAutosave(store, storage, documentApi);
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 30]));
    const good = storage.getItem(AUTOSAVE_KEY)!;
    expect(JSON.parse(good).shapes[0].points[2]).toEqual([40, 30]);
    // A self-crossing outline (the corner dragged across the opposite wall) fails validation.
    store.getState().edit((d) => setVertex(d, 0, 2, [-10, 10]));
    expect(storage.getItem(AUTOSAVE_KEY)).toBe(good);
    store.getState().undo();
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 25]));
    expect(JSON.parse(storage.getItem(AUTOSAVE_KEY)!).shapes[0].points[2]).toEqual([40, 25]);
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
    expect(JSON.parse(storage.getItem(AUTOSAVE_KEY)!).shapes[0].points[2]).toEqual([41, 21]);
    stop();
  });

  it('tells the user once when storage refuses the write', () => {
    const storage = new MemoryStorage();
    storage.refuseWrites = true;
    const store = createAppStore(box);
    const stop = startAutosave(store, storage, documentApi);
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 30]));
    store.getState().edit((d) => setVertex(d, 0, 2, [40, 31]));
    expect(store.getState().notices.filter((n) => n.text.startsWith('Autosave failed'))).toHaveLength(1);
    stop();
  });
});
