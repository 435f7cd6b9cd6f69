// One shape drawn straight into the layer's 2D context: the fill, then per edge
// (or arc) the highlight, the radiating-side shading and the surface stroke (a
// polygon's runs of edges in one colour together, see drawShape). One konva node per
// shape instead of two or three per edge keeps a 1000-edge sketch cheap to redraw.
import type { Camera } from '../../state/viewSlice';
import type { Shape } from '../../state/sketchFile';
import { shapeGeometry } from '../../state/geometry/shapeGeometry';
import { arcCount, isCircle } from '../../state/edits/circleShapes';
import { surfaceStyle, MARK } from '../palette';
import { arcScreenPoints, rimScreenPoints } from './circleDrawing';

/** Offset of the radiating-side shading from the edge, px. */
export const SIDE_PX = 4;

export interface ShapeLook {
  /** Colour slot of each edge's surface. */
  colourOf: readonly number[];
  /** Whether each edge is emphasised (hovered or selected surface). */
  hot: readonly boolean[];
  /** Whether the shape breaks a rule (traced in the problem colour). */
  problem: boolean;
}

interface Stroke {
  colour: string;
  width: number;
  alpha?: number;
  dash?: number[];
  round?: boolean;
}

function polyline(c: CanvasRenderingContext2D, pts: ArrayLike<number>, s: Stroke): void {
  c.beginPath();
  c.moveTo(pts[0], pts[1]);
  for (let i = 2; i + 1 < pts.length; i += 2) c.lineTo(pts[i], pts[i + 1]);
  applyStroke(c, s);
}

function applyStroke(c: CanvasRenderingContext2D, s: Stroke): void {
  c.strokeStyle = s.colour;
  c.lineWidth = s.width;
  c.globalAlpha = s.alpha ?? 1;
  c.setLineDash(s.dash ?? []);
  c.lineCap = s.round ? 'round' : 'butt';
  c.stroke();
}

function outline(c: CanvasRenderingContext2D, pts: ArrayLike<number>, kind: Shape['kind'], problem: boolean): void {
  c.beginPath();
  c.moveTo(pts[0], pts[1]);
  for (let i = 2; i + 1 < pts.length; i += 2) c.lineTo(pts[i], pts[i + 1]);
  c.closePath();
  c.fillStyle = kind === 'enclosure' ? '#fffdf6' : '#d9d3c3';
  c.fill();
  if (problem) {
    c.strokeStyle = MARK.problem;
    c.lineWidth = 8;
    c.globalAlpha = 1;
    c.setLineDash([]);
    c.lineCap = 'butt';
    c.stroke();
  }
}

/** The three strokes of one edge or arc: highlight when emphasised, shading on the radiating side, the surface line. */
function edgeStrokes(
  c: CanvasRenderingContext2D,
  line: ArrayLike<number>,
  side: ArrayLike<number>,
  colour: number,
  on: boolean,
): void {
  const st = surfaceStyle(colour);
  if (on) polyline(c, line, { colour: MARK.highlight, width: 11, round: true });
  polyline(c, side, { colour: st.colour, width: 4, alpha: 0.3 });
  polyline(c, line, { colour: st.colour, width: on ? 4 : 2.5, dash: st.dash, round: true });
}

/** Draw `shape` as seen through `camera` into `c` (screen pixels). */
export function drawShape(c: CanvasRenderingContext2D, shape: Shape, camera: Camera, look: ShapeLook): void {
  c.lineJoin = 'miter';
  if (isCircle(shape)) {
    outline(c, rimScreenPoints(camera, shape), shape.kind, look.problem);
    for (let k = 0; k < arcCount(shape); k++) {
      const rim = arcScreenPoints(camera, shape, k);
      edgeStrokes(c, rim, arcScreenPoints(camera, shape, k, SIDE_PX), look.colourOf[k] ?? 0, look.hot[k]);
    }
    c.globalAlpha = 1;
    return;
  }
  const pts = shape.points;
  const n = pts.length;
  if (n === 0) return;
  const { scale, originX, originY } = camera;
  const screen = new Float64Array(2 * n);
  for (let k = 0; k < n; k++) {
    screen[2 * k] = originX + scale * pts[k][0];
    screen[2 * k + 1] = originY - scale * pts[k][1];
  }
  outline(c, screen, shape.kind, look.problem);
  const { normals } = shapeGeometry(shape);
  // Each edge's line and its radiating-side shading, [x0, y0, x1, y1] at 4k.
  const lines = new Float64Array(4 * n);
  const sides = new Float64Array(4 * n);
  for (let k = 0; k < n; k++) {
    const m = (k + 1) % n;
    lines[4 * k] = screen[2 * k];
    lines[4 * k + 1] = screen[2 * k + 1];
    lines[4 * k + 2] = screen[2 * m];
    lines[4 * k + 3] = screen[2 * m + 1];
    // Screen y is flipped, so the normal's y flips too.
    const ox = normals[2 * k] * SIDE_PX;
    const oy = -normals[2 * k + 1] * SIDE_PX;
    sides[4 * k] = lines[4 * k] + ox;
    sides[4 * k + 1] = lines[4 * k + 1] + oy;
    sides[4 * k + 2] = lines[4 * k + 2] + ox;
    sides[4 * k + 3] = lines[4 * k + 3] + oy;
  }
  // A run of edges in one colour, none emphasised, is stroked as one path of segments,
  // shading then lines: a stroke per edge cost a 1000-edge sketch more to paint than
  // to compute (each segment its own subpath, so dashes and caps are as per edge).
  for (let k = 0; k < n;) {
    const colour = look.colourOf[k] ?? 0;
    if (look.hot[k]) {
      edgeStrokes(c, lines.subarray(4 * k, 4 * k + 4), sides.subarray(4 * k, 4 * k + 4), colour, true);
      k++;
      continue;
    }
    let end = k + 1;
    while (end < n && !look.hot[end] && (look.colourOf[end] ?? 0) === colour) end++;
    const st = surfaceStyle(colour);
    segments(c, sides, k, end, { colour: st.colour, width: 4, alpha: 0.3 });
    segments(c, lines, k, end, { colour: st.colour, width: 2.5, dash: st.dash, round: true });
    k = end;
  }
  c.globalAlpha = 1;
}

/** Segments k0 .. k1-1 of `seg` ([x0, y0, x1, y1] at 4k) as one stroked path. */
function segments(c: CanvasRenderingContext2D, seg: Float64Array, k0: number, k1: number, s: Stroke): void {
  c.beginPath();
  for (let k = k0; k < k1; k++) {
    c.moveTo(seg[4 * k], seg[4 * k + 1]);
    c.lineTo(seg[4 * k + 2], seg[4 * k + 3]);
  }
  applyStroke(c, s);
}
