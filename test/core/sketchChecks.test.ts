import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { checkSketchGeometry, type GeometryFinding } from '../../src/core/sketchChecks';
import { pointInPolygon } from '../../src/core/pointInPolygon';
import { signedArea2 } from '../../src/core/edges';
import { orient as orientation } from '../../src/core/orient';
import type { PolygonInput } from '../../src/core/scene';

// Geometry facts used here are elementary plane geometry (common practice):
// two segments cross when each one's ends lie on opposite sides of the other.

const enclosure = (...pts: number[][]): PolygonInput => ({ kind: 'enclosure', points: pts.flat() });
const solid = (...pts: number[][]): PolygonInput => ({ kind: 'solid', points: pts.flat() });
const rect = (kind: 'enclosure' | 'solid', x0: number, y0: number, x1: number, y1: number): PolygonInput => ({
  kind,
  points: [x0, y0, x1, y0, x1, y1, x0, y1],
});
const duct = rect('enclosure', 0, 0, 4, 2);
const rules = (f: GeometryFinding[]) => f.map((x) => x.rule);

describe('orientation and point in polygon', () => {
  it('is positive for an anticlockwise turn (y up), zero when collinear', () => {
    expect(orientation(0, 0, 1, 0, 0, 1)).toBeGreaterThan(0);
    expect(orientation(0, 0, 1, 0, 0, -1)).toBeLessThan(0);
    expect(orientation(0, 0, 1, 1, 3, 3)).toBe(0);
    // Exactly collinear although the naive determinant in doubles is not zero (robust predicate).
    expect(orientation(0.1, 0.1, 0.3, 0.3, 0.7, 0.7)).toBe(0);
  });
  it('decides inside/outside for either winding', () => {
    const ccw = [0, 0, 4, 0, 4, 2, 0, 2];
    const cw = [0, 2, 4, 2, 4, 0, 0, 0];
    for (const ring of [ccw, cw]) {
      expect(pointInPolygon(2, 1, ring)).toBe(true);
      expect(pointInPolygon(5, 1, ring)).toBe(false);
      expect(pointInPolygon(-1, 1, ring)).toBe(false);
      expect(pointInPolygon(2, 3, ring)).toBe(false);
    }
    expect(signedArea2(ccw)).toBe(16);
    expect(signedArea2(cw)).toBe(-16);
  });
  it('handles a concave (U-shaped) polygon', () => {
    const u = [0, 0, 3, 0, 3, 3, 2, 3, 2, 1, 1, 1, 1, 3, 0, 3];
    expect(pointInPolygon(1.5, 2, u)).toBe(false); // in the notch
    expect(pointInPolygon(0.5, 2, u)).toBe(true);
    expect(pointInPolygon(1.5, 0.5, u)).toBe(true);
  });
});

