import { describe, expect, it } from 'vitest';
import type { CircleInput } from '../../../src/core/scene';
import { mulberry32 } from '../../bench/scenes';
import { boxCorners } from '../helpers';
import { oracleRow } from './circleOracle';
import { sectionFactors, type SectionPolygon } from './section';

// Seeded random sections with exact circles: tubes split into 1 to 6 arcs, some beside
// another 1e-6 or 1e-3 of the smaller radius away (the near-touching case, where the
// factor moves like the square root of the gap), and a few polygon bars, in a box.
// Each is checked row by row, rows on walls and on arcs, against the ray-cast
// reference of circleOracle.ts (the 2D point kernel of Siegel and Howell, Thermal
// Radiation Heat Transfer; no code shared with src/core), cut at every event along the
// emitter (oracleCuts.ts), and by the summation rule of a closed enclosure (Incropera
// et al., Fundamentals of Heat and Mass Transfer, 6th ed., sec. 13.1).
const TOL = 1e-9;
const SECTIONS = 16;

interface Section {
  polys: SectionPolygon[];
  circles: CircleInput[];
  /** Tubes or bars placed 1e-6 of the smaller radius from another. */
  nearlyTouching: number;
}

function randomSection(seed: number): Section {
  const rand = mulberry32(7919 * seed);
  const W = 3 + 4 * rand(),
    H = 2 + 3 * rand();
  const polys: Section['polys'] = [
    {
      kind: 'enclosure',
      points: boxCorners(W, H),
    },
  ];
  const circles: CircleInput[] = [];
  const placed: [number, number, number][] = [];
  let nearlyTouching = 0;
  const wanted = 1 + Math.floor(6 * rand());
  for (let attempt = 0; attempt < 5 * wanted && placed.length < wanted; attempt++) {
    const r = 0.1 + 0.4 * rand();
    let cx = r + 0.05 + rand() * (W - 2 * r - 0.1),
      cy = r + 0.05 + rand() * (H - 2 * r - 0.1);
    let near = false;
    if (placed.length > 0 && rand() < 0.5) {
      const [x, y, q] = placed[Math.floor(rand() * placed.length)];
      near = rand() < 0.5;
      const a = 2 * Math.PI * rand(),
        d = q + r + (near ? 1e-6 : 1e-3) * Math.min(q, r);
      cx = x + d * Math.cos(a);
      cy = y + d * Math.sin(a);
    }
    if (cx - r < 0.01 || cy - r < 0.01 || cx + r > W - 0.01 || cy + r > H - 0.01) continue;
    if (placed.some(([x, y, q]) => Math.hypot(x - cx, y - cy) < r + q + 1e-7 * Math.min(r, q))) continue;
    placed.push([cx, cy, r]);
    if (near) nearlyTouching++;
    if (rand() < 0.8) circles.push({ kind: 'solid', cx, cy, radius: r, arcs: 1 + Math.floor(6 * rand()) });
    else {
      const n = 3 + Math.floor(10 * rand()),
        turn = 2 * Math.PI * rand();
      polys.push({
        kind: 'solid',
        points: Array.from({ length: n }, (_, k) => [
          cx + r * Math.cos(turn + (2 * Math.PI * k) / n),
          cy + r * Math.sin(turn + (2 * Math.PI * k) / n),
        ]),
      });
    }
  }
  return { polys, circles, nearlyTouching };
}

describe('seeded random sections with exact circles against the ray-cast reference', () => {
  it('the sections hold circles, and several a pair 1e-6 of a radius apart', () => {
    let near = 0;
    for (let seed = 1; seed <= SECTIONS; seed++) {
      const s = randomSection(seed);
      expect(s.circles.length + s.polys.length - 1).toBeGreaterThan(0);
      if (s.nearlyTouching > 0) near++;
    }
    expect(near).toBeGreaterThanOrEqual(3);
  });

  it('rows on walls and on arcs match the reference and sum to one', { timeout: 600_000 }, () => {
    let arcRows = 0;
    for (let seed = 1; seed <= SECTIONS; seed++) {
      const { polys, circles } = randomSection(seed);
      const { scene, F, n } = sectionFactors(polys, circles);
      const pick = mulberry32(500 + seed);
      for (let q = 0; q < 3; q++) {
        const i = Math.floor(pick() * n);
        if (scene.parts[i].kind === 'arc') arcRows++;
        const ref = oracleRow(scene, i, 1e-11);
        let sum = 0;
        for (let j = 0; j < n; j++) {
          const got = F[i * n + j];
          sum += got;
          if (Math.abs(got - ref[j]) > TOL)
            throw new Error(`section ${seed}: F[${i}][${j}] = ${got}, reference ${ref[j]}`);
        }
        expect(Math.abs(sum - 1)).toBeLessThan(1e-12);
      }
    }
    expect(arcRows).toBeGreaterThan(5);
  });
});
