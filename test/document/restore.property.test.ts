import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { restore, serialize, toScene, type ProblemPlace } from '../../src/document';

// Property-based checks (fast-check): valid sketches are always accepted and
// survive a save/open round trip; invalid ones are always refused with a message.

type Doc = {
  version: number;
  units: string;
  shapes: { kind: string; points: unknown[]; surface: unknown }[];
  surfaces?: Record<string, unknown>;
};

/** A random valid sketch: a rectangular enclosure and convex solids, each in its own cell of a grid. */
const validDoc = fc
  .record({
    width: fc.double({ min: 0.01, max: 1000, noNaN: true }),
    height: fc.double({ min: 0.01, max: 1000, noNaN: true }),
    offsetX: fc.double({ min: -1e5, max: 1e5, noNaN: true }),
    offsetY: fc.double({ min: -1e5, max: 1e5, noNaN: true }),
    cols: fc.integer({ min: 1, max: 4 }),
    rows: fc.integer({ min: 1, max: 3 }),
    solids: fc.array(
      fc.record({
        sides: fc.integer({ min: 3, max: 9 }),
        turn: fc.double({ min: 0, max: 6.283, noNaN: true }),
        size: fc.double({ min: 0.2, max: 0.9, noNaN: true }),
        reverse: fc.boolean(),
      }),
      { maxLength: 12 },
    ),
    clockwise: fc.boolean(),
    units: fc.constantFrom('m', 'cm', 'mm', 'in', 'ft'),
    perEdgeNames: fc.boolean(),
  })
  .map((g): Doc => {
    const { width: w, height: h, offsetX: x0, offsetY: y0 } = g;
    const wall = [
      [x0, y0],
      [x0 + w, y0],
      [x0 + w, y0 + h],
      [x0, y0 + h],
    ];
    if (g.clockwise) wall.reverse();
    const cellW = w / g.cols,
      cellH = h / g.rows;
    const shapes: Doc['shapes'] = [
      { kind: 'enclosure', points: wall, surface: g.perEdgeNames ? ['a', 'b', 'c', 'd'] : 'wall' },
    ];
    g.solids.slice(0, g.cols * g.rows).forEach((s, k) => {
      const cx = x0 + ((k % g.cols) + 0.5) * cellW,
        cy = y0 + (Math.floor(k / g.cols) + 0.5) * cellH;
      const r = 0.5 * s.size * Math.min(cellW, cellH);
      const pts = Array.from({ length: s.sides }, (_, i) => {
        const t = s.turn + (2 * Math.PI * i) / s.sides;
        return [cx + r * Math.cos(t), cy + r * Math.sin(t)];
      });
      if (s.reverse) pts.reverse();
      shapes.push({ kind: 'solid', points: pts, surface: `tube ${k + 1}` });
    });
    return {
      version: 1,
      units: g.units,
      shapes,
      surfaces: { [g.perEdgeNames ? 'a' : 'wall']: { emissivity: 0.8, temperature: 400 } },
    };
  });

/**
 * A problem's place names shapes and edges of the document as given (not as
 * repaired), and only real edges: an edge the reader dropped for zero length
 * is never the one marked. Points are finite.
 */
function expectPlaceInDocument(place: ProblemPlace, doc: Doc): void {
  for (const s of place.shapes) expect(s >= 0 && s < doc.shapes.length).toBe(true);
  for (const { shape, edge } of place.edges) {
    const points = doc.shapes[shape].points as number[][];
    expect(edge >= 0 && edge < points.length).toBe(true);
    const [a, b] = [points[edge], points[(edge + 1) % points.length]];
    expect(a[0] !== b[0] || a[1] !== b[1]).toBe(true);
  }
  for (const p of place.points) expect(Number.isFinite(p[0]) && Number.isFinite(p[1])).toBe(true);
}

