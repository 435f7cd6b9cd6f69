import { memo } from 'react';
import { Layer, Shape as KonvaShape } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { Shape } from '../../state/sketchFile';
import { shapeGeometry } from '../../state/geometry/shapeGeometry';
import { useHeatScale } from './useHeatScale';
import { isCircle } from '../../state/edits/circleShapes';
import { arcScreenPoints } from '../canvas/circleDrawing';

/** Band widths, px: a dark rim so pale mid-scale colours still show on the paper canvas. */
const RIM_PX = 8;
const BAND_PX = 6;

interface Props {
  shapes: readonly Shape[];
  camera: Camera;
  /** Shapes a gesture is changing now: drawn in a layer of their own (liveSide), the others in a still one. */
  live: ReadonlySet<number>;
  liveSide: boolean;
}

/** Edges coloured by their surface's net flux or temperature (nothing when the colouring is off). */
export function HeatLayer({ shapes, camera, live, liveSide }: Props) {
  const { scale, stale } = useHeatScale();
  if (!scale || (liveSide && live.size === 0)) return null;
  return (
    <Layer listening={false} opacity={stale ? 0.55 : 1}>
      {shapes.map((shape, s) => {
        if (live.has(s) !== liveSide) return null;
        // One string per shape, so shapes a drag leaves alone skip re-rendering.
        const colours = shapeGeometry(shape)
          .names.map((name) => scale.colours.get(name) ?? '')
          .join('|');
        return <HeatShape key={s} shape={shape} camera={camera} colours={colours} />;
      })}
    </Layer>
  );
}

/** One shape's edges or arcs in their heat colours, each on a dark rim so light colours show on any background. */
const HeatShape = memo(function HeatShape({
  shape,
  camera,
  colours,
}: {
  shape: Shape;
  camera: Camera;
  colours: string;
}) {
  const colourOf = colours.split('|');
  if (colourOf.every((c) => !c)) return null;
  return (
    <KonvaShape
      listening={false}
      perfectDrawEnabled={false}
      sceneFunc={(ctx) => {
        const c = ctx._context;
        c.lineCap = 'round';
        c.lineJoin = 'miter';
        c.setLineDash([]);
        const band = (pts: ArrayLike<number>, colour: string) => {
          for (const [stroke, width] of [
            ['#3a3a3a', RIM_PX],
            [colour, BAND_PX],
          ] as const) {
            c.beginPath();
            c.moveTo(pts[0], pts[1]);
            for (let i = 2; i + 1 < pts.length; i += 2) c.lineTo(pts[i], pts[i + 1]);
            c.strokeStyle = stroke;
            c.lineWidth = width;
            c.stroke();
          }
        };
        if (isCircle(shape)) {
          colourOf.forEach((colour, k) => colour && band(arcScreenPoints(camera, shape, k), colour));
          return;
        }
        const pts = shape.points;
        const { scale, originX, originY } = camera;
        colourOf.forEach((colour, k) => {
          if (!colour) return;
          const a = pts[k];
          const b = pts[(k + 1) % pts.length];
          band(
            [originX + scale * a[0], originY - scale * a[1], originX + scale * b[0], originY - scale * b[1]],
            colour,
          );
        });
      }}
    />
  );
});
