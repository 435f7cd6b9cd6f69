import { describe, expect, it } from 'vitest';
import { restore, serialize, toScene } from '../../src/document';
import { computeViewFactors } from '../../src/core/viewFactors';

// The circle shape form of version 2: reading, refusing, writing back, and the
// scene handed to the core (arcs after every polygon edge, anticlockwise from +x).

const duct = {
  kind: 'enclosure',
  points: [
    [0, 0],
    [2, 0],
    [2, 1.5],
    [0, 1.5],
  ],
  surface: 'wall',
};
const file = (...shapes: unknown[]) => ({ version: 2, units: 'm', shapes: [duct, ...shapes] });
const tube = (cx: number, cy: number, r: number, surface: string | string[]) => ({
  kind: 'solid',
  circle: { center: [cx, cy], radius: r },
  surface,
});
const messages = (doc: unknown) => {
  const r = restore(doc);
  return r.ok ? [] : r.errors.map((e) => e.message);
};

describe('circles in the sketch file', () => {
  it('reads a circle with one name, or n names as n equal arcs, and writes it back unchanged', () => {
    const r = restore(file(tube(0.6, 1.2, 0.0572, 'tube 1'), tube(1.2, 0.5, 0.1, ['a', 'b', 'c'])));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.warnings).toEqual([]);
    const { scene, surfaceNames } = toScene(r.sketch);
    expect(scene.circles).toEqual([
      { kind: 'solid', cx: 0.6, cy: 1.2, radius: 0.0572, arcs: 1 },
      { kind: 'solid', cx: 1.2, cy: 0.5, radius: 0.1, arcs: 3 },
    ]);
    expect(surfaceNames).toEqual(['wall', 'tube 1', 'a', 'b', 'c']);
    expect(Array.from(scene.edgeSurface)).toEqual([0, 0, 0, 0, 1, 2, 3, 4]);
    const again = restore(serialize(r.sketch));
    expect(again.ok && again.sketch).toEqual(r.sketch);
  });

  it('numbers arcs after every polygon edge, whatever the file order', () => {
    const bar = {
      kind: 'solid',
      points: [
        [1, 1],
        [1.2, 1],
        [1.2, 1.2],
        [1, 1.2],
      ],
      surface: 'bar',
    };
    const r = restore({ version: 2, units: 'm', shapes: [tube(0.5, 0.5, 0.1, 'tube'), duct, bar] });
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    const { scene, surfaceNames } = toScene(r.sketch);
    expect(surfaceNames).toEqual(['wall', 'bar', 'tube']);
    expect(Array.from(scene.edgeSurface)).toEqual([0, 0, 0, 0, 1, 1, 1, 1, 2]);
    // Rows sum to one in the closed duct (common practice: the enclosure rule).
    const f = computeViewFactors(scene);
    for (const v of f.rowSumResidual) expect(Math.abs(v)).toBeLessThan(1e-12);
  });

  it('refuses a bad radius, contact, a solid outside and two enclosures, naming the shape and the rule', () => {
    expect(messages(file(tube(1, 1, -1, 't')))).toEqual([
      "'t' (body, shape 2): circle radius must be a positive finite number (got -1)",
    ]);
    expect(messages(file(tube(1, 0.1, 0.1, 't')))[0]).toMatch(
      /^'t' \(body, shape 2\): crosses, touches or overlaps the enclosure wall 'wall' \(shape 1\) edge 1 near \(1, 0\)/,
    );
    expect(messages(file(tube(1, 1, 0.2, 'a'), tube(1.4, 1, 0.2, 'b')))[0]).toMatch(
      /^'a' \(body, shape 2\): crosses, touches or overlaps 'b' \(body, shape 3\) near \(1\.2, 1\)/,
    );
    expect(messages(file(tube(3, 1, 0.2, 'a')))).toEqual([
      "'a' (body, shape 2): lies outside the enclosure (shape 1) at (3, 1); solids must be inside it",
    ]);
    expect(messages(file({ kind: 'enclosure', circle: { center: [1, 1], radius: 0.3 }, surface: 's' }))).toEqual([
      "two enclosures, 'wall' (enclosure, shape 1) and 's' (enclosure, shape 2); a sketch has at most one (draw the others as solids)",
    ]);
    expect(
      messages(
        file({
          ...tube(1, 1, 0.2, 'a'),
          points: [
            [0, 0],
            [1, 0],
            [1, 1],
          ],
        }),
      )[0],
    ).toMatch(/either points or circle, not both/);
  });

  it('accepts a tube 1e-6 of its radius above the floor and next to another', () => {
    const r = 0.05;
    const doc = file(tube(1, r * (1 + 1e-6), r, 'low'), tube(1 + 2 * r + 1e-6 * r, r * (1 + 1e-6), r, 'next'));
    expect(messages(doc)).toEqual([]);
  });
});
