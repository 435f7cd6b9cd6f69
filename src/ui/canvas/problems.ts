// Where a validation message points: "shape N" and "(x, y)" in the document
// layer's messages become highlighted shapes and markers on the canvas.
import type { Point } from '../../state/sketchFile';

export interface ProblemMarks { shapes: Set<number>; points: Point[] }

const NUM = '[-+]?(?:\\d+\\.?\\d*|\\.\\d+)(?:e[-+]?\\d+)?';

export function problemMarks(messages: readonly string[], shapeCount: number): ProblemMarks {
  const shapes = new Set<number>();
  const points: Point[] = [];
  for (const m of messages) {
    // The first shape a message names is the one to fix (messages count shapes from 1).
    const hit = /shape (\d+)/i.exec(m);
    const i = hit ? Number(hit[1]) - 1 : -1;
    if (i >= 0 && i < shapeCount) shapes.add(i);
    for (const hit of m.matchAll(new RegExp(`\\((${NUM}),\\s*(${NUM})\\)`, 'gi'))) {
      const p: Point = [Number(hit[1]), Number(hit[2])];
      if (Number.isFinite(p[0]) && Number.isFinite(p[1])) points.push(p);
    }
  }
  return { shapes, points: points.slice(0, 20) };
}
