import { describe, expect, it } from 'vitest';
import type { CircleInput } from '../../../src/core/scene';
import { oracleRow } from './circleOracle';
import { sectionFactors } from './section';

// Named after the fault it caught (a seeded fuzz against the reference, seed 43374): a
// short top edge of a 14-sided bar (part 10) and an edge of an 8-sided bar (part 21)
// see each other only in a sliver (F = 1.6e-6), with a tube whose rim crosses the top
// edge's line just past its end. The alignment where the emitter crosses the target's
// own line (both ends of the target in one line with p, the target turning edge-on)
// is a breakpoint. The rule that drops alignments whose line a circle crosses before
// the target (arc/curvedPair.ts, `keeps`) took that line, nearly along the target, to
// meet the target just past its end and inside the tube, dropped the breakpoint, and
// the pair came out 0. A line must now cross the target at an angle of at least
// 1e-6 rad, away from its ends, and cross a target circle clearly, for the rule to
// apply. Checked against the ray-cast reference of circleOracle.ts (the 2D point
// kernel of Siegel and Howell, Thermal Radiation Heat Transfer; no code shared with
// src/core) to 1e-9, as the other circle tests.
const TOL = 1e-9;

const box = [
  [0, 0],
  [6.725169660523534, 0],
  [6.725169660523534, 4.020731353899464],
  [0, 4.020731353899464],
];
const bars = [
  [
    [4.411784898280931, 1.3444945255348566],
    [4.512877463386723, 1.3931660669833652],
    [4.582840926931145, 1.4808800307263796],
    [4.607818166913654, 1.590263590503426],
    [4.58286213462997, 1.6996519907993357],
    [4.512915678339524, 1.7873795173748146],
    [4.411832551547631, 1.8360706576840815],
    [4.299633507218621, 1.8360815342312389],
    [4.198540942112829, 1.7874099927827305],
    [4.128577478568407, 1.6996960290397163],
    [4.103600238585898, 1.5903124692626698],
    [4.128556270869582, 1.48092406896676],
    [4.198502727160029, 1.393196542391281],
    [4.299585853951921, 1.344505402082014],
  ],
  [
    [1.0582634296846605, 2.0135131036238354],
    [1.032771357359906, 1.9055554433191186],
    [1.0910833338350732, 1.8111922324292877],
    [1.1990409941397902, 1.7857001601045333],
    [1.293404205029621, 1.8440121365797004],
    [1.3188962773543755, 1.9519697968844174],
    [1.2605843008792084, 2.046333007774248],
    [1.1526266405744914, 2.0718250800990026],
  ],
];
const circles: CircleInput[] = [
  { kind: 'solid', cx: 4.468574859183617, cy: 2.2561740013482496, radius: 0.4232742168940604, arcs: 2 },
  { kind: 'solid', cx: 1.2723597265923452, cy: 3.4901821126353774, radius: 0.3268538244068623, arcs: 1 },
  { kind: 'solid', cx: 4.756989430324527, cy: 0.9279869916730639, radius: 0.18700966285541654, arcs: 3 },
];

describe('a target seen edge-on past a tube', () => {
  it('rows of both edges match the reference, the sliver included', { timeout: 120_000 }, () => {
    const { scene, F, n } = sectionFactors(
      [{ kind: 'enclosure', points: box }, ...bars.map((points) => ({ kind: 'solid' as const, points }))],
      circles,
    );
    expect(scene.parts[10].kind).toBe('segment');
    expect(scene.parts[21].kind).toBe('segment');
    for (const i of [10, 21]) {
      const ref = oracleRow(scene, i, 1e-12);
      for (let j = 0; j < n; j++)
        if (Math.abs(F[i * n + j] - ref[j]) > TOL)
          throw new Error(`F[${i}][${j}] = ${F[i * n + j]}, reference ${ref[j]}`);
    }
    expect(F[10 * n + 21]).toBeGreaterThan(1e-6);
  });
});
