// Evenly spaced values of a varied quantity, both ends included.

/**
 * `count` values from `from` to `to` (any units, those of the quantity varied),
 * evenly spaced, the first exactly `from` and the last exactly `to`. `count` is
 * an integer >= 2 (a single value is `[from]` when from equals to and count is 1).
 * Values are from + (to - from) k / (count - 1), so each is one rounding from exact.
 */
export function evenlySpaced(from: number, to: number, count: number): number[] {
  if (count === 1) return [from];
  const values: number[] = [];
  for (let k = 0; k < count; k++) values.push(k === count - 1 ? to : from + ((to - from) * k) / (count - 1));
  return values;
}
