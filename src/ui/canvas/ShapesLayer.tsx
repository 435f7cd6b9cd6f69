import { memo } from 'react';
import { Layer, Shape as KonvaShape } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { Shape } from '../../state/sketchFile';
import { shapeGeometry } from '../../state/geometry/shapeGeometry';
import { drawShape } from './shapeDrawing';

interface Props {
  shapes: readonly Shape[];
  /** Which shapes this layer draws, in drawing order. */
  draw: readonly number[];
  camera: Camera;
  order: ReadonlyMap<string, number>;
  /** Surfaces to emphasise (hovered table cell, selected surfaces). */
  emphasis: Set<string>;
  problemShapes: Set<number>;
}

/**
 * Shapes with each edge in its surface's colour and the radiating side shaded.
 * The canvas keeps shapes a drag leaves alone in a layer of their own, so only
 * the moving ones are drawn again on every pointer move.
 */
export function ShapesLayer({ shapes, draw, camera, order, emphasis, problemShapes }: Props) {
  return (
    <Layer listening={false}>
      {draw.map((s) => {
        const shape = shapes[s];
        const { names } = shapeGeometry(shape);
        // Plain strings as props, so shapes a drag does not touch skip re-rendering.
        let colours = '';
        let hot = '';
        for (let k = 0; k < names.length; k++) {
          colours += (k ? ',' : '') + String(order.get(names[k]) ?? 0);
          hot += emphasis.size && emphasis.has(names[k]) ? '1' : '0';
        }
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
  const look = { colourOf: colours.split(',').map(Number), hot: Array.from(hot, (c) => c === '1'), problem };
  return (
    <KonvaShape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(ctx) => drawShape(ctx._context, shape, camera, look)}
    />
  );
});
