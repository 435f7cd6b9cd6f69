// A piece's directions are sorted starting from the last piece's order (arc/coherentOrder.ts).
// Whatever it starts from, the result must be the order a sort from scratch gives: by
// key, equal keys by index. Checked here against Array.prototype.sort with that
// comparator, over sequences of pieces whose keys drift, swap, tie exactly, and whose
// objects come and go, and over scrambled keys where the insertion sort gives up.
import { describe, expect, it } from 'vitest';
import { CoherentOrder } from '../../../src/core/arc/coherentOrder';
import { seeded } from '../seeded';

function reference(key: Float64Array, m: number): number[] {
  return Array.from({ length: m }, (_, k) => k).sort((a, b) => key[a] - key[b] || a - b);
}

describe('directions sorted from the last order', () => {
  it('gives the order of a sort from scratch, piece after piece', () => {
    const rand = seeded(909);
    let pieces = 0;
    for (let pair = 0; pair < 30; pair++) {
      const sorter = new CoherentOrder();
      const objects = 30 + Math.floor(rand() * 150);
      const value = Float64Array.from({ length: objects }, () => rand() * 10 - 5);
      for (let piece = 0; piece < 20; piece++) {
        // Drift, a few swaps, exact ties, objects leaving and coming back.
        for (let o = 0; o < objects; o++) value[o] += (rand() - 0.5) * 0.01;
        for (let s = 0; s < 3; s++) {
          const a = Math.floor(rand() * objects),
            b = Math.floor(rand() * objects);
          [value[a], value[b]] = [value[b], value[a]];
        }
        value[Math.floor(rand() * objects)] = value[Math.floor(rand() * objects)];
        const id: number[] = [];
        for (let o = 0; o < objects; o++) if (rand() < 0.9) id.push(o);
        // Pushed in a shuffled order, as objects are found in loops, not by angle.
        for (let k = id.length - 1; k > 0; k--) {
          const j = Math.floor(rand() * (k + 1));
          [id[k], id[j]] = [id[j], id[k]];
        }
        const m = id.length;
        const key = Float64Array.from(id, (o) => value[o]);
        const order = new Int32Array(m);
        sorter.sort(order, key, Int32Array.from(id), m, objects);
        expect(Array.from(order)).toEqual(reference(key, m));
        pieces++;
      }
    }
    expect(pieces).toBe(600);
  });

  it('scrambled keys (the insertion sort gives up) still come out sorted', () => {
    const rand = seeded(5);
    const sorter = new CoherentOrder();
    const m = 200;
    const id = Int32Array.from({ length: m }, (_, k) => k);
    for (let piece = 0; piece < 5; piece++) {
      const key = Float64Array.from({ length: m }, () => Math.floor(rand() * 50)); // many ties
      const order = new Int32Array(m);
      sorter.sort(order, key, id, m, m);
      expect(Array.from(order)).toEqual(reference(key, m));
    }
  });
});
