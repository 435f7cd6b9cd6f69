// A polygon drawn into a recording 2D context: runs of edges in one colour are
// stroked together, and the picture holds the same strokes as one stroke per edge
// would (each edge's line and shading, in its style, at its screen place), which
// the test rebuilds on its own from the points, the camera and the outward normals.
import { describe, expect, it } from 'vitest';
import { drawShape, SIDE_PX } from '../../../src/ui/canvas/shapeDrawing';
import { MARK, surfaceStyle } from '../../../src/ui/palette';
import type { Shape } from '../../../src/state/sketchFile';

interface Drawn {
  colour: string;
  width: number;
  alpha: number;
  dash: string;
  cap: string;
  segments: string[];
}

/** A 2D context that records each stroke: its style and its segments (moveTo, lineTo pairs). */
function recorder() {
  const strokes: Drawn[] = [];
  let path: number[][] = [];
  const state = { strokeStyle: '', lineWidth: 0, globalAlpha: 1, lineCap: 'butt', dash: [] as number[] };
  const c = {
    ...state,
    fillStyle: '',
    lineJoin: 'miter',
    beginPath: () => void (path = []),
    moveTo: (x: number, y: number) => void path.push([x, y]),
    lineTo: (x: number, y: number) => void path[path.length - 1].push(x, y),
    closePath: () => {},
    fill: () => {},
    setLineDash: (d: number[]) => void (state.dash = d),
    stroke() {
      strokes.push({
        colour: c.strokeStyle,
        width: c.lineWidth,
        alpha: c.globalAlpha,
        dash: state.dash.join(','),
        cap: c.lineCap,
        segments: path.map((p) => p.map((v) => v.toFixed(6)).join(' ')),
      });
    },
  };
  return { c: c as unknown as CanvasRenderingContext2D, strokes };
}

/** Every (style, segment) of a drawing, one entry per segment, sorted: the picture up to the order of strokes. */
const picture = (strokes: Drawn[]) =>
  strokes.flatMap((s) => s.segments.map((seg) => `${s.colour}|${s.width}|${s.alpha}|${s.dash}|${s.cap}|${seg}`)).sort();

const camera = { scale: 40, originX: 100, originY: 300 };

/** An anticlockwise hexagon body (outward normals point away from its centre). */
const hexagon: Shape = {
  kind: 'solid',
  points: Array.from({ length: 6 }, (_, k): [number, number] => [
    3 + 2 * Math.cos((Math.PI * k) / 3),
    2 + 2 * Math.sin((Math.PI * k) / 3),
  ]),
  surface: 'hex',
};

/** One stroke per edge, as the app drew before runs (the test's own reference). */
function perEdge(colourOf: number[], hot: boolean[]): string[] {
  const out: Drawn[] = [];
  const pts = hexagon.points.map(([x, y]) => [camera.originX + camera.scale * x, camera.originY - camera.scale * y]);
  const n = pts.length;
  for (let k = 0; k < n; k++) {
    const [x0, y0] = pts[k];
    const [x1, y1] = pts[(k + 1) % n];
    // Outward normal of an anticlockwise outline in sketch space is (dy, -dx)/len; screen y flips.
    const [sx0, sy0] = hexagon.points[k];
    const [sx1, sy1] = hexagon.points[(k + 1) % n];
    const len = Math.hypot(sx1 - sx0, sy1 - sy0);
    const ox = ((sy1 - sy0) / len) * SIDE_PX,
      oy = ((sx1 - sx0) / len) * SIDE_PX;
    const seg = (a: number[]) => a.map((v) => v.toFixed(6)).join(' ');
    const st = surfaceStyle(colourOf[k]);
    if (hot[k])
      out.push({
        colour: MARK.highlight,
        width: 11,
        alpha: 1,
        dash: '',
        cap: 'round',
        segments: [seg([x0, y0, x1, y1])],
      });
    out.push({
      colour: st.colour,
      width: 4,
      alpha: 0.3,
      dash: '',
      cap: 'butt',
      segments: [seg([x0 + ox, y0 + oy, x1 + ox, y1 + oy])],
    });
    out.push({
      colour: st.colour,
      width: hot[k] ? 4 : 2.5,
      alpha: 1,
      dash: (st.dash ?? []).join(','),
      cap: 'round',
      segments: [seg([x0, y0, x1, y1])],
    });
  }
  return picture(out);
}

describe('drawShape', () => {
  it('strokes each run of edges in one colour as one path, with every edge where one stroke per edge puts it', () => {
    const colourOf = [0, 0, 0, 1, 1, 0];
    const hot = colourOf.map(() => false);
    const { c, strokes } = recorder();
    drawShape(c, hexagon, camera, { colourOf, hot, problem: false });
    // Three runs (edges 1-3, 4-5, 6), each a shading stroke and a line stroke.
    expect(strokes).toHaveLength(6);
    expect(strokes.map((s) => s.segments.length)).toEqual([3, 3, 2, 2, 1, 1]);
    expect(picture(strokes)).toEqual(perEdge(colourOf, hot));
  });

  it('draws an emphasised edge on its own, with its highlight, and splits the run around it', () => {
    const colourOf = [2, 2, 2, 2, 2, 2];
    const hot = [false, false, true, false, false, false];
    const { c, strokes } = recorder();
    drawShape(c, hexagon, camera, { colourOf, hot, problem: false });
    // Edges 1-2, then edge 3 (highlight, shading, line), then edges 4-6.
    expect(strokes.map((s) => s.segments.length)).toEqual([2, 2, 1, 1, 1, 3, 3]);
    expect(strokes[2].colour).toBe(MARK.highlight);
    expect(picture(strokes)).toEqual(perEdge(colourOf, hot));
  });
});
