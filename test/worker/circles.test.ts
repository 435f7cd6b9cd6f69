import { describe, expect, it } from 'vitest';
import { computeEdgeViewFactors } from '../../src/worker/api';
import { isSurfaceAnswer, jobFromPolygons } from '../../src/worker/job';
import { geometryKey, scaleBetween } from '../../src/state/results/geometry';
import { edgeMatrixOf } from './edgeMatrix';

// Circles travel in the view-factor job: their arcs follow every polygon edge in the
// edge matrix, and the geometry key changes when a circle moves but not when the
// whole sketch is scaled.
const box = { kind: 'enclosure' as const, points: [0, 0, 3, 0, 3, 2, 0, 2] };
const tube = { kind: 'solid' as const, cx: 1, cy: 1, radius: 0.25, arcs: 3 };

describe('circles in the view-factor job', () => {
  it('computes polygon edges then arcs, every row summing to one', () => {
    const r = computeEdgeViewFactors(jobFromPolygons([box], [tube]));
    if (isSurfaceAnswer(r)) throw new Error('a job without surfaces answers edge factors');
    expect(r.edgeCount).toBe(4 + 3);
    // Arc lengths r * 2 pi / 3, computed here.
    for (let a = 4; a < 7; a++) expect(r.edgeLength[a]).toBeCloseTo((0.25 * 2 * Math.PI) / 3, 14);
    const F = edgeMatrixOf(r);
    for (let i = 0; i < r.edgeCount; i++) {
      let s = 0;
      for (let j = 0; j < r.edgeCount; j++) s += F[i * r.edgeCount + j];
      // Common practice: the enclosure rule, exact to rounding.
      expect(Math.abs(1 - s)).toBeLessThan(1e-12);
    }
  });

  it('keys a moved circle as new geometry and a scaled sketch as the same', () => {
    const base = geometryKey([box], [tube]);
    expect(scaleBetween(base, geometryKey([box], [{ ...tube, cx: 1.1 }]))).toBeNull();
    expect(scaleBetween(base, geometryKey([box], [{ ...tube, arcs: 4 }]))).toBeNull();
    const scaled = geometryKey(
      [{ kind: 'enclosure', points: box.points.map((v) => 10 * v) }],
      [{ ...tube, cx: 10, cy: 10, radius: 2.5 }],
    );
    expect(scaleBetween(base, scaled)).toBeCloseTo(10, 12);
  });
});
