import { Fragment, memo } from 'react';
import { Layer, Line } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { SketchFile } from '../../state/sketchFile';
import { edgeEnds, edgeNames, radiatingNormal } from '../../state/geometry/polygon';
import { toScreen } from '../../state/camera';
import { surfaceStyle, MARK } from '../palette';

interface Props {
  doc: SketchFile;
  camera: Camera;
  order: Map<string, number>;
  /** Surfaces to emphasise (hovered table cell, selected surfaces). */
  emphasis: Set<string>;
  problemShapes: Set<number>;
}

/** Offset of the radiating-side shading from the edge, px. */
const SIDE_PX = 4;

export const ShapesLayer = memo(function ShapesLayer({ doc, camera, order, emphasis, problemShapes }: Props) {
  const enclosureFirst = doc.shapes.map((_, i) => i).sort((a, b) => Number(doc.shapes[a].kind === 'solid') - Number(doc.shapes[b].kind === 'solid'));
  return (
    <Layer listening={false}>
      {enclosureFirst.map((s) => {
        const shape = doc.shapes[s];
        const flat = shape.points.flatMap((p) => toScreen(camera, p));
        const names = edgeNames(shape);
        return (
          <Fragment key={s}>
            <Line points={flat} closed fill={shape.kind === 'enclosure' ? '#fffdf6' : '#d9d3c3'}
              stroke={problemShapes.has(s) ? MARK.problem : undefined} strokeWidth={problemShapes.has(s) ? 8 : 0} opacity={problemShapes.has(s) ? 0.9 : 1} />
            {names.map((name, k) => {
              const [a, b] = edgeEnds(shape, k);
              const [ax, ay] = toScreen(camera, a);
              const [bx, by] = toScreen(camera, b);
              const n = radiatingNormal(shape, k);
              // Screen y is flipped, so the normal's y flips too.
              const ox = n[0] * SIDE_PX;
              const oy = -n[1] * SIDE_PX;
              const st = surfaceStyle(order.get(name) ?? 0);
              const hot = emphasis.has(name);
              return (
                <Fragment key={k}>
                  {hot && <Line points={[ax, ay, bx, by]} stroke={MARK.highlight} strokeWidth={11} lineCap="round" />}
                  <Line points={[ax + ox, ay + oy, bx + ox, by + oy]} stroke={st.colour} strokeWidth={4} opacity={0.3} />
                  <Line points={[ax, ay, bx, by]} stroke={st.colour} strokeWidth={hot ? 4 : 2.5} dash={st.dash} lineCap="round" />
                </Fragment>
              );
            })}
          </Fragment>
        );
      })}
    </Layer>
  );
});
