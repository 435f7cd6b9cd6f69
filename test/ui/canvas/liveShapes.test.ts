// Which layer each shape is drawn in: one layer when nothing moves; a moving
// solid above the still shapes; a moving enclosure between the still enclosures
// and the still solids, so enclosures stay below solids as when nothing moves.
import { describe, expect, it } from 'vitest';
import { shapeLayers } from '../../../src/ui/canvas/liveShapes';
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
