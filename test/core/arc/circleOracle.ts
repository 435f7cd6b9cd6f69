// An independent reference for view factors with exact circles, sharing no code with
// src/core: from a point p the factor to a part of the sketch is 1/2 of the integral
// of cos(b) db over the directions whose first hit is that part (Siegel and Howell,
// Thermal Radiation Heat Transfer, the 2D point kernel), found by ray casting. The
// first part hit cannot change between consecutive directions to corners, arc ends
// and circle tangents, so one ray per angular gap decides it. The point factor is
// integrated along the emitting segment or arc by adaptive Gauss-Kronrod (7/15)
// quadrature, after cutting the emitter wherever the first part hit or its horizon
// changes (oracleCuts.ts): without those cuts a kink can fool the error estimate, and
// the reference was off by up to 1.4e-8 in seeded random scenes.
import { integrateVector } from '../quadrature';
import { arcEventCuts, segmentEventCuts } from './oracleCuts';

export type Part =
  | { kind: 'segment'; ax: number; ay: number; bx: number; by: number } // radiates to the left of a -> b
  | { kind: 'arc'; cx: number; cy: number; r: number; solid: boolean; from: number; to: number }; // angles, from < to

export interface OracleScene {
  parts: Part[];
  /** Circles that stop rays (every circle whose arcs are parts). */
  circles: { cx: number; cy: number; r: number; solid: boolean }[];
}

/** Segments of polygons, enclosures anticlockwise and solids clockwise, as parts. */
export function polygonParts(kind: 'enclosure' | 'solid', pts: number[][]): Part[] {
  let area = 0;
  for (let k = 0; k < pts.length; k++) {
    const q = pts[(k + 1) % pts.length];
    area += pts[k][0] * q[1] - q[0] * pts[k][1];
  }
  const flip = kind === 'enclosure' ? area < 0 : area > 0;
  return pts.map((a, k) => {
    const b = pts[(k + 1) % pts.length];
    return flip
      ? { kind: 'segment', ax: b[0], ay: b[1], bx: a[0], by: a[1] }
      : { kind: 'segment', ax: a[0], ay: a[1], bx: b[0], by: b[1] };
  });
}

/** n equal arcs anticlockwise from +x, as parts, and the circle itself. */
export function circleParts(
  scene: OracleScene,
  kind: 'enclosure' | 'solid',
  cx: number,
  cy: number,
  r: number,
  n: number,
): void {
  const solid = kind === 'solid';
  scene.circles.push({ cx, cy, r, solid });
  for (let k = 0; k < n; k++)
    scene.parts.push({ kind: 'arc', cx, cy, r, solid, from: (2 * Math.PI * k) / n, to: (2 * Math.PI * (k + 1)) / n });
}

function angleIn(t: number, from: number, to: number): boolean {
  const turn = 2 * Math.PI;
  const u = (((t - from) % turn) + turn) % turn;
  return u <= to - from;
}

/** First part hit by the ray p + t d (t > 0): its index, or -1. */
function firstHit(scene: OracleScene, px: number, py: number, dx: number, dy: number, from: number): number {
  let best = Infinity,
    who = -1;
  scene.parts.forEach((s, e) => {
    if (s.kind !== 'segment' || e === from) return;
    const ex = s.bx - s.ax,
      ey = s.by - s.ay;
    const den = dx * ey - dy * ex;
    if (den === 0) return;
    const wx = s.ax - px,
      wy = s.ay - py;
    const t = (wx * ey - wy * ex) / den;
    const u = (wx * dy - wy * dx) / den;
    // Only the radiating side counts as a hit on the part; the back is its body.
    if (t > 1e-12 && u >= 0 && u <= 1 && t < best) {
      best = t;
      who = ex * (py - s.ay) - ey * (px - s.ax) > 0 ? e : -2;
    }
  });
  for (const c of scene.circles) {
    const fx = px - c.cx,
      fy = py - c.cy;
    const b = fx * dx + fy * dy;
    const disc = b * b - (fx * fx + fy * fy - c.r * c.r);
    if (disc <= 0) continue;
    const t = c.solid ? -b - Math.sqrt(disc) : -b + Math.sqrt(disc);
    if (!(t > 1e-12) || t >= best) continue;
    best = t;
    const angle = Math.atan2(fy + t * dy, fx + t * dx);
    who = scene.parts.findIndex(
      (s) => s.kind === 'arc' && s.cx === c.cx && s.cy === c.cy && s.r === c.r && angleIn(angle, s.from, s.to),
    );
  }
  return who;
}

