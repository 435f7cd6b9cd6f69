// One shape drawn straight into the layer's 2D context: the fill, then per edge
// (or arc) the highlight, the radiating-side shading and the surface stroke, in
// that order, as the separate konva lines once drew them. One konva node per
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
  const line = new Float64Array(4);
  const side = new Float64Array(4);
  for (let k = 0; k < n; k++) {
    const m = (k + 1) % n;
    line[0] = screen[2 * k];
    line[1] = screen[2 * k + 1];
    line[2] = screen[2 * m];
    line[3] = screen[2 * m + 1];
    // Screen y is flipped, so the normal's y flips too.
    const ox = normals[2 * k] * SIDE_PX;
    const oy = -normals[2 * k + 1] * SIDE_PX;
    side[0] = line[0] + ox;
    side[1] = line[1] + oy;
    side[2] = line[2] + ox;
    side[3] = line[3] + oy;
    edgeStrokes(c, line, side, look.colourOf[k] ?? 0, look.hot[k]);
  }
  c.globalAlpha = 1;
}
