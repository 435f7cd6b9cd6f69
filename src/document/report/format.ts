// Numbers in the report, formatted exactly as the command line prints them, so
// a reader can compare the report with `npm run cli -- factors/exchange FILE`.

/** Six significant digits, no trailing zeros (the exchange table's rule). */
export function sig6(x: number): string {
  if (x === 0) return '0';
  return String(Number(x.toPrecision(6)));
}

/** Six decimals, never -0.000000 (the factors table's rule for view factors). */
export function fixed6(x: number): string {
  const text = x.toFixed(6);
  return text === '-0.000000' ? '0.000000' : text;
}

/** A temperature in K with two decimals (the exchange table's rule). */
export function kelvin2(x: number): string {
  const text = x.toFixed(2);
  return text === '-0.00' ? '0.00' : text;
}

/** A residual: two significant digits in exponent form (the command line's rule). */
export function residual(x: number): string {
  return x.toExponential(1);
}

/** A length as the factors table prints it: up to eight significant digits. */
export function length8(x: number): string {
  return String(Number(x.toPrecision(8)));
}
