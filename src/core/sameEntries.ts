// One test of equal arrays for every layer: kept results are taken again only when
// their inputs are the same numbers (compared by value, never by identity alone).

/** Are `a` and `b` equal entry by entry (numbers exactly, so NaN never equals NaN)? */
export function sameEntries<T>(a: ArrayLike<T>, b: ArrayLike<T>): boolean {
  if (a.length !== b.length) return false;
  for (let k = 0; k < a.length; k++) if (a[k] !== b[k]) return false;
  return true;
}
