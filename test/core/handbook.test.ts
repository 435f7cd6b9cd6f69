import { describe, expect, it } from 'vitest';
import { f, perEdge, withSurfaces } from './helpers';

// Closed forms for long (2D) geometries. Sources are named beside each check.
// Exact methods agree to rounding, so the tolerance is 1e-12 (well above 1e-16 * terms).
const TOL = 1e-12;

describe('handbook view factors (unobstructed)', () => {
  it('parallel plates with midlines joined by a perpendicular (Incropera et al., Fundamentals of Heat and Mass Transfer, 6th ed., Table 13.1, from memory)', () => {
    for (const [wi, wj, L] of [
      [1, 1, 1],
      [2, 1, 0.5],
      [0.3, 3, 2],
    ]) {
      // A trapezoid: plate i on the floor, plate j on the roof, centred on one vertical.
      const r = perEdge([
        {
          kind: 'enclosure',
          points: [
            [-wi / 2, 0],
            [wi / 2, 0],
            [wj / 2, L],
            [-wj / 2, L],
          ],
        },
      ]);
      const Wi = wi / L,
        Wj = wj / L;
      const expected = (Math.sqrt((Wi + Wj) ** 2 + 4) - Math.sqrt((Wj - Wi) ** 2 + 4)) / (2 * Wi);
      expect(Math.abs(f(r, 0, 2) - expected)).toBeLessThan(TOL);
    }
  });

  it('perpendicular plates with a common edge (Incropera et al., Table 13.1, from memory)', () => {
    for (const [wi, wj] of [
      [1, 1],
      [1, 3],
      [2.5, 0.4],
    ]) {
      const r = perEdge([
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [wi, 0],
            [0, wj],
          ],
        },
      ]);
      // Edge 0 is the plate of width wi on the x axis, edge 2 the plate of width wj on the y axis.
      const expected = (1 + wj / wi - Math.sqrt(1 + (wj / wi) ** 2)) / 2;
      expect(Math.abs(f(r, 0, 2) - expected)).toBeLessThan(TOL);
    }
  });

  it('inclined plates of equal width with a common edge, a V-groove (Incropera et al., Table 13.1, from memory)', () => {
    for (const alphaDeg of [20, 60, 90, 135]) {
      const a = (alphaDeg * Math.PI) / 180;
      const w = 1.7;
      // Apex at the origin, the two walls opening symmetric about the y axis; the third edge is the groove's mouth.
      const left: [number, number] = [-w * Math.sin(a / 2), w * Math.cos(a / 2)];
      const right: [number, number] = [w * Math.sin(a / 2), w * Math.cos(a / 2)];
      const r = perEdge([{ kind: 'enclosure', points: [[0, 0], right, left] }]);
      const expected = 1 - Math.sin(a / 2);
      expect(Math.abs(f(r, 0, 2) - expected)).toBeLessThan(TOL);
      expect(Math.abs(f(r, 0, 1) - Math.sin(a / 2))).toBeLessThan(TOL); // wall to mouth, by the summation rule
    }
  });

  it('three-sided enclosure F_ij = (w_i + w_j - w_k) / (2 w_i) (Incropera et al., Table 13.1, from memory)', () => {
    const pts = [
      [0, 0],
      [5, 0],
      [1.2, 2.9],
    ];
    const r = perEdge([{ kind: 'enclosure', points: pts }]);
    const w = [0, 1, 2].map((k) => Math.hypot(pts[(k + 1) % 3][0] - pts[k][0], pts[(k + 1) % 3][1] - pts[k][1]));
    for (let i = 0; i < 3; i++) {
      for (let j = 0; j < 3; j++) {
        if (i === j) continue;
        const k = 3 - i - j;
        expect(Math.abs(f(r, i, j) - (w[i] + w[j] - w[k]) / (2 * w[i]))).toBeLessThan(TOL);
      }
    }
  });

  it('square duct: adjacent walls 1 - sqrt(2)/2, opposite walls sqrt(2) - 1 (crossed strings of Hottel evaluated by hand; Modest, Radiative Heat Transfer, 3rd ed., ch. 4, crossed-strings method, from memory)', () => {
    const r = perEdge([
      {
        kind: 'enclosure',
        points: [
          [0, 0],
          [3, 0],
          [3, 3],
          [0, 3],
        ],
      },
    ]);
    expect(Math.abs(f(r, 0, 1) - (1 - Math.SQRT1_2))).toBeLessThan(TOL);
    expect(Math.abs(f(r, 0, 2) - (Math.SQRT2 - 1))).toBeLessThan(TOL);
    expect(f(r, 0, 0)).toBe(0);
  });

  it('offset parallel plates in open space: F = (sqrt(10) - sqrt(2)) / 4 (crossed strings of Hottel evaluated by hand; Modest, Radiative Heat Transfer, 3rd ed., ch. 4, crossed-strings method, from memory)', () => {
    // Plate 1: top face of a thin bar from x = 0 to 2 at y = 0; plate 2: bottom face of a bar from x = 1 to 3 at y = 1.
    // Crossed strings sqrt(10) and sqrt(2), uncrossed strings sqrt(2) and sqrt(2), plate width 2.
    const t = 0.01;
    const r = perEdge([
      {
        kind: 'solid',
        points: [
          [0, -t],
          [2, -t],
          [2, 0],
          [0, 0],
        ],
      },
      {
        kind: 'solid',
        points: [
          [1, 1],
          [3, 1],
          [3, 1 + t],
          [1, 1 + t],
        ],
      },
    ]);
    // Edge 2 is (2,0)-(0,0), the top of bar 1; edge 4 is (1,1)-(3,1), the bottom of bar 2.
    expect(Math.abs(f(r, 2, 4) - (Math.sqrt(10) - Math.SQRT2) / 4)).toBeLessThan(TOL);
    // Open sketch: what is not seen goes to the surroundings, so rows sum to less than one.
    expect(r.closed).toBe(false);
    expect(r.rowSumResidual[2]).toBeGreaterThan(0.1);
  });

  it('convex body inside an enclosure: F_body,wall = 1 and F_wall,body = L_body / L_wall (summation rule and reciprocity; concentric cylinders, Incropera et al., Table 13.2, from memory)', () => {
    const sides = 24;
    const ring = (r: number, phase: number) =>
      Array.from({ length: sides }, (_, k) => [
        r * Math.cos(phase + (2 * Math.PI * k) / sides),
        r * Math.sin(phase + (2 * Math.PI * k) / sides),
      ]);
    const polys = [
      { kind: 'enclosure' as const, points: ring(2, 0.1) },
      { kind: 'solid' as const, points: ring(0.7, 0.3) },
    ];
    const edgeSurface: number[] = [...new Array<number>(sides).fill(0), ...new Array<number>(sides).fill(1)];
    const r = withSurfaces(polys, edgeSurface, 2);
    expect(Math.abs(f(r, 1, 0) - 1)).toBeLessThan(TOL);
    expect(f(r, 1, 1)).toBe(0);
    expect(Math.abs(f(r, 0, 1) - r.surfaceLength[1] / r.surfaceLength[0])).toBeLessThan(TOL);
    // Outer wall is concave: it sees itself, F_22 = 1 - F_21 (Incropera et al., sec. 13.1, summation rule).
    expect(Math.abs(f(r, 0, 0) - (1 - r.surfaceLength[1] / r.surfaceLength[0]))).toBeLessThan(TOL);
  });
});
