import { describe, expect, it } from 'vitest';
import { restore, MAX_EDGES, MAX_SURFACES } from '../../src/document';

// Every bad input of the file reader gets a specific message naming what and
// where (shapes, points and edges counted from 1) and the rule broken.

const enclosure = {
  kind: 'enclosure',
  points: [
    [0, 0],
    [4, 0],
    [4, 2],
    [0, 2],
  ],
  surface: ['floor', 'right', 'roof', 'left'],
};
const block = {
  kind: 'solid',
  points: [
    [1.75, 0.75],
    [2.25, 0.75],
    [2.25, 1.25],
    [1.75, 1.25],
  ],
  surface: 'block',
};
const minimal = {
  version: 1,
  units: 'm',
  shapes: [enclosure, block],
  surfaces: { floor: { emissivity: 0.9, temperature: 1100 } },
};

function errorsOf(input: unknown): string[] {
  const result = restore(input);
  if (result.ok) throw new Error(`expected refusal, got a sketch (warnings: ${result.warnings.join('; ')})`);
  expect(result.errors.length).toBeGreaterThan(0);
  const messages = result.errors.map((e) => e.message);
  for (const m of messages) {
    expect(m.length).toBeLessThan(300);
    expect(m).not.toMatch(/Invalid input|undefined|\[object|NaN NaN/); // no library defaults or leaks
  }
  return messages;
}
const only = (input: unknown) => {
  const errors = errorsOf(input);
  expect(errors).toHaveLength(1);
  return errors[0];
};
const withShapes = (...shapes: unknown[]) => ({ ...minimal, shapes });
const solid = (points: unknown, surface: unknown = 'a') => ({ kind: 'solid', points, surface });
const surfaceOf = (props: unknown) => ({ ...minimal, surfaces: { floor: props } });

describe('restore refuses what is not a sketch file', () => {
  it('empty and blank files', () => {
    expect(only('')).toBe('the file is empty');
    expect(only(' \n\t ')).toBe('the file is empty');
  });
  it('text that is not JSON, with line and column', () => {
    expect(only('hello')).toBe('not valid JSON at line 1, column 1 near "hello"');
    expect(only('{\n  "version": 1,\n  "units" "m"\n}')).toMatch(/^not valid JSON at line 3, column 11/);
    expect(only('x,y\n1,2\n')).toMatch(/^not valid JSON at line 1, column 1/);
  });
  it('a truncated file', () => {
    const text = JSON.stringify(minimal);
    for (const cut of [text.length - 1, Math.floor(text.length / 2), 1]) {
      expect(only(text.slice(0, cut))).toMatch(/ends too early \(truncated\?\)|not valid JSON at line 1/);
    }
    expect(only(text.slice(0, 40))).toBe('not valid JSON: the file ends too early (truncated?)');
  });
  it('files of another kind', () => {
    expect(only('<svg xmlns="http://www.w3.org/2000/svg"></svg>')).toMatch(/looks like an XML, SVG or HTML file/);
    expect(only('%PDF-1.7\n')).toMatch(/looks like a PDF document/);
    expect(only('\u0089PNG\r\n\u001a\n\u0000\u0000')).toMatch(/looks like a binary file/);
    expect(only('{"name": "pkg", "dependencies": {}}')).toMatch(
      /^not a Tautline sketch: found fields "name", "dependencies"; .*"version", "units" and "shapes"/,
    );
    expect(only('{"type": "FeatureCollection", "features": []}')).toMatch(/not a Tautline sketch/);
    expect(only('[[0,0],[1,0],[0,1]]')).toMatch(/not a Tautline sketch: the file holds a list/);
    expect(only('42')).toMatch(/holds a single number/);
    expect(only('null')).toMatch(/holds null/);
    expect(only({})).toMatch(/found an empty object/);
  });
});

describe('restore refuses a bad version, units or structure', () => {
  it('a newer version, a missing or odd version', () => {
    expect(only({ ...minimal, version: 3 })).toBe(
      'version 3 is newer than this program reads (up to 2); open it with a newer Tautline',
    );
    expect(only({ ...minimal, version: undefined })).toMatch(/^version is missing/);
    expect(only({ ...minimal, version: '1' })).toBe('version must be a whole number from 1 (got "1")');
    expect(only({ ...minimal, version: 0 })).toMatch(/version must be a whole number from 1 \(got 0\)/);
    expect(only({ ...minimal, version: 1.5 })).toMatch(/got 1.5/);
  });
  it('unknown or missing units', () => {
    expect(only({ ...minimal, units: 'km' })).toBe('units must be one of m, cm, mm, in, ft (got "km")');
    expect(only({ ...minimal, units: 'M' })).toMatch(/got "M"/);
    expect(only({ ...minimal, units: undefined })).toBe('units is missing; it must be one of m, cm, mm, in, ft');
  });
  it('missing or mistyped fields, naming the shape', () => {
    expect(only({ version: 1, units: 'm' })).toBe('shapes is missing; it must be a list of shapes');
    expect(only({ ...minimal, shapes: 'none' })).toBe('shapes must be a list of shapes (got "none")');
    expect(only(withShapes(enclosure, 'block'))).toBe(
      'shape 2 must be an object with kind, points (or circle) and surface (got "block")',
    );
    expect(only(withShapes(enclosure, { kind: 'solid', surface: 'block' }))).toBe(
      "'block' (body, shape 2): points is missing; it must be a list of points [[x, y], ...]",
    );
    expect(only(withShapes(enclosure, { ...block, points: 'square' }))).toMatch(
      /^'block' \(body, shape 2\): points must be a list of points/,
    );
    expect(only(withShapes(enclosure, { ...block, surface: 5 }))).toBe(
      'shape 2 (body): surface must be a surface name, or a list of names with one per edge (got 5)',
    );
    expect(only(withShapes(enclosure, { ...block, surface: undefined }))).toMatch(
      /^shape 2 \(body\): surface is missing/,
    );
    expect(only(withShapes({ ...enclosure, surface: ['floor', 'right', '', 'left'] }))).toMatch(
      /^the enclosure \(shape 1\): surface name of edge 3 must not be empty/,
    );
    expect(only(withShapes(enclosure, { ...block, points: [[1.75, 0.75], [2.25], [2.25, 1.25]] }))).toMatch(
      /^'block' \(body, shape 2\): point 2 must be a pair of numbers \[x, y\]/,
    );
    expect(only({ ...minimal, surfaces: [] })).toMatch(/^surfaces must be an object of surface names/);
    expect(only({ ...minimal, settings: { depth: -2 } })).toBe('settings: depth must be greater than 0 (got -2)');
  });
  it('empty surface names, and bad properties under the name "__proto__" (checked like any other name)', () => {
    expect(only({ ...minimal, surfaces: { '': { emissivity: 0.5 } } })).toBe("surfaces: the name '' must not be empty");
    expect(only('{"version": 1, "units": "m", "shapes": [], "surfaces": {"__proto__": {"emissivity": 2}}}')).toMatch(
      /^surface '__proto__': emissivity must be/,
    );
  });
  it('an unknown kind', () => {
    expect(only(withShapes(enclosure, { ...block, kind: 'tube' }))).toBe(
      `'block' (shape 2): kind must be "enclosure" or "solid" (got "tube")`,
    );
  });
  it('one name per edge: the list must match the edges', () => {
    expect(only(withShapes({ ...enclosure, surface: ['floor', 'right', 'roof'] }))).toBe(
      'the enclosure (shape 1): surface lists 3 names for 4 edges; give one name per edge, or a single name for all',
    );
  });
});

describe('restore refuses bad numbers', () => {
  it('coordinates that are not finite numbers: strings, null, NaN, Infinity', () => {
    const errors = errorsOf(
      withShapes(
        enclosure,
        solid(
          [
            [1, '2'],
            [null, 1],
            [NaN, 1.5],
            [1, Infinity],
            [1, -Infinity],
          ],
          'block',
        ),
      ),
    );
    expect(errors).toEqual([
      `'block' (body, shape 2): point 1 y must be a finite number (got "2")`,
      "'block' (body, shape 2): point 2 x must be a finite number (got null)",
      "'block' (body, shape 2): point 3 x must be a finite number (got NaN)",
      "'block' (body, shape 2): point 4 y must be a finite number (got Infinity)",
      "'block' (body, shape 2): point 5 y must be a finite number (got -Infinity)",
    ]);
    // Beyond five, the last line counts the rest.
    const many = errorsOf(withShapes(solid(Array.from({ length: 9 }, () => ['x', 0]))));
    expect(many).toHaveLength(5);
    expect(many[4]).toBe('…and 5 more problems');
  });
  it('coordinates so large that lengths overflow', () => {
    expect(
      only(
        withShapes(
          solid([
            [0, 0],
            [1e200, 0],
            [0, 1],
          ]),
        ),
      ),
    ).toBe("'a' (body, shape 1): point 2 (1e+200, 0) is beyond ±1e+100; lengths would overflow");
    expect(
      only(
        withShapes(
          solid([
            [-1.7e308, 0],
            [1.7e308, 0],
            [0, 1],
          ]),
        ),
      ),
    ).toMatch(/point 1 .* lengths would overflow/);
  });
  it('sketches so tiny that everything is below rounding', () => {
    expect(
      only(
        withShapes(
          solid([
            [0, 0],
            [1e-200, 0],
            [0, 1e-200],
          ]),
        ),
      ),
    ).toBe(
      "'a' (body, shape 1): edge 1 is 1e-200 m long, shorter than 1e-100: the sketch is too small to compute (below rounding)",
    );
    // Features far below the rounding of their coordinates.
    expect(
      only(
        withShapes(
          solid([
            [1e9, 0],
            [1e9 + 1e-4, 0],
            [1e9, 1],
          ]),
        ),
      ),
    ).toMatch(
      /^'a' \(body, shape 1\): edge 1 is 0\.0001\d* m long, too short for coordinates near 1000000000 \(below rounding/,
    );
    // ... and features that vanish entirely in rounding (1 + 1e-17 is 1) become repeated points.
    expect(
      only(
        withShapes(
          solid([
            [1, 0],
            [1 + 1e-17, 0],
            [1, 1e-17],
          ]),
        ),
      ),
    ).toBe("'a' (body, shape 1): has 2 distinct (of 3 written) points; a shape needs at least 3");
  });
  it('surface properties out of range or not numbers', () => {
    expect(only(surfaceOf({ emissivity: 0 }))).toBe(
      "surface 'floor': emissivity must be at least 0.001 (and at most 1) (got 0)",
    );
    expect(only(surfaceOf({ emissivity: 1.2 }))).toBe("surface 'floor': emissivity must be at most 1 (got 1.2)");
    expect(only(surfaceOf({ emissivity: -0.1 }))).toMatch(/emissivity must be at least 0.001/);
    expect(only(surfaceOf({ emissivity: 'high' }))).toBe(
      `surface 'floor': emissivity must be a number from 0.001 to 1 (got "high")`,
    );
    expect(only(surfaceOf({ emissivity: NaN }))).toMatch(/emissivity must be a number from 0.001 to 1 \(got NaN\)/);
    expect(only(surfaceOf({ temperature: 0 }))).toBe("surface 'floor': temperature must be above 0 K (got 0)");
    expect(only(surfaceOf({ temperature: -40 }))).toBe("surface 'floor': temperature must be above 0 K (got -40)");
    expect(only(surfaceOf({ temperature: '1100 K' }))).toMatch(
      /temperature must be a number of kelvin \(got "1100 K"\)/,
    );
    expect(only(surfaceOf({ heatFlux: null }))).toMatch(/heatFlux must be a number of W\/m\^2 \(got null\)/);
    expect(only(surfaceOf({ adiabatic: 'yes' }))).toMatch(/adiabatic must be true or false \(got "yes"\)/);
    expect(only({ ...minimal, surfaces: { floor: 0.9 } })).toMatch(/^surface 'floor' must be an object of properties/);
    expect(only({ ...minimal, settings: { surroundingsTemperature: -1 } })).toBe(
      'settings: surroundingsTemperature must be above 0 K (got -1)',
    );
  });
  it('more than one condition on a surface', () => {
    expect(only(surfaceOf({ temperature: 300, heatFlux: 100 }))).toBe(
      "surface 'floor': give one condition, not temperature and heatFlux together",
    );
    expect(only(surfaceOf({ adiabatic: true, opening: true }))).toMatch(/not adiabatic and opening together/);
  });
});

describe('restore refuses impossible geometry', () => {
  it('fewer than 3 points', () => {
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [1, 1],
              [2, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toBe("'block' (body, shape 2): has 2 points; a shape needs at least 3");
    expect(only(withShapes(solid([])))).toBe("'a' (body, shape 1): has 0 points; a shape needs at least 3");
    expect(
      only(
        withShapes(
          solid([
            [1, 1],
            [1, 1],
            [1, 1],
          ]),
        ),
      ),
    ).toBe("'a' (body, shape 1): has 1 distinct (of 3 written) point; a shape needs at least 3");
  });
  it('all points on one line (zero area)', () => {
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [1, 1],
              [2, 1],
              [3, 1],
              [1.5, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toBe("'block' (body, shape 2): all its points lie on one straight line (zero area)");
    // Exactly collinear in decimal, not in a naive floating-point determinant.
    expect(
      only(
        withShapes(
          solid([
            [0.1, 0.1],
            [0.3, 0.3],
            [0.7, 0.7],
          ]),
        ),
      ),
    ).toMatch(/zero area/);
  });
  it('a self-crossing polygon, with where it crosses', () => {
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [1, 0.5],
              [2, 0.5],
              [1, 1.5],
              [2, 1.5],
            ],
            'bow',
          ),
        ),
      ),
    ).toBe("'bow' (body, shape 2): edge 2 crosses edge 4 at (1.5, 1); the outline must not cross or touch itself");
    expect(
      only(
        withShapes(
          solid([
            [0, 0],
            [4, 0],
            [4, 2],
            [4, 1],
            [0, 2],
          ]),
        ),
      ),
    ).toMatch(/edges 2 and 3 fold back onto each other from \(4, 2\) to \(4, 1\)/);
  });
  it('a solid crossing the enclosure wall, or outside it', () => {
    expect(
      errorsOf(
        withShapes(
          enclosure,
          solid(
            [
              [3.5, 0.5],
              [4.5, 0.5],
              [4.5, 1],
              [3.5, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toEqual([
      "'block' (body, shape 2): edge 1 crosses the enclosure wall 'right' (shape 1, edge 2) at (4, 0.5); solids must lie inside the enclosure without touching it",
      "'block' (body, shape 2): edge 3 crosses the enclosure wall 'right' (shape 1, edge 2) at (4, 1); solids must lie inside the enclosure without touching it",
    ]);
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [3, 0.5],
              [4, 0.5],
              [4, 1],
              [3, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toBe(
      "'block' (body, shape 2): edge 2 runs along the enclosure wall 'right' (shape 1, edge 2) from (4, 0.5) to (4, 1); solids must lie inside the enclosure without touching it",
    );
    expect(
      only(
        withShapes(
          enclosure,
          solid(
            [
              [5, 0.5],
              [6, 0.5],
              [6, 1],
            ],
            'block',
          ),
        ),
      ),
    ).toBe("'block' (body, shape 2): lies outside the enclosure (point 1 at (5, 0.5)); solids must be inside it");
    expect(
      only(
        withShapes(
          solid(
            [
              [-1, -1],
              [5, -1],
              [5, 3],
              [-1, 3],
            ],
            'box',
          ),
          enclosure,
        ),
      ),
    ).toMatch(/^'box' \(body, shape 1\): lies outside the enclosure/);
  });
  it('solids that overlap, touch along an edge, or lie one inside the other', () => {
    const a = solid(
      [
        [1, 0.5],
        [2, 0.5],
        [2, 1.5],
        [1, 1.5],
      ],
      'a',
    );
    expect(
      errorsOf(
        withShapes(
          enclosure,
          a,
          solid(
            [
              [1.5, 1],
              [2.5, 1],
              [2.5, 1.8],
              [1.5, 1.8],
            ],
            'b',
          ),
        ),
      )[0],
    ).toBe(
      "'b' (body, shape 3): edge 1 crosses 'a' (body, shape 2) edge 2 at (2, 1); solids must not overlap or touch",
    );
    expect(
      only(
        withShapes(
          enclosure,
          a,
          solid(
            [
              [2, 0.5],
              [3, 0.5],
              [3, 1.5],
              [2, 1.5],
            ],
            'b',
          ),
        ),
      ),
    ).toBe(
      "'b' (body, shape 3): edge 4 runs along 'a' (body, shape 2) edge 2 from (2, 0.5) to (2, 1.5); solids must not overlap or touch",
    );
    expect(
      only(
        withShapes(
          enclosure,
          a,
          solid(
            [
              [2, 1.5],
              [3, 1.5],
              [3, 1.8],
            ],
            'b',
          ),
        ),
      ),
    ).toMatch(/^'b' \(body, shape 3\): edge \d touches 'a' \(body, shape 2\) edge \d at \(2, 1.5\)/);
    expect(
      only(
        withShapes(
          enclosure,
          a,
          solid(
            [
              [1.2, 0.7],
              [1.8, 0.7],
              [1.8, 1.3],
            ],
            'b',
          ),
        ),
      ),
    ).toBe("'b' (body, shape 3): lies inside 'a' (body, shape 2) (point 1 at (1.2, 0.7)); solids must not overlap");
  });
  it('more than one enclosure', () => {
    const second = {
      ...enclosure,
      points: [
        [10, 0],
        [11, 0],
        [11, 1],
      ],
      surface: 'other',
    };
    expect(only(withShapes(enclosure, second))).toBe(
      "two enclosures, the enclosure (shape 1) and 'other' (enclosure, shape 2); a sketch has at most one (draw the others as solids)",
    );
  });
  it('edge and point numbers follow the file even after repeated points were removed', () => {
    // Point 2 repeats point 1, so the file's edge 4 is the crossing edge.
    const bow = solid(
      [
        [1, 0.5],
        [1, 0.5],
        [2, 0.5],
        [1, 1.5],
        [2, 1.5],
      ],
      'bow',
    );
    expect(only(withShapes(enclosure, bow))).toMatch(/edge 3 crosses edge 5 at \(1.5, 1\)/);
  });
});

describe('restore refuses very large sketches before computing', () => {
  it(`more than ${MAX_EDGES} edges`, () => {
    // The documented limit (README, "What the reader checks"), so the message below is not only the constant echoed.
    expect(MAX_EDGES).toBe(20000);
    const ring = (n: number) =>
      Array.from({ length: n }, (_, k) => [Math.cos((2 * Math.PI * k) / n), Math.sin((2 * Math.PI * k) / n)]);
    expect(only(withShapes({ kind: 'enclosure', points: ring(MAX_EDGES + 1), surface: 'wall' }))).toBe(
      `the sketch has ${MAX_EDGES + 1} edges; the limit is ${MAX_EDGES} (the work grows with the square of the edge count)`,
    );
    expect(restore(withShapes({ kind: 'enclosure', points: ring(MAX_EDGES), surface: 'wall' })).ok).toBe(true);
    expect(only({ ...minimal, shapes: new Array(MAX_EDGES).fill(block) })).toMatch(
      /the sketch has 20000 shapes; the limit is 20000 edges/,
    );
  });

  it(`more than ${MAX_SURFACES} surfaces`, () => {
    // The documented limit (README, "Limits"): the exchange holds surfaces^2 numbers.
    expect(MAX_SURFACES).toBe(5000);
    const ring = (n: number) =>
      Array.from({ length: n }, (_, k) => [Math.cos((2 * Math.PI * k) / n), Math.sin((2 * Math.PI * k) / n)]);
    const named = (n: number) => Array.from({ length: n }, (_, k) => `wall ${k + 1}`);
    expect(
      only(withShapes({ kind: 'enclosure', points: ring(MAX_SURFACES + 1), surface: named(MAX_SURFACES + 1) })),
    ).toBe(
      `the sketch has ${MAX_SURFACES + 1} surfaces; the limit is ${MAX_SURFACES} (the surface factors and the heat exchange grow with the square of the surface count)`,
    );
    expect(
      restore(withShapes({ kind: 'enclosure', points: ring(MAX_SURFACES), surface: named(MAX_SURFACES) })).ok,
    ).toBe(true);
  });
});

describe('restore never throws', () => {
  it('answers odd values with a message', () => {
    for (const v of [undefined, () => 1, Symbol('s'), 10n, new Date(0), new Map()]) {
      const r = restore(v);
      expect(r.ok).toBe(false);
    }
    const hostile = {
      version: 1,
      units: 'm',
      get shapes(): unknown {
        throw new Error('boom');
      },
    };
    expect(only(hostile)).toMatch(/could not read the sketch \(internal error: boom\)/);
  });
});
