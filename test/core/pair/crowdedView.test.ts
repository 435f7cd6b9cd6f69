import { describe, expect, it } from 'vitest';
import { intersectRanges, WalkRanges } from '../../../src/core/pair/convexWindows';
import { oracleRow, orientedSegments } from '../oracle';
import { perEdge, type Poly } from '../helpers';

// Views crowded with obstructions: more chains, fixed points, visible gaps and clipped
// pieces in one view region than the integrator's scratch buffers start with, so every
// buffer has to grow during the pair. Checked against the ray-cast quadrature reference
// in ../oracle.ts (shares no code with src/core; converged to about 1e-11 per entry, so
// 1e-9 leaves room for its error) and against the enclosure rule (rows of a closed
// sketch sum to one; Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed.,
// sec. 13.1), summed here.
const TOL = 1e-9;

const square = (x: number, y: number, s: number): number[][] => [
  [x, y],
  [x + s, y],
  [x + s, y + s],
  [x, y + s],
];
const ell = (x: number, y: number, s: number): number[][] => [
  [x, y],
  [x + s, y],
  [x + s, y + s / 3],
  [x + s / 3, y + s / 3],
  [x + s / 3, y + s],
  [x, y + s],
];
const tube = (cx: number, cy: number, r: number, sides: number): number[][] =>
  Array.from({ length: sides }, (_, k) => [
    cx + r * Math.cos((2 * Math.PI * k) / sides + 0.1),
    cy + r * Math.sin((2 * Math.PI * k) / sides + 0.1),
  ]);

/**
 * A duct 8 x 3 holding three staggered rows of small squares and L-shaped bars (convex
 * bodies wholly inside a view, and non-convex ones whose edges become chains), two
 * many-sided tubes (clipped through angular windows) and a comb of teeth rising from
 * the floor (re-entrant wall pockets). The floor edge SPOT (0.1 long, mid-floor) sees the
 * flat roof past every body at once.
 */
function crowdedDuct(): Poly[] {
  const comb: number[][] = [];
  for (let k = 0; k < 6; k++) {
    const x = 0.2 + 0.5 * k;
    comb.push([x, 0], [x + 0.05, 0.3], [x + 0.15, 0.3], [x + 0.2, 0]);
  }
  const polys: Poly[] = [
    { kind: 'enclosure', points: [[0, 0], ...comb, [3.95, 0], [4.05, 0], [8, 0], [8, 3], [0, 3]] },
  ];
  for (let c = 0; c < 14; c++) {
    const x = 2.2 + 0.26 * c;
    polys.push({ kind: 'solid', points: square(x, 0.7 + 0.08 * (c % 3), 0.12) });
    polys.push({ kind: 'solid', points: ell(x + 0.2, 1.45 + 0.06 * (c % 4), 0.14) });
    polys.push({ kind: 'solid', points: square(x + 0.1, 2.1 - 0.05 * (c % 2), 0.1) });
  }
  polys.push({ kind: 'solid', points: tube(3.2, 1.15, 0.15, 40) }, { kind: 'solid', points: tube(6.1, 1.6, 0.16, 36) });
  return polys;
}
/** Edge id of SPOT, the floor edge from (3.95, 0) to (4.05, 0): after the corner and the comb's 24 points. */
const SPOT = 1 + 24;
/** Edge id of the roof, from (8, 3) to (0, 3). */
const ROOF = SPOT + 3;

const rowSums = (F: Float64Array, n: number, rows: number[]) =>
  rows.map((i) => {
    let s = 0;
    for (let j = 0; j < n; j++) s += F[i * n + j];
    return s;
  });

describe('crowded views (every scratch buffer grows within one pair)', () => {
  const polys = crowdedDuct();
  const segs = orientedSegments(polys);
  const n = segs.length;
  const r = perEdge(polys);

  it('the scene really is crowded: the view from SPOT to the roof holds more bodies than the buffers start with', () => {
    // The view region of SPOT and the roof: the quadrilateral (3.95, 0) (4.05, 0) (8, 3) (0, 3).
    const H = [
      [3.95, 0],
      [4.05, 0],
      [8, 3],
      [0, 3],
    ];
    const inside = ([x, y]: number[]) =>
      H.every(([ax, ay], k) => {
        const [bx, by] = H[(k + 1) % 4];
        return (bx - ax) * (y - ay) - (by - ay) * (x - ax) > 0;
      });
    const whole = polys.slice(1).filter((p) => p.points.every(inside));
    expect(whole.length).toBeGreaterThan(32); // chains start with room for 32, kept pieces and fixed points for 64
    expect(whole.reduce((s, p) => s + p.points.length, 0)).toBeGreaterThan(128);
    expect(segs[SPOT]).toEqual({ ax: 3.95, ay: 0, bx: 4.05, by: 0 });
    expect(segs[ROOF]).toEqual({ ax: 8, ay: 3, bx: 0, by: 3 });
    expect(r.F[SPOT * n + ROOF]).toBeGreaterThan(0.01); // SPOT sees the roof through the crowd
  });

  it('every row sums to one (closed duct), factors lie in [0, 1]', () => {
    const sums = rowSums(
      r.F,
      n,
      segs.map((_, k) => k),
    );
    for (let i = 0; i < n; i++) {
      expect(Math.abs(1 - sums[i]), `row ${i}`).toBeLessThan(TOL);
      for (let j = 0; j < n; j++) {
        expect(r.F[i * n + j]).toBeGreaterThanOrEqual(-1e-12);
        expect(r.F[i * n + j]).toBeLessThanOrEqual(1 + 1e-12);
      }
    }
  });

  it('the row of SPOT agrees with the ray-cast reference', () => {
    // SPOT looks up past every body at once.
    for (const i of [SPOT]) {
      const ref = oracleRow(segs, i);
      for (let j = 0; j < n; j++) {
        const got = r.F[i * n + j];
        if (Math.abs(got - ref[j]) > TOL) throw new Error(`F[${i}][${j}] = ${got}, reference ${ref[j]}`);
      }
    }
  }, 120_000); // the reference casts rays over 300 edges at every quadrature node
});

describe('walk-position ranges of the angular windows', () => {
  it('intersecting many ranges keeps every product (more than any fixed buffer held), merged, as a brute-force set intersection', () => {
    // 60 short ranges against 9 overlapping windows: over 400 products before merging.
    const a = new WalkRanges(2),
      b = new WalkRanges(2),
      scratch = new WalkRanges(2);
    for (let k = 0; k < 60; k++) a.push(10 * k, 10 * k + 6);
    for (let k = 0; k < 9; k++) b.push(3 + 7 * k, 3 + 7 * k + 500);
    const inA = (m: number) => m % 10 <= 6 && m < 600;
    const inB = (m: number) => [...Array(9).keys()].some((k) => m >= 3 + 7 * k && m <= 503 + 7 * k);
    intersectRanges(a, b, scratch);
    expect(scratch.count).toBeGreaterThan(64);
    const got = new Set<number>();
    for (let q = 0; q < a.count; q++) {
      if (q > 0) expect(a.lo[q]).toBeGreaterThan(a.hi[q - 1] + 1); // sorted, disjoint, not adjacent
      for (let m = a.lo[q]; m <= a.hi[q]; m++) got.add(m);
    }
    const want = [...Array(700).keys()].filter((m) => inA(m) && inB(m));
    expect([...got].sort((x, y) => x - y)).toEqual(want);
  });
});
