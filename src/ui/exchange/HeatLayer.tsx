import { Fragment } from 'react';
import { Layer, Line } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { SketchFile } from '../../state/sketchFile';
import { edgeEnds, edgeNames } from '../../state/geometry/polygon';
import { toScreen } from '../../state/camera';
import { useHeatScale } from './useHeatScale';
import { isCircle } from '../../state/edits/circleShapes';
import { arcScreenPoints } from '../canvas/circleDrawing';

/** Band widths, px: a dark rim so pale mid-scale colours still show on the paper canvas. */
const RIM_PX = 8;
const BAND_PX = 6;

/** Edges coloured by their surface's net flux or temperature (nothing when the colouring is off). */
export function HeatLayer({ doc, camera }: { doc: SketchFile; camera: Camera }) {
  const { scale, stale } = useHeatScale();
  if (!scale) return null;
  return (
    <Layer listening={false} opacity={stale ? 0.55 : 1}>
      {doc.shapes.map((shape, s) => {
        const names = edgeNames(shape);
        if (isCircle(shape))
          return (
            <Fragment key={s}>
              {names.map((name, k) => {
                const colour = scale.colours.get(name);
                if (!colour) return null;
                return <HeatBand key={k} points={arcScreenPoints(camera, shape, k)} colour={colour} />;
              })}
            </Fragment>
          );
        return (
          <Fragment key={s}>
            {shape.points.map((_, k) => {
              const colour = scale.colours.get(names[k]);
              if (!colour) return null;
              const [a, b] = edgeEnds(shape, k);
              return <HeatBand key={k} points={[...toScreen(camera, a), ...toScreen(camera, b)]} colour={colour} />;
            })}
          </Fragment>
        );
      })}
    </Layer>
  );
}

/** One edge or arc in its heat colour, on a dark rim so light colours show on any background (screen points). */
function HeatBand({ points, colour }: { points: number[]; colour: string }) {
  return (
    <>
      <Line points={points} stroke="#3a3a3a" strokeWidth={RIM_PX} lineCap="round" />
      <Line points={points} stroke={colour} strokeWidth={BAND_PX} lineCap="round" />
    </>
  );
}
