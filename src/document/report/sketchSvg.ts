// The picture of a sketch as SVG text, a pure function of its shapes, names and
// colours, so the app (SVG and PNG export, the report) and the command line
// (the report) draw the same picture. Sketch y points up; SVG y points down.
import { signedArea2 } from '../../core/edges';
import { plainName } from '../labels';
import type { Units } from '../units';
import { escapeMarkup } from './escape';
import { HEAT_STOPS } from './heatColours';

export interface PictureShape {
  kind: 'enclosure' | 'solid';
  /** Vertices [x, y] in the sketch's units, either winding. */
  points: ReadonlyArray<readonly [number, number]>;
  /** Surface name of each edge (edge k runs from point k to point k + 1), or of each arc of a circle. */
  surface: ReadonlyArray<string>;
  /** An exact circle instead of points: one arc per surface name, anticlockwise from +x (file version 2). */
  circle?: { center: readonly [number, number]; radius: number };
}

/** A shape as drawn: circles as fine polygons, and where each surface's label and dimension go. */
interface Drawn {
  kind: PictureShape['kind'];
  points: (readonly [number, number])[];
  /** Name of each drawn edge. */
  surface: string[];
  /** Label anchors: middle of each edge, or of each arc of a circle (sketch units), with the outward-facing length. */
  anchors: { name: string; at: readonly [number, number]; normal: readonly [number, number]; length: number }[];
  /** Dimension labels: [where (sketch units), offset direction, text]. */
  dims: { at: readonly [number, number]; normal: readonly [number, number]; text: string }[];
}

/** Segments a full circle is drawn with (a circle split into n arcs gets at least 4 per arc). */
const CIRCLE_SEGMENTS = 72;

function drawn(shape: PictureShape, units: string): Drawn {
  const c = shape.circle;
  if (!c) {
    const pts = shape.points;
    // Twice the signed area (y up): positive when the points run anticlockwise.
    const area = signedArea2(pts.flat());
    // Left of a -> b is inside when the points run anticlockwise; enclosures radiate inwards, solids outwards.
    const side = (area > 0 ? 1 : -1) * (shape.kind === 'enclosure' ? 1 : -1);
    const anchors: Drawn['anchors'] = [];
    const dims: Drawn['dims'] = [];
    pts.forEach((a, k) => {
      const b = pts[(k + 1) % pts.length];
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      if (!(len > 0)) return;
      const normal = [(-(b[1] - a[1]) / len) * side, ((b[0] - a[0]) / len) * side] as const;
      const at = [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2] as const;
      anchors.push({ name: shape.surface[k], at, normal, length: len });
      dims.push({ at, normal: [-normal[0], -normal[1]], text: `${short(len)} ${units}` });
    });
    return { kind: shape.kind, points: [...pts], surface: [...shape.surface], anchors, dims };
  }
  const n = Math.max(1, shape.surface.length);
  const per = Math.max(4, Math.ceil(CIRCLE_SEGMENTS / n));
  const [cx, cy] = c.center;
  const points: (readonly [number, number])[] = [];
  const surface: string[] = [];
  const anchors: Drawn['anchors'] = [];
  const out = shape.kind === 'enclosure' ? -1 : 1; // radiating side: outwards for a solid
  for (let k = 0; k < n; k++) {
    const name = shape.surface[k] ?? shape.surface[0];
    for (let j = 0; j < per; j++) {
      const t = (2 * Math.PI * (k * per + j)) / (n * per);
      points.push([cx + c.radius * Math.cos(t), cy + c.radius * Math.sin(t)]);
      surface.push(name);
    }
    const mid = (2 * Math.PI * (k + 0.5)) / n;
    const u = [Math.cos(mid), Math.sin(mid)] as const;
    anchors.push({
      name,
      at: [cx + c.radius * u[0], cy + c.radius * u[1]],
      normal: [out * u[0], out * u[1]],
      length: (2 * Math.PI * c.radius) / n,
    });
  }
  const dims = [{ at: c.center, normal: [0, 0] as const, text: `⌀ ${short(2 * c.radius)} ${units}` }];
  return { kind: shape.kind, points, surface, anchors, dims };
}

export interface PictureLegend {
  title: string;
  low: number;
  centre: number;
  high: number;
}

