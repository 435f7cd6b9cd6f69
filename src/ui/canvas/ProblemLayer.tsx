import { memo } from 'react';
import { Circle, Layer, Text } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { Point } from '../../state/sketchFile';
import { toScreen } from '../../state/camera';
import { MARK } from '../palette';

/** Rings with "!" where validation says the geometry breaks a rule. */
export const ProblemLayer = memo(function ProblemLayer({ points, camera }: { points: Point[]; camera: Camera }) {
  if (!points.length) return null;
  return (
    <Layer listening={false}>
      {points.map((p, i) => {
        const [x, y] = toScreen(camera, p);
        return [
          <Circle key={`c${i}`} x={x} y={y} radius={11} stroke={MARK.problem} strokeWidth={3} fill="rgba(255,255,255,0.7)" />,
          <Text key={`t${i}`} x={x - 3} y={y - 7} text="!" fontStyle="bold" fontSize={14} fill={MARK.problem} />,
        ];
      })}
    </Layer>
  );
});
