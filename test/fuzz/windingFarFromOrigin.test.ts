// Faults the fuzz suite found, kept as fixtures named after the bug.
//
// Winding lost far from the origin: src/core/edges.ts took each polygon's
// winding from its signed area in unshifted coordinates. A 0.1 m square at
// -1e9 m has products near 1e18 whose rounding (~1e2) swamps its area (0.01),
// so the winding came out wrong and every factor was 0; the same cancellation
// flipped small bodies at 1e6. The area is now taken relative to the first point.
// Expected values: a closed enclosure's rows sum to one (Incropera et al.,
// Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.1).
import { describe, expect, it } from 'vitest';
import { restore, toScene } from '../../src/document';
import { computeViewFactors } from '../../src/core/viewFactors';

function rowSums(file: object): number[] {
  const read = restore(file);
  if (!read.ok) throw new Error(read.errors[0].message);
  const r = computeViewFactors(toScene(read.sketch).scene);
  const n = r.surfaceCount;
  return Array.from({ length: n }, (_, i) => r.F.slice(i * n, i * n + n).reduce((a, b) => a + b, 0));
}

const square = (x0: number, y0: number, side: number): [number, number][] => [
  [x0, y0],
  [x0 + side, y0],
  [x0 + side, y0 + side],
  [x0, y0 + side],
];

describe('winding lost far from the origin (fixed)', () => {
  it('a 0.1 square enclosure at -1e9 sums its row to one', () => {
    const sums = rowSums({
      version: 1,
      units: 'm',
      shapes: [{ kind: 'enclosure', points: square(-1e9, -1e9, 0.1), surface: 'wall' }],
    });
    expect(Math.abs(1 - sums[0])).toBeLessThan(1e-9);
  });

  // The fuzz suite's own counterexample (shrunk): a 1 mm body in a 0.1 enclosure at 1e6.
  const body = (dx: number, dy: number): [number, number][] => [
    [dx + 0.004496906, dy + 0.0045],
    [dx + 0.0055030939, dy + 0.0045],
    [dx + 0.0055030939, dy + 0.0055],
    [dx + 0.004496906, dy + 0.0055],
  ];
  const withBody = (at: number) => ({
    version: 1,
    units: 'm',
    shapes: [
      { kind: 'enclosure', points: square(at, at, 0.1), surface: 'wall' },
      { kind: 'solid', points: body(at, at), surface: 'wall' },
    ],
  });

  it('a 1 mm body in a 0.1 enclosure at 1e6: every row sums to one', () => {
    for (const s of rowSums(withBody(1e6))) expect(Math.abs(1 - s)).toBeLessThan(1e-9);
  });

  it('the same sketches at the origin sum to one (the faults are the offset alone)', () => {
    expect(
      Math.abs(
        1 -
          rowSums({
            version: 1,
            units: 'm',
            shapes: [{ kind: 'enclosure', points: square(0, 0, 0.1), surface: 'wall' }],
          })[0],
      ),
    ).toBeLessThan(1e-9);
    const sums = rowSums(withBody(0));
    for (const s of sums) expect(Math.abs(1 - s)).toBeLessThan(1e-9);
  });
});
