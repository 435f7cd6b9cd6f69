import { describe, expect, it } from 'vitest';
import { checkCircles } from '../../../src/core/arc/circleChecks';
import type { CircleInput, PolygonInput } from '../../../src/core/scene';

// The rules for circles: a clear gap everywhere (at least 1e-7 of the radius), solids
// inside the enclosure, one enclosure in all. Gaps here are set exactly in the input.
const box: PolygonInput = { kind: 'enclosure', points: [0, 0, 4, 0, 4, 3, 0, 3] };
const solid = (cx: number, cy: number, radius: number): CircleInput => ({ kind: 'solid', cx, cy, radius, arcs: 1 });
const check = (polygons: PolygonInput[], circles: CircleInput[]) =>
  checkCircles(
    polygons.map((polygon, shape) => ({ shape, polygon })),
    circles.map((circle, k) => ({ shape: polygons.length + k, circle })),
  ).map((f) => f.rule);

describe('geometric checks of circles', () => {
  it('accepts gaps of 1e-6 of the radius to walls, tubes and bars; refuses contact and overlap', () => {
    const r = 0.5;
    expect(check([box], [solid(1, r * (1 + 1e-6), r), solid(1 + 2 * r * (1 + 1e-6), 1.5, r)])).toEqual([]);
    expect(check([box], [solid(1, r, r)])).toEqual(['circle-contact']); // resting on the floor
    expect(check([box], [solid(1, r * (1 + 2e-8), r)])).toEqual(['circle-contact']); // under 1e-7 of the radius
    expect(check([box], [solid(1, 1, r), solid(1 + 2 * r * (1 + 2e-8), 1, r)])).toEqual(['circle-contact']);
    expect(check([box], [solid(1, 1, r), solid(2, 1, r)])).toEqual(['circle-contact']); // tangent tubes
    expect(check([box], [solid(1, 1, r), solid(1.5, 1, r)])).toEqual(['circle-contact']);
    const bar: PolygonInput = { kind: 'solid', points: [2, 1, 3, 1, 3, 2, 2, 2] };
    expect(check([box, bar], [solid(2.5, 1.5, 0.2)])).toEqual(['circle-contact']); // inside the bar
    expect(check([box, bar], [solid(1.5 - 1e-6, 1.5, 0.5)])).toEqual([]);
    expect(check([box, bar], [solid(1.5, 1.5, 0.5)])).toEqual(['circle-contact']);
  });

  it('refuses solids outside the enclosure and a second enclosure', () => {
    expect(check([box], [solid(5, 1, 0.5)])).toEqual(['circle-outside-enclosure']);
    const shell: CircleInput = { kind: 'enclosure', cx: 0, cy: 0, radius: 2, arcs: 2 };
    expect(check([box], [shell])).toEqual(['circle-several-enclosures']);
    const triangle: PolygonInput = { kind: 'solid', points: [0, 0, 1, 0, 0, 2.5] };
    expect(check([triangle], [shell])).toEqual(['circle-outside-enclosure']);
    expect(check([triangle], [{ ...shell, radius: 2.5 }])).toEqual(['circle-contact']);
    expect(check([triangle], [{ ...shell, radius: 2.5 * (1 + 1e-6) }])).toEqual([]);
    expect(check([], [shell, solid(0, 1, 1 - 1e-6)])).toEqual([]);
    expect(check([], [shell, solid(0, 1, 1)])).toEqual(['circle-contact']);
  });
});
