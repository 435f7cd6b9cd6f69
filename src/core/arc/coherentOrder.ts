import { sortIndexByKey as sortIndexByKeyIn } from '../scratch';

// Module-local copy of a hot import (see pieceView.ts).
const sortIndexByKey = sortIndexByKeyIn;

// The order of a piece's bounding directions, started from the last piece's. From one
// piece of an emitter to the next the directions' order changes only where p crossed
// an alignment (two objects swap) or an object came into or left the front, so an
// insertion sort from the last order does little work, where a sort from scratch did
// m log m (a wall seeing a wall past a bank of tubes: 136 directions on each of 270
// pieces). The order is by (key, index), a total order, so the result is the one a
// sort from scratch gives, bit for bit, whatever it starts from.

/** Moves per direction past which the insertion sort gives up and sorts from scratch. */
const MOVES_PER_ITEM = 8;
/** Fewer directions than this are best sorted afresh (an insertion sort there already). */
export const SORT_FROM_LAST = 24;

export class CoherentOrder {
  /** Object ids in the last piece's sorted order. */
  private last = new Int32Array(64);
  private lastCount = 0;
  /** Object id -> index of this piece's direction (-1: none), cleared after each use. */
  private slot = new Int32Array(64).fill(-1);

  /** Forget the last order (a new pair). */
  reset(): void {
    this.lastCount = 0;
  }

  /**
   * Sort `order[0..m)` to index the m directions by (key, index) ascending; `id[k]` is
   * direction k's object id (unique, at most `maxId`).
   */
  sort(order: Int32Array, key: Float64Array, id: Int32Array, m: number, maxId: number): void {
    if (this.slot.length <= maxId) {
      this.slot = new Int32Array(2 * (maxId + 1)).fill(-1);
    }
    const slot = this.slot,
      last = this.last;
    for (let k = 0; k < m; k++) slot[id[k]] = k;
    // Start from the last order: directions seen then, in that order, then the new ones.
    let n = 0;
    for (let q = 0; q < this.lastCount; q++) {
      const o = last[q]; // an id of this pair's objects, so at most maxId
      const k = slot[o];
      if (k >= 0) {
        order[n++] = k;
        slot[o] = -1;
      }
    }
    for (let k = 0; k < m; k++) {
      if (slot[id[k]] === k) {
        order[n++] = k;
        slot[id[k]] = -1;
      }
    }
    // Insertion sort by (key, index).
    let moves = 0;
    const limit = MOVES_PER_ITEM * m + 16;
    for (let q = 1; q < m && moves <= limit; q++) {
      const v = order[q],
        kv = key[v];
      let p = q - 1;
      while (p >= 0) {
        const w = order[p];
        if (key[w] > kv || (key[w] === kv && w > v)) {
          order[p + 1] = w;
          p--;
          moves++;
        } else break;
      }
      order[p + 1] = v;
    }
    if (moves > limit) sortIndexByKey(order, key, m);
    if (this.last.length < m) this.last = new Int32Array(2 * m);
    for (let q = 0; q < m; q++) this.last[q] = id[order[q]];
    this.lastCount = m;
  }
}
