// Fuzz: random sketches and mutated files through the reader. It never throws;
// every refusal says why; every accepted sketch computes finite view factors
// that keep the summation rule and reciprocity; a draft's problems are the
// reasons restore gives.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { readDraft, restore, serialize, toScene } from '../../src/document';
import { computeViewFactors } from '../../src/core/viewFactors';
import {
  FUZZ_TIMEOUT,
  mutateText,
  mutateValue,
  runs,
  seed,
  sketchFile,
  textMutation,
  valueMutation,
} from './arbitraries';
import { expectInvariants, expectMessage, nonFinite } from './checks';

function check(input: unknown): 'accepted' | 'refused' {
  const read = restore(input);
  const draft = readDraft(input);
  if (!read.ok) {
    expect(read.errors.length).toBeGreaterThan(0);
    for (const e of read.errors) expectMessage(e.message);
    if (draft.ok) {
      // Read as a draft: the problems are restore's reasons.
      expect(draft.problems.map((p) => p.message)).toEqual(read.errors.map((e) => e.message));
    } else expect(draft.errors.map((e) => e.message)).toEqual(read.errors.map((e) => e.message));
    return 'refused';
  }
  expect(draft.ok && draft.problems).toEqual([]);
  for (const w of read.warnings) expectMessage(w);
  // Written and read again: the same sketch (as JSON reads it: -0 is written 0; ignored fields are not written back).
  const again = restore(serialize(read.sketch));
  expect(again.ok && JSON.parse(JSON.stringify(again.sketch))).toEqual(JSON.parse(JSON.stringify(read.sketch)));
  if (read.sketch.shapes.length === 0) return 'accepted';
  const { scene } = toScene(read.sketch);
  const r = computeViewFactors(scene, { independentPairs: true });
  expect(nonFinite(r)).toEqual([]);
  expectInvariants(r.F, r.surfaceLength, r.closed);
  return 'accepted';
}

describe('fuzz: the reader', () => {
  it(
    'random sketches',
    () => {
      const seen = { accepted: 0, refused: 0 };
      fc.assert(
        fc.property(sketchFile, (file) => {
          seen[check(JSON.stringify(file))]++;
          seen[check(file)]++;
        }),
        { numRuns: runs(150), seed: seed(1401) },
      );
      expect(seen.accepted).toBeGreaterThan(0);
      expect(seen.refused).toBeGreaterThan(0);
    },
    FUZZ_TIMEOUT,
  );

  it(
    'mutated files: text and values',
    () => {
      fc.assert(
        fc.property(
          sketchFile,
          fc.array(textMutation, { minLength: 1, maxLength: 3 }),
          valueMutation,
          (file, edits, m) => {
            check(edits.reduce(mutateText, JSON.stringify(file, null, 1)));
            check(JSON.stringify(mutateValue(file, m)));
          },
        ),
        { numRuns: runs(150), seed: seed(1402) },
      );
    },
    FUZZ_TIMEOUT,
  );
});
