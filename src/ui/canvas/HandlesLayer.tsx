import { memo, type ReactElement } from 'react';
import { Circle, Label, Layer, Line, Rect, Tag, Text } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { SketchFile } from '../../state/sketchFile';
import type { Pick } from '../../state/selection';
import { edgeEnds, edgeLength } from '../../state/geometry/polygon';
import { toScreen } from '../../state/camera';
import { MARK } from '../palette';
import { isCircle } from '../../state/edits/circleShapes';
import { arcScreenPoints } from './circleDrawing';

interface Props {
  doc: SketchFile;
  camera: Camera;
  selection: Pick[];
  /** Show every vertex handle of the shapes the selection touches (the select tool); else only picked vertices. */
  showAll: boolean;
}

function fmt(v: number): string {
  return String(Number(v.toPrecision(6)));
}

function Tip({ x, y, text }: { x: number; y: number; text: string }) {
  return (
    <Label x={x + 10} y={y - 26}>
      <Tag fill="#1d2b36" cornerRadius={3} opacity={0.92} />
      <Text text={text} fill="#ffffff" fontSize={12} padding={4} fontFamily="system-ui, sans-serif" />
    </Label>
  );
}

/** Vertex handles, selection marks, and the length or coordinates of what is selected. */
export const HandlesLayer = memo(function HandlesLayer({ doc, camera, selection, showAll }: Props) {
  const u = doc.units;
  const marks: ReactElement[] = [];
  const tips: ReactElement[] = [];
  for (const p of selection) {
    const shape = doc.shapes[p.shape];
    if (!shape) continue;
    if (p.type === 'shape' && isCircle(shape)) {
      const [x, y] = toScreen(camera, shape.circle.center);
      marks.push(
        <Line
          key={`s${p.shape}`}
          points={arcScreenPoints(camera, { ...shape, surface: 'rim' }, 0, -3)}
          stroke={MARK.selection}
          strokeWidth={1.5}
          dash={[6, 4]}
        />,
        <Circle key={`c${p.shape}`} x={x} y={y} radius={3} fill={MARK.selection} />,
      );
      tips.push(
        <Tip
          key={`tc${p.shape}`}
          x={x}
          y={y}
          text={`centre (${fmt(shape.circle.center[0])}, ${fmt(shape.circle.center[1])}), diameter ${fmt(2 * shape.circle.radius)} ${u}`}
        />,
      );
    } else if (p.type === 'shape') {
      marks.push(
        <Line
          key={`s${p.shape}`}
          points={shape.points.flatMap((q) => toScreen(camera, q))}
          closed
          stroke={MARK.selection}
          strokeWidth={1.5}
          dash={[6, 4]}
        />,
      );
    } else if (p.type === 'edge' && !isCircle(shape)) {
      const [a, b] = edgeEnds(shape, p.index);
      const [ax, ay] = toScreen(camera, a);
      const [bx, by] = toScreen(camera, b);
      marks.push(
        <Line
          key={`e${p.shape}:${p.index}`}
          points={[ax, ay, bx, by]}
          stroke={MARK.selection}
          strokeWidth={1.5}
          dash={[5, 4]}
        />,
      );
      tips.push(
        <Tip
          key={`te${p.shape}:${p.index}`}
          x={(ax + bx) / 2}
          y={(ay + by) / 2}
          text={`length ${fmt(edgeLength(shape, p.index))} ${u}`}
        />,
      );
    } else if (p.type === 'vertex') {
      const q = shape.points[p.index];
      if (!q) continue;
      const [x, y] = toScreen(camera, q);
      tips.push(<Tip key={`tv${p.shape}:${p.index}`} x={x} y={y} text={`(${fmt(q[0])}, ${fmt(q[1])}) ${u}`} />);
    }
  }
  const selectedVertex = new Set(
    selection.filter((p) => p.type === 'vertex').map((p) => `${p.shape}:${(p as { index: number }).index}`),
  );
  // Handles only on the selected shapes: unselected tubes show their outline, not a ring of squares.
  const touched = new Set(selection.map((p) => p.shape));
  const handles: ReactElement[] = [];
  doc.shapes.forEach((shape, s) =>
    shape.points.forEach((q, k) => {
      const on = selectedVertex.has(`${s}:${k}`);
      if (!on && !(showAll && touched.has(s))) return;
      const [x, y] = toScreen(camera, q);
      handles.push(
        on ? (
          <Circle key={`${s}:${k}`} x={x} y={y} radius={5.5} fill={MARK.selection} stroke="#ffffff" strokeWidth={1.5} />
        ) : (
          <Rect
            key={`${s}:${k}`}
            x={x - 3}
            y={y - 3}
            width={6}
            height={6}
            fill="#ffffff"
            stroke="#1d2b36"
            strokeWidth={1}
          />
        ),
      );
    }),
  );
  return (
    <Layer listening={false}>
      {marks}
      {handles}
      {tips}
    </Layer>
  );
});
