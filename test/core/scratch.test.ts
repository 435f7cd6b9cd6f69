import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { ExactValueSet, sortIndexByKey, sortPrefix, sortOrderByKey } from '../../src/core/scratch';
import { distanceChange } from '../../src/core/pairGeometry';

describe('pair-integral helpers', () => {
  it('sortPrefix sorts the prefix like Array.prototype.sort and leaves the rest', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true }), { maxLength: 80 }), fc.nat(80), (values, cut) => {
        const n = Math.min(cut, values.length);
        const a = Float64Array.from(values);
        sortPrefix(a, n);
        expect(Array.from(a.subarray(0, n))).toEqual(values.slice(0, n).sort((x, y) => x - y));
        expect(Array.from(a.subarray(n))).toEqual(values.slice(n));
      }),
    );
  });

  it('sortOrderByKey orders indices by their keys', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true }), { maxLength: 30 }), (keys) => {
        const key = Float64Array.from(keys);
        const order = Int32Array.from(keys.map((_, k) => k));
        sortOrderByKey(order, key, keys.length);
        for (let k = 1; k < keys.length; k++) expect(key[order[k - 1]]).toBeLessThanOrEqual(key[order[k]]);
      }),
    );
  });

  it('sortIndexByKey gives the order of a stable sort by key, ties included, short lists and long', () => {
    // Keys drawn from a few values, so most lists hold ties; lengths on both sides of the switch to heap sort.
    const keys = fc.array(fc.constantFrom(-1.5, 0, 0.25, 2, 1e-300, -0), { maxLength: 120 });
    fc.assert(
      fc.property(keys, (values) => {
        const key = Float64Array.from(values);
        const order = new Int32Array(values.length + 3).fill(99); // longer than needed: only the prefix is set
        sortIndexByKey(order, key, values.length);
        const stable = values.map((_, k) => k).sort((a, b) => key[a] - key[b]); // Array.prototype.sort is stable (ES2019)
        expect(Array.from(order.subarray(0, values.length))).toEqual(stable);
        expect(Array.from(order.subarray(values.length))).toEqual([99, 99, 99]);
      }),
      { numRuns: 300, seed: 42 },
    );
  });

  it('ExactValueSet answers like a Set of numbers over adds, lookups and clears, through growth', () => {
    // Few distinct values (so repeats), -0 beside 0, and runs long enough to grow the table several times.
    const value = fc.oneof(fc.constantFrom(0, -0, 1, 0.1 + 0.2, 0.3, 1e-300), fc.double({ noNaN: true }));
    const op = fc.tuple(fc.constantFrom('add', 'has', 'clear'), value);
    fc.assert(
      fc.property(fc.array(op, { maxLength: 600 }), (ops) => {
        const mine = new ExactValueSet();
        const ref = new Set<number>();
        for (const [kind, v] of ops) {
          if (kind === 'add') {
            mine.add(v);
            ref.add(v);
          } else if (kind === 'clear') {
            mine.clear();
            ref.clear();
          }
          expect(mine.has(v)).toBe(ref.has(v));
        }
        for (const v of ref) expect(mine.has(v)).toBe(true);
      }),
      { numRuns: 200, seed: 7 },
    );
  });

  it('distanceChange equals |v - pb| - |v - pa| and keeps its digits for a tiny step', () => {
    // Plain difference for a large step: both forms agree to rounding.
    const plain = Math.hypot(3 - 1, 4 - 0) - Math.hypot(3 - 0, 4 - 0);
    expect(distanceChange(3, 4, 0, 0, 1, 0, 1, 0)).toBeCloseTo(plain, 14);
    // A step of 1e-12 along x from the origin towards v = (3, 4): the change is -0.6e-12
    // (the derivative of |v - p| is -(v - p)/|v - p| . d), exact to first order.
    const tiny = distanceChange(3, 4, 0, 0, 1e-12, 0, 1e-12, 0);
    expect(Math.abs(tiny / -0.6e-12 - 1)).toBeLessThan(1e-11);
  });
});
