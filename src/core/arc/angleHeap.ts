// A min-heap of slots keyed by an angle that changes (radians): the line sweep keeps
// one slot per pair of neighbours in its order, keyed by when they swap next.

export class AngleHeap {
  /** Key of each slot (radians; Infinity: never). */
  key = new Float64Array(64);
  private heap = new Int32Array(64);
  private where = new Int32Array(64);
  size = 0;

  /** Hold slots 0 .. n-1 with the keys already written to `key`. */
  fill(n: number): void {
    this.grow(n);
    for (let k = 0; k < n; k++) {
      this.heap[k] = k;
      this.where[k] = k;
    }
    this.size = n;
    for (let h = (n >> 1) - 1; h >= 0; h--) this.down(h);
  }

  /** The slot with the smallest key (size > 0). */
  top(): number {
    return this.heap[0];
  }

  /** Set slot k's key to t. */
  set(k: number, t: number): void {
    const old = this.key[k];
    this.key[k] = t;
    if (t < old) this.up(this.where[k]);
    else if (t > old) this.down(this.where[k]);
  }

  /** Room for n slots; keys are kept. */
  grow(n: number): void {
    if (this.heap.length >= n) return;
    const key = new Float64Array(2 * n);
    key.set(this.key);
    this.key = key;
    this.heap = new Int32Array(2 * n);
    this.where = new Int32Array(2 * n);
  }

  private up(h: number): void {
    const heap = this.heap,
      key = this.key,
      where = this.where;
    const k = heap[h],
      t = key[k];
    while (h > 0) {
      const p = (h - 1) >> 1;
      if (key[heap[p]] <= t) break;
      heap[h] = heap[p];
      where[heap[h]] = h;
      h = p;
    }
    heap[h] = k;
    where[k] = h;
  }

  private down(h: number): void {
    const heap = this.heap,
      key = this.key,
      where = this.where,
      size = this.size;
    const k = heap[h],
      t = key[k];
    for (;;) {
      let c = 2 * h + 1;
      if (c >= size) break;
      if (c + 1 < size && key[heap[c + 1]] < key[heap[c]]) c++;
      if (key[heap[c]] >= t) break;
      heap[h] = heap[c];
      where[heap[h]] = h;
      h = c;
    }
    heap[h] = k;
    where[k] = h;
  }
}
