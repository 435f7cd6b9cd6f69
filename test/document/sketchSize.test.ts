// Edges too short beside the whole sketch are refused (src/document/sketchSize.ts):
// the core's computed points carry a rounding of about 1e-16 of the sketch's size, so
// below 2^-26 of it an edge's factors could miss the 1e-9 promised. Fixtures named
// after the long fuzz runs that caught them: a value mutated to 1e15 (a 1 mm square's
// row then summed to 0.87) and one mutated to -1 (a 1e-4 opening beside a sliver 1e6
// long summed to 1 - 2.4e-8). Just inside the limit the rows hold to 1e-9 (the
// summation rule, Incropera et al., 6th ed., sec. 13.1).
import { describe, expect, it } from 'vitest';
import { restore, toScene } from '../../src/document';
import { MIN_SIZE_FRACTION } from '../../src/document/limits';
import { computeViewFactors } from '../../src/core/viewFactors';

/** A thin sliver enclosure `length` long with a 1e-4 mouth, and a 4e-5 square block in its wide end. */
const sliver = (length: number) => ({
  version: 1,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [1e-4, -length],
        [1e-4, 1e-4],
        [0, 1e-4],
      ],
      surface: ['a', 'b', 'c', 'mouth'],
    },
    {
      kind: 'solid',
      points: [
        [2e-5, 2e-5],
        [6e-5, 2e-5],
        [6e-5, 6e-5],
        [2e-5, 6e-5],
      ],
      surface: 'block',
    },
  ],
});

describe('edges too short beside the sketch', () => {
  it('a square of 1 mm in a sketch reaching 1e15 is refused, naming the shape, edge and size', () => {
    const doc = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [1e15, 0],
            [0.1, 0.1],
            [0, 0.1],
          ],
          surface: 'wall',
        },
        { kind: 'solid', points: sliver(1).shapes[1].points.map(([x, y]) => [x * 25, y * 25]), surface: 'bar' },
      ],
    };
    const r = restore(doc);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    const bar = r.errors.find((e) => e.message.startsWith("'bar'"));
    expect(bar?.kind).toBe('edge-too-short');
    expect(bar?.message).toMatch(/edge 1 is 0\.001 m long, under 1\.5e-8 of the sketch's size \(1000000000000000 m\)/);
    expect(bar?.place.edges).toEqual([{ shape: 1, edge: 0 }]);
  });

  it('a 1e-4 mouth beside a sliver 1e6 long is refused; 2600 long, just inside the limit, its rows hold to 1e-9', () => {
    const far = restore(sliver(1e6));
    expect(far.ok).toBe(false);
    if (!far.ok) expect(far.errors.map((e) => e.kind)).toEqual(['edge-too-short', 'edge-too-short']);
    // The block's 4e-5 edges against a size of 2600: 1.54e-8, over 2^-26 = 1.49e-8.
    expect(4e-5 / 2600).toBeGreaterThan(MIN_SIZE_FRACTION);
    const near = restore(sliver(2600));
    expect(near.ok).toBe(true);
    if (!near.ok) return;
    const v = computeViewFactors(toScene(near.sketch).scene);
    for (const x of v.rowSumResidual) expect(Math.abs(x)).toBeLessThan(1e-9);
    expect(restore(sliver(2700)).ok).toBe(false);
  });
});
