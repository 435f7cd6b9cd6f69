/** A view factor (or any number) with a fixed number of decimals; rounding noise below the last digit shows as 0, not -0. */
export function fmtFactor(f: number, digits: number): string {
  const s = f.toFixed(digits);
  return Number(s) === 0 ? (0).toFixed(digits) : s;
}

/** A residual: zero as 0, else two significant digits in exponent form. */
export function fmtResidual(r: number): string {
  return r === 0 ? '0' : r.toExponential(1);
}

export function fmtLength(v: number): string {
  return String(Number(v.toPrecision(5)));
}
