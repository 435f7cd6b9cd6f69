import { memo } from 'react';
import { Circle, Layer, Line, Text } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import { toScreen } from '../../state/camera';
import { MARK } from '../palette';
import type { ProblemMarks } from './problems';

/** Edges traced and rings with "!" where validation says the geometry breaks a rule. */
export const ProblemLayer = memo(function ProblemLayer({ marks, camera }: { marks: ProblemMarks; camera: Camera }) {
  const { edges, points } = marks;
  if (!points.length && !edges.length) return null;
  return (
    <Layer listening={false}>
      {edges.map(([a, b], i) => (
        <Line
          key={`e${i}`}
          points={[...toScreen(camera, a), ...toScreen(camera, b)]}
          stroke={MARK.problem}
          strokeWidth={5}
          opacity={0.6}
          lineCap="round"
        />
      ))}
      {points.map((p, i) => {
        const [x, y] = toScreen(camera, p);
        return [
          <Circle
            key={`c${i}`}
            x={x}
            y={y}
            radius={11}
            stroke={MARK.problem}
            strokeWidth={3}
            fill="rgba(255,255,255,0.7)"
          />,
          <Text key={`t${i}`} x={x - 3} y={y - 7} text="!" fontStyle="bold" fontSize={14} fill={MARK.problem} />,
        ];
      })}
    </Layer>
  );
});
