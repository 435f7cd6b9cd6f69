import type { SceneInput } from '../../src/core/scene';
import { mulberry32 } from './scenes';

// Hard scenes for the view-factor core: a non-convex enclosure (a finned floor, zigzag
// side walls and roof) holding 100-200 small bodies, every edge its own surface. The
// pockets between fins and teeth make many wall edges obstacles, and the crowd of
// bodies puts many obstacles in nearly every pair's view.

const W = 20,
  H = 10;
const FIN_HEIGHT = 0.6;
const TOOTH_DEPTH = 0.4;

/**
 * A seeded hard scene of about `targetEdges` edges (sketch units: a 20 x 10 box).
 * A quarter of the edges go to the enclosure: a floor of rectangular fins (4 edges a
 * fin) and zigzag walls and roof (2 edges a tooth). The rest are bodies: 100 to 200 of
 * them, regular polygons squashed at random (convex) and, every second one, stars
 * (not convex), placed at random without touching each other or the walls.
 * `options` fixes the number of bodies and their sides (small scenes for tests).
 */
export function hardScene(
  seed: number,
  targetEdges: number,
  options: { bodies?: number; sides?: number } = {},
): SceneInput {
  const rand = mulberry32(seed);
  const wallBudget = Math.max(24, Math.round(targetEdges / 4));
  const fins = Math.max(3, Math.round((0.4 * wallBudget) / 4));
  const teeth = Math.max(3, Math.round((0.6 * wallBudget) / 2));
  // Roof teeth take half the remaining budget, each side wall a quarter.
  const roofTeeth = Math.max(1, Math.round(teeth / 2));
  const sideTeeth = Math.max(1, Math.round(teeth / 4));

  const wall: number[] = [];
  // Floor, left to right: flat lead-in, then fins (up, across, down, across).
  const pitch = W / (fins + 1);
  const finWidth = 0.4 * pitch;
  wall.push(0, 0);
  for (let k = 0; k < fins; k++) {
    const x = pitch * (k + 0.8);
    wall.push(x, 0, x, FIN_HEIGHT, x + finWidth, FIN_HEIGHT, x + finWidth, 0);
  }
  // Right wall, bottom to top: zigzag teeth pointing inward.
  zigzag(wall, W, 0, W, H, sideTeeth, -TOOTH_DEPTH, 0);
  // Roof, right to left.
  zigzag(wall, W, H, 0, H, roofTeeth, 0, -TOOTH_DEPTH);
  // Left wall, top to bottom.
  zigzag(wall, 0, H, 0, 0, sideTeeth, TOOTH_DEPTH, 0);
  const polygons: SceneInput['polygons'] = [{ kind: 'enclosure', points: wall }];

  const bodyBudget = Math.max(0, targetEdges - wall.length / 2);
  // 100 bodies up to 1000 edges, then 50 more per doubling up to 200.
  const bodies = options.bodies ?? Math.min(200, Math.max(100, Math.round(50 * Math.log2(targetEdges / 250))));
  const sides = options.sides ?? Math.max(3, Math.round(bodyBudget / bodies));
  const placed: [number, number, number][] = [];
  const x0 = TOOTH_DEPTH + 0.05,
    x1 = W - TOOTH_DEPTH - 0.05;
  const y0 = FIN_HEIGHT + 0.05,
    y1 = H - TOOTH_DEPTH - 0.05;
  let guard = 0;
  while (placed.length < bodies) {
    if (guard++ > 1e6) throw new Error(`hard scene: could not place ${bodies} bodies`);
    const r = 0.12 + 0.18 * rand();
    const cx = x0 + r + rand() * (x1 - x0 - 2 * r);
    const cy = y0 + r + rand() * (y1 - y0 - 2 * r);
    if (placed.some(([x, y, q]) => Math.hypot(x - cx, y - cy) < r + q + 0.03)) continue;
    placed.push([cx, cy, r]);
    const star = placed.length % 2 === 0 && sides >= 6;
    const phase = rand() * 2 * Math.PI;
    const squash = 0.6 + 0.4 * rand();
    const pts: number[] = [];
    const n = star ? sides - (sides % 2) : sides;
    for (let k = 0; k < n; k++) {
      const a = (2 * Math.PI * k) / n;
      const rho = star && k % 2 === 1 ? 0.4 * r : r;
      const u = rho * Math.cos(a),
        v = rho * squash * Math.sin(a);
      pts.push(cx + u * Math.cos(phase) - v * Math.sin(phase), cy + u * Math.sin(phase) + v * Math.cos(phase));
    }
    polygons.push({ kind: 'solid', points: pts });
  }
  const count = polygons.reduce((n, p) => n + p.points.length / 2, 0);
  return { polygons, edgeSurface: Array.from({ length: count }, (_, k) => k), surfaceCount: count };
}

/** Append the corners of `n` teeth from (xa, ya) towards (xb, yb), tips offset by (dx, dy) at most; (xb, yb) excluded. */
function zigzag(out: number[], xa: number, ya: number, xb: number, yb: number, n: number, dx: number, dy: number) {
  // No deeper than 0.4 of a tooth's width, so teeth of walls meeting at a corner never cross.
  const width = Math.hypot(xb - xa, yb - ya) / n;
  const scale = Math.min(1, (0.4 * width) / Math.hypot(dx, dy));
  dx *= scale;
  dy *= scale;
  for (let k = 0; k < n; k++) {
    const s = k / n,
      t = (k + 0.5) / n;
    out.push(xa + s * (xb - xa), ya + s * (yb - ya));
    out.push(xa + t * (xb - xa) + dx, ya + t * (yb - ya) + dy);
  }
}

/** Edge count of a scene. */
export function edgeCount(scene: SceneInput): number {
  return scene.polygons.reduce((n, p) => n + p.points.length / 2, 0);
}
