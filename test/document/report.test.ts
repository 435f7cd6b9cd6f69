// @vitest-environment jsdom
// The report's pure parts: the sketch picture as SVG (parses, escapes, labels,
// dimensions, legend), the heat colours, split-wall profiles, file names.
import { describe, expect, it } from 'vitest';
import {
  HEAT_STOPS,
  heatColour,
  reportDate,
  reportFileName,
  sketchSvg,
  wallProfiles,
  type PictureShape,
} from '../../src/document/report';
import { escapeMarkup } from '../../src/document/report/escape';
import type { ShapeV1 } from '../../src/document/schema';

const parseSvg = (text: string) => new DOMParser().parseFromString(text, 'image/svg+xml');

const square: PictureShape = {
  kind: 'enclosure',
  points: [
    [0, 0],
    [2, 0],
    [2, 1],
    [0, 1],
  ],
  surface: ['floor', 'right', 'roof', 'left'],
};

describe('sketchSvg', () => {
  it('parses as SVG with hostile names, every name once, as text', () => {
    const evil = '<script>x()</script>&\u0001';
    const svg = sketchSvg({ shapes: [{ ...square, surface: [evil, 'b', 'b', ']]>'] }], units: 'm' });
    const doc = parseSvg(svg);
    expect(doc.getElementsByTagName('parsererror').length).toBe(0);
    expect(doc.getElementsByTagName('script').length).toBe(0);
    const labels = [...doc.querySelectorAll('text[data-surface]')].map((t) => t.textContent);
    expect(labels).toEqual(['<script>x()</script>&?', 'b', ']]>']);
  });

  it('puts enclosure labels inside and solid labels outside', () => {
    // A 2 x 1 enclosure drawn clockwise and a solid inside it drawn anticlockwise: winding must not matter.
    const cw: PictureShape = {
      ...square,
      points: [...square.points].reverse(),
      surface: ['left', 'roof', 'right', 'floor'],
    };
    const solid: PictureShape = {
      kind: 'solid',
      points: [
        [0.8, 0.4],
        [1.2, 0.4],
        [1.2, 0.6],
        [0.8, 0.6],
      ],
      surface: ['s bottom', 's right', 's top', 's left'],
    };
    const doc = parseSvg(sketchSvg({ shapes: [cw, solid], units: 'm', width: 640 }));
    const y = (name: string) => Number(doc.querySelector(`text[data-surface="${name}"]`)!.getAttribute('y'));
    const path = doc.querySelector('path')!.getAttribute('d')!;
    const ys = [...path.matchAll(/[ML][\d.]+ ([\d.]+)/g)].map((m) => Number(m[1]));
    const [top, bottom] = [Math.min(...ys), Math.max(...ys)];
    expect(y('floor')).toBeLessThan(bottom); // above the floor line (inside)
    expect(y('roof')).toBeGreaterThan(top); // below the roof line (inside)
    const solidPath = doc.querySelectorAll('path')[1].getAttribute('d')!;
    const sy = [...solidPath.matchAll(/[ML][\d.]+ ([\d.]+)/g)].map((m) => Number(m[1]));
    expect(y('s bottom')).toBeGreaterThan(Math.max(...sy)); // below the solid (outside)
    expect(y('s top')).toBeLessThan(Math.min(...sy));
  });

  it('writes dimensions in the sketch units and a legend with its title and ends', () => {
    const svg = sketchSvg({
      shapes: [square],
      units: 'mm',
      dimensions: true,
      names: false,
      heat: {
        colours: new Map([['floor', '#123456']]),
        legend: { title: 'Net flux, W/m²', low: -12.5, centre: 0, high: 12.5 },
      },
      idPrefix: 'p"1',
    });
    const doc = parseSvg(svg);
    expect(doc.getElementsByTagName('parsererror').length).toBe(0);
    const texts = [...doc.querySelectorAll('text')].map((t) => t.textContent);
    expect(texts.filter((t) => t === '2 mm').length).toBe(2);
    expect(texts.filter((t) => t === '1 mm').length).toBe(2);
    expect(texts).toEqual(expect.arrayContaining(['Net flux, W/m²', '-12.5', '0', '12.5']));
    expect(doc.querySelectorAll('text[data-surface]').length).toBe(0);
    expect(doc.querySelectorAll('line[stroke="#123456"]').length).toBe(1);
    expect(doc.querySelectorAll('linearGradient stop').length).toBe(HEAT_STOPS.length);
  });

  it('draws an exact circle: one label per arc, outside a solid, and its diameter', () => {
    const tube: PictureShape = {
      kind: 'solid',
      points: [],
      circle: { center: [1, 0.5], radius: 0.2 },
      surface: ['t 1', 't 2', 't 3', 't 4'],
    };
    const doc = parseSvg(sketchSvg({ shapes: [square, tube], units: 'm', dimensions: true }));
    expect(doc.getElementsByTagName('parsererror').length).toBe(0);
    const path = doc.querySelectorAll('path')[1].getAttribute('d')!;
    const pts = [...path.matchAll(/[ML]([\d.]+) ([\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
    const cx = pts.reduce((a, p) => a + p[0], 0) / pts.length;
    const cy = pts.reduce((a, p) => a + p[1], 0) / pts.length;
    const r = Math.max(...pts.map((p) => Math.hypot(p[0] - cx, p[1] - cy)));
    for (const name of ['t 1', 't 2', 't 3', 't 4']) {
      const t = doc.querySelector(`text[data-surface="${name}"]`)!;
      const d = Math.hypot(Number(t.getAttribute('x')) - cx, Number(t.getAttribute('y')) - cy);
      expect(d).toBeGreaterThan(r);
    }
    // Arc 1 runs from +x anticlockwise to +y: its label is up and to the right of the centre (screen y points down).
    const first = doc.querySelector('text[data-surface="t 1"]')!;
    expect(Number(first.getAttribute('x'))).toBeGreaterThan(cx);
    expect(Number(first.getAttribute('y'))).toBeLessThan(cy);
    expect([...doc.querySelectorAll('text')].map((t) => t.textContent)).toContain('⌀ 0.4 m');
  });

  it('an empty sketch is still a picture', () => {
    const doc = parseSvg(sketchSvg({ shapes: [], units: 'm' }));
    expect(doc.getElementsByTagName('parsererror').length).toBe(0);
    expect(doc.documentElement.textContent).toContain('no shapes');
  });
});

describe('heat colours', () => {
  it('runs from the first stop to the last, grey in the middle, clamped outside', () => {
    const hex = (s: readonly number[]) => `#${s.map((c) => c.toString(16).padStart(2, '0')).join('')}`;
    expect(heatColour(0)).toBe(hex(HEAT_STOPS[0]));
    expect(heatColour(0.5)).toBe(hex(HEAT_STOPS[2]));
    expect(heatColour(1)).toBe(hex(HEAT_STOPS[4]));
    expect(heatColour(-3)).toBe(heatColour(0));
    expect(heatColour(Number.NaN)).toBe(heatColour(0.5));
  });
});

describe('wallProfiles', () => {
  const names = ['roof 1', 'roof 2', 'roof 3', 'floor', 'tube 1', 'tube 2'];
  // A regular polygon (side lengths do not matter to which parts make a profile).
  const ring = (surface: string[]): ShapeV1 => ({
    kind: 'enclosure',
    points: surface.map((_, k): [number, number] => [
      Math.cos((2 * Math.PI * k) / surface.length),
      Math.sin((2 * Math.PI * k) / surface.length),
    ]),
    surface,
  });
  const tube = (name: string, x: number): ShapeV1 => ({
    kind: 'solid',
    points: [],
    circle: { center: [x, 0], radius: 0.1 },
    surface: name,
  });
  it('finds parts numbered 1..n along consecutive edges of one shape, either direction', () => {
    // Edges 2..5 along the top, right to left: roof 3 (length 1), roof 2 (two edges of 1), roof 1 (length 1).
    const box: ShapeV1 = {
      kind: 'enclosure',
      points: [
        [1, 0],
        [4, 0],
        [4, 1],
        [3, 1],
        [2, 1],
        [1, 1],
      ],
      surface: ['floor', 'x', 'roof 3', 'roof 2', 'roof 2', 'roof 1'],
    };
    const p = wallProfiles([box, tube('tube 1', 2), tube('tube 2', 3)], names);
    expect(p.length).toBe(1);
    expect(p[0].wall).toBe('roof');
    expect(p[0].parts).toEqual([
      { surface: 0, position: 0.5, length: 1 },
      { surface: 1, position: 2, length: 2 },
      { surface: 2, position: 3.5, length: 1 },
    ]);
  });

  it('wraps around the last edge to the first', () => {
    const p = wallProfiles([ring(['roof 2', 'roof 3', 'floor', 'roof 1'])], names);
    expect(p.map((w) => w.parts.map((q) => q.surface))).toEqual([[0, 1, 2]]);
  });

  it('skips parts with a gap, split over shapes, or not one run', () => {
    expect(wallProfiles([ring(['roof 1', 'floor', 'roof 2', 'roof 3'])], names)).toEqual([]);
    expect(wallProfiles([ring(['roof 1', 'roof 2', 'x']), ring(['roof 3', 'floor', 'y'])], names)).toEqual([]);
    expect(wallProfiles([ring(['roof 1', 'roof 2', 'roof 1', 'roof 3', 'floor'])], names)).toEqual([]);
    expect(wallProfiles([ring(['a 1', 'a 3', 'x'])], ['a 1', 'a 3', 'x'])).toEqual([]);
  });
});

describe('names and dates', () => {
  it('derives the report name from the sketch file name', () => {
    expect(reportFileName('sketch.json')).toBe('sketch-report.html');
    expect(reportFileName('dir/furnace.v2.json')).toBe('furnace.v2-report.html');
    expect(reportFileName('C:\\work\\duct')).toBe('duct-report.html');
    expect(reportFileName('.json')).toBe('sketch-report.html');
  });
  it('writes the date in UTC to the minute', () => {
    expect(reportDate(new Date(Date.UTC(2026, 0, 2, 3, 4, 59)))).toBe('2026-01-02 03:04 UTC');
  });
  it('escapes the five markup characters', () => {
    expect(escapeMarkup(`<a href="x">'&'</a>`)).toBe('&lt;a href=&quot;x&quot;&gt;&#39;&amp;&#39;&lt;/a&gt;');
  });
});
