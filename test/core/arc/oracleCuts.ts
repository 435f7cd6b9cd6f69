import type { OracleScene, Part } from './circleOracle';

// Where the integrand of the ray-cast reference has kinks along a straight emitter:
// the first part hit from p changes where p lines up two fixed points (corners, arc
// ends), a fixed point with a tangent of a circle, or a tangent common to two circles.
// Cutting the quadrature there leaves only smooth pieces, so no kink can hide between
// the nodes of one interval and fool its error estimate. Test code only, shared by both
// references (../oracle.ts too); the core's own tangents (src/core/arc/tangents.ts) are
// not used, since a reference shares no code with what it checks.

/** A line n . x + c = 0 (n a unit normal). */
export type Line = [nx: number, ny: number, c: number];

/** A segment a -> b (sketch units). */
type Segment = { ax: number; ay: number; bx: number; by: number };

/** Parameters u in (0, 1) along segment `emitter` where it crosses an event line of the scene, ascending. */
export function segmentEventCuts(scene: OracleScene, emitter: Extract<Part, { kind: 'segment' }>): number[] {
  return crossingsAlong(emitter, eventLines(scene, null));
}

/**
 * Parameters u in (0, 1) along segment `emitter` where it crosses one of `lines`
 * strictly (its ends on opposite sides), ascending, each once. A line through an end
 * of the emitter (to rounding: 1e-13 of the terms of its distance) is no cut: a cut a
 * hair from a shared corner, where the kernel is singular, cost the quadrature 1e-12.
 */
export function crossingsAlong(emitter: Segment, lines: Line[]): number[] {
  const cuts = new Set<number>();
  const { ax, ay, bx, by } = emitter;
  for (const [nx, ny, c] of lines) {
    const d0 = nx * ax + ny * ay + c,
      d1 = nx * bx + ny * by + c;
    const t0 = 1e-13 * (Math.abs(nx * ax) + Math.abs(ny * ay) + Math.abs(c)),
      t1 = 1e-13 * (Math.abs(nx * bx) + Math.abs(ny * by) + Math.abs(c));
    if (!((d0 < -t0 && d1 > t1) || (d0 > t0 && d1 < -t1))) continue;
    const u = d0 / (d0 - d1);
    if (u > 1e-12 && u < 1 - 1e-12) cuts.add(u);
  }
  return [...cuts].sort((p, q) => p - q);
}

/** The lines through every two distinct points of `points`. */
export function linesThroughPairs(points: [number, number][]): Line[] {
  const lines: Line[] = [];
  for (let a = 0; a < points.length; a++)
    for (let b = a + 1; b < points.length; b++) {
      const line = lineThrough(points[a], points[b]);
      if (line) lines.push(line);
    }
  return lines;
}

/**
 * Parameters u in (0, 1) along arc `emitter` (angle from + u (to - from)) where an
 * event line of the other circles and points meets its circle, or where its horizon
 * (the tangent at p) passes through a fixed point or touches another circle; ascending.
 */
export function arcEventCuts(scene: OracleScene, emitter: Extract<Part, { kind: 'arc' }>): number[] {
  const { cx, cy, r } = emitter;
  const own = scene.circles.find((c) => c.cx === cx && c.cy === cy && c.r === r);
  const angles: number[] = [];
  for (const [nx, ny, c] of eventLines(scene, own ?? null)) {
    const s = nx * cx + ny * cy + c; // signed distance of the centre from the line
    if (Math.abs(s) >= r) continue;
    const fx = cx - s * nx,
      fy = cy - s * ny,
      h = Math.sqrt(r * r - s * s);
    angles.push(Math.atan2(fy + h * nx - cy, fx - h * ny - cx), Math.atan2(fy - h * nx - cy, fx + h * ny - cx));
  }
  // The horizon through a fixed point: p is a tangent point of the emitter's circle from it.
  for (const [qx, qy] of fixedPoints(scene)) {
    const d = Math.hypot(qx - cx, qy - cy);
    if (d <= r) continue;
    const phi = Math.atan2(qy - cy, qx - cx),
      w = Math.acos(r / d);
    angles.push(phi - w, phi + w);
  }
  // The horizon touching another circle: p touches a tangent common to both circles.
  for (const c of scene.circles) {
    if (c === own) continue;
    for (const [nx, ny, k] of commonTangents({ cx, cy, r }, c)) {
      const s = nx * cx + ny * cy + k;
      angles.push(Math.atan2(-s * ny, -s * nx));
    }
  }
  const turn = 2 * Math.PI,
    span = emitter.to - emitter.from;
  const cuts = new Set<number>();
  for (const a of angles) {
    const u = ((((a - emitter.from) % turn) + turn) % turn) / span;
    if (u > 1e-12 && u < 1 - 1e-12) cuts.add(u);
  }
  return [...cuts].sort((p, q) => p - q);
}

