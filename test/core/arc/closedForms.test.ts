import { describe, expect, it } from 'vitest';
import { computeViewFactors } from '../../../src/core/viewFactors';
import type { CircleInput, PolygonInput } from '../../../src/core/scene';

// Exact circles against published closed forms. The method is exact (closed-form
// piece integrals), so agreement is to rounding: errors seen are ~1e-14.
const TOL = 1e-12;

/**
 * Surface factors with one surface per polygon or circle, in the order given (polygons
 * first); a polygon marked `ownTop` gives its first edge a surface of its own, numbered
 * after the circles (the strip on top of a thin bar).
 */
function perShape(polygons: PolygonInput[], circles: CircleInput[], ownTop = false) {
  const edgeSurface: number[] = [];
  const m = polygons.length + circles.length + (ownTop ? 1 : 0);
  polygons.forEach((p, k) => {
    for (let e = 0; e < p.points.length / 2; e++) edgeSurface.push(ownTop && k === 0 && e === 0 ? m - 1 : k);
  });
  circles.forEach((c, k) => {
    for (let m = 0; m < c.arcs; m++) edgeSurface.push(polygons.length + k);
  });
  const r = computeViewFactors({ polygons, circles, edgeSurface, surfaceCount: m });
  return (i: number, j: number) => r.F[i * m + j];
}

const tube = (cx: number, cy: number, radius: number, arcs = 1): CircleInput => ({
  kind: 'solid',
  cx,
  cy,
  radius,
  arcs,
});

// Howell, A Catalog of Radiation Heat Transfer Configuration Factors, "two infinitely long
// parallel cylinders of the same radius" (also Siegel and Howell, Thermal Radiation Heat
// Transfer, appendix of configuration factors); formula from memory:
// F_12 = (1/pi) (sqrt(X^2 - 1) + asin(1/X) - X), X = 1 + s / (2 r), s the gap.
const equalCylinders = (s: number, r: number) => {
  const X = 1 + s / (2 * r);
  return (Math.sqrt(X * X - 1) + Math.asin(1 / X) - X) / Math.PI;
};

// Howell's catalogue, "infinitely long parallel cylinders of different radii" (from memory):
// with R = r2 / r1 and C = 1 + R + s / r1,
// F_12 = 1/(2 pi) [pi + sqrt(C^2 - (R+1)^2) - sqrt(C^2 - (R-1)^2) + (R-1) acos((R-1)/C) - (R+1) acos((R+1)/C)].
const unequalCylinders = (r1: number, r2: number, s: number) => {
  const R = r2 / r1,
    C = 1 + R + s / r1;
  return (
    (Math.PI +
      Math.sqrt(C * C - (R + 1) ** 2) -
      Math.sqrt(C * C - (R - 1) ** 2) +
      (R - 1) * Math.acos((R - 1) / C) -
      (R + 1) * Math.acos((R + 1) / C)) /
    (2 * Math.PI)
  );
};

