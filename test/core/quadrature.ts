// Adaptive 15-point Gauss-Kronrod quadrature of a vector-valued integrand over
// [0, 1], shared by the test references (oracle.ts, arc/circleOracle.ts). It is
// test code only: the references share nothing with the core.

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

/** Most intervals one integral may evaluate (a converged row of the references takes up to about 1e4). */
const MAX_INTERVALS = 200_000;

/**
 * The integral over [0, 1] of f (n values at once), splitting an interval while
 * the Kronrod and Gauss estimates differ by more than `tol` per unit length in any
 * entry (at most 40 halvings). `starts` are the first interval ends inside (0, 1).
 */
export function integrateVector(
  n: number,
  f: (u: number, out: Float64Array) => void,
  tol: number,
  starts: readonly number[] = [],
): Float64Array {
  const pf = new Float64Array(n);
  const kron = new Float64Array(n),
    gauss = new Float64Array(n);
  const total = new Float64Array(n);
  const edges = [0, ...starts, 1];
  const stack: [number, number, number][] = [];
  for (let k = 0; k + 1 < edges.length; k++) stack.push([edges[k], edges[k + 1], 0]);
  let intervals = 0;
  while (stack.length) {
    // Rounding noise in a point factor (points lined up to 1e-12) can keep the error
    // estimate from ever passing: say so rather than run for hours.
    if (++intervals > MAX_INTERVALS) throw new Error(`quadrature: no convergence in ${MAX_INTERVALS} intervals`);
    const [u0, u1, depth] = stack.pop()!;
    kron.fill(0);
    gauss.fill(0);
    const c = 0.5 * (u0 + u1),
      h = 0.5 * (u1 - u0);
    for (let k = 0; k < 15; k++) {
      const idx = k < 8 ? k : 14 - k;
      const x = k < 8 ? -XK[idx] : XK[idx];
      f(c + h * x, pf);
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