/** The segment ends and arc ends of the scene. */
function fixedPoints(scene: OracleScene): [number, number][] {
  const points: [number, number][] = [];
  for (const s of scene.parts) {
    if (s.kind === 'segment') points.push([s.ax, s.ay], [s.bx, s.by]);
    else
      points.push(
        [s.cx + s.r * Math.cos(s.from), s.cy + s.r * Math.sin(s.from)],
        [s.cx + s.r * Math.cos(s.to), s.cy + s.r * Math.sin(s.to)],
      );
  }
  return points;
}

/**
 * Lines where the first part hit from p can change: through two fixed points, from a
 * fixed point tangent to a circle, and tangent to two circles (the circle `skip`, the
 * emitter's own, left out: its events are the horizon's).
 */
function eventLines(scene: OracleScene, skip: OracleScene['circles'][number] | null): Line[] {
  const points = fixedPoints(scene);
  const circles = scene.circles.filter((c) => c !== skip);
  const lines = linesThroughPairs(points);
  for (const c of circles) for (const p of points) lines.push(...tangentsFrom(p, c));
  for (let a = 0; a < circles.length; a++)
    for (let b = a + 1; b < circles.length; b++) lines.push(...commonTangents(circles[a], circles[b]));
  return lines;
}

/** The line through p and q (null when they coincide to 1e-12). */
export function lineThrough(p: [number, number], q: [number, number]): Line | null {
  const dx = q[0] - p[0],
    dy = q[1] - p[1];
  const len = Math.hypot(dx, dy);
  if (len < 1e-12) return null;
  const nx = -dy / len,
    ny = dx / len;
  return [nx, ny, -(nx * p[0] + ny * p[1])];
}

/** The two tangents from point p to circle c (none when p is not outside it). */
function tangentsFrom(p: [number, number], c: { cx: number; cy: number; r: number }): Line[] {
  const dx = c.cx - p[0],
    dy = c.cy - p[1];
  const d = Math.hypot(dx, dy);
  if (d <= c.r) return [];
  const phi = Math.atan2(dy, dx),
    alpha = Math.asin(c.r / d);
  return [phi - alpha, phi + alpha].map((t) => lineThrough(p, [p[0] + Math.cos(t), p[1] + Math.sin(t)]) as Line);
}

/** The tangents common to two circles: outer ones always, inner ones when the circles are apart. */
function commonTangents(c1: { cx: number; cy: number; r: number }, c2: { cx: number; cy: number; r: number }): Line[] {
  const dx = c2.cx - c1.cx,
    dy = c2.cy - c1.cy;
  const D = Math.hypot(dx, dy);
  if (D === 0) return [];
  const ux = dx / D,
    uy = dy / D;
  const out: Line[] = [];
  // n . c1 + c = r1 and n . c2 + c = s r2 (s = 1: both circles on one side; -1: between).
  for (const s of [1, -1]) {
    const q = (s * c2.r - c1.r) / D;
    if (Math.abs(q) > 1) continue;
    const w = Math.sqrt(1 - q * q);
    for (const sign of [1, -1]) {
      const nx = q * ux - sign * w * uy,
        ny = q * uy + sign * w * ux;
      out.push([nx, ny, c1.r - (nx * c1.cx + ny * c1.cy)]);
    }
  }
  return out;
}
