// Surface-factor matrices of retired answers are reused (results/derive.ts): a
// fresh 8 MB array costs a browser's main thread tens of ms. Reuse must never
// show wrong numbers: every shown matrix equals a fresh sum of its own answer, bit
// for bit, and a retired answer's sums are never served from the cache again.
import { describe, expect, it } from 'vitest';
import { createAppStore } from '../../../src/state/store';
import { startLiveResults, type JobRunner } from '../../../src/state/results/live';
import { REUSE_FROM, retireSurfaceFactors, shownResult, surfaceFactors } from '../../../src/state/results/derive';
import { documentApi } from '../../../src/state/documentApi';
import { moveSelection } from '../../../src/state/edits/shapeEdits';
import { aggregatePackedRows } from '../../../src/core/packedSurfaces';
import { viewFactorApi } from '../../../src/worker/api';
import { isSurfaceAnswer, jobFromPolygons, type ViewFactorAnswer } from '../../../src/worker/job';
import { checkedGeometry } from '../../../src/state/results/checked';
import type { JobOutcome } from '../../../src/worker/client';
import type { SketchFile } from '../../../src/state/sketchFile';
import type { SurfaceIndex } from '../../../src/document/surfaceIndex';

const flush = () => new Promise((r) => setTimeout(r, 0));
const bytes = (a: Float64Array) => new Uint8Array(a.buffer, a.byteOffset, a.byteLength);

/** A 70-sided enclosure, every wall edge its own surface, holding one block: 71 surfaces, past REUSE_FROM. */
const SIDES = 70;
const ring: SketchFile = {
  version: 2,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: Array.from({ length: SIDES }, (_, k): [number, number] => {
        const a = (2 * Math.PI * k) / SIDES;
        return [3 * Math.cos(a), 2 * Math.sin(a)];
      }),
      surface: Array.from({ length: SIDES }, (_, k) => `wall ${k + 1}`),
    },
    {
      kind: 'solid',
      points: [
        [-0.5, -0.25],
        [0.5, -0.25],
        [0.5, 0.25],
        [-0.5, 0.25],
      ],
      surface: 'block',
    },
  ],
};
const block = [{ type: 'shape' as const, shape: 1 }];

/** The sums of `answer` to `surfaces` in a fresh matrix, as if nothing were reused. */
function freshSums(answer: ViewFactorAnswer, surfaces: SurfaceIndex): Float64Array {
  if (isSurfaceAnswer(answer)) throw new Error('expected edge factors');
  const m = surfaces.names.length;
  return aggregatePackedRows(answer.edgeLength, answer.rows, surfaces.edgeSurface, m, answer.closed).F;
}

describe('reused surface-factor matrices', () => {
  it('a drag of a 71-surface sketch reuses retired matrices and shows each answer its own numbers', async () => {
    expect((SIDES + 1) ** 2).toBeGreaterThanOrEqual(REUSE_FROM);
    const pending: (() => Promise<void>)[] = [];
    const runner: JobRunner = {
      run: (job) =>
        new Promise<JobOutcome>((resolve) => {
          pending.push(async () => {
            resolve({ kind: 'done', result: await viewFactorApi.compute(job), elapsedMs: 0 });
            await flush();
          });
        }),
    };
    const store = createAppStore(ring);
    startLiveResults(store, runner, documentApi);
    await pending.shift()!();
    const s = store.getState();
    s.beginGesture();
    const seen: Float64Array[] = [];
    let previous: { F: Float64Array; numbers: Uint8Array } | null = null;
    for (let step = 1; step <= 6; step++) {
      s.previewGesture(moveSelection(ring, block, 0.1 * step, 0.05 * step));
      await pending.shift()!();
      const vf = store.getState().viewFactors;
      const shown = shownResult(vf)!;
      expect(shown.stale).toBe(false);
      // The shown numbers are this answer's, whatever buffer holds them.
      expect(bytes(shown.result.F)).toEqual(bytes(freshSums(vf.edges!.result, vf.current!.surfaces)));
      seen.push(shown.result.F);
      // The matrix shown one answer before is still intact (a render under way may read it).
      if (previous) expect(bytes(previous.F)).toEqual(previous.numbers);
      previous = { F: shown.result.F, numbers: bytes(shown.result.F).slice() };
    }
    // Matrices came back: fewer distinct buffers than answers shown.
    expect(new Set(seen.map((F) => F.buffer)).size).toBeLessThan(seen.length);
  });

  it('a retired answer is summed afresh if asked again, never from the reused matrix', async () => {
    const a = await viewFactorApi.compute(
      jobFromPolygons([
        { kind: 'enclosure', points: ring.shapes[0].points.flat() },
        { kind: 'solid', points: ring.shapes[1].points.flat() },
      ]),
    );
    const check = documentApi.restore(ring);
    if (!check.ok) throw new Error('the ring sketch must be valid');
    const surfaces = checkedGeometry(ring.shapes, check.sketch).surfaces;
    const first = surfaceFactors(a, surfaces);
    const expected = bytes(freshSums(a, surfaces)).slice();
    expect(surfaceFactors(a, surfaces)).toBe(first); // cached while the answer lives
    retireSurfaceFactors(a);
    // The next sums (any answer) take the retired matrix; then the retired answer asked again gets a new one.
    const b = await viewFactorApi.compute(
      jobFromPolygons([
        { kind: 'enclosure', points: ring.shapes[0].points.flat() },
        { kind: 'solid', points: ring.shapes[1].points.flat().map((v) => v * 0.5) },
      ]),
    );
    const next = surfaceFactors(b, surfaces);
    expect(next.F.buffer).toBe(first.F.buffer);
    const again = surfaceFactors(a, surfaces);
    expect(again).not.toBe(first);
    expect(again.F.buffer).not.toBe(next.F.buffer);
    expect(bytes(again.F)).toEqual(expected);
  });
});
