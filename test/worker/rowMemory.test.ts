// A worker's memory between jobs (src/worker/rowMemory.ts): kept rows are handed out
// once, answers are copied into a spare buffer of their length when the page has
// handed one back, and only the newest spare is kept.
import { describe, expect, it } from 'vitest';
import { buildEdges } from '../../src/core/edges';
import { EdgePairs } from '../../src/core/pairRows';
import { MAX_KEPT_PAIRS, RowMemory } from '../../src/worker/rowMemory';

const pairs = new EdgePairs(buildEdges([{ kind: 'enclosure', points: [0, 0, 1, 0, 1, 1, 0, 1] }]));

describe('row memory', () => {
  it('hands the kept rows out once, so a job that throws leaves none behind', () => {
    const m = new RowMemory();
    expect(m.take()).toBeNull();
    const kept = { pairs, rows: Int32Array.of(0), packed: new Float64Array(4) };
    expect(m.keep(kept)).toBe(true);
    expect(m.take()).toBe(kept);
    expect(m.take()).toBeNull();
  });

  it('does not keep rows past the size limit', () => {
    const m = new RowMemory();
    const huge = { pairs, rows: Int32Array.of(0), packed: new Float64Array(MAX_KEPT_PAIRS + 1) };
    expect(m.keep(huge)).toBe(false);
    expect(m.take()).toBeNull();
  });

  it('copies into a handed-back buffer of the same length, else into a fresh one', () => {
    const m = new RowMemory();
    const from = Float64Array.of(1, 2, 3);
    const spare = new Float64Array(3);
    const other = new Float64Array(5);
    m.recycle([other, spare]);
    const first = m.copy(from);
    expect(first).toBe(spare);
    expect(Array.from(first)).toEqual([1, 2, 3]);
    // The spare is used once; the next copy of that length is fresh, and equal.
    const second = m.copy(from);
    expect(second).not.toBe(spare);
    expect(second).not.toBe(from);
    expect(Array.from(second)).toEqual([1, 2, 3]);
  });

  it('keeps only the newest spare and ignores empty (detached) buffers', () => {
    const m = new RowMemory();
    const [a, b] = [new Float64Array(2), new Float64Array(2)];
    m.recycle([a, new Float64Array(0)]);
    m.recycle([b]);
    const from = Float64Array.of(7, 8);
    const got = [m.copy(from), m.copy(from)];
    expect(got[0]).toBe(b);
    expect([a, b]).not.toContain(got[1]);
    expect(Array.from(got[1])).toEqual([7, 8]);
  });
});