describe('exact circles against closed forms', () => {
  it('two parallel cylinders of equal radius, from wide gaps down to a gap of 1e-6 of the radius', () => {
    // The touching limit X -> 1 of the same form is 1/2 - 1/pi (Howell's catalogue, from memory).
    expect(equalCylinders(0, 1)).toBeCloseTo(0.5 - 1 / Math.PI, 15);
    for (const [s, r, arcs] of [
      [3, 1, 1],
      [1, 0.5, 3],
      [0.2, 2, 4],
      [1e-3, 1, 2],
      [1e-6, 1, 1],
      [1e-6, 0.0572, 5],
    ]) {
      const F = perShape([], [tube(0.3, -0.2, r, 1), tube(0.3 + 2 * r + s, -0.2, r, arcs)]);
      expect(Math.abs(F(0, 1) - equalCylinders(s, r))).toBeLessThan(TOL);
      expect(Math.abs(F(1, 0) - equalCylinders(s, r))).toBeLessThan(TOL);
    }
  });

  it('two parallel cylinders of unequal radii, any relative position', () => {
    for (const [r1, r2, s, turn] of [
      [1, 2, 0.5, 0.3],
      [0.3, 1, 1e-6, 2.1],
      [2, 0.1, 3, -1],
    ]) {
      const d = r1 + r2 + s;
      const F = perShape([], [tube(1, 2, r1, 2), tube(1 + d * Math.cos(turn), 2 + d * Math.sin(turn), r2, 3)]);
      expect(Math.abs(F(0, 1) - unequalCylinders(r1, r2, s))).toBeLessThan(TOL);
      // Reciprocity gives the other direction: r1 F_12 = r2 F_21.
      expect(Math.abs(F(1, 0) - (r1 / r2) * unequalCylinders(r1, r2, s))).toBeLessThan(TOL);
    }
  });

  it('a strip parallel to a cylinder, including a tube resting 1e-6 of its radius above the strip', () => {
    // Howell's catalogue, "plane strip of finite width to a parallel cylinder" (from memory): a strip
    // in a plane at distance a from the axis, from b1 to b2 along the plane (measured from the foot
    // of the axis): F_strip,cyl = r / (b2 - b1) (atan(b2 / a) - atan(b1 / a)).
    for (const [r, a, b1, b2] of [
      [1, 3, -2, 5],
      [0.5, 0.5 * (1 + 1e-6), -1, 1],
      [0.2, 1, 0.5, 4],
    ]) {
      // The strip is the top edge of a thin solid bar (radiating upward); the cylinder sits above it.
      const bar: PolygonInput = { kind: 'solid', points: [b1, 0, b2, 0, b2, -0.05, b1, -0.05] };
      const F = perShape([bar], [tube(0, a, r, 2)], true);
      const expected = (r / (b2 - b1)) * (Math.atan(b2 / a) - Math.atan(b1 / a));
      expect(Math.abs(F(2, 1) - expected)).toBeLessThan(TOL); // surface 2: the bar's top edge
    }
  });

  it('concentric and eccentric cylinders: F_12 = 1, F_21 = r1 / r2, F_22 = 1 - r1 / r2', () => {
    // Enclosure rule and reciprocity (Incropera et al., Fundamentals of Heat and Mass Transfer,
    // 6th ed., sec. 13.1.3, two-surface enclosure of long concentric cylinders); the inner tube
    // sees only the shell, wherever it sits inside.
    for (const [r1, r2, ox, arcs1, arcs2] of [
      [1, 2, 0, 1, 1],
      [0.5, 3, 1.7, 3, 4],
      [1, 1 + 1e-6, 0, 2, 3],
    ]) {
      const F = perShape([], [tube(ox, 0, r1, arcs1), { kind: 'enclosure', cx: 0, cy: 0, radius: r2, arcs: arcs2 }]);
      expect(Math.abs(F(0, 1) - 1)).toBeLessThan(TOL);
      expect(Math.abs(F(1, 0) - r1 / r2)).toBeLessThan(TOL);
      expect(Math.abs(F(1, 1) - (1 - r1 / r2))).toBeLessThan(TOL);
    }
  });

  it("a plane to an infinite row of tubes (Hottel's formula), approached by a long row", () => {
    // Hottel's formula for a plane facing one row of tubes of diameter D at pitch p (Modest,
    // Radiative Heat Transfer, configuration-factor examples; Howell's catalogue; from memory):
    // F = 1 - sqrt(1 - x^2) + x atan(sqrt(1 - x^2) / x), x = D / p. It does not depend on the
    // distance c from the plane to the tubes' centre line.
    const D = 1,
      p = 2,
      c = 1.5;
    const x = D / p;
    const hottel = 1 - Math.sqrt(1 - x * x) + x * Math.atan(Math.sqrt(1 - x * x) / x);
    const errors: number[] = [];
    for (const M of [10, 20]) {
      // 2M + 1 tubes; the strip of one pitch under the middle tube stands for the plane.
      const circles: CircleInput[] = [];
      for (let k = -M; k <= M; k++) circles.push(tube(k * p, c, D / 2));
      const bar: PolygonInput = { kind: 'solid', points: [-p / 2, 0, p / 2, 0, p / 2, -0.1, -p / 2, -0.1] };
      const F = perShape([bar], circles, true);
      const strip = 1 + circles.length; // the bar's top edge
      let fromStrip = 0;
      for (let k = 0; k < circles.length; k++) fromStrip += F(strip, 1 + k);
      // What the finite row misses leaves past its last tubes: at most the directions beyond the
      // end tubes' centres, 1 - sin(atan((M p - p/2) / c)) for both ends together.
      const bound = 1 - Math.sin(Math.atan((M * p - p / 2) / c));
      const error = hottel - fromStrip;
      expect(error).toBeGreaterThan(0);
      expect(error).toBeLessThan(bound);
      errors.push(error);
    }
    // The missing far-field fraction falls like 1/M^2: about 4x per doubling of the row
    // (3.1e-4 with 41 tubes at x = 1/2).
    expect(errors[0] / errors[1]).toBeGreaterThan(3.5);
    expect(errors[0] / errors[1]).toBeLessThan(4.5);
  });

  it('a tube in a square duct: regular n-gon tubes converge to the exact circle, error about 4x smaller per doubling', () => {
    // Common practice: an inscribed n-gon differs from its circle by O(1/n^2) (perimeter short by
    // about pi^3 / (3 n^2)), so the wall-to-tube factor converges quadratically.
    const duct: PolygonInput = { kind: 'enclosure', points: [0, 0, 1, 0, 1, 1, 0, 1] };
    const c = tube(0.35, 0.6, 0.2);
    const wallToTube = (n: number) => {
      const pts: number[] = [];
      for (let k = 0; k < n; k++)
        pts.push(c.cx + c.radius * Math.cos((2 * Math.PI * k) / n), c.cy + c.radius * Math.sin((2 * Math.PI * k) / n));
      const edgeSurface = [0, 1, 2, 3, ...Array<number>(n).fill(4)];
      const r = computeViewFactors({ polygons: [duct, { kind: 'solid', points: pts }], edgeSurface, surfaceCount: 5 });
      return r.F[0 * 5 + 4];
    };
    const exactWall = computeViewFactors({
      polygons: [duct],
      circles: [c],
      edgeSurface: [0, 1, 2, 3, 4],
      surfaceCount: 5,
    }).F[4];
    const errors = [24, 48, 96, 192].map((n) => Math.abs(wallToTube(n) - exactWall));
    for (let k = 0; k + 1 < errors.length; k++) {
      expect(errors[k] / errors[k + 1]).toBeGreaterThan(3.5);
      expect(errors[k] / errors[k + 1]).toBeLessThan(4.5);
    }
  });

  it('arcs of one cylindrical shell, far from the origin: crossed strings between chords', () => {
    // Hottel's crossed strings (Modest, Radiative Heat Transfer, ch. 4): inside a circle every
    // string is a chord, 2 r sin(angle / 2). An arc of angle t sees itself: 1 - 2 sin(t/2) / t.
    const r = 1e-3,
      n = 5,
      t = (2 * Math.PI) / n;
    const chord = (a: number) => 2 * r * Math.abs(Math.sin(a / 2));
    const shell: CircleInput = { kind: 'enclosure', cx: 1e6, cy: -3e5, radius: r, arcs: n };
    const edgeSurface = Array.from({ length: n }, (_, k) => k);
    const res = computeViewFactors({ polygons: [], circles: [shell], edgeSurface, surfaceCount: n });
    for (let j = 0; j < n; j++) {
      // Arc 0 spans [0, t], arc j spans [j t, (j + 1) t]: the crossed strings are chords of
      // j t, the uncrossed ones of (j - 1) t and (j + 1) t; crossed minus uncrossed over 2 L.
      const expected =
        j === 0
          ? 1 - (2 * Math.sin(t / 2)) / t
          : (2 * chord(j * t) - chord((j + 1) * t) - chord((j - 1) * t)) / (2 * r * t);
      expect(Math.abs(res.F[j] - expected)).toBeLessThan(1e-12);
    }
  });
});
