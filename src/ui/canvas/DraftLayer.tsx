import { memo } from 'react';
import { Circle, Layer, Line } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import type { Point } from '../../state/sketchFile';
import { toScreen } from '../../state/camera';
import { toolRegistry } from '../../state/tools/registry';

interface Props {
  tool: string;
  draft: Point[];
  hover: Point | null;
  camera: Camera;
}

const TONES = { enclosure: '#1d2b36', body: '#5a4a2a' } as const;

/** The shape being drawn, as the active tool pictures it: an open rubber band or a closed outline. */
export const DraftLayer = memo(function DraftLayer({ tool, draft, hover, camera }: Props) {
  const picture = toolRegistry.get(tool).draft(draft, hover);
  if (!picture) return null;
  const flat = picture.points.flatMap((p) => toScreen(camera, p));
  const colour = TONES[picture.tone];
  const dot = picture.dot && toScreen(camera, picture.dot);
  return (
    <Layer listening={false}>
      {flat.length >= 4 && (
        <Line
          points={flat}
          closed={picture.closed}
          stroke={colour}
          strokeWidth={1.5}
          dash={[6, 4]}
          fill={picture.closed ? 'rgba(90,74,42,0.08)' : undefined}
        />
      )}
      {picture.marks.map((p, i) => {
        const [x, y] = toScreen(camera, p);
        return (
          <Circle
            key={i}
            x={x}
            y={y}
            radius={i === 0 ? 6 : 3.5}
            stroke={colour}
            strokeWidth={1.5}
            fill={i === 0 ? '#fff3d6' : '#ffffff'}
          />
        );
      })}
      {dot && <Circle x={dot[0]} y={dot[1]} radius={3} fill={colour} />}
    </Layer>
  );
});
