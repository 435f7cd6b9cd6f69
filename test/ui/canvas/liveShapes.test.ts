// Which layer each shape is drawn in: one layer when nothing moves; a moving
// solid above the still shapes; a moving enclosure between the still enclosures
// and the still solids, so enclosures stay below solids as when nothing moves.
import { describe, expect, it } from 'vitest';
import { liveShift, shapeLayers } from '../../../src/ui/canvas/liveShapes';
import type { Shape } from '../../../src/state/sketchFile';

const square = (kind: Shape['kind']): Shape => ({
  kind,
  points: [
    [0, 0],
    [1, 0],
    [1, 1],
  ],
  surface: kind,
});
// Drawing order when still: enclosures by index (0, 2), then solids by index (1, 3).
const shapes = [square('enclosure'), square('solid'), square('enclosure'), square('solid')];

describe('shape layers', () => {
  it('draws enclosures first, then solids, in one layer when nothing moves', () => {
    expect(shapeLayers(shapes, new Set())).toEqual([{ key: 'still', shapes: [0, 2, 1, 3] }]);
  });

  it('puts a moving solid in a layer above the still shapes', () => {
    expect(shapeLayers(shapes, new Set([1]))).toEqual([
      { key: 'still', shapes: [0, 2, 3] },
      { key: 'live-solids', shapes: [1] },
    ]);
  });

  it('keeps a moving enclosure below every solid', () => {
    expect(shapeLayers(shapes, new Set([2, 3]))).toEqual([
      { key: 'still', shapes: [0] },
      { key: 'live-enclosures', shapes: [2] },
      { key: 'still-solids', shapes: [1] },
      { key: 'live-solids', shapes: [3] },
    ]);
  });
});

describe('live shift', () => {
  const tube: Shape = { kind: 'solid', points: [], circle: { center: [1, 2], radius: 0.5 }, surface: ['a', 'b'] };
  const block = square('solid');
  const moved = (s: Shape, dx: number, dy: number): Shape =>
    s.circle
      ? { ...s, circle: { ...s.circle, center: [s.circle.center[0] + dx, s.circle.center[1] + dy] } }
      : { ...s, points: s.points.map(([x, y]): [number, number] => [x + dx, y + dy]) };
  const base = [square('enclosure'), block, tube];

  it('gives the one shift of shapes moved whole, polygons and circles alike', () => {
    const now = [base[0], moved(block, 0.25, -0.5), moved(tube, 0.25, -0.5)];
    const shift = liveShift(now, base, new Set([1, 2]))!;
    expect(shift[0]).toBeCloseTo(0.25, 12);
    expect(shift[1]).toBeCloseTo(-0.5, 12);
  });

  it('is null when a shape changed otherwise: a corner dragged, a new radius, a rename, two shifts, no gesture', () => {
    const corner: Shape = { ...block, points: block.points.map((p, k): [number, number] => (k === 1 ? [2, 0] : p)) };
    expect(liveShift([base[0], corner, tube], base, new Set([1]))).toBeNull();
    const wider: Shape = { ...tube, circle: { center: [1, 2], radius: 0.6 } };
    expect(liveShift([base[0], block, wider], base, new Set([2]))).toBeNull();
    const renamed: Shape = { ...moved(block, 1, 0), surface: 'other' };
    expect(liveShift([base[0], renamed, tube], base, new Set([1]))).toBeNull();
    expect(liveShift([base[0], moved(block, 1, 0), moved(tube, 0, 1)], base, new Set([1, 2]))).toBeNull();
    expect(liveShift(base, null, new Set())).toBeNull();
    expect(liveShift(base, base, new Set())).toBeNull();
  });

  it('accepts the rounding of a move far from the origin, to a millionth of the shape', () => {
    const far: Shape = { ...block, points: block.points.map(([x, y]): [number, number] => [x + 1e6, y - 1e6]) };
    const shift = liveShift([moved(far, 0.1, 0.3)], [far], new Set([0]))!;
    expect(shift[0]).toBeCloseTo(0.1, 6);
    expect(shift[1]).toBeCloseTo(0.3, 6);
  });
});
