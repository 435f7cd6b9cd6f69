// The app's document functions: restore and readDraft of one document come from
// one reading (live results and the autosave both ask about every edit; the
// checks are the costly part), with the answers the document layer gives.
import { describe, expect, it } from 'vitest';
import { readDraft, restore } from '../../src/document';
import { documentApi } from '../../src/state/documentApi';
import { demoSketch } from '../../src/state/demo';
import type { SketchFile } from '../../src/state/sketchFile';

const crossed: SketchFile = {
  version: 1,
  units: 'm',
  // A bow tie: its outline crosses itself, a drawing rule the checks refuse.
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [0, 3],
        [4, 3],
      ],
      surface: 'wall',
    },
  ],
};

const notASketch = { version: 1, units: 'm', shapes: 'none' };

describe('documentApi', () => {
  it('answers as restore and readDraft do, for a sketch, a draft and a file that is not a sketch', () => {
    for (const doc of [demoSketch, crossed, notASketch]) {
      const copy = structuredClone(doc);
      expect(documentApi.restore(copy)).toEqual(restore(structuredClone(doc)));
      expect(documentApi.readDraft(copy)).toEqual(readDraft(structuredClone(doc)));
    }
    expect(documentApi.restore(crossed).ok).toBe(false);
    expect(documentApi.readDraft(crossed).ok).toBe(true);
    expect(documentApi.readDraft(notASketch).ok).toBe(false);
  });

  it('reads a document once: the draft is the sketch restore gave, and the problems the same', () => {
    const doc = structuredClone(demoSketch);
    const draft = documentApi.readDraft(doc);
    const restored = documentApi.restore(doc);
    if (!draft.ok || !restored.ok) throw new Error('the demo should read');
    expect(draft.doc).toBe(restored.sketch);
    const bad = structuredClone(crossed);
    const badDraft = documentApi.readDraft(bad);
    const badRestored = documentApi.restore(bad);
    if (!badDraft.ok || badRestored.ok) throw new Error('the bow tie should be a draft');
    expect(badDraft.problems).toBe(badRestored.errors);
  });
});
