import { memo } from 'react';
import { Layer, Line } from 'react-konva';
import type { Camera } from '../../state/viewSlice';
import { MARK } from '../palette';

/** Grid lines at the grid step, thinned out (x2, x5, x10...) so they stay at least 12 px apart. */
export const GridLayer = memo(function GridLayer({
  camera,
  width,
  height,
  step,
}: {
  camera: Camera;
  width: number;
  height: number;
  step: number;
}) {
  let s = step;
  for (let i = 0; s * camera.scale < 12 && i < 30; i++) s *= i % 3 === 1 ? 2.5 : 2;
  const x0 = -camera.originX / camera.scale;
  const x1 = (width - camera.originX) / camera.scale;
  const y0 = (camera.originY - height) / camera.scale;
  const y1 = camera.originY / camera.scale;
  const lines = [];
  for (let x = Math.ceil(x0 / s) * s, i = 0; x <= x1 && i < 400; x += s, i++) {
    const sx = camera.originX + x * camera.scale;
    lines.push(<Line key={`x${i}`} points={[sx, 0, sx, height]} stroke={MARK.grid} strokeWidth={1} />);
  }
  for (let y = Math.ceil(y0 / s) * s, i = 0; y <= y1 && i < 400; y += s, i++) {
    const sy = camera.originY - y * camera.scale;
    lines.push(<Line key={`y${i}`} points={[0, sy, width, sy]} stroke={MARK.grid} strokeWidth={1} />);
  }
  return (
    <Layer listening={false}>
      {lines}
      <Line points={[camera.originX, 0, camera.originX, height]} stroke={MARK.axis} strokeWidth={1.5} />
      <Line points={[0, camera.originY, width, camera.originY]} stroke={MARK.axis} strokeWidth={1.5} />
    </Layer>
  );
});
