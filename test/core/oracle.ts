// An independent reference for view factors, sharing no code with src/core:
// the point-to-edge factor from p is 1/2 of the integral of cos(b) db over the
// directions whose first hit is that edge (Siegel and Howell, Thermal Radiation
// Heat Transfer, point-to-strip form of the 2D kernel), found by ray casting:
// between consecutive directions to the sketch's corners the first edge hit
// cannot change, so one ray per angular gap decides it. The point factor is then
// integrated along the emitting edge by adaptive Gauss-Kronrod (7/15) quadrature.
import { crossingsAlong, lineThrough, linesThroughPairs, type Line } from './arc/oracleCuts';
import { integrateVector } from './quadrature';

export interface Seg {
  ax: number;
  ay: number;
  bx: number;
  by: number;
} // radiating side on the left of a -> b

/** Oriented segments of polygons, enclosures anticlockwise and solids clockwise. */
export function orientedSegments(polys: { kind: 'enclosure' | 'solid'; points: number[][] }[]): Seg[] {
  const out: Seg[] = [];
  for (const poly of polys) {
    const p = poly.points;
    let area = 0;
    for (let k = 0; k < p.length; k++) {
      const q = p[(k + 1) % p.length];
      area += p[k][0] * q[1] - q[0] * p[k][1];
    }
    const flip = poly.kind === 'enclosure' ? area < 0 : area > 0;
    for (let k = 0; k < p.length; k++) {
      const a = p[k],
        b = p[(k + 1) % p.length];
      out.push(flip ? { ax: b[0], ay: b[1], bx: a[0], by: a[1] } : { ax: a[0], ay: a[1], bx: b[0], by: b[1] });
    }
  }
  return out;
}

/** Distance along the ray p + t d to segment s, or Infinity. */
function hit(px: number, py: number, dx: number, dy: number, s: Seg): number {
  const ex = s.bx - s.ax,
    ey = s.by - s.ay;
  const den = dx * ey - dy * ex;
  if (den === 0) return Infinity;
  const wx = s.ax - px,
    wy = s.ay - py;
  const t = (wx * ey - wy * ex) / den;
  const u = (wx * dy - wy * dx) / den;
  return t > 1e-12 && u >= 0 && u <= 1 ? t : Infinity;
}

/** Fraction of diffuse emission from point p on segment `from` that first hits each segment. */
export function pointFactors(segs: Seg[], from: number, px: number, py: number, out: Float64Array): void {
  out.fill(0);
  const s = segs[from];
  const L = Math.hypot(s.bx - s.ax, s.by - s.ay);
  const tx = (s.bx - s.ax) / L,
    ty = (s.by - s.ay) / L;
  const nx = -ty,
    ny = tx;
  // Angles from the normal, in (-pi/2, pi/2), of every corner in front of p.
  const angles: number[] = [-Math.PI / 2, Math.PI / 2];
  for (const q of segs) {
    for (const [x, y] of [
      [q.ax, q.ay],
      [q.bx, q.by],
    ]) {
      const vx = x - px,
        vy = y - py;
      const c = vx * nx + vy * ny,
        sn = vx * tx + vy * ty;
      if (c > 0) angles.push(Math.atan2(sn, c));
    }
  }
  angles.sort((a, b) => a - b);
  for (let k = 0; k + 1 < angles.length; k++) {
    const b0 = angles[k],
      b1 = angles[k + 1];
    if (b1 - b0 < 1e-15) continue;
    const bm = 0.5 * (b0 + b1);
    const dx = Math.cos(bm) * nx + Math.sin(bm) * tx,
      dy = Math.cos(bm) * ny + Math.sin(bm) * ty;
    let best = Infinity,
      who = -1;
    for (let e = 0; e < segs.length; e++) {
      if (e === from) continue;
      const t = hit(px, py, dx, dy, segs[e]);
      if (t < best) {
        best = t;
        who = e;
      }
    }
    if (who < 0) continue; // escapes to open surroundings
    const q = segs[who];
    // The ray must meet the radiating (left) side of the segment it hits.
    const side = (q.bx - q.ax) * (py - q.ay) - (q.by - q.ay) * (px - q.ax);
    if (side > 0) out[who] += 0.5 * (Math.sin(b1) - Math.sin(b0));
  }
}

/**
 * Row i of the edge view-factor matrix by adaptive quadrature along edge i,
 * to an absolute error near `tol` per entry.
 */
export function oracleRow(segs: Seg[], i: number, tol = 1e-11): Float64Array {
  const s = segs[i];
  return integrateVector(
    segs.length,
    (u, out) => pointFactors(segs, i, s.ax + u * (s.bx - s.ax), s.ay + u * (s.by - s.ay), out),
    tol,
    eventCuts(segs, i),
  );
}

/** Up to this many edges, the quadrature is also cut where edge i lines up two corners (see eventCuts). */
const ALL_EVENTS_MAX_EDGES = 80;

/**
 * Fractions in (0, 1) along edge i, ascending, where the integrand can kink or jump:
 * where edge i crosses the line of another edge (that edge faces only one side of the
 * line, so its column starts or stops there) and, in sketches of up to
 * ALL_EVENTS_MAX_EDGES edges, where it lines up any two corners (the first edge hit in
 * some direction changes there). Without these cuts a part that sees an edge can be
 * thinner than the gap between quadrature nodes (a grazing view at an edge's end), or
 * a kink can fool the error estimate: in seeded random sketches the reference was off
 * by up to 8e-8. Above that size the pairs of corners would cost more than a test
 * can spend, and only the line crossings are cut: the reference was then off by more
 * than 1e-9 in about 1% of the rows of seeded random sketches (checked against the full
 * cuts), so a failing row of a large sketch should first be checked with the full cuts.
 */
function eventCuts(segs: Seg[], i: number): number[] {
  if (segs.length <= ALL_EVENTS_MAX_EDGES) {
    const corners = segs.flatMap((o): [number, number][] => [
      [o.ax, o.ay],
      [o.bx, o.by],
    ]);
    return crossingsAlong(segs[i], linesThroughPairs(corners));
  }
  const lines: Line[] = [];
  segs.forEach((o, k) => {
    const line = k === i ? null : lineThrough([o.ax, o.ay], [o.bx, o.by]);
    if (line) lines.push(line);
  });
  return crossingsAlong(segs[i], lines);
}
