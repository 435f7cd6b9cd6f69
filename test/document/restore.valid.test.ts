import { describe, expect, it } from 'vitest';
import { readdirSync, readFileSync } from 'node:fs';
import { restore, serialize, toScene, UNITS, METRES_PER_UNIT, type Sketch } from '../../src/document';

/** The parsed JSON of a sketch text, typed loosely for editing in a test. */
type LooseDoc = Record<string, unknown> & { shapes: Record<string, unknown>[]; version?: unknown };
const parsed = (text: string): LooseDoc => JSON.parse(text) as LooseDoc;

// The minimal file of the format description (README, "The sketch file").
const minimalText = `{
  "version": 1,
  "units": "m",
  "shapes": [
    { "kind": "enclosure", "points": [[0,0],[4,0],[4,2],[0,2]], "surface": ["floor","right","roof","left"] },
    { "kind": "solid", "points": [[1.75,0.75],[2.25,0.75],[2.25,1.25],[1.75,1.25]], "surface": "block" }
  ],
  "surfaces": { "floor": { "emissivity": 0.9, "temperature": 1100 } }
}`;

function sketchOf(input: unknown): { sketch: Sketch; warnings: string[] } {
  const r = restore(input);
  if (!r.ok) throw new Error(`refused: ${r.errors.map((e) => e.message).join('; ')}`);
  return r;
}

function deepFreeze<T>(value: T): T {
  if (value && typeof value === 'object') {
    Object.values(value).forEach(deepFreeze);
    Object.freeze(value);
  }
  return value;
}

describe('restore reads valid sketches', () => {
  it('reads the minimal file and expands a single surface name to every edge', () => {
    const { sketch, warnings } = sketchOf(minimalText);
    expect(warnings).toEqual([]);
    // A version-1 file reads as version 2 (version 2 only adds fields), meaning the same.
    expect(sketch).toEqual({
      version: 2,
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
          surface: ['block', 'block', 'block', 'block'],
        },
      ],
      surfaces: { floor: { emissivity: 0.9, temperature: 1100 } },
      settings: {},
    });
  });

  it('reads the shipped example files without warnings', () => {
    const dir = new URL('../../public/examples/', import.meta.url);
    const names = readdirSync(dir).filter((n) => n.endsWith('.json'));
    expect(names).toContain('duct-with-block.json');
    for (const name of names) expect(sketchOf(readFileSync(new URL(name, dir), 'utf8')).warnings).toEqual([]);
  });

  it('reads an object as well as text, without changing it', () => {
    const doc = deepFreeze(parsed(minimalText));
    expect(sketchOf(doc).sketch).toEqual(sketchOf(minimalText).sketch);
  });

  it('accepts every unit, a byte-order mark, CRLF line ends, either winding, and an open sketch', () => {
    for (const units of UNITS) expect(sketchOf({ ...parsed(minimalText), units }).sketch.units).toBe(units);
    expect(METRES_PER_UNIT.in).toBe(0.0254); // exact by definition (international inch, 1959; common practice)
    expect(sketchOf(`\uFEFF${minimalText.replace(/\n/g, '\r\n')}`).sketch.shapes).toHaveLength(2);
    const cw = {
      version: 1,
      units: 'mm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 2],
            [4, 2],
            [4, 0],
            [0, 0],
          ],
          surface: 'wall',
        },
      ],
    };
    expect(sketchOf(cw).warnings).toEqual([]);
    const open = {
      version: 1,
      units: 'ft',
      shapes: [
        {
          kind: 'solid',
          points: [
            [0, 0],
            [1, 0],
            [1, 1],
            [0, 1],
          ],
          surface: 'a',
        },
        {
          kind: 'solid',
          points: [
            [2, 0],
            [3, 0],
            [3, 1],
            [2, 1],
          ],
          surface: 'b',
        },
      ],
    };
    expect(sketchOf(open).sketch.shapes).toHaveLength(2);
  });

  it('keeps settings and all surface conditions', () => {
    const doc = {
      ...parsed(minimalText),
      surfaces: {
        floor: { emissivity: 1, temperature: 1100 },
        roof: { heatFlux: -2500 },
        left: { adiabatic: true, emissivity: 0.3 },
        right: { opening: true },
      },
      settings: { surroundingsTemperature: 293.15, depth: 3 },
    };
    const { sketch, warnings } = sketchOf(doc);
    expect(warnings).toEqual([]);
    expect(sketch.surfaces.roof).toEqual({ heatFlux: -2500 });
    expect(sketch.settings).toEqual({ surroundingsTemperature: 293.15, depth: 3 });
  });

  it('accepts shapes a hair apart and large offsets with millimetre features', () => {
    const base = 1e6;
    const doc = {
      version: 1,
      units: 'mm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [base, base],
            [base + 4, base],
            [base + 4, base + 2],
            [base, base + 2],
          ],
          surface: 'wall',
        },
        {
          kind: 'solid',
          points: [
            [base + 1, base + 0.001],
            [base + 1.001, base + 0.001],
            [base + 1.001, base + 0.002],
          ],
          surface: 'chip',
        },
        {
          kind: 'solid',
          points: [
            [base + 2, base + 1],
            [base + 4 - 1e-9, base + 1],
            [base + 3, base + 1.5],
          ],
          surface: 'close',
        },
      ],
    };
    expect(sketchOf(doc).warnings).toEqual([]);
  });
});

