import { memo } from 'react';
import { Layer, Text } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { SketchFile } from '../../state/sketchFile';
import { edgeEnds, edgeLength, edgeNames, radiatingNormal } from '../../state/geometry/polygon';
import { toScreen } from '../../state/camera';
import { surfaceStyle } from '../palette';
import { arcAngles, arcLength, isCircle, rimPoint } from '../../state/edits/circleShapes';

interface Props {
  doc: SketchFile;
  camera: Camera;
  colours: ReadonlyMap<string, number>;
  emphasis: Set<string>;
}

/** Label box width, px; the text is centred in it. */
const BOX = 180;
/** Distance of a label from its edge, px, on the radiating side. */
const GAP = 14;

/** Each surface's name once, beside the middle of its longest edge on the side that radiates. */
export const NamesLayer = memo(function NamesLayer({ doc, camera, colours, emphasis }: Props) {
  const best = new Map<string, { shape: number; edge: number; length: number }>();
  doc.shapes.forEach((shape, s) =>
    edgeNames(shape).forEach((name, k) => {
      const length = isCircle(shape) ? arcLength(shape, k) : edgeLength(shape, k);
      const b = best.get(name);
      if (!b || length > b.length) best.set(name, { shape: s, edge: k, length });
    }),
  );
  return (
    <Layer listening={false}>
      {[...best].map(([name, b]) => {
        const shape = doc.shapes[b.shape];
        const st = surfaceStyle(colours.get(name) ?? 0);
        let x: number;
        let y: number;
        let n: readonly [number, number];
        if (isCircle(shape)) {
          // A circle's name sits beside the middle of its longest arc (above a one-surface tube).
          const [a0, a1] = typeof shape.surface === 'string' ? [Math.PI / 2, Math.PI / 2] : arcAngles(shape, b.edge);
          const mid = (a0 + a1) / 2;
          const out = shape.kind === 'solid' ? 1 : -1;
          [x, y] = toScreen(camera, rimPoint(shape, mid));
          n = [out * Math.cos(mid), out * Math.sin(mid)];
        } else if (shape.kind === 'solid' && typeof shape.surface === 'string') {
          // A body that is one surface (a tube): centred above it, so names in a row do not run together.
          const xs = shape.points.map((p) => p[0]);
          const top = Math.max(...shape.points.map((p) => p[1]));
          [x, y] = toScreen(camera, [(Math.min(...xs) + Math.max(...xs)) / 2, top]);
          n = [0, 1];
        } else {
          const [a, c] = edgeEnds(shape, b.edge);
          [x, y] = toScreen(camera, [(a[0] + c[0]) / 2, (a[1] + c[1]) / 2]);
          n = radiatingNormal(shape, b.edge);
        }
        return (
          <Text
            key={name}
            text={name}
            x={x + n[0] * GAP - BOX / 2}
            y={y - n[1] * GAP - 7}
            width={BOX}
            align="center"
            fontSize={12}
            fontStyle={emphasis.has(name) ? 'bold' : 'normal'}
            fontFamily="system-ui, sans-serif"
            fill={st.colour}
            stroke="#ffffff"
            strokeWidth={3}
            fillAfterStrokeEnabled
            wrap="none"
            ellipsis
          />
        );
      })}
    </Layer>
  );
});
