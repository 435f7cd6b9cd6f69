// The per-shape geometry the canvas draws from: radiating normals worked out by
// hand for squares run both ways, lengths, the longest piece per surface name,
// and one computation per shape object.
import { describe, expect, it } from 'vitest';
import { shapeGeometry } from '../../../src/state/geometry/shapeGeometry';
import { isAnticlockwise, radiatingNormal, signedArea } from '../../../src/state/geometry/polygon';
import type { Shape } from '../../../src/state/sketchFile';

const ccwSquare: [number, number][] = [
  [0, 0],
  [2, 0],
  [2, 2],
  [0, 2],
];
const normalsOf = (shape: Shape) => {
  const n = shapeGeometry(shape).normals;
  return Array.from({ length: n.length / 2 }, (_, k) => [n[2 * k], n[2 * k + 1]].map((v) => v + 0));
};

describe('shape geometry', () => {
  it('points into an enclosure and out of a solid, whichever way the points run', () => {
    // Anticlockwise square: the inside is left of each side, so the bottom side's inward normal is +y.
    const inward = [
      [0, 1],
      [-1, 0],
      [0, -1],
      [1, 0],
    ];
    const outward = inward.map(([x, y]) => [-x + 0, -y + 0]);
    expect(normalsOf({ kind: 'enclosure', points: ccwSquare, surface: 'box' })).toEqual(inward);
    expect(normalsOf({ kind: 'solid', points: ccwSquare, surface: 'box' })).toEqual(outward);
    // The same square clockwise, from (0, 2): top, right, bottom, left side; inward is still inward.
    const cw = [...ccwSquare].reverse();
    expect(normalsOf({ kind: 'enclosure', points: cw, surface: 'box' })).toEqual([
      [0, -1],
      [-1, 0],
      [0, 1],
      [1, 0],
    ]);
  });

  it('agrees with radiatingNormal edge by edge on an irregular outline', () => {
    const shape: Shape = {
      kind: 'solid',
      points: [
        [0, 0],
        [3, 0.5],
        [2.5, 2],
        [1, 1.2],
        [-0.5, 2.4],
      ],
      surface: ['a', 'b', 'c', 'd', 'e'],
    };
    const g = shapeGeometry(shape);
    shape.points.forEach((_, k) => {
      const [x, y] = radiatingNormal(shape, k);
      expect(g.normals[2 * k]).toBe(x);
      expect(g.normals[2 * k + 1]).toBe(y);
    });
  });

  it('keeps lengths, names and the longest piece of each surface (first on a tie)', () => {
    const shape: Shape = {
      kind: 'enclosure',
      points: [
        [0, 0],
        [4, 0],
        [4, 3],
        [0, 3],
      ],
      surface: ['floor', 'wall', 'roof', 'wall'],
    };
    const g = shapeGeometry(shape);
    expect(Array.from(g.lengths)).toEqual([4, 3, 4, 3]);
    expect(g.names).toEqual(['floor', 'wall', 'roof', 'wall']);
    expect(g.longest.get('wall')).toEqual({ edge: 1, length: 3 });
    expect(g.longest.get('roof')).toEqual({ edge: 2, length: 4 });
  });

  it('is computed once per shape object and afresh for a changed copy', () => {
    const shape: Shape = { kind: 'solid', points: ccwSquare, surface: 'box' };
    expect(shapeGeometry(shape)).toBe(shapeGeometry(shape));
    const moved: Shape = { ...shape, points: ccwSquare.map(([x, y]) => [x + 1, y] as [number, number]) };
    expect(shapeGeometry(moved)).not.toBe(shapeGeometry(shape));
  });

  it('finds the orientation of a small polygon far from the origin', () => {
    // 0.1 x 0.1 square at 1e9: the area 0.01 is below the rounding of x*y products near 1e18.
    const far: [number, number][] = ccwSquare.map(([x, y]) => [1e9 + x / 20, 1e9 + y / 20]);
    expect(signedArea(far)).toBeCloseTo(0.01, 6);
    expect(isAnticlockwise(far)).toBe(true);
    expect(isAnticlockwise([...far].reverse())).toBe(false);
  });
});
