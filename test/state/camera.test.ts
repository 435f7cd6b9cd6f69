import { describe, expect, it } from 'vitest';
import { fitCamera, toScreen, toSketch, zoomAt } from '../../src/state/camera';
import { sketchBounds } from '../../src/state/geometry/polygon';

describe('camera', () => {
  it('maps sketch to screen with y up, and back', () => {
    const c = { scale: 50, originX: 10, originY: 300 };
    expect(toScreen(c, [2, 1])).toEqual([110, 250]);
    expect(toSketch(c, [110, 250])).toEqual([2, 1]);
  });

  it('zooms around the pointer: the point under it stays put', () => {
    const c = { scale: 50, originX: 10, originY: 300 };
    const z = zoomAt(c, [200, 120], 1.7);
    expect(z.scale).toBeCloseTo(85, 12);
    const before = toSketch(c, [200, 120]);
    const after = toSketch(z, [200, 120]);
    expect(after[0]).toBeCloseTo(before[0], 12);
    expect(after[1]).toBeCloseTo(before[1], 12);
  });

  it('fits a sketch centred in the viewport', () => {
    const c = fitCamera({ minX: 0, minY: 0, maxX: 4, maxY: 2 }, 840, 480, 20);
    expect(c.scale).toBe(200);
    expect(toScreen(c, [2, 1])).toEqual([420, 240]);
  });

  it('frames exact circles too: a shell around a bar, and a tube outside every polygon', () => {
    const bar = {
      kind: 'solid' as const,
      points: [
        [-1, -1],
        [1, -1],
        [1, 1],
        [-1, 1],
      ] as [number, number][],
      surface: 'bar',
    };
    const shell = {
      kind: 'enclosure' as const,
      points: [],
      circle: { center: [0, 0] as [number, number], radius: 5 },
      surface: 'shell',
    };
    expect(sketchBounds([bar, shell])).toEqual({ minX: -5, minY: -5, maxX: 5, maxY: 5 });
    const tube = {
      kind: 'solid' as const,
      points: [],
      circle: { center: [10, 0] as [number, number], radius: 2 },
      surface: 'tube',
    };
    expect(sketchBounds([tube])).toEqual({ minX: 8, minY: -2, maxX: 12, maxY: 2 });
    expect(sketchBounds([])).toBeNull();
  });
});
