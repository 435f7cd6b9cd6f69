// Sketch <-> screen mapping. Sketch y points up, screen y down.
import type { Point } from './sketchFile';
import type { Camera } from './viewSlice';
import type { Bounds } from './geometry/polygon';

export function toScreen(c: Camera, p: Point): Point {
  return [c.originX + c.scale * p[0], c.originY - c.scale * p[1]];
}

export function toSketch(c: Camera, s: Point): Point {
  return [(s[0] - c.originX) / c.scale, (c.originY - s[1]) / c.scale];
}

/** Zoom by `factor` keeping the sketch point under the screen point `at` fixed. */
export function zoomAt(c: Camera, at: Point, factor: number): Camera {
  const scale = Math.max(1e-6, Math.min(1e9, c.scale * factor));
  const p = toSketch(c, at);
  return { scale, originX: at[0] - scale * p[0], originY: at[1] + scale * p[1] };
}

/** Camera that shows `b` centred in a width x height viewport with a margin (px). */
export function fitCamera(b: Bounds | null, width: number, height: number, margin = 40): Camera {
  if (!b) return { scale: 100, originX: margin, originY: height - margin };
  const w = Math.max(b.maxX - b.minX, 1e-9);
  const h = Math.max(b.maxY - b.minY, 1e-9);
  const scale = Math.min((width - 2 * margin) / w, (height - 2 * margin) / h);
  const cx = (b.minX + b.maxX) / 2;
  const cy = (b.minY + b.maxY) / 2;
  return { scale, originX: width / 2 - scale * cx, originY: height / 2 + scale * cy };
}