describe('checkSketchGeometry', () => {
  it('accepts the minimal duct with a block, and an open sketch of solids', () => {
    expect(checkSketchGeometry([duct, rect('solid', 1.75, 0.75, 2.25, 1.25)])).toEqual([]);
    expect(checkSketchGeometry([rect('solid', 0, 0, 1, 1), rect('solid', 2, 0, 3, 1)])).toEqual([]);
  });

  it('accepts collinear neighbouring edges (a wall split into two surfaces) and a concave enclosure', () => {
    expect(checkSketchGeometry([enclosure([0, 0], [2, 0], [4, 0], [4, 2], [0, 2])])).toEqual([]);
    expect(checkSketchGeometry([enclosure([0, 0], [3, 0], [3, 3], [2, 3], [2, 1], [1, 1], [1, 3], [0, 3])])).toEqual(
      [],
    );
  });

  it('refuses fewer than 3 points and zero area', () => {
    expect(checkSketchGeometry([solid([0, 0], [1, 1])])).toEqual([{ rule: 'too-few-points', shape: 0, pointCount: 2 }]);
    expect(checkSketchGeometry([solid([0, 0], [1, 1], [3, 3], [2, 2])])).toEqual([{ rule: 'zero-area', shape: 0 }]);
  });

  it('reports a repeated point when called on unrepaired input', () => {
    expect(checkSketchGeometry([solid([0, 0], [1, 0], [1, 0], [0, 1])])).toEqual([
      { rule: 'repeated-point', shape: 0, point: 2, at: [1, 0] },
    ]);
  });

  it('finds a self-crossing (bow-tie) polygon and where it crosses', () => {
    const f = checkSketchGeometry([solid([0, 0], [2, 0], [0, 2], [2, 2])]);
    expect(f).toEqual([{ rule: 'edges-cross', shape: 0, edge: 1, otherShape: 0, otherEdge: 3, at: [1, 1] }]);
  });

  it('finds a polygon that touches itself at a vertex', () => {
    // Vertex 4 (2, 0) lies on edge 0 from (0,0) to (4,0).
    const f = checkSketchGeometry([solid([0, 0], [4, 0], [4, 2], [3, 2], [2, 0], [1, 2], [0, 2])]);
    // Two edges meet there, but one report per place is enough.
    expect(f).toEqual([{ rule: 'edges-touch', shape: 0, edge: 0, otherShape: 0, otherEdge: 3, at: [2, 0] }]);
  });

  it('finds a spike that folds back along its own edge', () => {
    const f = checkSketchGeometry([solid([0, 0], [4, 0], [4, 2], [4, 1], [0, 2])]);
    expect(f).toEqual([
      { rule: 'edges-overlap', shape: 0, edge: 1, otherShape: 0, otherEdge: 2, at: [4, 2], to: [4, 1] },
    ]);
  });

  it('finds a solid crossing the enclosure wall, with the crossing points', () => {
    const f = checkSketchGeometry([duct, rect('solid', 3.5, 0.5, 4.5, 1)]);
    expect(f).toEqual([
      { rule: 'edges-cross', shape: 0, edge: 1, otherShape: 1, otherEdge: 0, at: [4, 0.5] },
      { rule: 'edges-cross', shape: 0, edge: 1, otherShape: 1, otherEdge: 2, at: [4, 1] },
    ]);
  });

  it('finds a solid touching the wall, along an edge or at a corner', () => {
    expect(checkSketchGeometry([duct, rect('solid', 3, 0.5, 4, 1)])).toEqual([
      { rule: 'edges-overlap', shape: 0, edge: 1, otherShape: 1, otherEdge: 1, at: [4, 0.5], to: [4, 1] },
    ]);
    const corner = checkSketchGeometry([duct, solid([3, 1], [4, 1.5], [3, 1.5])]);
    expect(corner).toEqual([{ rule: 'edges-touch', shape: 0, edge: 1, otherShape: 1, otherEdge: 0, at: [4, 1.5] }]);
  });

  it('finds a solid outside the enclosure, and one surrounding it', () => {
    expect(checkSketchGeometry([duct, rect('solid', 5, 0, 6, 1)])).toEqual([
      { rule: 'outside-enclosure', shape: 1, enclosure: 0, point: 0, at: [5, 0] },
    ]);
    expect(rules(checkSketchGeometry([duct, rect('solid', -1, -1, 5, 3)]))).toEqual(['outside-enclosure']);
    // In the notch of a concave enclosure: outside although inside its bounding box.
    const u = enclosure([0, 0], [3, 0], [3, 3], [2, 3], [2, 1], [1, 1], [1, 3], [0, 3]);
    expect(rules(checkSketchGeometry([u, rect('solid', 1.2, 1.5, 1.8, 2)]))).toEqual(['outside-enclosure']);
  });

  it('finds solids that overlap, touch along an edge, touch at a corner, or nest', () => {
    const a = rect('solid', 1, 0.5, 2, 1.5);
    expect(rules(checkSketchGeometry([duct, a, rect('solid', 1.5, 1, 2.5, 1.8)]))).toEqual([
      'edges-cross',
      'edges-cross',
    ]);
    expect(checkSketchGeometry([duct, a, rect('solid', 2, 0.5, 3, 1.5)])).toEqual([
      { rule: 'edges-overlap', shape: 1, edge: 1, otherShape: 2, otherEdge: 3, at: [2, 0.5], to: [2, 1.5] },
    ]);
    expect(checkSketchGeometry([duct, a, rect('solid', 2, 1.5, 3, 1.8)])).toEqual([
      { rule: 'edges-touch', shape: 1, edge: 1, otherShape: 2, otherEdge: 0, at: [2, 1.5] },
    ]);
    expect(checkSketchGeometry([duct, a, rect('solid', 1.2, 0.7, 1.8, 1.3)])).toEqual([
      { rule: 'inside-solid', shape: 2, otherShape: 1, point: 0, at: [1.2, 0.7] },
    ]);
  });

  it('refuses more than one enclosure', () => {
    expect(checkSketchGeometry([duct, rect('enclosure', 10, 0, 11, 1)])).toEqual([
      { rule: 'several-enclosures', shapes: [0, 1] },
    ]);
  });

  it('decides touching exactly at tiny separations and large offsets', () => {
    // A solid a hair (1e-12) from the wall is valid; exactly on it is not.
    expect(checkSketchGeometry([duct, rect('solid', 3, 0.5, 4 - 1e-12, 1)])).toEqual([]);
    // Coordinates around 1e6 with millimetre features.
    const big = rect('enclosure', 1e6, 1e6, 1e6 + 4, 1e6 + 2);
    expect(checkSketchGeometry([big, rect('solid', 1e6 + 1, 1e6 + 0.001, 1e6 + 1.001, 1e6 + 0.002)])).toEqual([]);
    expect(rules(checkSketchGeometry([big, rect('solid', 1e6 + 1, 1e6, 1e6 + 1.001, 1e6 + 0.002)]))).toEqual([
      'edges-overlap',
    ]);
  });

  it('caps the number of reported contacts', () => {
    // A comb of 40 thin solids all crossing one long bar: 80 crossings.
    const teeth = Array.from({ length: 40 }, (_, k) => rect('solid', k * 0.1, 0, k * 0.1 + 0.05, 1));
    const f = checkSketchGeometry([...teeth, rect('solid', -1, 0.4, 5, 0.6)], { maxFindings: 10 });
    expect(f.length).toBe(10);
  });

  it('is invariant under reversing point order (property)', () => {
    const shape = fc.array(fc.tuple(fc.integer({ min: 0, max: 6 }), fc.integer({ min: 0, max: 6 })), {
      minLength: 3,
      maxLength: 7,
    });
    fc.assert(
      fc.property(fc.array(shape, { minLength: 1, maxLength: 3 }), (shapes) => {
        const forward = shapes.map((pts, i): PolygonInput => ({
          kind: i === 0 ? 'enclosure' : 'solid',
          points: pts.flat(),
        }));
        const backward = forward.map((p) => ({ kind: p.kind, points: reversePoints(p.points) }));
        expect(checkSketchGeometry(forward).length === 0).toBe(checkSketchGeometry(backward).length === 0);
      }),
      { numRuns: 300 },
    );
  });

  it('finds nothing wrong in a valid 1600-edge sketch (enclosure and 20 tubes; timed by npm run bench)', () => {
    const polys: PolygonInput[] = [circle('enclosure', 0, 0, 100, 400)];
    for (let t = 0; t < 20; t++) polys.push(circle('solid', -60 + (t % 5) * 30, -45 + Math.floor(t / 5) * 30, 10, 60));
    expect(polys.reduce((n, p) => n + p.points.length / 2, 0)).toBe(1600);
    expect(checkSketchGeometry(polys)).toEqual([]);
  });
});

function reversePoints(points: ArrayLike<number>): number[] {
  const out: number[] = [];
  for (let k = points.length - 2; k >= 0; k -= 2) out.push(points[k], points[k + 1]);
  return out;
}

function circle(kind: 'enclosure' | 'solid', cx: number, cy: number, r: number, n: number): PolygonInput {
  const points: number[] = [];
  for (let k = 0; k < n; k++)
    points.push(cx + r * Math.cos((2 * Math.PI * k) / n), cy + r * Math.sin((2 * Math.PI * k) / n));
  return { kind, points };
}
