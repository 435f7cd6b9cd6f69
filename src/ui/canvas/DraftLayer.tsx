import { memo } from 'react';
import { Circle, Layer, Line } from 'react-konva';
import type { Camera, Tool } from '../../state/viewSlice';
import type { Point } from '../../state/sketchFile';
import { toScreen } from '../../state/camera';

interface Props { tool: Tool; draft: Point[]; hover: Point | null; camera: Camera }

/** The outline being drawn: open with a rubber band for polygons, closed for quick shapes. */
export const DraftLayer = memo(function DraftLayer({ tool, draft, hover, camera }: Props) {
  if (!draft.length && !hover) return null;
  const polygonTool = tool === 'enclosure' || tool === 'solid';
  const pts = polygonTool && hover && draft.length ? [...draft, hover] : draft;
  const flat = pts.flatMap((p) => toScreen(camera, p));
  const colour = tool === 'enclosure' ? '#1d2b36' : '#5a4a2a';
  return (
    <Layer listening={false}>
      {flat.length >= 4 && <Line points={flat} closed={!polygonTool} stroke={colour} strokeWidth={1.5} dash={[6, 4]} fill={polygonTool ? undefined : 'rgba(90,74,42,0.08)'} />}
      {polygonTool && draft.map((p, i) => {
        const [x, y] = toScreen(camera, p);
        return <Circle key={i} x={x} y={y} radius={i === 0 ? 6 : 3.5} stroke={colour} strokeWidth={1.5} fill={i === 0 ? '#fff3d6' : '#ffffff'} />;
      })}
      {polygonTool && hover && !draft.length && <Circle x={toScreen(camera, hover)[0]} y={toScreen(camera, hover)[1]} radius={3} fill={colour} />}
    </Layer>
  );
});
