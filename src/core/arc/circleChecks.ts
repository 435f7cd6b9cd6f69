import { pointInPolygon } from '../pointInPolygon';
import { closestFraction } from '../segmentPoint';
import type { CircleInput, PolygonInput } from '../scene';

// Geometric validity of exact circles against each other and against polygons.
// Circles need a clear gap: tangent contact (a tube resting on a wall or on another
// tube) is refused, and so is a gap below 1e-7 of the radius. The circle integrator's
// float tests keep margins of 1e-9 of a radius or a distance (they only ever keep an
// event or a blocker in doubt); a gap within a few of those margins was computed wrong
// (a tube split into halves beside a bar at 2e-9 of its radius gave rows off by 21%),
// so the gap must stand well clear of them. A gap of 1e-6 of the radius is accepted
// and computed exactly. Indices count from 0; sketch units.

/** A gap narrower than this fraction of the radius counts as contact: 100 times the integrator's margins. */
export const CONTACT_FRACTION = 1e-7;

/** One broken rule involving a circle: shape indices are the file's shape numbers (from 0). */
export type CircleFinding =
  /** The circle crosses, touches, contains or lies inside shape `otherShape` (`edge`: the polygon edge, or -1 for a circle). */
  | { rule: 'circle-contact'; shape: number; otherShape: number; edge: number; at: [number, number] }
  /** A solid (circle or polygon) lies outside the enclosure (`at`: a point of it outside). */
  | { rule: 'circle-outside-enclosure'; shape: number; enclosure: number; at: [number, number] }
  /** More than one enclosure, counting circles. */
  | { rule: 'circle-several-enclosures'; shapes: number[] };

/**
 * Check circles (each with its file shape number) against each other and against the
 * polygons (likewise numbered): solids must lie strictly inside the enclosure with a
 * gap, and solids must keep a gap from each other; at most one enclosure in all.
 * Polygon-against-polygon rules are checked elsewhere (checkSketchGeometry).
 */
export function checkCircles(
  polygons: readonly { shape: number; polygon: PolygonInput }[],
  circles: readonly { shape: number; circle: CircleInput }[],
): CircleFinding[] {
  const out: CircleFinding[] = [];
  if (circles.length === 0) return out;
  const enclosures = [
    ...polygons.filter((p) => p.polygon.kind === 'enclosure').map((p) => p.shape),
    ...circles.filter((c) => c.circle.kind === 'enclosure').map((c) => c.shape),
  ].sort((a, b) => a - b);
  if (enclosures.length > 1) {
    out.push({ rule: 'circle-several-enclosures', shapes: enclosures });
    return out;
  }
  for (let a = 0; a < circles.length; a++) {
    const A = circles[a].circle;
    for (let b = a + 1; b < circles.length; b++) circlePair(circles[a], circles[b], out);
    for (const p of polygons) circleAndPolygon(circles[a].shape, A, p.shape, p.polygon, out);
  }
  return out;
}

function circlePair(
  a: { shape: number; circle: CircleInput },
  b: { shape: number; circle: CircleInput },
  out: CircleFinding[],
): void {
  const A = a.circle,
    B = b.circle;
  const d = Math.hypot(B.cx - A.cx, B.cy - A.cy);
  const margin = CONTACT_FRACTION * Math.max(A.radius, B.radius);
  if (A.kind === 'solid' && B.kind === 'solid') {
    if (d - A.radius - B.radius <= margin) out.push(contact(a.shape, b.shape, -1, A, B));
    return;
  }
  const [shell, tube, tubeShape, shellShape] =
    A.kind === 'enclosure' ? [A, B, b.shape, a.shape] : [B, A, a.shape, b.shape];
  if (d >= shell.radius + tube.radius) {
    out.push({ rule: 'circle-outside-enclosure', shape: tubeShape, enclosure: shellShape, at: [tube.cx, tube.cy] });
  } else if (shell.radius - d - tube.radius <= margin) {
    out.push(contact(tubeShape, shellShape, -1, tube, shell));
  }
}

/** Where circle A meets circle B first along their centre line (for markers). */
function contact(shape: number, other: number, edge: number, A: CircleInput, B: CircleInput): CircleFinding {
  const d = Math.hypot(B.cx - A.cx, B.cy - A.cy);
  const ux = d > 0 ? (B.cx - A.cx) / d : 1,
    uy = d > 0 ? (B.cy - A.cy) / d : 0;
  return { rule: 'circle-contact', shape, otherShape: other, edge, at: [A.cx + A.radius * ux, A.cy + A.radius * uy] };
}

function circleAndPolygon(
  shape: number,
  C: CircleInput,
  polyShape: number,
  P: PolygonInput,
  out: CircleFinding[],
): void {
  const pts = P.points,
    n = pts.length >> 1;
  const margin = CONTACT_FRACTION * C.radius;
  if (C.kind === 'enclosure') {
    // A solid polygon inside a shell: every corner strictly inside with a gap (the disc is convex).
    for (let k = 0; k < n; k++) {
      const d = Math.hypot(pts[2 * k] - C.cx, pts[2 * k + 1] - C.cy);
      if (d < C.radius - margin) continue;
      const at: [number, number] = [pts[2 * k], pts[2 * k + 1]];
      if (d > C.radius) out.push({ rule: 'circle-outside-enclosure', shape: polyShape, enclosure: shape, at });
      else out.push({ rule: 'circle-contact', shape: polyShape, otherShape: shape, edge: -1, at });
      return;
    }
    return;
  }
  // A solid circle: a gap from every edge, and the centre inside an enclosure polygon or outside a solid one.
  let nearest = Infinity,
    nearEdge = -1,
    nx = 0,
    ny = 0;
  for (let k = 0; k < n; k++) {
    const m = k + 1 === n ? 0 : k + 1;
    const [qx, qy] = closestOnSegment(C.cx, C.cy, pts[2 * k], pts[2 * k + 1], pts[2 * m], pts[2 * m + 1]);
    const d = Math.hypot(qx - C.cx, qy - C.cy);
    if (d < nearest) {
      nearest = d;
      nearEdge = k;
      nx = qx;
      ny = qy;
    }
  }
  const inside = pointInPolygon(C.cx, C.cy, pts);
  if (P.kind === 'enclosure' && !inside) {
    out.push({ rule: 'circle-outside-enclosure', shape, enclosure: polyShape, at: [C.cx, C.cy] });
    return;
  }
  if (nearest - C.radius <= margin || (P.kind === 'solid' && inside))
    out.push({ rule: 'circle-contact', shape, otherShape: polyShape, edge: nearEdge, at: [nx, ny] });
}

function closestOnSegment(px: number, py: number, ax: number, ay: number, bx: number, by: number): [number, number] {
  const t = closestFraction(px, py, ax, ay, bx, by);
  return [ax + t * (bx - ax), ay + t * (by - ay)];
}
