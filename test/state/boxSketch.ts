// A 4 x 2 box (floor, right, roof, left) holding one 0.5 x 0.5 block: the small
// sketch of the store, results-pipeline and some command-line tests.
import type { SketchFile } from '../../src/state/sketchFile';

export const box: SketchFile = {
  version: 1,
  units: 'm',
  shapes: [
    {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 2],
        [0, 2],
      ],
      surface: ['floor', 'right', 'roof', 'left'],
    },
    {
      kind: 'solid',
      points: [
        [1.75, 0.75],
        [2.25, 0.75],
        [2.25, 1.25],
        [1.75, 1.25],
      ],
      surface: 'block',
    },
  ],
};
