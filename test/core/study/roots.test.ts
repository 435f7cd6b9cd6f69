import { describe, expect, it } from 'vitest';
import { brentRoot, evenlySpaced, rootsByScan, ROOT_RELATIVE_TOLERANCE } from '../../../src/core/study';

const tolerance = { relative: 1e-9, absolute: 0, maxEvaluations: 200 };

describe('evenlySpaced', () => {
  it('includes both ends exactly and spaces evenly, in either direction', () => {
    expect(evenlySpaced(300, 500, 5)).toEqual([300, 350, 400, 450, 500]);
    const down = evenlySpaced(1, 0.1, 4);
    expect(down[0]).toBe(1);
    expect(down[3]).toBe(0.1);
    expect(down[1]).toBeCloseTo(0.7, 15);
  });
});

describe('brentRoot', () => {
  it('finds the cube root of 2 to the asked relative tolerance', () => {
    const r = brentRoot((x) => x ** 3 - 2, 0, 3, -2, 25, tolerance);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(Math.abs(r.root - Math.cbrt(2))).toBeLessThanOrEqual(1e-9 * Math.cbrt(2));
    // Far fewer evaluations than bisection's ~32 to reach 1e-9 relative from a width of 3.
    expect(r.evaluations).toBeLessThan(20);
  });

  it('handles a steep function whose interpolation steps overshoot (falls back to bisection)', () => {
    const f = (x: number) => Math.tanh(50 * (x - 0.3));
    const r = brentRoot(f, -1, 1, f(-1), f(1), tolerance);
    expect(r.ok && Math.abs(r.root - 0.3)).toBeLessThanOrEqual(1e-9 * 0.3);
  });

  it('refuses ends of one sign and reports a non-number', () => {
    expect(brentRoot((x) => x * x + 1, -1, 1, 2, 2, tolerance)).toMatchObject({ ok: false, code: 'not-bracketed' });
    const r = brentRoot((x) => (x > 0.2 ? Number.NaN : x - 0.5), 0, 1, -0.5, 0.5, tolerance);
    expect(r).toMatchObject({ ok: false, code: 'not-finite' });
  });
});

describe('rootsByScan', () => {
  it('finds every sign change of sin over [0.5, 10] (pi, 2 pi, 3 pi)', () => {
    const values = evenlySpaced(0.5, 10, 16);
    const out = rootsByScan(Math.sin, values, values.map(Math.sin));
    expect(out.ok).toBe(true);
    if (!out.ok) return;
    expect(out.roots).toHaveLength(3);
    out.roots.forEach((r, k) =>
      expect(Math.abs(r - (k + 1) * Math.PI)).toBeLessThanOrEqual(ROOT_RELATIVE_TOLERANCE * (k + 1) * Math.PI),
    );
  });

  it('counts a root on a scanned value once, and sorts roots ascending when the scan runs downwards', () => {
    const f = (x: number) => (x - 2) * (x - 3.5);
    const values = evenlySpaced(4, 0, 5); // 4, 3, 2, 1, 0: f is exactly 0 at 2
    const out = rootsByScan(f, values, values.map(f));
    expect(out).toEqual({ ok: true, roots: [2, expect.closeTo(3.5, 8) as number] });
  });

  it('reports no root when the scan sees no sign change', () => {
    const values = evenlySpaced(0, 1, 8);
    expect(
      rootsByScan(
        (x) => x + 1,
        values,
        values.map((x) => x + 1),
      ),
    ).toEqual({ ok: true, roots: [] });
  });
});
