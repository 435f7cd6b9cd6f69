// Typed-array helpers of the pair integral: in-place sorts and searches that
// allocate nothing (the hot loop runs them once per edge pair).

/** First walk position m in [0, n) whose angle A[first+m] <= value (angles fall with m); n if none. */
export function firstAtOrBelow(A: Float64Array, first: number, n: number, value: number): number {
  let lo = 0,
    hi = n;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (A[first + mid] <= value) hi = mid;
    else lo = mid + 1;
  }
  return lo;
}

/** Sort ranges [lo[k], hi[k]], k < n, by their start, in place (the lists are short). */
export function sortRanges(lo: Int32Array, hi: Int32Array, n: number): void {
  for (let k = 1; k < n; k++) {
    const a = lo[k],
      b = hi[k];
    let m = k - 1;
    while (m >= 0 && lo[m] > a) {
      lo[m + 1] = lo[m];
      hi[m + 1] = hi[m];
      m--;
    }
    lo[m + 1] = a;
    hi[m + 1] = b;
  }
}

/** A typed array of twice the length holding a's values (scratch buffers grow rarely, never per pair). */
export function grow(a: Float64Array<ArrayBuffer>): Float64Array<ArrayBuffer> {
  const b = new Float64Array(a.length * 2);
  b.set(a);
  return b;
}

/** An Int32Array of twice the length holding a's values (as `grow`). */
export function growInt(a: Int32Array<ArrayBuffer>): Int32Array<ArrayBuffer> {
  const b = new Int32Array(a.length * 2);
  b.set(a);
  return b;
}

/** In-place ascending sort of a[0..n) (insertion sort for short runs, else heap sort). */
export function sortPrefix(a: Float64Array, n: number): void {
  if (n < 24) {
    for (let k = 1; k < n; k++) {
      const v = a[k];
      let m = k - 1;
      while (m >= 0 && a[m] > v) {
        a[m + 1] = a[m];
        m--;
      }
      a[m + 1] = v;
    }
    return;
  }
  for (let k = (n >> 1) - 1; k >= 0; k--) siftDown(a, k, n);
  for (let end = n - 1; end > 0; end--) {
    const t = a[0];
    a[0] = a[end];
    a[end] = t;
    siftDown(a, 0, end);
  }
}

function siftDown(a: Float64Array, start: number, n: number): void {
  let root = start;
  for (;;) {
    let child = 2 * root + 1;
    if (child >= n) return;
    if (child + 1 < n && a[child + 1] > a[child]) child++;
    if (a[root] >= a[child]) return;
    const t = a[root];
    a[root] = a[child];
    a[child] = t;
    root = child;
  }
}

/** Sort the indices order[0..n) by key[order[k]], ascending, in place (insertion sort: n is the number of chains). */
export function sortOrderByKey(order: Int32Array, key: Float64Array, n: number): void {
  for (let k = 1; k < n; k++) {
    const o = order[k];
    const v = key[o];
    let m = k - 1;
    while (m >= 0 && key[order[m]] > v) {
      order[m + 1] = order[m];
      m--;
    }
    order[m + 1] = o;
  }
}

/**
 * Sort order[0..n) = 0..n-1 (set here) by key[order[k]] ascending, equal keys by
 * index: the order a stable sort gives, without a comparator call per step.
 * Insertion sort for short lists, heap sort on (key, index) above that.
 */
export function sortIndexByKey(order: Int32Array, key: Float64Array, n: number): void {
  for (let k = 0; k < n; k++) order[k] = k;
  if (n < 24) {
    sortOrderByKey(order, key, n);
    return;
  }
  for (let k = (n >> 1) - 1; k >= 0; k--) siftIndexDown(order, key, k, n);
  for (let end = n - 1; end > 0; end--) {
    const t = order[0];
    order[0] = order[end];
    order[end] = t;
    siftIndexDown(order, key, 0, end);
  }
}

/** True when index a sorts after index b: larger key, or the same key and a larger index. */
function after(key: Float64Array, a: number, b: number): boolean {
  return key[a] > key[b] || (key[a] === key[b] && a > b);
}

function siftIndexDown(order: Int32Array, key: Float64Array, root: number, n: number): void {
  let r = root;
  for (;;) {
    let child = 2 * r + 1;
    if (child >= n) return;
    if (child + 1 < n && after(key, order[child + 1], order[child])) child++;
    if (!after(key, order[child], order[r])) return;
    const t = order[r];
    order[r] = order[child];
    order[child] = t;
    r = child;
  }
}

// One double and its two 32-bit halves: the bits a value is hashed by.
const hashValue = new Float64Array(1);
const hashBits = new Uint32Array(hashValue.buffer);

/**
 * A set of numbers compared exactly (===), kept in typed arrays: unlike a Set of
 * numbers it boxes nothing on the heap. Open addressing, grown at half full; -0 is
 * stored as 0 (they are ===). Not for NaN.
 */
export class ExactValueSet {
  private keys = new Float64Array(64);
  private used = new Uint8Array(64);
  private size = 0;

  clear(): void {
    if (this.size > 0) this.used.fill(0);
    this.size = 0;
  }

  has(v: number): boolean {
    const mask = this.keys.length - 1;
    for (let h = slotOf(v, mask); this.used[h]; h = (h + 1) & mask) if (this.keys[h] === v) return true;
    return false;
  }

  add(v: number): void {
    if (2 * (this.size + 1) > this.keys.length) this.grow();
    const mask = this.keys.length - 1;
    let h = slotOf(v, mask);
    for (; this.used[h]; h = (h + 1) & mask) if (this.keys[h] === v) return;
    this.keys[h] = v === 0 ? 0 : v;
    this.used[h] = 1;
    this.size++;
  }

  private grow(): void {
    const keys = this.keys,
      used = this.used;
    this.keys = new Float64Array(2 * keys.length);
    this.used = new Uint8Array(2 * keys.length);
    this.size = 0;
    for (let k = 0; k < keys.length; k++) if (used[k]) this.add(keys[k]);
  }
}

/** Slot of v in a table of mask + 1 entries (a power of two). */
function slotOf(v: number, mask: number): number {
  hashValue[0] = v === 0 ? 0 : v;
  return (Math.imul(hashBits[0] ^ Math.imul(hashBits[1], 0x9e3779b1), 0x85ebca6b) >>> 16) & mask;
}
