// Every bad input of the file reader gets a specific message naming what and
// where (shapes, points and edges counted from 1) and the rule broken.
import { describe, expect, it } from 'vitest';
import { enclosure, block, minimal, errorsOf, only, withShapes, solid, surfaceOf } from './restoreHelpers';

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
