// The last pair integrators built stay referenced (pairRows.ts, `lastBuilt`): while
// one sketch's integrators are alive, V8 keeps their hidden classes, and a full
// garbage collection does not throw away the optimised pair code between sketches.
// The speed itself is measured by `npm run bench`, never timed here.
import { describe, expect, it } from 'vitest';
import { buildEdges } from '../../src/core/edges';
import { EdgePairs, lastBuilt } from '../../src/core/pairRows';

const square = (x: number, size: number) => [x, 0, x + size, 0, x + size, size, x, size];

describe('pair integrators kept between sketches', () => {
  it('the integrators built last stay referenced until the next are built, and only those', () => {
    const first = new EdgePairs(buildEdges([{ kind: 'enclosure', points: square(0, 1) }]));
    expect(lastBuilt.pairs).toBe(first);
    const second = new EdgePairs(buildEdges([{ kind: 'enclosure', points: square(5, 2) }]));
    expect(lastBuilt.pairs).toBe(second);
    expect(lastBuilt.pairs).not.toBe(first);
  });
});