describe('restore repairs and warns', () => {
  it('removes repeated consecutive points (zero-length edges), keeping the names of the real edges', () => {
    const doc = {
      version: 1,
      units: 'm',
      shapes: [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [4, 0],
            [4, 0],
            [4, 2],
            [0, 2],
            [0, 0],
          ],
          surface: ['floor', 'gap', 'right', 'roof', 'left', 'closing'],
        },
      ],
    };
    const { sketch, warnings } = sketchOf(doc);
    expect(sketch.shapes[0].points).toEqual([
      [0, 0],
      [4, 0],
      [4, 2],
      [0, 2],
    ]);
    // Edge 2 (4,0)->(4,0) and edge 6 (0,0)->(0,0) had zero length; their names go with them.
    expect(sketch.shapes[0].surface).toEqual(['floor', 'right', 'roof', 'left']);
    expect(warnings).toEqual([
      'the enclosure (shape 1): removed point 2 (same as point 3) and point 6 (same as point 1), which made zero-length edges',
    ]);
  });

  it('warns about properties on a surface name no edge uses, and unknown fields', () => {
    const doc = {
      ...parsed(minimalText),
      surfaces: { flor: { emissivity: 0.8 } },
      colour: 'red',
      settings: { dpeth: 2 },
    };
    doc.shapes[1].label = 'bar';
    expect(sketchOf(doc).warnings).toEqual([
      "the sketch: ignored unknown field 'colour'",
      "'block' (body, shape 2): ignored unknown field 'label'",
      "settings: ignored unknown field 'dpeth'",
      "surface 'flor' has properties but no edge uses that name",
    ]);
  });

  it('warns that an opening ignores emissivity (it acts as black)', () => {
    const doc = { ...parsed(minimalText), surfaces: { right: { opening: true, emissivity: 0.5 } } };
    expect(sketchOf(doc).warnings).toEqual([
      "surface 'right': emissivity 0.5 is ignored; an opening acts as a black surface",
    ]);
  });

  it('warns about an opening on a solid (openings are gaps in the enclosure wall)', () => {
    const doc = { ...parsed(minimalText), surfaces: { block: { opening: true } } };
    expect(sketchOf(doc).warnings).toEqual([
      "surface 'block' is an opening but lies on a solid, 'block' (body, shape 2); openings are gaps in the enclosure wall",
    ]);
  });
});

describe('toScene', () => {
  it('numbers surfaces by first appearance along the edges and flattens points', () => {
    const doc = {
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
          surface: ['wall', 'hot', 'wall', 'cold'],
        },
        {
          kind: 'solid',
          points: [
            [1, 1],
            [2, 1],
            [2, 1.5],
          ],
          surface: ['tube', 'hot', 'tube'],
        },
      ],
    };
    const { scene, surfaceNames } = toScene(sketchOf(doc).sketch);
    expect(surfaceNames).toEqual(['wall', 'hot', 'cold', 'tube']);
    expect(Array.from(scene.edgeSurface)).toEqual([0, 1, 0, 2, 3, 1, 3]);
    expect(scene.surfaceCount).toBe(4);
    expect(scene.polygons.map((p) => p.kind)).toEqual(['enclosure', 'solid']);
    expect(Array.from(scene.polygons[1].points)).toEqual([1, 1, 2, 1, 2, 1.5]);
  });
});

describe('serialize', () => {
  it('writes version 2 that reads back to the same sketch', () => {
    const { sketch } = sketchOf({ ...parsed(minimalText), settings: { depth: 2.5 } });
    const text = serialize(sketch);
    expect(parsed(text).version).toBe(2);
    expect(text).toContain('"surface": "block"'); // one name when all edges share it
    expect(text).toContain('"points": [[0, 0], [4, 0], [4, 2], [0, 2]]');
    expect(sketchOf(text).sketch).toEqual(sketch);
  });

  it('keeps every digit of the coordinates', () => {
    const pts = [
      [0.1 + 0.2, 1 / 3],
      [Math.PI, 1e-7],
      [2 / 3, Math.E],
    ];
    const { sketch } = sketchOf({ version: 1, units: 'in', shapes: [{ kind: 'solid', points: pts, surface: 'x' }] });
    expect(sketchOf(serialize(sketch)).sketch.shapes[0].points).toEqual(pts);
  });

  it('writes an empty sketch that reads back', () => {
    const empty: Sketch = { version: 2, units: 'm', shapes: [], surfaces: {}, settings: {} };
    expect(sketchOf(serialize(empty)).sketch).toEqual(empty);
  });
});
