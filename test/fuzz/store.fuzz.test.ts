// Fuzz: random sketches and mutated files opened in the app's store, then
// random property, settings and geometry edits, with the real results pipeline
// (the view-factor job in this thread). Nothing throws; every notice says
// something; the results and the heat exchange hold only finite numbers; the
// shown factors keep the summation rule and reciprocity; whatever is on screen
// is in the autosave and reads back.
import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { startRuntime } from '../../src/state/runtime';
import { documentApi } from '../../src/state/documentApi';
import { demoSketch } from '../../src/state/demo';
import { openSketchText } from '../../src/state/files';
import { AUTOSAVE_KEY } from '../../src/state/autosave';
import { shownResult } from '../../src/state/results/derive';
import { setCondition, setEmissivity, setSettings } from '../../src/state/exchange/edits';
import { moveSelection } from '../../src/state/edits/shapeEdits';
import { edgeNames } from '../../src/state/geometry/polygon';
import { viewFactorApi } from '../../src/worker/api';
import type { AppStore } from '../../src/state/store';
import { MemoryStorage } from '../state/memoryStorage';
import { renameSurface } from '../../src/state/edits/surfaceEdits';
import {
  FUZZ_TIMEOUT,
  NAMES,
  magnitude,
  mutateText,
  runs,
  seed,
  signed,
  sketchFile,
  textMutation,
} from './arbitraries';
import { expectInvariants, expectMessage, nonFinite } from './checks';

const edit = fc.oneof(
  fc.record({ op: fc.constant('emissivity' as const), edge: fc.nat(), value: magnitude }),
  fc.record({ op: fc.constant('temperature' as const), edge: fc.nat(), value: magnitude }),
  fc.record({ op: fc.constant('flux' as const), edge: fc.nat(), value: signed }),
  fc.record({ op: fc.constant('surroundings' as const), value: magnitude }),
  fc.record({ op: fc.constant('depth' as const), value: magnitude }),
  fc.record({ op: fc.constant('rename' as const), edge: fc.nat(), to: fc.constantFrom(...NAMES) }),
  fc.record({
    op: fc.constant('move' as const),
    shape: fc.nat(3),
    dx: fc.double({ min: -0.5, max: 0.5, noNaN: true }),
  }),
);
type Edit = typeof edit extends fc.Arbitrary<infer T> ? T : never;

function apply(store: AppStore, e: Edit): void {
  const s = store.getState();
  const names = s.doc.shapes.flatMap(edgeNames);
  const name = 'edge' in e && names.length > 0 ? names[e.edge % names.length] : '';
  if (e.op === 'emissivity') s.edit((d) => setEmissivity(d, name, e.value));
  if (e.op === 'temperature') s.edit((d) => setCondition(d, name, { kind: 'temperature', temperature: e.value }));
  if (e.op === 'flux') s.edit((d) => setCondition(d, name, { kind: 'heatFlux', heatFlux: e.value }));
  if (e.op === 'surroundings') s.edit((d) => setSettings(d, { surroundingsTemperature: e.value }));
  if (e.op === 'depth') s.edit((d) => setSettings(d, { depth: e.value }));
  // Names such as "__proto__" and "constructor" are plain names: renaming onto one merges as any other.
  if (e.op === 'rename') s.edit((d) => renameSurface(d, name, e.to));
  if (e.op === 'move' && s.doc.shapes[e.shape])
    s.edit((d) => moveSelection(d, [{ type: 'shape', shape: e.shape }], e.dx, 0));
}

/** Let the in-thread job and the stages after it run. */
async function settle(store: AppStore): Promise<void> {
  for (let i = 0; i < 50 && store.getState().viewFactors.status === 'computing'; i++)
    await new Promise((r) => setTimeout(r, 0));
  expect(store.getState().viewFactors.status).not.toBe('computing');
}

/** How many checks saw each outcome, so a run that never reached results fails. */
const seen = { ready: 0, invalid: 0, solved: 0, exchangeError: 0 };

function check(store: AppStore, storage: MemoryStorage): void {
  const s = store.getState();
  for (const n of s.notices) expectMessage(n.text);
  const vf = s.viewFactors;
  if (vf.status === 'invalid') {
    seen.invalid++;
    expect(vf.problems.length).toBeGreaterThan(0);
    for (const p of vf.problems) expectMessage(p.message);
  }
  if (vf.status === 'error') expectMessage(vf.error ?? '');
  const shown = shownResult(vf);
  if (vf.status === 'ready' && shown) {
    seen.ready++;
    expect(nonFinite(shown.result)).toEqual([]);
    expectInvariants(shown.result.F, shown.result.surfaceLength, shown.result.closed);
    const ex = s.exchange;
    if (ex.kind === 'solved') {
      seen.solved++;
      // The surface balance marks "not a wall" and "not a tube" by NaN in these two (src/core/balance/types.ts).
      expect(nonFinite(ex.result, ['coldFaceTemperature', 'innerTemperature'])).toEqual([]);
    }
    if (ex.kind === 'error') {
      seen.exchangeError++;
      expectMessage(ex.message);
    }
  }
  // The autosave holds what is on screen, and reads back (a draft included).
  const saved = storage.getItem(AUTOSAVE_KEY);
  if (saved !== null && documentApi.readDraft(s.doc).ok) {
    const back = documentApi.readDraft(saved);
    expect(back.ok).toBe(true);
  }
}

async function session(text: string, edits: Edit[]): Promise<void> {
  const storage = new MemoryStorage();
  const runtime = startRuntime({
    storage,
    api: documentApi,
    spawn: () => ({ compute: (job) => Promise.resolve(viewFactorApi.compute(job)), terminate: () => {} }),
    demo: demoSketch,
  });
  try {
    const store = runtime.store;
    openSketchText(store, documentApi, text, 'fuzz.json');
    await settle(store);
    check(store, storage);
    for (const e of edits) {
      apply(store, e);
      await settle(store);
      check(store, storage);
    }
  } finally {
    runtime.dispose();
  }
}

describe('fuzz: the store', () => {
  it(
    'random sketches, then random edits',
    async () => {
      await fc.assert(
        fc.asyncProperty(sketchFile, fc.array(edit, { maxLength: 5 }), (file, edits) =>
          session(JSON.stringify(file), edits),
        ),
        { numRuns: runs(25), seed: seed(1405) },
      );
    },
    FUZZ_TIMEOUT,
  );

  it(
    'mutated files, then random edits',
    async () => {
      await fc.assert(
        fc.asyncProperty(sketchFile, textMutation, fc.array(edit, { maxLength: 3 }), (file, m, edits) =>
          session(mutateText(JSON.stringify(file), m), edits),
        ),
        { numRuns: runs(20), seed: seed(1406) },
      );
      // Both runs together reached results, drafts, solved exchanges and refused ones.
      for (const count of Object.values(seen)) expect(count).toBeGreaterThan(0);
    },
    FUZZ_TIMEOUT,
  );
});
