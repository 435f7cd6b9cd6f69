// A study on the page takes the view factors the results pipeline holds for its
// sketch instead of computing them again, and only for that geometry.
import { describe, expect, it } from 'vitest';
import { restore, toScene } from '../../src/document';
import { computeViewFactors } from '../../src/core/viewFactors';
import { createAppStore } from '../../src/state/store';
import { startLiveResults, type JobRunner } from '../../src/state/results/live';
import { shownResult } from '../../src/state/results/derive';
import { documentApi } from '../../src/state/documentApi';
import { runStudy, startStudy, withKnownFactors, type StudyReply, type StudyRequest } from '../../src/state/study';
import { knownFactorsOf, sameScene } from '../../src/state/study/known';
import type { SketchFile } from '../../src/state/sketchFile';
import { viewFactorApi } from '../../src/worker/api';
import { kiln } from '../cli/studyHelpers';

const flush = () => new Promise((r) => setTimeout(r, 0));

function checked(file: unknown) {
  const read = restore(file);
  if (!read.ok) throw new Error(read.errors[0].message);
  return read.sketch;
}

/** The kiln with its ware stack moved right by dx (m). */
function movedKiln(dx: number) {
  const file = kiln();
  file.shapes[1].points = file.shapes[1].points.map(([x, y]) => [x + dx, y]);
  return file;
}

const inProcess: JobRunner = {
  run: async (job) => ({ kind: 'done', result: await viewFactorApi.compute(job), elapsedMs: 0 }),
};

/** An app store on `file` whose results pipeline has finished. */
async function readyStore(file: unknown) {
  const store = createAppStore(file as SketchFile);
  startLiveResults(store, inProcess, documentApi);
  for (let k = 0; k < 5 && store.getState().viewFactors.status !== 'ready'; k++) await flush();
  expect(store.getState().viewFactors.status).toBe('ready');
  return store;
}

describe('sameScene and knownFactorsOf', () => {
  const base = toScene(checked(kiln())).scene;

  it('tells the same geometry from a moved point, another surface of an edge, or another circle', () => {
    expect(sameScene(base, toScene(checked(kiln())).scene)).toBe(true);
    expect(sameScene(base, toScene(checked(movedKiln(1e-9))).scene)).toBe(false);
    const regrouped = { ...base, edgeSurface: Array.from(base.edgeSurface, (s) => (s === 1 ? 0 : s)) };
    expect(sameScene(base, regrouped)).toBe(false);
    const withCircle = (radius: number) => ({
      ...base,
      circles: [{ kind: 'solid' as const, cx: 1.5, cy: 1.2, radius, arcs: 1 }],
    });
    expect(sameScene(withCircle(0.1), withCircle(0.1))).toBe(true);
    expect(sameScene(withCircle(0.1), withCircle(0.1000001))).toBe(false);
  });

  it('gives the known factors for their own scene only, and asks the fallback for any other', () => {
    const known = computeViewFactors(base);
    const of = knownFactorsOf(base, known, computeViewFactors);
    expect(of(toScene(checked(kiln())).scene)).toBe(known);
    const moved = toScene(checked(movedKiln(0.2))).scene;
    const got = of(moved);
    expect(got).not.toBe(known);
    expect(got).toEqual(computeViewFactors(moved));
  });
});

describe('runStudy with the factors it is given', () => {
  const sketch = checked(kiln());

  it('uses them: the sensitivity of the kiln with the moved kiln factors is the moved kiln sensitivity', () => {
    // Properties are the same in both files, so everything that differs comes from the factors.
    const moved = checked(movedKiln(0.2));
    const movedFactors = computeViewFactors(toScene(moved).scene);
    const given = runStudy({ kind: 'effects', sketch, factors: movedFactors });
    expect(given).toEqual(runStudy({ kind: 'effects', sketch: moved }));
    expect(given).not.toEqual(runStudy({ kind: 'effects', sketch }));
  });

  it('gives the same tables as computing them, for a property sweep and an aim', () => {
    const factors = computeViewFactors(toScene(sketch).scene);
    const sweep = { kind: 'sweep', sketch, address: 'hearth.emissivity', from: 0.5, to: 0.9, steps: 5 } as const;
    expect(runStudy({ ...sweep, factors })).toEqual(runStudy(sweep));
    const aim = {
      kind: 'solve',
      sketch,
      address: 'hearth.temperature',
      from: 900,
      to: 1500,
      steps: 8,
      surface: 'ware stack.2',
      quantity: 'netHeat',
      target: -5000,
    } as const;
    expect(runStudy({ ...aim, factors })).toEqual(runStudy(aim));
  });

  it('runs in-line on a copy: the pipeline reusing its arrays after the start changes nothing', async () => {
    const factors = computeViewFactors(toScene(sketch).scene);
    const request: StudyRequest = { kind: 'effects', sketch, factors };
    const want = runStudy(request);
    const reply = await new Promise<StudyReply>((done) => {
      startStudy(request, (r) => r.kind !== 'progress' && done(r));
      factors.F.fill(0); // what a spare matrix reused by the next sums would do
    });
    expect(reply).toEqual(want);
  });
});

describe('withKnownFactors', () => {
  it("attaches the pipeline's factors to a study of the same sketch that keeps its geometry", async () => {
    const store = await readyStore(kiln());
    const vf = store.getState().viewFactors;
    const shown = shownResult(vf)!;
    const sketch = checked(kiln()); // another object than the pipeline's, the same geometry
    const effects = withKnownFactors({ kind: 'effects', sketch }, vf);
    expect(effects.factors).toBe(shown.result);
    const property = { kind: 'sweep', sketch, address: 'wall.emissivity', from: 0.5, to: 0.9, steps: 3 } as const;
    expect(withKnownFactors(property, vf).factors).toBe(shown.result);
    // The same study with the factors the pipeline holds and without: the same table.
    expect(runStudy(withKnownFactors(property, vf))).toEqual(runStudy(property));
  });

  it('attaches nothing to a study that moves a shape, of another geometry, or while the results are stale', async () => {
    const store = await readyStore(kiln());
    const sketch = checked(kiln());
    const position = { kind: 'sweep', sketch, address: 'ware stack.2.x', from: 1.2, to: 1.6, steps: 3 } as const;
    expect(withKnownFactors(position, store.getState().viewFactors).factors).toBeUndefined();
    const other = { kind: 'effects', sketch: checked(movedKiln(1e-6)) } as const;
    expect(withKnownFactors(other, store.getState().viewFactors).factors).toBeUndefined();
    // An edit that moves a shape: until the new factors come, those held are stale.
    store.getState().commit(movedKiln(0.2) as SketchFile);
    expect(shownResult(store.getState().viewFactors)?.stale).toBe(true);
    const moved = { kind: 'effects', sketch: checked(movedKiln(0.2)) } as const;
    expect(withKnownFactors(moved, store.getState().viewFactors).factors).toBeUndefined();
    for (let k = 0; k < 5 && store.getState().viewFactors.status !== 'ready'; k++) await flush();
    expect(withKnownFactors(moved, store.getState().viewFactors).factors).toBe(
      shownResult(store.getState().viewFactors)!.result,
    );
  });
});
