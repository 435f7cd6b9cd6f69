import { describe, expect, it } from 'vitest';
import type { CircleInput } from '../../../src/core/scene';
import { oracleRow } from './circleOracle';
import { sectionFactors, type SectionPolygon } from './section';

// The core against the ray-cast reference (circleOracle.ts, no shared code). The
// reference integrates by adaptive Gauss-Kronrod quadrature to about 1e-11 per entry;
// it is cut at every event along the emitter (oracleCuts.ts); agreement is asked to 1e-9.
const TOL = 1e-9;

function compare(polys: SectionPolygon[], circles: CircleInput[], rows: number[]): void {
  const { scene, F, n } = sectionFactors(polys, circles);
  for (const i of rows) {
    const ref = oracleRow(scene, i, 1e-11);
    for (let j = 0; j < n; j++) expect(Math.abs(F[i * n + j] - ref[j])).toBeLessThan(TOL);
  }
}

describe('exact circles against the ray-cast reference', () => {
  it('tubes split into arcs beside a non-convex bar in a duct with a pocket', () => {
    compare(
      [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [10, 0],
            [10, 10],
            [6, 10],
            [6, 7],
            [4, 7],
            [4, 10],
            [0, 10],
          ],
        },
        {
          kind: 'solid',
          points: [
            [5, 3],
            [6.5, 3],
            [6.5, 4.5],
            [6.1, 4.5],
            [6.1, 3.6],
            [5, 3.6],
          ],
        },
      ],
      [
        { kind: 'solid', cx: 3, cy: 3, radius: 1.2, arcs: 3 },
        { kind: 'solid', cx: 7.5, cy: 7.2, radius: 0.8, arcs: 2 },
      ],
      [0, 4, 9, 14, 16, 17, 18],
    );
  });

  it('a shell in four arcs around a triangle and two tubes 1e-3 apart', () => {
    compare(
      [
        {
          kind: 'solid',
          points: [
            [-1, -2],
            [0.5, -2.5],
            [0, -1],
          ],
        },
      ],
      [
        { kind: 'enclosure', cx: 0, cy: 0, radius: 4, arcs: 4 },
        { kind: 'solid', cx: -1, cy: 1, radius: 1, arcs: 2 },
        { kind: 'solid', cx: 1.001, cy: 1, radius: 1, arcs: 3 },
      ],
      [0, 3, 4, 6, 7, 9, 11],
    );
  });

  it('the profile around a tube over a strip: each of 24 arcs against quadrature of the point-to-strip kernel', () => {
    // A cold black tube over a hot black strip, open to cold surroundings: the net flux
    // into arc k is sigma T^4 times F(arc k -> strip), so the profile is this row of factors.
    compare(
      [
        {
          kind: 'solid',
          points: [
            [-1, 0],
            [1.5, 0],
            [1.5, -0.1],
            [-1, -0.1],
          ],
        },
      ],
      [{ kind: 'solid', cx: 0, cy: 0.8, radius: 0.3, arcs: 24 }],
      Array.from({ length: 24 }, (_, k) => 4 + k),
    );
  });

  it('a row of tubes under a roof: a tube hides those beyond its neighbour (the one-circle shadow), whole and in arcs', () => {
    // Five tubes of radius 0.1 at a pitch of 0.3 on one line (they all touch the same two
    // lines, so the shadows graze), the middle one in two arcs, in a 2 x 1 box.
    const tubes: CircleInput[] = [0, 1, 2, 3, 4].map((k) => ({
      kind: 'solid',
      cx: 0.4 + 0.3 * k,
      cy: 0.7,
      radius: 0.1,
      arcs: k === 2 ? 2 : 1,
    }));
    compare(
      [
        {
          kind: 'enclosure',
          points: [
            [0, 0],
            [2, 0],
            [2, 1],
            [0, 1],
          ],
        },
      ],
      tubes,
      [2, 4, 5, 6, 8],
    );
  });
});