export interface SketchPicture {
  shapes: ReadonlyArray<PictureShape>;
  units: Units;
  /** Label every surface with its name (default true). */
  names?: boolean;
  /** Write every edge's length beside it. */
  dimensions?: boolean;
  /** Colour each surface's edges (by surface name) and draw the legend. */
  heat?: { colours: ReadonlyMap<string, string>; legend: PictureLegend };
  /** Text for the picture's accessible title. */
  title?: string;
  /** Prefix for ids inside the SVG, unique per page when several pictures share one. */
  idPrefix?: string;
  /** Width in px (default 640); the height follows the sketch's proportions, at most 3/4 of the width. */
  width?: number;
}

const MARGIN = 56; // px around the sketch, room for labels
const LEGEND_HEIGHT = 46; // px below the sketch
const RIM_PX = 7;
const BAND_PX = 5;
const NAME_OFFSET = 11; // px from the edge to its label, on the radiating side

/** A number in the picture: four significant digits, no trailing zeros. */
function short(x: number): string {
  const v = Number(x.toPrecision(4));
  return v === 0 ? '0' : String(v);
}

const px = (v: number) => String(Math.round(v * 100) / 100);

/** The sketch as a standalone SVG document (UTF-8 text, no external references). */
export function sketchSvg(picture: SketchPicture): string {
  const width = picture.width ?? 640;
  const id = picture.idPrefix ?? 'sketch';
  const showNames = picture.names ?? true;
  const shapes = picture.shapes.map((s) => drawn(s, picture.units));
  let minX = Infinity;
  let minY = Infinity;
  let maxX = -Infinity;
  let maxY = -Infinity;
  for (const s of shapes)
    for (const [x, y] of s.points) {
      minX = Math.min(minX, x);
      maxX = Math.max(maxX, x);
      minY = Math.min(minY, y);
      maxY = Math.max(maxY, y);
    }
  const legendH = picture.heat ? LEGEND_HEIGHT : 0;
  const title = `<title>${escapeMarkup(picture.title ?? 'Cross-section')}</title>`;
  if (!(maxX >= minX)) {
    const h = 80;
    return (
      svgOpen(width, h, picture.title) +
      title +
      `<text x="${width / 2}" y="40" text-anchor="middle">no shapes</text></svg>`
    );
  }
  const dx = Math.max(maxX - minX, 1e-300);
  const dy = Math.max(maxY - minY, 1e-300);
  const inner = width - 2 * MARGIN;
  const scale = Math.min(inner / dx, (0.75 * width - 2 * MARGIN) / dy);
  const height = dy * scale + 2 * MARGIN + legendH;
  const offX = MARGIN + (inner - dx * scale) / 2;
  const toX = (x: number) => offX + (x - minX) * scale;
  const toY = (y: number) => MARGIN + (maxY - y) * scale;

  const body: string[] = [title];
  // Enclosures under solids, so a solid inside an enclosure stays visible.
  const ordered = [...shapes].sort((a, b) => (a.kind === b.kind ? 0 : a.kind === 'enclosure' ? -1 : 1));
  for (const s of ordered) {
    const d = s.points.map(([x, y], k) => `${k === 0 ? 'M' : 'L'}${px(toX(x))} ${px(toY(y))}`).join(' ') + ' Z';
    const fill = s.kind === 'solid' ? '#d8d3ca' : '#fbfaf7';
    body.push(`<path d="${d}" fill="${fill}" stroke="#3a3a3a" stroke-width="1.5" stroke-linejoin="round"/>`);
  }
  // Heat bands per edge: a dark rim so pale mid-scale colours still show.
  if (picture.heat) {
    for (const s of shapes)
      s.points.forEach((a, k) => {
        const colour = picture.heat!.colours.get(s.surface[k]);
        if (!colour) return;
        const b = s.points[(k + 1) % s.points.length];
        const line = `x1="${px(toX(a[0]))}" y1="${px(toY(a[1]))}" x2="${px(toX(b[0]))}" y2="${px(toY(b[1]))}"`;
        body.push(
          `<line ${line} stroke="#3a3a3a" stroke-width="${RIM_PX}" stroke-linecap="round"/>`,
          `<line ${line} stroke="${colour}" stroke-width="${BAND_PX}" stroke-linecap="round"/>`,
        );
      });
  }
  if (picture.dimensions) body.push(...dimensionLabels(shapes, toX, toY));
  if (showNames) body.push(...nameLabels(shapes, toX, toY, width));
  if (picture.heat) body.push(legend(picture.heat.legend, id, width, height - legendH + 8));
  return svgOpen(width, height, picture.title) + body.join('') + '</svg>';
}

