import { Fragment, memo } from 'react';
import { Layer, Line } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { Shape, SketchFile } from '../../state/sketchFile';
import { edgeEnds, edgeNames, radiatingNormal } from '../../state/geometry/polygon';
import { toScreen } from '../../state/camera';
import { surfaceStyle, MARK } from '../palette';
import { isCircle, arcCount, type CircleShape } from '../../state/edits/circleShapes';
import { arcScreenPoints, rimScreenPoints } from './circleDrawing';

interface Props {
  doc: SketchFile;
  camera: Camera;
  order: ReadonlyMap<string, number>;
  /** Surfaces to emphasise (hovered table cell, selected surfaces). */
  emphasis: Set<string>;
  problemShapes: Set<number>;
}

/** Offset of the radiating-side shading from the edge, px. */
const SIDE_PX = 4;

export function ShapesLayer({ doc, camera, order, emphasis, problemShapes }: Props) {
  const enclosureFirst = doc.shapes
    .map((_, i) => i)
    .sort((a, b) => Number(doc.shapes[a].kind === 'solid') - Number(doc.shapes[b].kind === 'solid'));
  return (
    <Layer listening={false}>
      {enclosureFirst.map((s) => {
        const shape = doc.shapes[s];
        const names = edgeNames(shape);
        // Plain strings as props, so shapes a drag does not touch skip re-rendering.
        const colours = names.map((n) => order.get(n) ?? 0).join(',');
        const hot = names.map((n) => (emphasis.has(n) ? 1 : 0)).join('');
        return (
          <ShapeNode key={s} shape={shape} camera={camera} colours={colours} hot={hot} problem={problemShapes.has(s)} />
        );
      })}
    </Layer>
  );
}

const ShapeNode = memo(function ShapeNode({
  shape,
  camera,
  colours,
  hot,
  problem,
}: {
  shape: Shape;
  camera: Camera;
  colours: string;
  hot: string;
  problem: boolean;
}) {
  const colourOf = colours.split(',').map(Number);
  if (isCircle(shape))
    return <CircleNode shape={shape} camera={camera} colourOf={colourOf} hot={hot} problem={problem} />;
  const flat = shape.points.flatMap((p) => toScreen(camera, p));
  return (
    <Fragment>
      <Line
        points={flat}
        closed
        fill={shape.kind === 'enclosure' ? '#fffdf6' : '#d9d3c3'}
        stroke={problem ? MARK.problem : undefined}
        strokeWidth={problem ? 8 : 0}
      />
      {shape.points.map((_, k) => {
        const [a, b] = edgeEnds(shape, k);
        const [ax, ay] = toScreen(camera, a);
        const [bx, by] = toScreen(camera, b);
        const n = radiatingNormal(shape, k);
        // Screen y is flipped, so the normal's y flips too.
        const ox = n[0] * SIDE_PX;
        const oy = -n[1] * SIDE_PX;
        const st = surfaceStyle(colourOf[k] ?? 0);
        const on = hot[k] === '1';
        return (
          <Fragment key={k}>
            {on && <Line points={[ax, ay, bx, by]} stroke={MARK.highlight} strokeWidth={11} lineCap="round" />}
            <Line points={[ax + ox, ay + oy, bx + ox, by + oy]} stroke={st.colour} strokeWidth={4} opacity={0.3} />
            <Line
              points={[ax, ay, bx, by]}
              stroke={st.colour}
              strokeWidth={on ? 4 : 2.5}
              dash={st.dash}
              lineCap="round"
            />
          </Fragment>
        );
      })}
    </Fragment>
  );
});

/** An exact circle: filled rim, then each arc in its surface's colour with the radiating side shaded. */
function CircleNode({
  shape,
  camera,
  colourOf,
  hot,
  problem,
}: {
  shape: CircleShape;
  camera: Camera;
  colourOf: number[];
  hot: string;
  problem: boolean;
}) {
  return (
    <Fragment>
      <Line
        points={rimScreenPoints(camera, shape)}
        closed
        fill={shape.kind === 'enclosure' ? '#fffdf6' : '#d9d3c3'}
        stroke={problem ? MARK.problem : undefined}
        strokeWidth={problem ? 8 : 0}
      />
      {Array.from({ length: arcCount(shape) }, (_, k) => {
        const rim = arcScreenPoints(camera, shape, k);
        const st = surfaceStyle(colourOf[k] ?? 0);
        const on = hot[k] === '1';
        return (
          <Fragment key={k}>
            {on && <Line points={rim} stroke={MARK.highlight} strokeWidth={11} lineCap="round" />}
            <Line
              points={arcScreenPoints(camera, shape, k, SIDE_PX)}
              stroke={st.colour}
              strokeWidth={4}
              opacity={0.3}
            />
            <Line points={rim} stroke={st.colour} strokeWidth={on ? 4 : 2.5} dash={st.dash} lineCap="round" />
          </Fragment>
        );
      })}
    </Fragment>
  );
}