/** Ways to break a valid document, each a rule of the format. */
const corruptions: ((d: Doc, pick: number) => void)[] = [
  (d) => {
    d.version = 3 + (d.shapes.length % 5); // newer than version 2, the newest this program reads
  },
  (d) => {
    (d as Partial<Doc>).version = undefined;
  },
  (d, p) => {
    d.units = ['km', 'M', '', 'metre', 'µm'][p % 5];
  },
  (d) => {
    (d as Partial<Doc>).units = undefined;
  },
  (d, p) => {
    d.shapes[p % d.shapes.length].kind = ['tube', 'Solid', '', 'hole'][p % 4];
  },
  (d, p) => {
    const s = d.shapes[p % d.shapes.length];
    (s.points[p % s.points.length] as unknown[])[p % 2] = ['1', null, NaN, Infinity, -Infinity, {}, true][p % 7];
  },
  (d, p) => {
    const s = d.shapes[p % d.shapes.length];
    s.points = s.points.slice(0, p % 3);
  },
  (d, p) => {
    const s = d.shapes[p % d.shapes.length];
    s.surface = [1, null, '', [], {}][p % 5];
  },
  (d, p) => {
    d.shapes[p % d.shapes.length].points = [
      [0, 0],
      [1, 1],
      [2, 2],
      [3, 3],
    ];
  },
  (d, p) => {
    const s = d.shapes[p % d.shapes.length];
    s.points = s.points.map((q) => [(q as number[])[0] * 1e200, (q as number[])[1]]);
  },
  (d) => {
    d.shapes.push({ ...d.shapes[0], surface: 'second' });
  },
  (d) => {
    const s = d.shapes[0].points as number[][];
    d.shapes[0].points = [s[0], s[2], s[1], s[3]];
  }, // bow tie
  (d, p) => {
    const s = d.shapes[0].points as number[][];
    d.shapes.push({
      kind: 'solid',
      points: s.map(([x, y]) => [x + (p % 2 ? 0.5 : 2) * (s[2][0] - s[0][0]), y]),
      surface: 'out',
    });
  },
  (d) => {
    d.shapes.push({ kind: 'solid', points: d.shapes[0].points, surface: 'copy' });
  },
  // A bow tie with one point written twice: the reader drops it, the marks must still follow the file.
  (d, p) => {
    const s = d.shapes[0].points as number[][];
    const bow = [s[0], s[2], s[1], s[3]];
    bow.splice(p % 4, 0, bow[p % 4]);
    d.shapes[0] = { ...d.shapes[0], points: bow, surface: 'wall' };
  },
  (d, p) => {
    d.surfaces = {
      [String(d.shapes[0].surface).split(',')[0]]: [
        { emissivity: 0 },
        { emissivity: 1.01 },
        { temperature: 0 },
        { temperature: -1 },
        { emissivity: '0.5' },
        { temperature: 300, heatFlux: 1 },
      ][p % 6],
    };
  },
];

describe('restore on random documents', () => {
  it('accepts random valid sketches, and a saved sketch reads back unchanged', () => {
    fc.assert(
      fc.property(validDoc, (doc) => {
        const r = restore(JSON.stringify(doc));
        if (!r.ok) throw new Error(r.errors.map((e) => e.message).join('; '));
        expect(r.warnings).toEqual([]);
        const again = restore(serialize(r.sketch));
        expect(again.ok && again.sketch).toEqual(r.sketch);
        const { scene } = toScene(r.sketch);
        expect(scene.edgeSurface.length).toBe(doc.shapes.reduce((n, s) => n + s.points.length, 0));
      }),
      { numRuns: 200 },
    );
  });

  it('refuses random invalid documents, always with a message', () => {
    fc.assert(
      fc.property(validDoc, fc.integer({ min: 0, max: corruptions.length - 1 }), fc.nat(), (doc, which, pick) => {
        corruptions[which](doc, pick);
        const r = restore(doc); // the object itself: NaN and Infinity cannot pass through JSON text
        expect(r.ok).toBe(false);
        if (r.ok) return;
        expect(r.errors.length).toBeGreaterThan(0);
        for (const e of r.errors) {
          expect(e.message.length).toBeGreaterThan(10);
          expect(e.message).not.toMatch(/Invalid input|undefined|\[object/);
          expectPlaceInDocument(e.place, doc);
        }
      }),
      { numRuns: 400 },
    );
  });

  it('never throws on arbitrary values or text, and explains every refusal', () => {
    let refused = 0;
    fc.assert(
      fc.property(fc.oneof(fc.anything(), fc.string(), fc.json()), (value) => {
        const r = restore(value);
        if (r.ok) return;
        refused += 1;
        expect(r.errors.length).toBeGreaterThan(0);
        expect(r.errors.every((e) => typeof e.message === 'string' && e.message.length > 0)).toBe(true);
      }),
      { numRuns: 500 },
    );
    // Arbitrary values are almost never sketches: the explanations above were checked, not skipped.
    expect(refused).toBeGreaterThan(400);
  });

  it('refuses random cuts of a valid file', () => {
    fc.assert(
      fc.property(validDoc, fc.double({ min: 0, max: 0.999, noNaN: true }), (doc, at) => {
        const text = JSON.stringify(doc);
        const r = restore(text.slice(0, Math.floor(at * text.length)));
        expect(r.ok).toBe(false);
        if (!r.ok) expect(r.errors[0].message).toMatch(/empty|not valid JSON|not a Tautline sketch/);
      }),
      { numRuns: 200 },
    );
  });

  it('accepts a 1600-edge sketch (its reading time is measured by npm run bench)', () => {
    const ring = (cx: number, cy: number, r: number, n: number) =>
      Array.from({ length: n }, (_, k) => [
        cx + r * Math.cos((2 * Math.PI * k) / n),
        cy + r * Math.sin((2 * Math.PI * k) / n),
      ]);
    const shapes = [{ kind: 'enclosure', points: ring(0, 0, 100, 400), surface: 'shell' }];
    for (let t = 0; t < 20; t++)
      shapes.push({
        kind: 'solid',
        points: ring(-60 + (t % 5) * 30, -45 + Math.floor(t / 5) * 30, 10, 60),
        surface: `tube ${t + 1}`,
      });
    const text = JSON.stringify({ version: 1, units: 'mm', shapes });
    const r = restore(text);
    expect(r.ok).toBe(true);
  });
});
