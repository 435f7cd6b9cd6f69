// Screen polylines for exact circles: each arc drawn as a fine polyline, so the
// same code serves the surface colours, the radiating-side shading, the
// highlight and the heat bands. Drawing only: the factors use the exact arc.
import type { Camera } from '../../state/viewSlice';
import { arcAngles, type CircleShape } from '../../state/edits/circleShapes';
import { toScreen } from '../../state/camera';

/** Longest chord of the drawn polyline, px: fine enough that no corner shows. */
const CHORD_PX = 3;

/**
 * Flat screen points [x0, y0, x1, y1, ...] along arc k, `offsetPx` beyond the
 * rim on the radiating side (outward for a solid, inward for an enclosure).
 */
export function arcScreenPoints(camera: Camera, shape: CircleShape, k: number, offsetPx = 0): number[] {
  const [a0, a1] = arcAngles(shape, k);
  const [cx, cy] = toScreen(camera, shape.circle.center);
  const side = shape.kind === 'solid' ? 1 : -1;
  const r = Math.max(0, shape.circle.radius * camera.scale + side * offsetPx);
  const n = Math.min(720, Math.max(4, Math.ceil(((a1 - a0) * r) / CHORD_PX)));
  const out: number[] = [];
  for (let i = 0; i <= n; i++) {
    const a = a0 + ((a1 - a0) * i) / n;
    // Screen y runs down, so the angle turns the other way on screen.
    out.push(cx + r * Math.cos(a), cy - r * Math.sin(a));
  }
  return out;
}

/** The whole rim as flat screen points (a closed outline). */
export function rimScreenPoints(camera: Camera, shape: CircleShape): number[] {
  return arcScreenPoints(camera, { ...shape, surface: 'rim' }, 0);
}