function svgOpen(width: number, height: number, label: string | undefined): string {
  const h = Math.ceil(height);
  return (
    `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${h}" viewBox="0 0 ${width} ${h}" ` +
    `role="img" aria-label="${escapeMarkup(label ?? 'Cross-section')}" ` +
    `font-family="Helvetica, Arial, sans-serif" font-size="12">`
  );
}

/** Every edge's length beside it on the side it does not radiate from; a circle's diameter at its centre. */
function dimensionLabels(shapes: Drawn[], toX: (x: number) => number, toY: (y: number) => number): string[] {
  return shapes.flatMap((s) =>
    s.dims.map(({ at, normal, text }) => {
      const x = toX(at[0]) + normal[0] * NAME_OFFSET;
      const y = toY(at[1]) - normal[1] * NAME_OFFSET;
      return (
        `<text x="${px(x)}" y="${px(y)}" text-anchor="middle" dominant-baseline="middle" font-size="10" ` +
        `fill="#555" stroke="#fff" stroke-width="3" paint-order="stroke">${escapeMarkup(text)}</text>`
      );
    }),
  );
}

/** One label per surface, at the middle of its longest edge or arc, offset to the side it radiates from. */
function nameLabels(shapes: Drawn[], toX: (x: number) => number, toY: (y: number) => number, width: number): string[] {
  const best = new Map<string, Drawn['anchors'][number]>();
  for (const s of shapes)
    for (const a of s.anchors) {
      const old = best.get(a.name);
      if (!old || a.length > old.length) best.set(a.name, a);
    }
  const out: string[] = [];
  for (const [name, a] of best) {
    const label = plainName(name, 28);
    // Offset grows with the label's slant so text beside a steep edge clears it; kept inside the picture
    // (about 7 px per character at 12 px bold).
    const half = Math.min(width / 2, 3.6 * label.length + 2);
    const [nx, ny] = a.normal;
    const x = Math.min(width - half, Math.max(half, toX(a.at[0]) + nx * (NAME_OFFSET + 18 * Math.abs(nx))));
    const y = toY(a.at[1]) - ny * NAME_OFFSET;
    out.push(
      `<text x="${px(x)}" y="${px(y)}" text-anchor="middle" dominant-baseline="middle" font-weight="600" ` +
        `fill="#1d2a33" stroke="#fff" stroke-width="3" paint-order="stroke" data-surface="${escapeMarkup(name)}">` +
        `${escapeMarkup(label)}</text>`,
    );
  }
  return out;
}

function legend(l: PictureLegend, id: string, width: number, top: number): string {
  const barW = Math.min(240, width - 2 * MARGIN);
  const x0 = (width - barW) / 2;
  const gid = `${escapeMarkup(id)}-heat`;
  const stops = HEAT_STOPS.map(
    (s, i) => `<stop offset="${(100 * i) / (HEAT_STOPS.length - 1)}%" stop-color="rgb(${s.join(',')})"/>`,
  ).join('');
  const tick = (x: number, v: number, anchor: string) =>
    `<text x="${px(x)}" y="${px(top + 34)}" text-anchor="${anchor}" font-size="10">${escapeMarkup(short(v))}</text>`;
  return (
    `<g class="legend"><defs><linearGradient id="${gid}" x1="0" x2="1" y1="0" y2="0">${stops}</linearGradient></defs>` +
    `<text x="${px(width / 2)}" y="${px(top + 8)}" text-anchor="middle" font-size="11">${escapeMarkup(l.title)}</text>` +
    `<rect x="${px(x0)}" y="${px(top + 14)}" width="${px(barW)}" height="10" fill="url(#${gid})" stroke="#3a3a3a" stroke-width="0.5"/>` +
    tick(x0, l.low, 'start') +
    tick(x0 + barW / 2, l.centre, 'middle') +
    tick(x0 + barW, l.high, 'end') +
    '</g>'
  );
}
