// An independent reference for view factors, sharing no code with src/core:
// the point-to-edge factor from p is 1/2 of the integral of cos(b) db over the
// directions whose first hit is that edge (Siegel and Howell, Thermal Radiation
// Heat Transfer, point-to-strip form of the 2D kernel), found by ray casting:
// between consecutive directions to the sketch's corners the first edge hit
// cannot change, so one ray per angular gap decides it. The point factor is then
// integrated along the emitting edge by adaptive Gauss-Kronrod (7/15) quadrature.

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

// Kronrod 15-point nodes and weights with the embedded 7-point Gauss weights (common practice;
// Piessens et al., QUADPACK, 1983, routine QK15, from memory).
const XK = [
  0.991455371120813, 0.949107912342759, 0.864864423359769, 0.741531185599394, 0.586087235467691, 0.405845151377397,
  0.207784955007898, 0,
];
const WK = [
  0.022935322010529, 0.063092092629979, 0.10479001032225, 0.140653259715525, 0.169004726639267, 0.190350578064785,
  0.204432940075298, 0.209482141084728,
];
const WG = [0.12948496616887, 0.279705391489277, 0.381830050505119, 0.417959183673469]; // at XK[1], XK[3], XK[5], XK[7]

/**
 * Row i of the edge view-factor matrix by adaptive quadrature along edge i,
 * to an absolute error near `tol` per entry.
 */
export function oracleRow(segs: Seg[], i: number, tol = 1e-11): Float64Array {
  const s = segs[i];
  const n = segs.length;
  const pf = new Float64Array(n);
  const kron = new Float64Array(n),
    gauss = new Float64Array(n);
  const total = new Float64Array(n);
  const stack: [number, number, number][] = [[0, 1, 0]];
  while (stack.length) {
    const [u0, u1, depth] = stack.pop()!;
    kron.fill(0);
    gauss.fill(0);
    const c = 0.5 * (u0 + u1),
      h = 0.5 * (u1 - u0);
    for (let k = 0; k < 15; k++) {
      const idx = k < 8 ? k : 14 - k;
      const x = k < 8 ? -XK[idx] : XK[idx];
      const u = c + h * x;
      pointFactors(segs, i, s.ax + u * (s.bx - s.ax), s.ay + u * (s.by - s.ay), pf);
      const wk = WK[idx] * h;
      const g = idx % 2 === 1 ? WG[(idx - 1) / 2] * h : 0;
      for (let e = 0; e < n; e++) {
        kron[e] += wk * pf[e];
        gauss[e] += g * pf[e];
      }
    }
    let err = 0;
    for (let e = 0; e < n; e++) err = Math.max(err, Math.abs(kron[e] - gauss[e]));
    if (err > tol * (u1 - u0) && depth < 40) {
      stack.push([u0, c, depth + 1], [c, u1, depth + 1]);
    } else {
      for (let e = 0; e < n; e++) total[e] += kron[e];
    }
  }
  return total;
}
