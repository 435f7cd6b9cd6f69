// The residual for one step of iterative refinement of the radiosity system
// J_i - w_i sum_j F_ij J_j = b_i (units of J: W/m^2), computed from the view
// factors themselves because the LU factors have overwritten the matrix.
//
// Numeric choice: each sum over j is compensated (Kahan), so its error is
// about one rounding of the sum instead of growing with the number of terms
// (~sqrt(n) roundings for n = 2000 in practice): refinement can only bring the
// residual down to the accuracy with which the residual is computed.

/**
 * out_i = sum_j F_ij J_j for every row i (units of J), each sum compensated;
 * F: n x n row-major. Returns out.
 */
export function rowProducts(F: ArrayLike<number>, J: Float64Array, out: Float64Array): Float64Array {
  const n = J.length;
  for (let i = 0; i < n; i++) {
    const ri = i * n;
    // Two interleaved compensated sums (even and odd j), so the dependent
    // additions of one overlap those of the other.
    let s0 = 0;
    let c0 = 0;
    let s1 = 0;
    let c1 = 0;
    let j = 0;
    for (; j + 1 < n; j += 2) {
      const y0 = F[ri + j] * J[j] - c0;
      const t0 = s0 + y0;
      c0 = t0 - s0 - y0;
      s0 = t0;
      const y1 = F[ri + j + 1] * J[j + 1] - c1;
      const t1 = s1 + y1;
      c1 = t1 - s1 - y1;
      s1 = t1;
    }
    if (j < n) {
      const y0 = F[ri + j] * J[j] - c0;
      const t0 = s0 + y0;
      c0 = t0 - s0 - y0;
      s0 = t0;
    }
    out[i] = s0 + s1 - (c0 + c1);
  }
  return out;
}

/**
 * r_i = b_i - (J_i - w_i sum_j F_ij J_j) for every row i, written to `out`
 * and returned. F: n x n row-major view factors (dimensionless); w: row
 * weights (dimensionless); J, b: radiosity and right-hand side (W/m^2).
 */
export function radiosityResidual(
  F: ArrayLike<number>,
  w: ArrayLike<number>,
  J: Float64Array,
  b: ArrayLike<number>,
  out: Float64Array,
): Float64Array {
  rowProducts(F, J, out);
  // These last few roundings are about one unit of J_i's last digit.
  for (let i = 0; i < J.length; i++) out[i] = b[i] - J[i] + w[i] * out[i];
  return out;
}