/** Fraction of diffuse emission from point p (unit normal n, unit tangent t) first hitting each part. */
function pointFactors(
  scene: OracleScene,
  from: number,
  px: number,
  py: number,
  nx: number,
  ny: number,
  tx: number,
  ty: number,
  out: Float64Array,
): void {
  out.fill(0);
  const angles: number[] = [-Math.PI / 2, Math.PI / 2];
  const add = (x: number, y: number) => {
    const vx = x - px,
      vy = y - py;
    const c = vx * nx + vy * ny;
    if (c > 0) angles.push(Math.atan2(vx * tx + vy * ty, c));
  };
  for (const s of scene.parts) {
    if (s.kind === 'segment') {
      add(s.ax, s.ay);
      add(s.bx, s.by);
    } else {
      add(s.cx + s.r * Math.cos(s.from), s.cy + s.r * Math.sin(s.from));
      add(s.cx + s.r * Math.cos(s.to), s.cy + s.r * Math.sin(s.to));
    }
  }
  for (const c of scene.circles) {
    const d = Math.hypot(px - c.cx, py - c.cy);
    if (!c.solid || d <= c.r) continue;
    const a = Math.atan2(py - c.cy, px - c.cx),
      w = Math.acos(c.r / d);
    add(c.cx + c.r * Math.cos(a + w), c.cy + c.r * Math.sin(a + w));
    add(c.cx + c.r * Math.cos(a - w), c.cy + c.r * Math.sin(a - w));
  }
  angles.sort((a, b) => a - b);
  for (let k = 0; k + 1 < angles.length; k++) {
    const b0 = angles[k],
      b1 = angles[k + 1];
    if (b1 - b0 < 1e-15) continue;
    const bm = 0.5 * (b0 + b1);
    const who = firstHit(
      scene,
      px,
      py,
      Math.cos(bm) * nx + Math.sin(bm) * tx,
      Math.cos(bm) * ny + Math.sin(bm) * ty,
      from,
    );
    if (who >= 0) out[who] += 0.5 * (Math.sin(b1) - Math.sin(b0));
  }
}

/** Point, unit normal and unit tangent at parameter u in [0, 1] along part s, and its length. */
export function at(s: Part, u: number): [number, number, number, number, number, number, number] {
  if (s.kind === 'segment') {
    const L = Math.hypot(s.bx - s.ax, s.by - s.ay);
    const tx = (s.bx - s.ax) / L,
      ty = (s.by - s.ay) / L;
    return [s.ax + u * (s.bx - s.ax), s.ay + u * (s.by - s.ay), -ty, tx, tx, ty, L];
  }
  const th = s.from + u * (s.to - s.from);
  const c = Math.cos(th),
    sn = Math.sin(th);
  const sign = s.solid ? 1 : -1;
  // Normal outward for a tube, inward for a shell; tangent with the normal on its left.
  return [s.cx + s.r * c, s.cy + s.r * sn, sign * c, sign * sn, sign * sn, -sign * c, s.r * (s.to - s.from)];
}

/**
 * Row `from` of the part-to-part view-factor matrix by adaptive quadrature along the
 * part, to an absolute error near `tol` per entry. The emitter is cut at its events
 * (oracleCuts.ts); `cuts` are extra parameters in (0, 1) where the integrand has kinks.
 */
export function oracleRow(scene: OracleScene, from: number, tol = 1e-11, cuts: number[] = []): Float64Array {
  const s = scene.parts[from];
  // A kink near an end of a wide interval can hide between all 15 nodes, and the error
  // estimate then never sees it: start from 64 equal intervals so every interval is short.
  const uniform = Array.from({ length: 63 }, (_, k) => (k + 1) / 64);
  const events = s.kind === 'segment' ? segmentEventCuts(scene, s) : arcEventCuts(scene, s);
  const starts = [...uniform, ...events, ...cuts.filter((t) => t > 0 && t < 1)].sort((a, b) => a - b);
  return integrateVector(
    scene.parts.length,
    (u, out) => {
      const [px, py, nx, ny, tx, ty] = at(s, u);
      pointFactors(scene, from, px, py, nx, ny, tx, ty, out);
    },
    tol,
    starts,
  );
}
